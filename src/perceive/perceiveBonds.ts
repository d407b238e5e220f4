/**
 * Bonds from coordinates: atoms i and j are bonded when 0.4 Å ≤ d_ij ≤ r_i + r_j + ε, with r the Cordero et
 * al. 2008 (Dalton Trans. 2832) covalent radius (METHODS.md §7). Candidate pairs come from a uniform spatial
 * grid, so the work is linear in the number of atoms.
 */
import { elementInfo } from '../model/elements.js';
import { ConformarkError, usageError } from '../model/errors.js';
import type { Bond, Molecule } from '../model/molecule.js';
import { spatialGrid } from './spatialGrid.js';

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

/** Non-metals: the carbon valence cap counts only bonds to these. */
const NON_METALS = new Set([1, 2, 5, 6, 7, 8, 9, 10, 14, 15, 16, 17, 18, 33, 34, 35, 36, 52, 53, 54, 85, 86]);

/**
 * Perceives single bonds from the coordinates of `mol` (any bonds in the file are ignored).
 *
 * Two valence caps then remove impossible bonds (common practice, no source):
 * - hydrogen keeps at most one bond: when an H atom has several candidate partners only the nearest is kept
 *   (a bridging or crowded H is attached to its closest neighbour);
 * - carbon keeps at most four bonds to non-metals, dropping the longest relative to the radius sum (this
 *   removes the 1.85 Å bridgehead contact of bicyclo[1.1.1]pentane, which the distance test alone accepts).
 *   Bonds from carbon to metals are not capped.
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
  const { radii, z } = atomRadii(mol);
  checkCoordinates(mol);
  const maxRadius = radii.reduce((m, r) => Math.max(m, r), 0);

  const found = new Candidates();
  const min2 = MIN_BOND_LENGTH_A * MIN_BOND_LENGTH_A;
  spatialGrid(mol.coords, n, 2 * maxRadius + tolerance).forEachNearPair((i, j, d2) => {
    const limit = radii[i]! + radii[j]! + tolerance;
    if (d2 >= min2 && d2 <= limit * limit) found.push(i, j, Math.sqrt(d2));
  });
  const kept = new Uint8Array(found.length).fill(1);
  capHydrogens(n, z, found, kept);
  capCarbons(n, z, radii, found, kept);

  // sort by (a, b) through one numeric key per bond (exact: n² < 2^53 for any real file)
  const keys = new Float64Array(kept.reduce((m, k) => m + k, 0));
  let count = 0;
  for (let k = 0; k < found.length; k++) if (kept[k]) keys[count++] = found.a[k]! * n + found.b[k]!;
  keys.sort();
  return Array.from(keys, (key) => {
    const a = Math.floor(key / n);
    return { a, b: key - a * n, order: 1, perceived: true };
  });
}

/** Candidate bonds in growable typed arrays: atoms `a[k] < b[k]` at distance `d[k]` (Å). */
class Candidates {
  a = new Int32Array(1024);
  b = new Int32Array(1024);
  d = new Float64Array(1024);
  length = 0;
  push(i: number, j: number, distance: number): void {
    if (this.length === this.a.length) {
      const grow = <T extends Int32Array | Float64Array>(old: T, fresh: T): T => (fresh.set(old), fresh);
      this.a = grow(this.a, new Int32Array(2 * this.length));
      this.b = grow(this.b, new Int32Array(2 * this.length));
      this.d = grow(this.d, new Float64Array(2 * this.length));
    }
    this.a[this.length] = i;
    this.b[this.length] = j;
    this.d[this.length++] = distance;
  }
}

/** Each H keeps only its nearest candidate (ties to the lower partner index, so order does not matter). */
function capHydrogens(n: number, z: Uint8Array, found: Candidates, kept: Uint8Array): void {
  const { a, b, d } = found;
  const nearest = new Int32Array(n).fill(-1);
  const offer = (h: number, k: number, other: number) => {
    const best = nearest[h]!;
    if (best < 0 || d[k]! < d[best]! || (d[k] === d[best] && other < (a[best] === h ? b[best]! : a[best]!))) nearest[h] = k;
  };
  for (let k = 0; k < found.length; k++) {
    if (z[a[k]!] === 1) offer(a[k]!, k, b[k]!);
    if (z[b[k]!] === 1) offer(b[k]!, k, a[k]!);
  }
  for (let k = 0; k < found.length; k++) {
    if ((z[a[k]!] === 1 && nearest[a[k]!] !== k) || (z[b[k]!] === 1 && nearest[b[k]!] !== k)) kept[k] = 0;
  }
}

/**
 * Each carbon, in index order, keeps at most four bonds to non-metals: the smallest d / (r_a + r_b), ties to
 * the lower partner index.
 */
function capCarbons(n: number, z: Uint8Array, radii: Float64Array, found: Candidates, kept: Uint8Array): void {
  const { a, b, d } = found;
  const count = new Int32Array(n);
  for (let k = 0; k < found.length; k++) {
    if (!kept[k]) continue;
    if (z[a[k]!] === 6 && NON_METALS.has(z[b[k]!]!)) count[a[k]!]!++;
    if (z[b[k]!] === 6 && NON_METALS.has(z[a[k]!]!)) count[b[k]!]!++;
  }
  const incident = new Map<number, number[]>();
  for (let atom = 0; atom < n; atom++) if (count[atom]! > 4) incident.set(atom, []);
  if (incident.size === 0) return;
  for (let k = 0; k < found.length; k++) {
    incident.get(a[k]!)?.push(k);
    incident.get(b[k]!)?.push(k);
  }
  for (const [atom, bonds] of incident) {
    const other = (k: number) => (a[k] === atom ? b[k]! : a[k]!);
    const ratio = (k: number) => d[k]! / (radii[a[k]!]! + radii[b[k]!]!);
    const live = bonds.filter((k) => kept[k] && NON_METALS.has(z[other(k)]!));
    live.sort((p, q) => ratio(p) - ratio(q) || other(p) - other(q));
    for (const k of live.slice(4)) kept[k] = 0;
  }
}

function atomRadii(mol: Molecule): { radii: Float64Array; z: Uint8Array } {
  const n = mol.atoms.length;
  const radii = new Float64Array(n);
  const z = new Uint8Array(n);
  const known = new Map<string, ReturnType<typeof elementInfo>>();
  for (let i = 0; i < n; i++) {
    const element = mol.atoms[i]!.element;
    let info = known.get(element);
    if (info === undefined) {
      info = elementInfo(element);
      known.set(element, info);
    }
    if (!info) {
      throw new ConformarkError({
        code: 'unknown-element',
        file: mol.source.file,
        line: null,
        message: `atom ${i + 1}: element '${element}' has no covalent radius, so bonds cannot be perceived`,
      });
    }
    radii[i] = info.radius;
    z[i] = info.z;
  }
  return { radii, z };
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
