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

/** A candidate bond: atoms `a < b`, distance `d` (Å) and `d / (r_a + r_b)`. */
interface Candidate {
  readonly a: number;
  readonly b: number;
  readonly d: number;
  readonly ratio: number;
  kept: boolean;
}

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
  const c = mol.coords;

  const candidates: Candidate[] = [];
  spatialGrid(c, n, 2 * maxRadius + tolerance).forEachNearPair((i, j) => {
    const d = Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
    const sum = radii[i]! + radii[j]!;
    if (d < MIN_BOND_LENGTH_A || d > sum + tolerance) return;
    candidates.push({ a: i, b: j, d, ratio: d / sum, kept: true });
  });

  const incident: Candidate[][] = Array.from({ length: n }, () => []);
  for (const e of candidates) {
    incident[e.a]!.push(e);
    incident[e.b]!.push(e);
  }
  for (let i = 0; i < n; i++) {
    if (z[i] === 1) keepShortest(i, incident[i]!, 1, () => true, (e) => e.d);
  }
  for (let i = 0; i < n; i++) {
    if (z[i] === 6) keepShortest(i, incident[i]!, 4, (j) => NON_METALS.has(z[j]!), (e) => e.ratio);
  }

  return candidates
    .filter((e) => e.kept)
    .sort((p, q) => p.a - q.a || p.b - q.b)
    .map(({ a, b }) => ({ a, b, order: 1, perceived: true }));
}

/**
 * Keeps at most `limit` of atom `i`'s still-kept bonds to partners passing `counts`, the smallest by `key`
 * (ties to the lower partner index, so the result does not depend on iteration order).
 */
function keepShortest(
  i: number,
  bonds: readonly Candidate[],
  limit: number,
  counts: (partner: number) => boolean,
  key: (e: Candidate) => number,
): void {
  const other = (e: Candidate) => (e.a === i ? e.b : e.a);
  const live = bonds.filter((e) => e.kept && counts(other(e)));
  if (live.length <= limit) return;
  live.sort((p, q) => key(p) - key(q) || other(p) - other(q));
  for (const e of live.slice(limit)) e.kept = false;
}

function atomRadii(mol: Molecule): { radii: number[]; z: number[] } {
  const radii: number[] = [];
  const z: number[] = [];
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
    z.push(info.z);
  });
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
