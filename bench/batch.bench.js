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
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const perFigure = (fn, n) => {
  const times = [];
  for (let round = 0; round < 3; round++) {
    const t = performance.now();
    fn();
    times.push((performance.now() - t) / n);
  }
  return median(times);
};

// Newman figures, this thread: analyse + lay out + render one ring bond each.
newmanFigure(jobs[0].p.molecule, { bond: jobs[0].bond, graph: jobs[0].p.graph, rings: jobs[0].p.rings });
let bytes = 0;
const newman = perFigure(() => {
  for (const { p, bond } of jobs) bytes += newmanFigure(p.molecule, { bond, graph: p.graph, rings: p.rings, idPrefix: 'b-' }).svg.length;
}, jobs.length);

// (a) floor: bare template strings of about the same structure.
let sink = 0;
const floor = perFigure(() => {
  for (let k = 0; k < jobs.length; k++) {
    const lines = Array.from({ length: 6 }, (_, i) => `<line x1="${50 + i}" y1="50" x2="${(50 + 40 * Math.sin(i)).toFixed(2)}" y2="${(50 - 40 * Math.cos(i)).toFixed(2)}" class="bond"/>`).join('');
    sink += `<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><circle cx="50" cy="50" r="20"/>${lines}</svg>`.length;
  }
}, jobs.length);

// (b) peer: openchemlib's 2D depiction of the same molecules (parsed before timing).
// A molecule caches its invented 2D coordinates after the first toSVG: each round gets fresh molecules.
const blocks = ensemble.map((m) => formatSdf([m]).split('$$$$')[0]);
const rounds = [0, 1, 2, 3].map(() => blocks.map((b) => OclMolecule.fromMolfile(b)));
rounds[3].forEach((m) => m.toSVG(300, 200)); // warm-up
let round = 0;
const peer = perFigure(() => {
  for (const m of rounds[round]) sink += m.toSVG(300, 200).length;
  round++;
}, blocks.length);

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

console.log(`batch: ${jobs.length} Newman figures from ${RECORDS} records (${(bytes / 3 / jobs.length / 1024).toFixed(1)} KiB each)`);
console.log(`  newmanFigure            ${newman.toFixed(3)} ms/figure  (${(1000 / newman).toFixed(0)} figures/s)`);
console.log(`  (a) template-string SVG ${floor.toFixed(4)} ms/figure  ratio newman/floor ${(newman / floor).toFixed(0)}`);
console.log(`  (b) openchemlib toSVG   ${peer.toFixed(3)} ms/figure  ratio newman/peer ${(newman / peer).toFixed(2)} (goal < 0.33)`);
console.log(`  batchFile, 1 thread     ${(single.ms / single.figures).toFixed(3)} ms/file (${single.figures} files incl. sheets, ${(single.figures / single.ms * 1000).toFixed(0)} files/s)`);
console.log(`  batchFile, 2 workers    ${(pooled.ms / pooled.figures).toFixed(3)} ms/file (${(pooled.figures / pooled.ms * 1000).toFixed(0)} files/s)`);
if (sink < 0) console.log(sink);
