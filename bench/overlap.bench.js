// The overlapping-atoms check on one large record (a 3D lattice with 1.0 Å spacing, jiggled, no overlap: the
// worst case, every atom checked against all 27 neighbour cells): findOverlap (typed-array grid) against the
// string-keyed Map grid it replaced (kept here as the baseline), same coordinates, same run. Goal: faster.
import { performance } from 'node:perf_hooks';
import { findOverlap } from '../dist/io/overlap.js';

function stringGrid(c, n, d) {
  const d2 = d * d;
  const cells = new Map();
  let best = null;
  const key = (x, y, z) => `${x},${y},${z}`;
  for (let j = 0; j < n; j++) {
    const x = c[3 * j], y = c[3 * j + 1], z = c[3 * j + 2];
    const cx = Math.floor(x / d), cy = Math.floor(y / d), cz = Math.floor(z / d);
    for (let ax = -1; ax <= 1; ax++) for (let ay = -1; ay <= 1; ay++) for (let az = -1; az <= 1; az++) {
      for (const i of cells.get(key(cx + ax, cy + ay, cz + az)) ?? []) {
        const dx = c[3 * i] - x, dy = c[3 * i + 1] - y, dz = c[3 * i + 2] - z;
        if (dx * dx + dy * dy + dz * dz < d2 && (best === null || i < best[0])) best = [i, j];
      }
    }
    if (best) return best;
    const k = key(cx, cy, cz);
    const list = cells.get(k);
    if (list) list.push(j);
    else cells.set(k, [j]);
  }
  return null;
}

function lattice(n) {
  const side = Math.ceil(Math.cbrt(n));
  const c = new Float64Array(3 * n);
  for (let k = 0; k < n; k++) {
    const jiggle = 0.1 * Math.sin(k * 12.9898);
    c[3 * k] = (k % side) + jiggle;
    c[3 * k + 1] = (Math.floor(k / side) % side) - jiggle;
    c[3 * k + 2] = Math.floor(k / side / side) + jiggle * 0.5;
  }
  return c;
}

const best = (xs) => Math.min(...xs);
for (const n of [10_000, 100_000, 300_000]) {
  const c = lattice(n);
  if (findOverlap(c, n, 0.4) !== null || stringGrid(c, n, 0.4) !== null) throw new Error('the lattice overlaps');
  const grid = [];
  const strings = [];
  for (let r = 0; r < 5; r++) {
    let t = performance.now();
    findOverlap(c, n, 0.4);
    grid.push(performance.now() - t);
    t = performance.now();
    stringGrid(c, n, 0.4);
    strings.push(performance.now() - t);
  }
  console.log(`${String(n).padStart(9)} atoms: typed grid ${best(grid).toFixed(1)} ms, string-key Map ${best(strings).toFixed(1)} ms: ${(best(strings) / best(grid)).toFixed(1)}x faster`);
}
