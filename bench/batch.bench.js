// Batch figures per second for a 200-record ensemble (compiled dist/), against two baselines measured in
// the same run: (a) the same number of bare template-string SVGs (a circle and six lines: the floor) and
// (b) openchemlib's own 2D depiction, Molecule.toSVG(w, h), of the same molecules (the nearest
// general-purpose peer). Goal: a Newman figure costs less than a third of the peer's depiction.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { Molecule as OclMolecule } from 'openchemlib';
import { batchFile, buildConformers, figureBonds, formatSdf, newmanFigure, prepareRecord } from '../dist/index.js';

const RECORDS = 200;
const { molecules } = await buildConformers('CC1CCCCC1', { conformers: 2, ringForms: true, seed: 1 });
const ensemble = Array.from({ length: RECORDS }, (_, k) => {
  const m = molecules[k % molecules.length];
  return { ...m, title: `record ${k + 1}`, source: { ...m.source, index: k + 1 } };
});
const prepared = ensemble.map((m) => prepareRecord(m));
const jobs = prepared.flatMap((p) => figureBonds(p.molecule, p.graph, p.rings, 'ring').map((bond) => ({ p, bond })));
const ROUNDS = 5;
const best = (xs) => Math.min(...xs);
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const perFigure = (fn, n) => {
  const t = performance.now();
  fn();
  return (performance.now() - t) / n;
};

// Newman figures, this thread: analyse + lay out + render one ring bond each.
newmanFigure(jobs[0].p.molecule, { bond: jobs[0].bond, graph: jobs[0].p.graph, rings: jobs[0].p.rings });
let bytes = 0;
const newmanRound = () => {
  for (const { p, bond } of jobs) bytes += newmanFigure(p.molecule, { bond, graph: p.graph, rings: p.rings, idPrefix: 'b-' }).svg.length;
};

// (a) floor: bare template strings of about the same structure.
let sink = 0;
const floorRound = () => {
  for (let k = 0; k < jobs.length; k++) {
    const lines = Array.from({ length: 6 }, (_, i) => `<line x1="${50 + i}" y1="50" x2="${(50 + 40 * Math.sin(i)).toFixed(2)}" y2="${(50 - 40 * Math.cos(i)).toFixed(2)}" class="bond"/>`).join('');
    sink += `<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><circle cx="50" cy="50" r="20"/>${lines}</svg>`.length;
  }
};

// (b) peer: openchemlib's 2D depiction of the same molecules (parsed before timing).
// A molecule caches its invented 2D coordinates after the first toSVG: each round gets fresh molecules.
const blocks = ensemble.map((m) => formatSdf([m]).split('$$$$')[0]);
const fresh = Array.from({ length: ROUNDS + 1 }, () => blocks.map((b) => OclMolecule.fromMolfile(b)));
fresh[ROUNDS].forEach((m) => m.toSVG(300, 200)); // warm-up
const peerRound = (r) => () => {
  for (const m of fresh[r]) sink += m.toSVG(300, 200).length;
};

// Rounds interleaved (the machine is shared: load shifts between rounds, not within one); best round counts.
const times = { newman: [], floor: [], peer: [] };
for (let r = 0; r < ROUNDS; r++) {
  times.newman.push(perFigure(newmanRound, jobs.length));
  times.floor.push(perFigure(floorRound, jobs.length));
  times.peer.push(perFigure(peerRound(r), blocks.length));
}
const newman = best(times.newman);
const floor = best(times.floor);
const peer = best(times.peer);
const ratios = times.newman.map((t, r) => t / times.peer[r]);

// End to end: `batchFile` on the 200-record SDF, in this thread and on workers (SVG only, no tables).
const dir = mkdtempSync(join(tmpdir(), 'cmk-bench-batch-'));
writeFileSync(join(dir, 'in.sdf'), formatSdf(ensemble));
const endToEnd = async (jobsN) => {
  const t = performance.now();
  const { manifest } = await batchFile(join(dir, 'in.sdf'), join(dir, `out-${jobsN}`), { tables: [], jobs: jobsN });
  const ms = performance.now() - t;
  return { figures: manifest.figures.length, ms };
};
const single = await endToEnd(1);
const pooled = await endToEnd(2);
rmSync(dir, { recursive: true, force: true });

console.log(`batch: ${jobs.length} Newman figures from ${RECORDS} records (${(bytes / ROUNDS / jobs.length / 1024).toFixed(1)} KiB each), best of ${ROUNDS} interleaved rounds`);
console.log(`  newmanFigure            ${newman.toFixed(3)} ms/figure  (${(1000 / newman).toFixed(0)} figures/s)`);
console.log(`  (a) template-string SVG ${floor.toFixed(4)} ms/figure  ratio newman/floor ${(newman / floor).toFixed(0)}`);
console.log(`  (b) openchemlib toSVG   ${peer.toFixed(3)} ms/figure  ratio newman/peer ${(newman / peer).toFixed(2)} (goal < 0.33; per round median ${median(ratios).toFixed(2)}, worst ${Math.max(...ratios).toFixed(2)})`);
console.log(`  batchFile, 1 thread     ${(single.ms / single.figures).toFixed(3)} ms/file (${single.figures} files incl. sheets, ${(single.figures / single.ms * 1000).toFixed(0)} files/s)`);
console.log(`  batchFile, 2 workers    ${(pooled.ms / pooled.figures).toFixed(3)} ms/file (${(pooled.figures / pooled.ms * 1000).toFixed(0)} files/s)`);
if (sink < 0) console.log(sink);
