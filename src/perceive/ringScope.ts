/**
 * Which perceived rings are analysed as rings. In real structure files the bond graph holds cycles that are
 * not rings in the conformational sense: chelates closed through a metal, loops closed by a disulfide, and
 * macrocycles whose "puckering" is a whole-molecule fold. This module keeps those out of the ring analysis
 * by default and says why (options put them back).
 */
import { isMetal } from '../model/elements.js';
import type { Bond, Molecule } from '../model/molecule.js';
import { atomResidueLabel, residueKey } from './residues.js';

/** Options of {@link scopeRings} and the ring graph. */
export interface RingScopeOptions {
  /** Let bonds to metal atoms (coordination) close rings (chelate rings are then analysed). Default false. */
  readonly metalRings?: boolean;
  /** Analyse rings closed by an S–S bond between two residues (disulfide loops). Default false. */
  readonly disulfideRings?: boolean;
  /** Largest ring analysed, atoms (3 or more). Default {@link DEFAULT_MAX_RING_SIZE}. */
  readonly maxRingSize?: number;
}

/**
 * Largest ring analysed by default: 12 atoms. The ring forms conformark names stop at eight atoms; rings of
 * 9–12 atoms (medium and small-large rings such as cyclododecane) still get Cremer–Pople coordinates and
 * torsions. From 13 atoms on, rings are macrocycles whose shape chemists describe by torsion sequences, not
 * by a puckering amplitude, and in structure files they are almost always cycles through cross-links (a
 * 29-atom "ring" through a disulfide had Q = 7.15 Å). The cut at twelve is common practice, no source.
 */
export const DEFAULT_MAX_RING_SIZE = 12;

/** Why a ring is listed but not analysed. */
export type SetAsideReason = 'disulfide' | 'too-large';

/** A ring that was found but is not analysed (0-based atoms in cyclic order). */
export interface SetAsideRing {
  readonly atoms: readonly number[];
  readonly reason: SetAsideReason;
  /** One sentence for the user: what the ring is and which option analyses it. */
  readonly message: string;
}

/**
 * True when bond `b` has a metal atom at one end ({@link isMetal}): a coordination bond. Such bonds stay in
 * the bond list and the graph (so substituents include the metal) but close no rings by default.
 * @example isCoordinationBond(zincComplex, { a: 0, b: 1, order: 1, perceived: true }) // true when atom 1 is Zn
 */
export function isCoordinationBond(mol: Pick<Molecule, 'atoms'>, b: Pick<Bond, 'a' | 'b'>): boolean {
  return isMetal(mol.atoms[b.a]?.element ?? '') || isMetal(mol.atoms[b.b]?.element ?? '');
}

/**
 * The bonds that may close rings: all of them with `metalRings`, else those without a metal atom.
 * Returns `bonds` itself when nothing is left out.
 */
export function ringClosingBonds(mol: Pick<Molecule, 'atoms'>, bonds: readonly Bond[], options: RingScopeOptions = {}): readonly Bond[] {
  if (options.metalRings) return bonds;
  const metal = mol.atoms.map((a) => isMetal(a.element));
  if (!metal.some(Boolean)) return bonds;
  return bonds.filter((b) => !metal[b.a] && !metal[b.b]);
}

/**
 * Splits found rings into those analysed and those set aside: a ring through an S–S bond between two
 * residues (unless `disulfideRings`) and a ring of more than `maxRingSize` atoms. Order is kept in both lists.
 * Throws `RangeError` for a `maxRingSize` below 3 (the CLI checks its flag first).
 * @example scopeRings(protein, rings).setAside[0]?.reason // 'disulfide'
 */
export function scopeRings(
  mol: Pick<Molecule, 'atoms'>,
  rings: readonly (readonly number[])[],
  options: RingScopeOptions = {},
): { rings: (readonly number[])[]; setAside: SetAsideRing[] } {
  const limit = options.maxRingSize ?? DEFAULT_MAX_RING_SIZE;
  if (!(Number.isInteger(limit) && limit >= 3)) throw new RangeError(`maxRingSize must be a whole number ≥ 3, got ${limit}`);
  const kept: (readonly number[])[] = [];
  const setAside: SetAsideRing[] = [];
  for (const ring of rings) {
    const ss = options.disulfideRings ? null : disulfideIn(mol, ring);
    if (ss) {
      const what = `${ring.length}-atom ring through the S–S bond ${label(mol, ss[0])}–${label(mol, ss[1])}`;
      setAside.push({ atoms: ring, reason: 'disulfide', message: `${what}: a disulfide loop, listed but not analysed (--ss-rings, option disulfideRings, analyses it)` });
    } else if (ring.length > limit) {
      setAside.push({ atoms: ring, reason: 'too-large', message: `${ring.length}-atom ring: larger than ${limit} atoms, listed but not analysed (--max-ring-size ${ring.length}, option maxRingSize, analyses it)` });
    } else kept.push(ring);
  }
  return { rings: kept, setAside };
}

/**
 * The first ring bond between two sulfur atoms of different residues (a disulfide cross-link), or null. An
 * S–S bond inside one residue or in a file without residues (1,2-dithiolane, 1,2-dithiane, a lipoyl ligand)
 * is a ring bond like any other; cross-linked loops in files without residues are caught by the size limit.
 */
function disulfideIn(mol: Pick<Molecule, 'atoms'>, ring: readonly number[]): [number, number] | null {
  for (let k = 0; k < ring.length; k++) {
    const a = ring[k]!;
    const b = ring[(k + 1) % ring.length]!;
    const x = mol.atoms[a];
    const y = mol.atoms[b];
    if (x?.element !== 'S' || y?.element !== 'S') continue;
    const kx = residueKey(x);
    const ky = residueKey(y);
    if (kx !== null && ky !== null && kx !== ky) return a < b ? [a, b] : [b, a];
  }
  return null;
}

/** `A/CYS22/SG (atom 170)` for residue atoms, `S12` otherwise (1-based). */
function label(mol: Pick<Molecule, 'atoms'>, i: number): string {
  const atom = mol.atoms[i]!;
  const residue = atomResidueLabel(atom);
  return residue === null ? `${atom.element}${i + 1}` : `${residue}/${(atom.name ?? atom.element).trim()} (atom ${i + 1})`;
}
