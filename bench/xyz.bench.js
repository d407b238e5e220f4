// XYZ trajectory streaming: readFrames (reused buffer) and readRecords vs a bare line scan of the same file
// (read + gunzip-free decode + line split, no parsing), same run. Goal: readFrames within 2x of the scan.
// FRAMES=1000000 node bench/xyz.bench.js for the full-size case (default 50,000 frames of 18 atoms).
import { createWriteStream, existsSync, mkdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readFrames, readRecords } from '../dist/index.js';
import { LineSplitter } from '../dist/io/lines.js';
import { openInput } from '../dist/io/openInput.js';

const FRAMES = Number(process.env.FRAMES ?? 50_000);
const out = join(dirname(fileURLToPath(import.meta.url)), 'out');
const path = join(out, `trajectory-${FRAMES}.xyz`);

async function generate() {
  mkdirSync(out, { recursive: true });
  // a chair-like six-ring with twelve hydrogens, jiggled deterministically (no randomness)
  const base = [];
  for (let k = 0; k < 6; k++) {
    const a = (k * Math.PI) / 3;
    base.push(['C', 1.45 * Math.cos(a), 1.45 * Math.sin(a), k % 2 ? 0.25 : -0.25]);
    base.push(['H', 2.05 * Math.cos(a), 2.05 * Math.sin(a), k % 2 ? 1.1 : -1.1]);
    base.push(['H', 2.5 * Math.cos(a), 2.5 * Math.sin(a), k % 2 ? -0.1 : 0.1]);
  }
  const w = createWriteStream(path);
  for (let f = 0; f < FRAMES; f++) {
    let s = `${base.length}\nframe ${f + 1} t=${(f * 0.002).toFixed(3)} energy=${(-23.5 + Math.sin(f) * 0.01).toFixed(6)}\n`;
    for (let i = 0; i < base.length; i++) {
      const [e, x, y, z] = base[i];
      const d = 0.05 * Math.sin(f * 0.37 + i);
      s += `${e} ${(x + d).toFixed(6)} ${(y - d).toFixed(6)} ${(z + d * 0.5).toFixed(6)}\n`;
    }
    if (!w.write(s)) await new Promise((r) => w.once('drain', r));
  }
  await new Promise((r) => w.end(r));
}

async function time(label, fn) {
  globalThis.gc?.();
  const t = performance.now();
  const n = await fn();
  const ms = performance.now() - t;
  console.log(`${label.padEnd(28)} ${ms.toFixed(0).padStart(7)} ms  (${n})`);
  return ms;
}

if (!existsSync(path)) await generate();
console.log(`file: ${path} (${(statSync(path).size / 1e6).toFixed(0)} MB, ${FRAMES} frames)`);

const scan = async () => {
  const s = new LineSplitter(path, 100_000);
  let n = 0;
  for await (const chunk of openInput(path)) n += s.pushBytes(chunk).length;
  return n + s.end().length;
};
const frames = async () => {
  let n = 0;
  let sum = 0;
  for await (const f of readFrames(path, { reuse: true })) {
    n++;
    sum += f.coords[0];
  }
  if (!Number.isFinite(sum)) throw new Error('bad coordinates');
  return n;
};
const records = async () => {
  let n = 0;
  for await (const _ of readRecords(path)) n++;
  return n;
};

await scan(); // warm the page cache and the JIT
await frames();
const results = { scan: [], frames: [], records: [] };
for (let r = 0; r < 3; r++) {
  results.scan.push(await time('bare line scan', scan));
  results.frames.push(await time('readFrames (reuse)', frames));
  results.records.push(await time('readRecords', records));
}
const best = (xs) => Math.min(...xs);
console.log(`frames/s readFrames: ${((FRAMES / best(results.frames)) * 1000).toFixed(0)}`);
console.log(`ratio readFrames / bare scan:  ${(best(results.frames) / best(results.scan)).toFixed(2)}x (goal <= 2x)`);
console.log(`ratio readRecords / bare scan: ${(best(results.records) / best(results.scan)).toFixed(2)}x`);
