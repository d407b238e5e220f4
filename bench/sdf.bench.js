// SDF records per second: conformark's reader vs openchemlib's SDFileParser on the same generated
// 10,000-record file, in the same run. Prints the ratio (goal: at least 10x).
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ConformerGenerator, Molecule, Resources, SDFileParser } from 'openchemlib';
import { parseText, readRecords } from '../dist/index.js';

const out = join(dirname(fileURLToPath(import.meta.url)), 'out');
const path = join(out, 'records-10k.sdf');
const RECORDS = 10_000;

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

function best(label, fn, runs = 3) {
  fn(); // warm-up
  let min = Infinity;
  let n = 0;
  for (let r = 0; r < runs; r++) {
    globalThis.gc?.();
    const t = performance.now();
    n = fn();
    min = Math.min(min, performance.now() - t);
  }
  if (n !== RECORDS) throw new Error(`${label}: read ${n} records, expected ${RECORDS}`);
  const rate = (RECORDS / min) * 1000;
  console.log(`${label.padEnd(34)} ${min.toFixed(0).padStart(6)} ms  ${rate.toFixed(0).padStart(8)} records/s`);
  return rate;
}

if (!existsSync(path)) generate();
const text = readFileSync(path, 'utf8');
console.log(`file: ${path} (${(text.length / 1e6).toFixed(1)} MB, ${RECORDS} records)`);

const ocl = best('openchemlib SDFileParser', () => {
  const parser = new SDFileParser(text, ['energy', 'id']);
  let n = 0;
  while (parser.next()) {
    parser.getMolecule();
    parser.getField('energy');
    n++;
  }
  return n;
}, 1);
const ours = best('conformark parseText', () => parseText(text, { file: path }).length);
let streamed = 0;
const t = performance.now();
for await (const _ of readRecords(path)) streamed++;
const streamMs = performance.now() - t;
if (streamed !== RECORDS) throw new Error(`readRecords read ${streamed} records`);
const streamRate = (RECORDS / streamMs) * 1000;
console.log(`${'conformark readRecords (file)'.padEnd(34)} ${streamMs.toFixed(0).padStart(6)} ms  ${streamRate.toFixed(0).padStart(8)} records/s`);
console.log(`ratio parseText / SDFileParser:   ${(ours / ocl).toFixed(1)}x (goal >= 10x)`);
console.log(`ratio readRecords / SDFileParser: ${(streamRate / ocl).toFixed(1)}x`);
