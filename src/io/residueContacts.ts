/**
 * Atoms closer than the overlap limit in a structure file (atoms with residues). Coinciding atoms inside
 * one residue (a water too) are a broken record; a contact between different residues (waters included) or
 * different alternate locations is a crystallographic fact (a mis-modelled water, a symmetry-overlapping ligand) that is
 * reported and read past — perception never bonds a pair that close. Linear in the atoms (uniform grid).
 */
import type { Warning } from '../model/errors.js';
import type { Atom } from '../model/molecule.js';

/** Residue names read as water (common practice, no source). */
const WATERS = new Set(['HOH', 'WAT', 'H2O', 'DOD', 'TIP', 'TIP3', 'SOL', 'SPC']);
/** Contacts named one by one before the rest are counted in one line. */
const NAMED = 10;

/** `A/ARG45/NH1 (atom 812)`: an atom as a structure chemist names it, with its 1-based position. */
export function structureAtomLabel(atoms: readonly Atom[], i: number): string {
  const a = atoms[i]!;
  const alt = a.altLoc ? `:${a.altLoc}` : '';
  const residue = a.residue === undefined ? '' : `${a.chain ?? ''}/${a.residue}${a.residueNumber ?? ''}${a.insertionCode ?? ''}/`;
  return `${residue}${a.name ?? a.element}${alt} (atom ${i + 1})`;
}

/** The error message for atoms `i` and `j` coinciding inside one residue. */
export function sameResidueMessage(atoms: readonly Atom[], c: Float64Array, i: number, j: number, minDist: number): string {
  const d = Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
  return `atoms ${structureAtomLabel(atoms, i)} and ${structureAtomLabel(atoms, j)} are ${d.toFixed(2)} Å apart inside one residue, closer than ${minDist} Å`;
}

/**
 * Finds every pair closer than `minDist` Å. Returns the first same-residue pair as `error` (it stops the
 * record), and a warning per other pair (at most `NAMED` named, the rest counted).
 */
export function residueContacts(atoms: readonly Atom[], c: Float64Array, minDist: number): { error: [number, number] | null; warnings: Warning[] } {
  const n = atoms.length;
  const warnings: Warning[] = [];
  if (!(minDist > 0) || n < 2) return { error: null, warnings };
  const pairs = closePairs(c, n, minDist);
  let error: [number, number] | null = null;
  let skipped = 0;
  for (const [i, j] of pairs) {
    const a = atoms[i]!;
    const b = atoms[j]!;
    const water = WATERS.has(a.residue ?? '') || WATERS.has(b.residue ?? '');
    const sameResidue = a.chain === b.chain && a.residueNumber === b.residueNumber && a.insertionCode === b.insertionCode && a.residue === b.residue;
    const alternates = (a.altLoc ?? '') !== '' && (b.altLoc ?? '') !== '' && a.altLoc !== b.altLoc;
    if (sameResidue && !alternates) {
      if (error === null || j < error[1]) error = [i, j];
      continue;
    }
    if (warnings.length >= NAMED) {
      skipped++;
      continue;
    }
    const d = Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
    const kind = water ? 'a contact with a water' : alternates ? 'a contact between alternate locations' : 'a contact between residues';
    warnings.push({
      code: 'close-contact',
      message: `${structureAtomLabel(atoms, i)} and ${structureAtomLabel(atoms, j)} are ${d.toFixed(2)} Å apart, closer than ${minDist} Å: ${kind}, not bonded`,
    });
  }
  if (skipped > 0) warnings.push({ code: 'close-contact', message: `${skipped} more contact${skipped === 1 ? '' : 's'} closer than ${minDist} Å between residues, not bonded` });
  return { error, warnings };
}

/** Every pair (i < j) closer than `d`, from a uniform grid of cell size `d` (linked lists per cell). */
function closePairs(c: Float64Array, n: number, d: number): [number, number][] {
  const d2 = d * d;
  const head = new Map<number, number>();
  const next = new Int32Array(n).fill(-1);
  const SPAN = 1 << 17; // cells per axis in the key; far-out cells may share keys, which only adds checks
  const cell = (v: number): number => Math.floor(v / d) + SPAN / 2;
  const out: [number, number][] = [];
  for (let j = 0; j < n; j++) {
    const x = c[3 * j]!;
    const y = c[3 * j + 1]!;
    const z = c[3 * j + 2]!;
    const cx = cell(x);
    const cy = cell(y);
    const cz = cell(z);
    for (let ax = -1; ax <= 1; ax++) {
      for (let ay = -1; ay <= 1; ay++) {
        for (let az = -1; az <= 1; az++) {
          for (let i = head.get(((cx + ax) * SPAN + (cy + ay)) * SPAN + (cz + az)) ?? -1; i >= 0; i = next[i]!) {
            const dx = c[3 * i]! - x;
            const dy = c[3 * i + 1]! - y;
            const dz = c[3 * i + 2]! - z;
            if (dx * dx + dy * dy + dz * dz < d2) out.push([i, j]);
          }
        }
      }
    }
    const key = (cx * SPAN + cy) * SPAN + cz;
    next[j] = head.get(key) ?? -1;
    head.set(key, j);
  }
  out.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  return out;
}
