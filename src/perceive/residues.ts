/** Residues of a record: which atoms share chain, number, insertion code and name, and how a user writes one. */
import type { Atom, Molecule } from '../model/molecule.js';

/** One residue (or ligand, water) of a record, its atoms in file order (0-based). */
export interface Residue {
  readonly name: string;
  readonly number: number;
  readonly insertion: string;
  readonly chain: string;
  readonly atoms: number[];
}

/** True when the atom carries a residue name and number (PDB, mmCIF, MOL2 substructures, GRO …). */
export function hasResidue(atom: Atom): boolean {
  return atom.residue !== undefined && atom.residueNumber !== undefined;
}

/** A key equal for atoms of one residue and different otherwise; `null` for an atom without residue. */
export function residueKey(atom: Atom): string | null {
  if (!hasResidue(atom)) return null;
  return `${atom.chain ?? ''}\u0000${atom.residueNumber}\u0000${atom.insertionCode ?? ''}\u0000${atom.residue}`;
}

/**
 * The residue as a selection token writes it: `A/PRO42B/` style without the trailing slash, i.e.
 * `chain/NAMEnumberInsertion` (`/NAG501` when the chain is blank).
 * @example residueLabel({ chain: 'A', residue: 'PRO', residueNumber: 42, insertion: '' }) // 'A/PRO42'
 */
export function residueLabel(r: Pick<Residue, 'chain' | 'name' | 'number' | 'insertion'>): string {
  return `${r.chain}/${r.name}${r.number}${r.insertion}`;
}

/** The residue label of atom `i`, or `null` when the atom has no residue. */
export function atomResidueLabel(atom: Atom): string | null {
  if (!hasResidue(atom)) return null;
  return residueLabel({ chain: atom.chain ?? '', name: atom.residue!, number: atom.residueNumber!, insertion: atom.insertionCode ?? '' });
}

/**
 * The residues of `mol` in order of first appearance; atoms without residue information belong to none.
 * Linear in the atoms.
 */
export function residuesOf(mol: Molecule): Residue[] {
  const byKey = new Map<string, Residue>();
  const out: Residue[] = [];
  mol.atoms.forEach((atom, i) => {
    const key = residueKey(atom);
    if (key === null) return;
    let r = byKey.get(key);
    if (r === undefined) {
      r = { name: atom.residue!, number: atom.residueNumber!, insertion: atom.insertionCode ?? '', chain: atom.chain ?? '', atoms: [] };
      byKey.set(key, r);
      out.push(r);
    }
    r.atoms.push(i);
  });
  return out;
}
