// Trajectory puckering throughput and memory: `analyzeTrajectory` on a generated ~1,000,000-frame cyclohexane
// XYZ trajectory (18 atoms per frame) against a bare line scan of the same file in the same run (read 1 MiB
// chunks, decode, split into lines, parse nothing), best of TRAJ_ROUNDS (default 3) interleaved rounds.
// Goal: within 2x of the scan. Then peak RSS of a child process analysing a 100,000-frame and the
// 1,000,000-frame file, with default node flags (goal: flat, under 150 MB).
// Last run (2 shared cores, best of 3): trajectory / scan 0.93x (readFrames 0.72x), peak RSS 122 / 127 MB
// (100k / 1M frames; 86 MB of it is loading the library). This bench on the code before the in-place XYZ
// reader, bounded batches and byte-written CSV: 2.56x (readFrames 1.74x), 179 / 185 MB.
import { createReadStream, existsSync, mkdirSync, openSync, writeSync, closeSync, renameSync, statSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const out = join(here, 'out');
const big = Number(process.env.TRAJ_FRAMES ?? 1_000_000);
const small = Math.max(1000, Math.round(big / 10));

/** Seeded uniform numbers (mulberry32). */
function rng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A cyclohexane chair (Q 0.55 Å) whose puckering wanders: chair most of the time, now and then a twist-boat. */
function generate(path, frames) {
  const rand = rng(5);
  const tmp = `${path}.tmp`;
  const fd = openSync(tmp, 'w');
  let buf = '';
  let theta = 5;
  let phi = 0;
  for (let f = 0; f < frames; f++) {
    if (f % 5000 === 2500) theta = theta < 45 ? 90 : theta > 135 ? 90 : rand() < 0.5 ? 5 : 175;
    phi = (phi + 0.7 + rand()) % 360;
    const t = ((theta + 3 * (rand() - 0.5)) * Math.PI) / 180;
    const p = (phi * Math.PI) / 180;
    const q2 = 0.55 * Math.sin(t), q3 = 0.55 * Math.cos(t);
    buf += `18\nframe ${f + 1}\n`;
    const ring = [];
    for (let j = 0; j < 6; j++) {
      const z = Math.sqrt(1 / 3) * q2 * Math.cos(p + (2 * Math.PI * 2 * j) / 6) + (q3 / Math.sqrt(6)) * (j % 2 ? -1 : 1);
      const a = (-2 * Math.PI * j) / 6;
      ring.push([1.45 * Math.cos(a), 1.45 * Math.sin(a), z]);
    }
    const line = (el, x, y, z) => `${el} ${(x + 0.004 * (rand() - 0.5)).toFixed(5)} ${(y + 0.004 * (rand() - 0.5)).toFixed(5)} ${z.toFixed(5)}\n`;
    for (const [x, y, z] of ring) buf += line('C', x, y, z);
    for (const [x, y, z] of ring) {
      const r = Math.hypot(x, y);
      buf += line('H', x + (0.63 * x) / r, y + (0.63 * y) / r, z + 0.89);
      buf += line('H', x + (0.63 * x) / r, y + (0.63 * y) / r, z - 0.89);
    }
    if (buf.length > 1 << 20) {
      writeSync(fd, buf);
      buf = '';
    }
  }
  writeSync(fd, buf);
  closeSync(fd);
  renameSync(tmp, path);
}

function file(frames) {
  const path = join(out, `cyclohexane-${frames}.xyz`);
  if (!existsSync(path)) {
    mkdirSync(out, { recursive: true });
    const t = performance.now();
    generate(path, frames);
    console.log(`generated ${path} in ${((performance.now() - t) / 1000).toFixed(1)} s`);
  }
  return path;
}

/** The baseline: read 1 MiB chunks, decode UTF-8, split into lines, count them. */
async function scan(path) {
  let lines = 0;
  let rest = '';
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    const parts = (rest + chunk.toString('utf8')).split('\n');
    rest = parts.pop();
    lines += parts.length;
  }
  return lines + (rest ? 1 : 0);
}

const bigPath = file(big);
const smallPath = file(small);
const { analyzeTrajectory, readFrames } = await import('../dist/index.js');
console.log(`file: ${bigPath} (${(statSync(bigPath).size / 1e6).toFixed(0)} MB, ${big} frames)`);

/** Seconds taken by `run`. */
async function timed(run) {
  const t = performance.now();
  await run();
  return (performance.now() - t) / 1000;
}

// Best of `rounds` interleaved runs (the machine is shared: the best run is the least disturbed one); the
// order rotates each round so no contender always runs right after another's garbage.
const rounds = Number(process.env.TRAJ_ROUNDS ?? 3);
let summary;
const contenders = {
  scan: async () => {
    const lines = await scan(bigPath);
    if (lines !== big * 20) throw new Error(`scan counted ${lines} lines, expected ${big * 20}`);
  },
  read: async () => {
    let frames = 0;
    for await (const f of readFrames(bigPath, { reuse: true })) frames += f.coords.length > 0 ? 1 : 0;
    if (frames !== big) throw new Error(`readFrames gave ${frames} frames, expected ${big}`);
  },
  traj: async () => {
    summary = await analyzeTrajectory(bigPath, { dir: join(out, 'trajectory'), ring: '1' });
    if (summary.frames.analysed !== big) throw new Error(`analysed ${summary.frames.analysed} frames, expected ${big}`);
  },
};
const best = { scan: Infinity, read: Infinity, traj: Infinity };
const names = Object.keys(contenders);
for (let r = 0; r < rounds; r++) {
  for (let i = 0; i < names.length; i++) {
    const name = names[(i + r) % names.length];
    best[name] = Math.min(best[name], await timed(contenders[name]));
  }
}
const { scan: scanS, read: readS, traj: trajS } = best;
console.log(`best of ${rounds} interleaved rounds`);
console.log(`line scan (read + split)        ${scanS.toFixed(2).padStart(7)} s  ${(big / scanS).toFixed(0).padStart(9)} frames/s`);
console.log(`readFrames alone (reuse)        ${readS.toFixed(2).padStart(7)} s  ${(big / readS).toFixed(0).padStart(9)} frames/s`);
console.log(`analyzeTrajectory (csv+figures) ${trajS.toFixed(2).padStart(7)} s  ${(big / trajS).toFixed(0).padStart(9)} frames/s`);
console.log(`ratio trajectory / scan time: ${(trajS / scanS).toFixed(2)}x (goal: at most 2x); readFrames / scan: ${(readS / scanS).toFixed(2)}x; analysis over reading: ${(trajS / readS).toFixed(2)}x`);
console.log(`occupancy: ${Object.entries(summary.occupancy).map(([s, f]) => `${s} ${(100 * f).toFixed(1)}%`).join(', ')}`);

// Peak memory in a fresh process per file size, next to the floor: a process that only loads the library.
const child = (path) => {
  const lib = JSON.stringify(new URL('../dist/index.js', import.meta.url).href);
  const code = path === null
    ? `await import(${lib}); console.log(process.resourceUsage().maxRSS);`
    : `import { analyzeTrajectory } from ${lib};
await analyzeTrajectory(${JSON.stringify(path)}, { dir: ${JSON.stringify(join(out, 'trajectory-rss'))} });
console.log(process.resourceUsage().maxRSS);`;
  const r = spawnSync(process.execPath, ['--input-type=module', '-e', code], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(r.stderr);
  return Number(r.stdout.trim()) / 1024;
};
if (process.env.TRAJ_SKIP_RSS !== '1') {
  console.log(`peak RSS, library loaded, nothing read:          ${child(null).toFixed(0)} MB`);
  for (const [frames, path] of [[small, smallPath], [big, bigPath]]) {
    console.log(`peak RSS, ${String(frames).padStart(8)} frames (${(statSync(path).size / 1e6).toFixed(0).padStart(4)} MB file): ${child(path).toFixed(0)} MB (goal: under 150 MB, flat)`);
  }
}
