/**
 * Bonds from coordinates: atoms i and j are bonded when 0.4 Å ≤ d_ij ≤ r_i + r_j + ε, with r the Cordero et
 * al. 2008 (Dalton Trans. 2832) covalent radius (docs/methods.md#bond-perception). Candidate pairs come from a uniform spatial
 * grid, so the work is linear in the number of atoms.
 */
import { elementInfo, isMetal } from '../model/elements.js';
import { ConformarkError, usageError } from '../model/errors.js';
import type { Bond, Molecule } from '../model/molecule.js';
import { nearPairs, type PairList } from './nearPairs.js';
import { scratchInt32, scratchUint8 } from './scratch.js';

/** Options of {@link perceiveBonds}. */
export interface PerceiveBondsOptions {
  /**
   * Tolerance ε added to the sum of covalent radii, in Å. Default 0.40 (docs/methods.md#bond-perception: 0.40–0.45 Å is
   * common practice, no source).
   */
  readonly toleranceA?: number;
  /**
   * Tolerance for a contact with a metal atom, Å: a metal–X pair is a bond only when d ≤ r_M + r_X + this.
   * Default 0.25, or `toleranceA` when that is smaller.
   */
  readonly metalToleranceA?: number;
}

/** Default ε of the bond test, Å (docs/methods.md#bond-perception). */
export const BOND_TOLERANCE_A = 0.4;
/**
 * Default ε for contacts with a metal atom, Å. Stricter than {@link BOND_TOLERANCE_A}: the radii of the
 * s-block metals are large (Na 1.66 Å), so the general rule bonds a sodium ion to a carbon 2.79 Å away.
 * Typical metal–donor distances in crystal structures (Harding 2006, Acta Cryst. D62, 678; from memory:
 * Na–O 2.41, K–O 2.82, Mg–O 2.07, Ca–O 2.36, Zn–N(His) 2.03, Zn–S(Cys) 2.33 Å) all lie within
 * r_M + r_X + 0.20 Å of the Cordero radii, so 0.25 Å keeps them with a margin and drops Na···C 2.79 Å
 * (limit 2.67 Å). The value is common practice, no source.
 */
export const METAL_TOLERANCE_A = 0.25;
/** Pairs closer than this are overlapping or duplicated atoms, never bonds, Å (docs/methods.md#bond-perception). */
export const MIN_BOND_LENGTH_A = 0.4;

/** Non-metals: the carbon valence cap counts only bonds to these. */
const NON_METAL = new Uint8Array(256);
for (const z of [1, 2, 5, 6, 7, 8, 9, 10, 14, 15, 16, 17, 18, 33, 34, 35, 36, 52, 53, 54, 85, 86]) NON_METAL[z] = 1;

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
 * Contacts with a metal atom use the stricter tolerance {@link METAL_TOLERANCE_A}.
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
  const { radii, z, metal } = atomRadii(mol);
  checkCoordinates(mol);
  const metalTolerance = Math.min(tolerance, options.metalToleranceA ?? METAL_TOLERANCE_A);
  if (!(metalTolerance >= 0)) {
    throw usageError('bad-option', `metalToleranceA must be a number ≥ 0 (Å), got ${String(options.metalToleranceA)}`);
  }
  const found = nearPairs(mol.coords, n, radii, tolerance, MIN_BOND_LENGTH_A);
  const kept = scratchUint8('bond-kept', found.count).fill(1);
  capMetals(metal, radii, metalTolerance, found, kept);
  capHydrogens(n, z, found, kept);
  capCarbons(n, z, radii, found, kept);
  return sortedBonds(n, found, kept);
}

/**
 * The kept pairs as bonds sorted by (a, b): counted into rows by `a` (counts become row ends, then pairs are
 * placed from the back, leaving each entry at its row start), each short row sorted by insertion.
 */
function sortedBonds(n: number, found: PairList, kept: Uint8Array): Bond[] {
  const { i: a, j: b } = found;
  const start = scratchInt32('bond-start', n + 1).fill(0);
  for (let k = 0; k < found.count; k++) if (kept[k]) start[a[k]!]!++;
  for (let v = 1; v <= n; v++) start[v]! += start[v - 1]!;
  const partner = scratchInt32('bond-partner', start[n]!);
  for (let k = found.count - 1; k >= 0; k--) if (kept[k]) partner[--start[a[k]!]!] = b[k]!;
  // one allocation of the final length: a growing array of this size would be copied through several
  // large-object allocations, each on fresh pages
  const bonds = new Array<Bond>(start[n]!);
  let count = 0;
  for (let v = 0; v < n; v++) {
    const row0 = start[v]!;
    const row1 = start[v + 1]!;
    for (let k = row0 + 1; k < row1; k++) {
      const x = partner[k]!;
      let m = k - 1;
      for (; m >= row0 && partner[m]! > x; m--) partner[m + 1] = partner[m]!;
      partner[m + 1] = x;
    }
    for (let k = row0; k < row1; k++) bonds[count++] = { a: v, b: partner[k]!, order: 1, perceived: true };
  }
  return bonds;
}

/** Drops each metal contact longer than r_M + r_X + `tolerance` (the stricter metal rule). */
function capMetals(metal: Uint8Array, radii: Float64Array, tolerance: number, found: PairList, kept: Uint8Array): void {
  const { i: a, j: b, d2 } = found;
  for (let k = 0; k < found.count; k++) {
    if (!metal[a[k]!] && !metal[b[k]!]) continue;
    const limit = radii[a[k]!]! + radii[b[k]!]! + tolerance;
    if (d2[k]! > limit * limit) kept[k] = 0;
  }
}

/** Each H keeps only its nearest candidate (ties to the lower partner index, so order does not matter). */
function capHydrogens(n: number, z: Uint8Array, found: PairList, kept: Uint8Array): void {
  const { i: a, j: b, d2: d } = found;
  const nearest = scratchInt32('bond-atom', n).fill(-1);
  for (let k = 0; k < found.count; k++) {
    if (z[a[k]!] === 1) offerNearest(nearest, a, b, d, a[k]!, k, b[k]!);
    if (z[b[k]!] === 1) offerNearest(nearest, a, b, d, b[k]!, k, a[k]!);
  }
  for (let k = 0; k < found.count; k++) {
    if ((z[a[k]!] === 1 && nearest[a[k]!] !== k) || (z[b[k]!] === 1 && nearest[b[k]!] !== k)) kept[k] = 0;
  }
}

/**
 * Makes candidate k (from hydrogen h to `other`) the nearest of h when it is closer, or as close to a lower
 * index. Distances are compared after the square root (`d2` holds squares), as equal roots are a tie.
 */
function offerNearest(nearest: Int32Array, a: Int32Array, b: Int32Array, d2: Float64Array, h: number, k: number, other: number): void {
  const best = nearest[h]!;
  if (best < 0) {
    nearest[h] = k;
    return;
  }
  const dk = Math.sqrt(d2[k]!);
  const dBest = Math.sqrt(d2[best]!);
  if (dk < dBest || (dk === dBest && other < (a[best] === h ? b[best]! : a[best]!))) nearest[h] = k;
}

/**
 * Each carbon, in index order, keeps at most four bonds to non-metals: the smallest d / (r_a + r_b), ties to
 * the lower partner index.
 */
function capCarbons(n: number, z: Uint8Array, radii: Float64Array, found: PairList, kept: Uint8Array): void {
  const { i: a, j: b, d2 } = found;
  const count = scratchInt32('bond-atom', n).fill(0);
  for (let k = 0; k < found.count; k++) {
    if (!kept[k]) continue;
    if (z[a[k]!] === 6 && NON_METAL[z[b[k]!]!]) count[a[k]!]!++;
    if (z[b[k]!] === 6 && NON_METAL[z[a[k]!]!]) count[b[k]!]!++;
  }
  const incident = new Map<number, number[]>();
  for (let atom = 0; atom < n; atom++) if (count[atom]! > 4) incident.set(atom, []);
  if (incident.size === 0) return;
  for (let k = 0; k < found.count; k++) {
    incident.get(a[k]!)?.push(k);
    incident.get(b[k]!)?.push(k);
  }
  for (const [atom, bonds] of incident) {
    const other = (k: number) => (a[k] === atom ? b[k]! : a[k]!);
    const ratio = (k: number) => Math.sqrt(d2[k]!) / (radii[a[k]!]! + radii[b[k]!]!);
    const live = bonds.filter((k) => kept[k] && NON_METAL[z[other(k)]!]);
    live.sort((p, q) => ratio(p) - ratio(q) || other(p) - other(q));
    for (const k of live.slice(4)) kept[k] = 0;
  }
}

function atomRadii(mol: Molecule): { radii: Float64Array; z: Uint8Array; metal: Uint8Array } {
  const n = mol.atoms.length;
  const radii = new Float64Array(n);
  const z = new Uint8Array(n);
  const metal = new Uint8Array(n);
  const metals = new Map<string, boolean>();
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
    let m = metals.get(element);
    if (m === undefined) metals.set(element, (m = isMetal(element)));
    metal[i] = m ? 1 : 0;
  }
  return { radii, z, metal };
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
