/**
 * Finds two atoms closer than a minimum distance: a sign of a broken or duplicated coordinate block.
 * Pairwise for small records (with a cheap x pre-test), a uniform grid for large ones, so it stays O(n).
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

function gridded(c: Float64Array, n: number, d: number): [number, number] | null {
  const d2 = d * d;
  const cells = new Map<string, number[]>();
  let best: [number, number] | null = null;
  const key = (x: number, y: number, z: number): string => `${x},${y},${z}`;
  for (let j = 0; j < n; j++) {
    const x = c[3 * j]!;
    const y = c[3 * j + 1]!;
    const z = c[3 * j + 2]!;
    const cx = Math.floor(x / d);
    const cy = Math.floor(y / d);
    const cz = Math.floor(z / d);
    for (let ax = -1; ax <= 1; ax++) {
      for (let ay = -1; ay <= 1; ay++) {
        for (let az = -1; az <= 1; az++) {
          for (const i of cells.get(key(cx + ax, cy + ay, cz + az)) ?? []) {
            const dx = c[3 * i]! - x;
            const dy = c[3 * i + 1]! - y;
            const dz = c[3 * i + 2]! - z;
            if (dx * dx + dy * dy + dz * dz < d2 && (best === null || i < best[0])) best = [i, j];
          }
        }
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

/** `atoms 3 (C) and 7 (H) are 0.12 Å apart, closer than 0.4 Å` (1-based numbers). */
export function overlapMessage(atoms: readonly Atom[], c: Float64Array, i: number, j: number, min: number): string {
  const d = Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
  const label = (k: number): string => `${k + 1} (${atoms[k]?.name ?? atoms[k]?.element ?? '?'})`;
  return `atoms ${label(i)} and ${label(j)} are ${d.toFixed(2)} Å apart, closer than ${min} Å`;
}
