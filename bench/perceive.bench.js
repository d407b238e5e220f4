// Bond and ring perception on synthetic lattices of 10,000 and 100,000 atoms (built here, no data files).
// Prints the 100k/10k time ratio; linear work gives about 10 (goal ≤ 12). Run after `npx tsc -p tsconfig.build.json`.
import { perceiveBonds, findRings, buildGraph } from '../dist/index.js';

const source = { file: 'bench.xyz', format: 'xyz', index: 1, line: 1 };

/** Places copies of a template (elements + positions) on a cubic lattice with spacing `step` Å. */
function lattice(template, copies, step) {
  const side = Math.ceil(Math.cbrt(copies));
  const atoms = [];
  const coords = new Float64Array(3 * copies * template.length);
  let k = 0;
  for (let m = 0; m < copies; m++) {
    const [ox, oy, oz] = [m % side, Math.floor(m / side) % side, Math.floor(m / side / side)].map((v) => v * step);
    for (const [element, [x, y, z]] of template) {
      atoms.push({ element, name: null });
      coords.set([ox + x, oy + y, oz + z], 3 * k++);
    }
  }
  return { title: 'lattice', atoms, coords, bonds: null, properties: {}, source };
}

// water: O–H 0.96 Å, H–O–H 104.5°, molecules 3.1 Å apart (about liquid density)
const water = [['O', [0, 0, 0]], ['H', [0.96, 0, 0]], ['H', [0.96 * Math.cos(1.824), 0.96 * Math.sin(1.824), 0]]];

// cyclohexane chair: ring radius 1.45 Å, ring atoms ±0.25 Å from the mean plane (C–C ≈ 1.53 Å)
const cyclohexane = [];
for (let j = 0; j < 6; j++) {
  const t = (j * Math.PI) / 3;
  const s = j % 2 === 0 ? 1 : -1;
  const [cx, cy, cz] = [1.45 * Math.cos(t), 1.45 * Math.sin(t), 0.25 * s];
  cyclohexane.push(['C', [cx, cy, cz]]);
  cyclohexane.push(['H', [cx, cy, cz + 1.09 * s]]);
  cyclohexane.push(['H', [cx + 1.03 * Math.cos(t), cy + 1.03 * Math.sin(t), cz - 0.35 * s]]);
}

// Collecting before every timed call keeps one run's garbage from being charged to the next (run.js passes
// --expose-gc; without it the numbers are noisier).
const collect = globalThis.gc ?? (() => {});
if (!globalThis.gc) console.log('perceive: run with node --expose-gc for fair timings');

/** Time of one call in ms, after a full collection. */
function time(f) {
  collect();
  const t0 = process.hrtime.bigint();
  f();
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

const RUNS = 9;

/**
 * Fastest of several interleaved runs on each input after warming up the compiler on both: on a shared
 * machine the minimum is the least disturbed estimate of the work itself.
 */
function measure(label, run, small, large) {
  for (let r = 0; r < 5; r++) run(small);
  for (let r = 0; r < 2; r++) run(large);
  let bestSmall = Infinity;
  let bestLarge = Infinity;
  for (let r = 0; r < RUNS; r++) {
    bestSmall = Math.min(bestSmall, time(() => run(small)));
    bestLarge = Math.min(bestLarge, time(() => run(large)));
  }
  report(label, bestSmall, bestLarge);
}

function report(label, small, large) {
  const ratio = large / small;
  console.log(
    `perceive: ${label}: 10k atoms ${small.toFixed(1)} ms, 100k atoms ${large.toFixed(1)} ms, ` +
      `ratio ${ratio.toFixed(2)} (goal ≤ 12) ${ratio <= 12 ? 'ok' : 'SLOW'}`,
  );
}

function check(condition, message) {
  if (!condition) throw new Error(`perceive bench: ${message}`);
}

// bonds: water lattice
const w10 = lattice(water, 3334, 3.1);
const w100 = lattice(water, 33334, 3.1);
check(perceiveBonds(w10).length === 2 * 3334, 'water lattice should have two bonds per molecule');
measure('perceiveBonds (water lattice)', perceiveBonds, w10, w100);

// bonds and rings: cyclohexane lattice (18 atoms per molecule, 7 Å apart)
const c10 = lattice(cyclohexane, 556, 7);
const c100 = lattice(cyclohexane, 5556, 7);
check(perceiveBonds(c10).length === 18 * 556, 'cyclohexane lattice should have 18 bonds per molecule');
measure('perceiveBonds (cyclohexane lattice)', perceiveBonds, c10, c100);
const g10 = buildGraph(c10.atoms.length, perceiveBonds(c10));
const g100 = buildGraph(c100.atoms.length, perceiveBonds(c100));
check(findRings(g10).length === 556 && findRings(g100).length === 5556, 'one ring per cyclohexane');
measure('findRings (cyclohexane lattice, one ring each)', findRings, g10, g100);

// rings: one long chain with a six-ring every 1,000 atoms (few rings in a big molecule)
function chainGraph(n) {
  const bonds = [];
  for (let i = 0; i + 1 < n; i++) bonds.push({ a: i, b: i + 1, order: 1, perceived: false });
  for (let i = 1000; i + 6 < n; i += 1000) bonds.push({ a: i, b: i + 5, order: 1, perceived: false });
  return buildGraph(n, bonds);
}
const k10 = chainGraph(10_000);
const k100 = chainGraph(100_000);
check(findRings(k100).length === 99, 'chain should carry 99 rings');
measure('findRings (chain with a ring every 1,000 atoms)', findRings, k10, k100);

// rings: one fully fused simple cubic lattice (every ring a 4-ring), 1,000 and 10,648 atoms; each round of
// candidates is short, so time grows about as atoms × rings / bonds (10.6× the atoms: goal ratio ≤ 40)
function cubicGraph(n) {
  const id = (x, y, z) => x + n * (y + n * z);
  const bonds = [];
  for (let z = 0; z < n; z++) for (let y = 0; y < n; y++) for (let x = 0; x < n; x++) {
    if (x + 1 < n) bonds.push({ a: id(x, y, z), b: id(x + 1, y, z), order: 1, perceived: false });
    if (y + 1 < n) bonds.push({ a: id(x, y, z), b: id(x, y + 1, z), order: 1, perceived: false });
    if (z + 1 < n) bonds.push({ a: id(x, y, z), b: id(x, y, z + 1), order: 1, perceived: false });
  }
  return buildGraph(n ** 3, bonds);
}
{
  const small = cubicGraph(10);
  const large = cubicGraph(22);
  const t0 = performance.now();
  check(findRings(small).length === 1701, 'a 10-cube lattice has 1,701 independent rings');
  const t1 = performance.now();
  check(findRings(large).length === 19845, 'a 22-cube lattice has 19,845 independent rings');
  const t2 = performance.now();
  const ratio = (t2 - t1) / (t1 - t0);
  console.log(`perceive: findRings (fused cubic lattice): 1,000 atoms ${(t1 - t0).toFixed(0)} ms, 10,648 atoms ${(t2 - t1).toFixed(0)} ms, ratio ${ratio.toFixed(1)} (goal ≤ 40) ${ratio <= 40 ? 'ok' : 'SLOW'}`);
}
