// SDF records per second: conformark's readers vs openchemlib's SDFileParser on the same generated
// 10,000-record file on disk, in the same run. Every contender starts from the file path (reading it is part
// of the time); rounds are interleaved and the best of ROUNDS (default 3) counts, so a busy machine penalises
// all sides alike. Prints the ratios (goal: at least 10x for both of ours).
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
      // conformers have real bond lengths, so toMolfile() does not rescale them (LIBRARIES.md)
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

/** Milliseconds for one call of `fn`, which must return the number of records it read. */
async function time(label, fn) {
  globalThis.gc?.();
  const t = performance.now();
  const n = await fn();
  const ms = performance.now() - t;
  if (n !== RECORDS) throw new Error(`${label}: read ${n} records, expected ${RECORDS}`);
  return ms;
}

const contenders = [
  {
    label: 'openchemlib SDFileParser',
    does: 'readFileSync, then every record parsed into an OCL Molecule (all atom/bond fields), field "energy" read',
    run: () => {
      const parser = new SDFileParser(readFileSync(path, 'utf8'), ['energy', 'id']);
      let n = 0;
      while (parser.next()) {
        parser.getMolecule();
        parser.getField('energy');
        n++;
      }
      return n;
    },
  },
  {
    label: 'conformark parseText',
    does: 'readFileSync, then parseText: every record as our Molecule (coordinates, bonds, SD fields), all kept',
    run: () => parseText(readFileSync(path, 'utf8'), { file: path }).length,
  },
  {
    label: 'conformark readRecords (stream)',
    does: 'readRecords streams the file in 1 MiB chunks: every record as our Molecule, one at a time',
    run: async () => {
      let n = 0;
      for await (const mol of readRecords(path)) if (mol.properties.energy !== undefined) n++;
      return n;
    },
  },
];

if (!existsSync(path)) generate();
console.log(`file: ${path} (${(statSync(path).size / 1e6).toFixed(1)} MB, ${RECORDS} records), best of ${ROUNDS} interleaved rounds`);
for (const c of contenders) console.log(`  ${c.label}: ${c.does}`);
for (const c of contenders) await c.run(); // warm-up: page cache and JIT
const times = contenders.map(() => []);
for (let r = 0; r < ROUNDS; r++) {
  for (let k = 0; k < contenders.length; k++) times[k].push(await time(contenders[k].label, contenders[k].run));
}
const best = times.map((ts) => Math.min(...ts));
contenders.forEach((c, k) => {
  const rate = (RECORDS / best[k]) * 1000;
  const all = times[k].map((t) => t.toFixed(0)).join(', ');
  console.log(`${c.label.padEnd(32)} ${best[k].toFixed(0).padStart(6)} ms  ${rate.toFixed(0).padStart(8)} records/s  (rounds: ${all} ms)`);
});
console.log(`ratio parseText / SDFileParser:   ${(best[0] / best[1]).toFixed(1)}x (goal >= 10x)`);
console.log(`ratio readRecords / SDFileParser: ${(best[0] / best[2]).toFixed(1)}x (goal >= 10x)`);
