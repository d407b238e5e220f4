/**
 * Finds two atoms closer than a minimum distance: a sign of a broken or duplicated coordinate block.
 * Pairwise for small records (with a cheap x pre-test), a uniform grid in typed arrays for large ones, so it stays O(n).
 */
import type { Atom } from '../model/molecule.js';

/** Returns the first pair `[i, j]` (i < j, 0-based) closer than `minDist` Å, or `null`. */
export function findOverlap(coords: Float64Array, n: number, minDist: number): [number, number] | null {
  if (!(minDist > 0) || n < 2) return null;
  return n <= 64 ? pairwise(coords, n, minDist) : gridded(coords, n, minDist);
}

function pairwise(c: Float64Array, n: number, d: number): [number, number] | null {
  const d2 = d * d;
  for (let j = 1; j < n; j++) {
    const xj = c[3 * j]!;
    const yj = c[3 * j + 1]!;
    const zj = c[3 * j + 2]!;
    for (let i = 0; i < j; i++) {
      const dx = c[3 * i]! - xj;
      if (dx > d || dx < -d) continue;
      const dy = c[3 * i + 1]! - yj;
      const dz = c[3 * i + 2]! - zj;
      if (dx * dx + dy * dy + dz * dz < d2) return [i, j];
    }
  }
  return null;
}

/**
 * Uniform grid in typed arrays: cells a hair wider than `d` (so rounding in the cell index can never separate a
 * close pair), hashed into a power-of-two table of linked lists; buckets shared by distant cells only add checks.
 * Atoms are added after their own check, so the answer is the smallest j with a close earlier atom, and its smallest i.
 */
function gridded(c: Float64Array, n: number, d: number): [number, number] | null {
  const d2 = d * d;
  const size = 1 / (d * (1 + 2 ** -20));
  let mx = Infinity;
  let my = Infinity;
  let mz = Infinity;
  for (let j = 0; j < n; j++) {
    if (c[3 * j]! < mx) mx = c[3 * j]!;
    if (c[3 * j + 1]! < my) my = c[3 * j + 1]!;
    if (c[3 * j + 2]! < mz) mz = c[3 * j + 2]!;
  }
  let bits = 4;
  while (1 << bits < 2 * n) bits++;
  const mask = (1 << bits) - 1;
  const head = new Int32Array(1 << bits).fill(-1);
  const next = new Int32Array(n);
  // cell index per axis, clamped (monotone, so neighbours stay neighbours) to keep the arithmetic in integers
  const cell = (v: number, m: number): number => Math.min(MAX_CELL, Math.floor((v - m) * size));
  const bucket = (x: number, y: number, z: number): number => (Math.imul(x, 73856093) ^ Math.imul(y, 19349663) ^ Math.imul(z, 83492791)) & mask;
  for (let j = 0; j < n; j++) {
    const x = c[3 * j]!;
    const y = c[3 * j + 1]!;
    const z = c[3 * j + 2]!;
    const cx = cell(x, mx);
    const cy = cell(y, my);
    const cz = cell(z, mz);
    if (!(cx >= 0 && cy >= 0 && cz >= 0)) continue; // a non-finite coordinate is close to nothing
    let best = -1;
    for (let ax = cx - 1; ax <= cx + 1; ax++) {
      for (let ay = cy - 1; ay <= cy + 1; ay++) {
        for (let az = cz - 1; az <= cz + 1; az++) {
          for (let i = head[bucket(ax, ay, az)]!; i !== -1; i = next[i]!) {
            if (best !== -1 && i >= best) continue;
            const dx = c[3 * i]! - x;
            const dy = c[3 * i + 1]! - y;
            const dz = c[3 * i + 2]! - z;
            if (dx * dx + dy * dy + dz * dz < d2) best = i;
          }
        }
      }
    }
    if (best !== -1) return [best, j];
    const b = bucket(cx, cy, cz);
    next[j] = head[b]!;
    head[b] = j;
  }
  return null;
}

/** Largest cell index per axis: beyond it cells merge into one (only more checks, never a missed pair). */
const MAX_CELL = 2 ** 20;

/** `atoms 3 (C) and 7 (H) are 0.12 Å apart, closer than 0.4 Å` (1-based numbers). */
export function overlapMessage(atoms: readonly Atom[], c: Float64Array, i: number, j: number, min: number): string {
  const d = Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
  const label = (k: number): string => `${k + 1} (${atoms[k]?.name ?? atoms[k]?.element ?? '?'})`;
  return `atoms ${label(i)} and ${label(j)} are ${d.toFixed(2)} Å apart, closer than ${min} Å`;
}
