// SDF records per second: conformark's readers vs openchemlib's SDFileParser on the same generated
// 10,000-record file, in the same run. Two pairings: from the file on disk (readRecords streams it;
// openchemlib gets readFileSync + SDFileParser, so reading is part of both times) and from the same text in
// memory (parseText vs SDFileParser on one string read beforehand). Rounds are interleaved and the best of
// ROUNDS (default 3) counts, so a busy machine penalises all sides alike. Goal: at least 10x for both.
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ConformerGenerator, Molecule, Resources, SDFileParser } from 'openchemlib';
import { parseText, readRecords } from '../dist/index.js';

const out = join(dirname(fileURLToPath(import.meta.url)), 'out');
const path = join(out, 'records-10k.sdf');
const RECORDS = 10_000;
const ROUNDS = Number(process.env.ROUNDS ?? 3);

function generate() {
  Resources.registerFromNodejs();
  const smiles = ['OCC1OC(O)C(O)C(O)C1O', 'CC1CCCCC1C(C)C', 'c1ccccc1CCN', 'CC(=O)OC1CCCC1', 'OC1CCOCC1'];
  const blocks = [];
  for (const s of smiles) {
    const gen = new ConformerGenerator(11);
    gen.initializeConformers(Molecule.fromSmiles(s), {});
    for (let k = 0; k < 8; k++) {
      const c = gen.getNextConformerAsMolecule();
      if (!c) break;
      c.setName(`${s} conformer ${k + 1}`);
      // conformers have real bond lengths, so toMolfile() does not rescale them (seen with openchemlib 9.25)
      blocks.push(c.toMolfile());
    }
  }
  const parts = [];
  for (let i = 0; i < RECORDS; i++) {
    parts.push(blocks[i % blocks.length], `> <energy>\n${(i % 97) / 10} kcal/mol\n\n> <id>\n${i + 1}\n\n$$$$\n`);
  }
  mkdirSync(out, { recursive: true });
  writeFileSync(path, parts.join(''));
}

/** Wall and CPU milliseconds for one call of `fn`, which must return the number of records it read. */
async function time(label, fn) {
  globalThis.gc?.();
  const cpu = process.cpuUsage();
  const t = performance.now();
  const n = await fn();
  const wall = performance.now() - t;
  const used = process.cpuUsage(cpu);
  if (n !== RECORDS) throw new Error(`${label}: read ${n} records, expected ${RECORDS}`);
  return { wall, cpu: (used.user + used.system) / 1000 };
}

/** openchemlib's reading: every record parsed into an OCL Molecule, the "energy" field fetched. */
function oclRead(text) {
  const parser = new SDFileParser(text, ['energy', 'id']);
  let n = 0;
  while (parser.next()) {
    parser.getMolecule();
    parser.getField('energy');
    n++;
  }
  return n;
}

let text = '';
const contenders = [
  {
    label: 'openchemlib, from the file',
    does: 'readFileSync, then SDFileParser: each record parsed into an OCL Molecule (all atom and bond fields)',
    run: () => oclRead(readFileSync(path, 'utf8')),
  },
  {
    label: 'conformark readRecords, file',
    does: 'readRecords streams the file in 1 MiB chunks: each record as our Molecule (coordinates, bonds, SD fields)',
    run: async () => {
      let n = 0;
      for await (const mol of readRecords(path)) if (mol.properties.energy !== undefined) n++;
      return n;
    },
  },
  {
    label: 'openchemlib, from text',
    does: 'SDFileParser on the text read beforehand, as above',
    run: () => oclRead(text),
  },
  {
    label: 'conformark parseText, text',
    does: 'parseText on the same text: every record as our Molecule, all returned in one array',
    run: () => parseText(text, { file: path }).length,
  },
];

if (!existsSync(path)) generate();
text = readFileSync(path, 'utf8');
console.log(`file: ${path} (${(statSync(path).size / 1e6).toFixed(1)} MB, ${RECORDS} records), best of ${ROUNDS} interleaved rounds`);
for (const c of contenders) console.log(`  ${c.label}: ${c.does}`);
for (const c of contenders) await c.run(); // warm-up: page cache and JIT
const times = contenders.map(() => []);
for (let r = 0; r < ROUNDS; r++) {
  for (let k = 0; k < contenders.length; k++) times[k].push(await time(contenders[k].label, contenders[k].run));
}
const best = (k, what) => Math.min(...times[k].map((t) => t[what]));
contenders.forEach((c, k) => {
  const wall = best(k, 'wall');
  const rate = (RECORDS / wall) * 1000;
  const all = times[k].map((t) => t.wall.toFixed(0)).join(', ');
  console.log(
    `${c.label.padEnd(30)} ${wall.toFixed(0).padStart(6)} ms  ${rate.toFixed(0).padStart(7)} records/s  ` +
      `cpu ${best(k, 'cpu').toFixed(0).padStart(5)} ms  (wall per round: ${all})`,
  );
});
const ratio = (ocl, ours) => `${(best(ocl, 'wall') / best(ours, 'wall')).toFixed(1)}x wall, ${(best(ocl, 'cpu') / best(ours, 'cpu')).toFixed(1)}x cpu`;
console.log(`ratio readRecords / openchemlib (from the file): ${ratio(0, 1)} (goal >= 10x)`);
console.log(`ratio parseText / openchemlib (from text):      ${ratio(2, 3)} (goal >= 10x)`);
