/**
 * Duplicate conformers in an ensemble: each record is compared with the earlier unique records by heavy-atom
 * RMSD after superposition; the first one within the threshold is the one it duplicates (README.md ensemble
 * `duplicateOf`).
 * Records in input order; pass them sorted by energy to keep the lowest of each set.
 *
 * Not every pair is superposed. Two exact lower bounds of the RMSD skip most of them (so no duplicate is
 * missed and the result is the same as comparing every pair):
 *   - for centred heavy-atom coordinates a, b and any rotation R, atom by atom | |a_i| − |R b_i| | ≤
 *     |a_i − R b_i|, so the RMS difference of the atoms' distances from the centroid ("radial profile") is
 *     ≤ RMSD: a cheap test before the superposition;
 *   - the heavy atoms are split into up to three groups G; the mean radial distance over a group differs by
 *     at most sqrt(N/|G|) × RMSD between two records (mean ≤ root mean square). Unique records are kept in a
 *     grid of these up-to-three means with that cell width; a record looks only at the 3^k cells around it.
 * With many records of equal energy (where the energy window prunes nothing) a record is compared only with
 * the unique records of nearly the same size and shape, not with all of them.
 */
import { atomPosition, type Molecule, type Vec3 } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { superpose } from './superpose.js';
import { isHydrogen } from './couplingSubstituents.js';

/** Options for `findDuplicates`. */
export interface DuplicateOptions {
  /**
   * Heavy-atom RMSD (Å) at or below which two conformers count as the same. Default 0.125 (common practice,
   * no source: a typical cut-off in conformer searches).
   */
  readonly rmsdThresholdA?: number;
  /**
   * Energy of each record (any one unit). When given, two records are the same only if their energies also
   * differ by at most `energyWindow` — so rotamers of hydrogens (OH, CH3), which heavy atoms cannot tell apart
   * but which differ in energy, stay separate. Default: not used.
   */
  readonly energies?: readonly number[];
  /** Energy window in the unit of `energies`. Default 0.05 (kcal/mol; common practice, no source). */
  readonly energyWindow?: number;
}

/** Slack on the bounds so rounding never skips a pair the superposition would accept. */
const SLACK = 1e-9;

/** Distances of the heavy atoms from their centroid. */
function radialProfile(mol: Molecule, atoms: readonly number[]): Float64Array {
  let cx = 0;
  let cy = 0;
  let cz = 0;
  for (const i of atoms) {
    const [x, y, z] = atomPosition(mol, i);
    cx += x;
    cy += y;
    cz += z;
  }
  const n = Math.max(1, atoms.length);
  cx /= n;
  cy /= n;
  cz /= n;
  const radial = new Float64Array(atoms.length);
  atoms.forEach((i, k) => {
    const [x, y, z] = atomPosition(mol, i);
    radial[k] = Math.sqrt((x - cx) ** 2 + (y - cy) ** 2 + (z - cz) ** 2);
  });
  return radial;
}

/** Up to three contiguous groups of profile positions, as [start, end) pairs. */
function groupsOf(n: number): [number, number][] {
  const k = Math.min(3, n);
  return Array.from({ length: k }, (_, j) => [Math.floor((j * n) / k), Math.floor(((j + 1) * n) / k)]);
}

/** Grid cell of a profile: each group's mean radial distance over its cell width. */
function cellOf(radial: Float64Array, groups: readonly [number, number][], widths: readonly number[]): number[] {
  return groups.map(([a, b], j) => {
    let s = 0;
    for (let k = a; k < b; k++) s += radial[k]!;
    return Math.floor(s / (b - a) / widths[j]!);
  });
}

/** The keys of the 3^k cells around `cell` (itself included). */
function neighbourKeys(cell: readonly number[]): string[] {
  let keys: number[][] = [[]];
  for (const c of cell) keys = keys.flatMap((k) => [c - 1, c, c + 1].map((d) => [...k, d]));
  return keys.map((k) => k.join(','));
}

/** RMS difference of two radial profiles: a lower bound of the RMSD after superposition. */
function radialBound(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let k = 0; k < a.length; k++) s += (a[k]! - b[k]!) ** 2;
  return Math.sqrt(s / Math.max(1, a.length));
}

/** The same checks `heavyAtomRmsd` makes, once for all records instead of per pair. */
function checkSameAtoms(records: readonly Molecule[]): void {
  const first = records[0];
  if (!first) return;
  for (const r of records) {
    if (r.atoms.length !== first.atoms.length) {
      throw usageError('atoms-differ', `records have ${first.atoms.length} and ${r.atoms.length} atoms; RMSD needs the same atoms`);
    }
    const mismatch = first.atoms.findIndex((atom, i) => atom.element !== r.atoms[i]!.element);
    if (mismatch >= 0) {
      throw usageError('atoms-differ', `atom ${mismatch + 1} is ${first.atoms[mismatch]!.element} in one record and ${r.atoms[mismatch]!.element} in the other`);
    }
  }
}

/**
 * For each record the index (0-based) of the earlier unique record it duplicates, or `null`.
 * @example findDuplicates([a, b, a]) // [null, null, 0]
 */
export function findDuplicates(records: readonly Molecule[], options: DuplicateOptions = {}): (number | null)[] {
  const { rmsdThresholdA = 0.125, energies, energyWindow = 0.05 } = options;
  if (!Array.isArray(records as unknown)) throw usageError('bad-argument', 'findDuplicates expects an array of molecules');
  if (energies && energies.length !== records.length) {
    throw usageError('bad-energies', `${energies.length} energies given for ${records.length} records`);
  }
  if (!(Number.isFinite(rmsdThresholdA) && rmsdThresholdA >= 0)) {
    throw usageError('bad-threshold', `RMSD threshold must be a non-negative number of Å, got ${rmsdThresholdA}`);
  }
  if (energies && !energies.every((e) => Number.isFinite(e))) throw usageError('bad-energies', 'energies must be finite numbers');
  checkSameAtoms(records);
  const heavy: number[] = [];
  records[0]?.atoms.forEach((a, i) => {
    if (!isHydrogen(a.element)) heavy.push(i);
  });
  const close = (u: number, i: number) => !energies || Math.abs(energies[u]! - energies[i]!) <= energyWindow;
  const groups = groupsOf(heavy.length);
  const widths = groups.map(([a, b]) => Math.sqrt(heavy.length / (b - a)) * Math.max(rmsdThresholdA, 1e-6) * (1 + 1e-6) + SLACK);
  const cells = new Map<string, number[]>();
  const profiles = records.map((r) => radialProfile(r, heavy));
  // heavy-atom points, taken once per record and kept for unique ones: the superposition heavyAtomRmsd makes,
  // without its per-pair set-up
  const points = new Map<number, Vec3[]>();
  const pointsOf = (k: number): Vec3[] => points.get(k) ?? heavy.map((i) => atomPosition(records[k]!, i));
  return records.map((_, i) => {
    const radial = profiles[i]!;
    const cell = cellOf(radial, groups, widths);
    const candidates: number[] = [];
    for (const key of neighbourKeys(cell)) {
      for (const u of cells.get(key) ?? []) {
        if (close(u, i) && radialBound(profiles[u]!, radial) <= rmsdThresholdA + SLACK) candidates.push(u);
      }
    }
    // the earliest unique record within the threshold, as a scan of all of them in order would find
    candidates.sort((a, b) => a - b);
    let mine: Vec3[] | null = null;
    const match = candidates.find((u) => superpose(pointsOf(u), (mine ??= pointsOf(i))).rmsdA <= rmsdThresholdA);
    if (match !== undefined) return match;
    points.set(i, mine ?? pointsOf(i));
    const key = cell.join(',');
    const list = cells.get(key);
    if (list) list.push(i);
    else cells.set(key, [i]);
    return null;
  });
}
