/**
 * Bonds from coordinates: atoms i and j are bonded when 0.4 Å ≤ d_ij ≤ r_i + r_j + ε, with r the Cordero et
 * al. 2008 (Dalton Trans. 2832) covalent radius (METHODS.md §7). Candidate pairs come from a uniform spatial
 * grid, so the work is linear in the number of atoms.
 */
import { elementInfo } from '../model/elements.js';
import { ConformarkError, usageError } from '../model/errors.js';
import type { Bond, Molecule } from '../model/molecule.js';

/** Options of {@link perceiveBonds}. */
export interface PerceiveBondsOptions {
  /**
   * Tolerance ε added to the sum of covalent radii, in Å. Default 0.40 (METHODS.md §7: 0.40–0.45 Å is
   * common practice, no source).
   */
  readonly toleranceA?: number;
}

/** Default ε of the bond test, Å (METHODS.md §7). */
export const BOND_TOLERANCE_A = 0.4;
/** Pairs closer than this are overlapping or duplicated atoms, never bonds, Å (METHODS.md §7). */
export const MIN_BOND_LENGTH_A = 0.4;

/**
 * Perceives single bonds from the coordinates of `mol` (any bonds in the file are ignored).
 *
 * Hydrogen keeps at most one bond: when an H atom has several candidate partners only the nearest is kept
 * (so a bridging or crowded H is attached to its closest neighbour). This is common practice, no source.
 *
 * Returns 0-based bonds with `a < b`, `order: 1`, `perceived: true`, sorted by `a` then `b`.
 * Throws a `ConformarkError` (`unknown-element`, `bad-coordinate`, `bad-option`) for unusable input.
 * @example perceiveBonds(water).map((b) => [b.a, b.b]) // [[0, 1], [0, 2]]
 */
export function perceiveBonds(mol: Molecule, options: PerceiveBondsOptions = {}): Bond[] {
  const tolerance = options.toleranceA ?? BOND_TOLERANCE_A;
  if (!Number.isFinite(tolerance) || tolerance < 0) {
    throw usageError('bad-option', `toleranceA must be a number ≥ 0 (Å), got ${String(options.toleranceA)}`);
  }
  const n = mol.atoms.length;
  const { radii, hydrogen } = atomRadii(mol);
  checkCoordinates(mol);
  const maxRadius = radii.reduce((m, r) => Math.max(m, r), 0);
  const grid = buildGrid(mol.coords, n, 2 * maxRadius + tolerance);

  // candidate partners j > i of each atom i, with squared distances
  const partners: number[][] = Array.from({ length: n }, () => []);
  const dist2: number[][] = Array.from({ length: n }, () => []);
  const c = mol.coords;
  const min2 = MIN_BOND_LENGTH_A * MIN_BOND_LENGTH_A;
  grid.forEachNearPair((i, j) => {
    const dx = c[3 * i]! - c[3 * j]!;
    const dy = c[3 * i + 1]! - c[3 * j + 1]!;
    const dz = c[3 * i + 2]! - c[3 * j + 2]!;
    const d2 = dx * dx + dy * dy + dz * dz;
    const limit = radii[i]! + radii[j]! + tolerance;
    if (d2 < min2 || d2 > limit * limit) return;
    partners[i]!.push(j);
    dist2[i]!.push(d2);
  });

  const nearest = nearestPartnerOfHydrogens(n, hydrogen, partners, dist2);
  const bonds: Bond[] = [];
  for (let a = 0; a < n; a++) {
    const list = partners[a]!.slice().sort((x, y) => x - y);
    for (const b of list) {
      if (hydrogen[a] && nearest[a] !== b) continue;
      if (hydrogen[b] && nearest[b] !== a) continue;
      bonds.push({ a, b, order: 1, perceived: true });
    }
  }
  return bonds;
}

function atomRadii(mol: Molecule): { radii: number[]; hydrogen: boolean[] } {
  const radii: number[] = [];
  const hydrogen: boolean[] = [];
  mol.atoms.forEach((atom, i) => {
    const info = elementInfo(atom.element);
    if (!info) {
      throw new ConformarkError({
        code: 'unknown-element',
        file: mol.source.file,
        line: null,
        message: `atom ${i + 1}: element '${atom.element}' has no covalent radius, so bonds cannot be perceived`,
      });
    }
    radii.push(info.radius);
    hydrogen.push(info.z === 1);
  });
  return { radii, hydrogen };
}

function checkCoordinates(mol: Molecule): void {
  for (let k = 0; k < 3 * mol.atoms.length; k++) {
    if (!Number.isFinite(mol.coords[k])) {
      throw new ConformarkError({
        code: 'bad-coordinate',
        file: mol.source.file,
        line: null,
        message: `atom ${Math.floor(k / 3) + 1} has a non-finite coordinate`,
      });
    }
  }
}

/** For each H atom, the index of its nearest candidate partner (−1 when it has none). */
function nearestPartnerOfHydrogens(
  n: number,
  hydrogen: readonly boolean[],
  partners: readonly (readonly number[])[],
  dist2: readonly (readonly number[])[],
): Int32Array {
  const nearest = new Int32Array(n).fill(-1);
  const best = new Float64Array(n).fill(Infinity);
  const offer = (h: number, other: number, d2: number) => {
    // ties go to the lower index, so the result does not depend on iteration order
    if (d2 < best[h]! || (d2 === best[h]! && other < nearest[h]!)) {
      best[h] = d2;
      nearest[h] = other;
    }
  };
  for (let a = 0; a < n; a++) {
    const list = partners[a]!;
    for (let k = 0; k < list.length; k++) {
      const b = list[k]!;
      const d2 = dist2[a]![k]!;
      if (hydrogen[a]) offer(a, b, d2);
      if (hydrogen[b]) offer(b, a, d2);
    }
  }
  return nearest;
}

interface Grid {
  /** Calls `visit(i, j)` with `i < j` once for every pair of atoms in the same or adjacent cells. */
  forEachNearPair(visit: (i: number, j: number) => void): void;
}

/**
 * Uniform grid with cubic cells of edge `cell` (the longest possible bond), so every bonded pair lies in the
 * same or adjacent cells. Only occupied cells are stored (a map from cell key to slot), so a sparse box costs
 * nothing; building and scanning are linear in the number of atoms.
 */
function buildGrid(coords: Float64Array, n: number, cell: number): Grid {
  const size = Math.max(cell, 1e-6);
  const ix = new Float64Array(n);
  const iy = new Float64Array(n);
  const iz = new Float64Array(n);
  const low = [Infinity, Infinity, Infinity];
  const high = [-Infinity, -Infinity, -Infinity];
  const cells = [ix, iy, iz];
  for (let i = 0; i < n; i++) {
    for (let d = 0; d < 3; d++) {
      const v = Math.floor(coords[3 * i + d]! / size);
      cells[d]![i] = v;
      low[d] = Math.min(low[d]!, v);
      high[d] = Math.max(high[d]!, v);
    }
  }
  // one number per cell (exact while the padded box has < 2^52 cells), else a string for absurd extents
  const nx = high[0]! - low[0]! + 3;
  const ny = high[1]! - low[1]! + 3;
  const nz = high[2]! - low[2]! + 3;
  const numeric = nx * ny * nz < 2 ** 52;
  const keyOf = numeric
    ? (x: number, y: number, z: number): number | string =>
        x - low[0]! + 1 + nx * (y - low[1]! + 1 + ny * (z - low[2]! + 1))
    : (x: number, y: number, z: number): number | string => `${x},${y},${z}`;

  const slot = new Map<number | string, number>();
  const cellOfAtom = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const key = keyOf(ix[i]!, iy[i]!, iz[i]!);
    let s = slot.get(key);
    if (s === undefined) {
      s = slot.size;
      slot.set(key, s);
    }
    cellOfAtom[i] = s;
  }
  // atoms stored cell by cell (counting sort)
  const start = new Int32Array(slot.size + 1);
  for (let i = 0; i < n; i++) start[cellOfAtom[i]! + 1]!++;
  for (let s = 0; s < slot.size; s++) start[s + 1]! += start[s]!;
  const fill = start.slice(0, slot.size);
  const members = new Int32Array(n);
  for (let i = 0; i < n; i++) members[fill[cellOfAtom[i]!]!++] = i;

  return {
    forEachNearPair(visit) {
      for (let i = 0; i < n; i++) {
        for (let dx = -1; dx <= 1; dx++) {
          for (let dy = -1; dy <= 1; dy++) {
            for (let dz = -1; dz <= 1; dz++) {
              const s = slot.get(keyOf(ix[i]! + dx, iy[i]! + dy, iz[i]! + dz));
              if (s === undefined) continue;
              for (let k = start[s]!; k < start[s + 1]!; k++) {
                const j = members[k]!;
                if (j > i) visit(i, j);
              }
            }
          }
        }
      }
    },
  };
}
