/** A molecule with bonds: the file's own, or perceived from coordinates when the file gave none. */
import type { Bond, Molecule } from '../model/molecule.js';
import { perceiveBonds, type PerceiveBondsOptions } from './perceiveBonds.js';

/**
 * Returns `mol` itself when the file gave bonds (`mol.bonds !== null`, even an empty list), else a new
 * Molecule whose `bonds` are perceived from the coordinates (see {@link perceiveBonds}). Never mutates `mol`.
 *
 * PDB (also PDBQT, mmCIF) is the exception: CONECT records usually cover only HETATM atoms and leave standard residues to the
 * reader, so when some atom of a PDB record has no file bond, the perceived bonds are added to the CONECT
 * ones (file bonds win where both exist). Common practice, no source.
 * @example withBonds(ethanolXyz).bonds?.length // 8 (perceived: C–C, C–O, O–H and five C–H)
 */
/** Formats whose bond records (CONECT, chem_comp_bond) usually cover only some residues. */
const STRUCTURE_FORMATS: ReadonlySet<string> = new Set(['pdb', 'pdbqt', 'mmcif']);

export function withBonds(mol: Molecule, options: PerceiveBondsOptions = {}): Molecule {
  if (mol.bonds === null) return { ...mol, bonds: perceiveBonds(mol, options) };
  if (!STRUCTURE_FORMATS.has(mol.source.format) || coversEveryAtom(mol.atoms.length, mol.bonds)) return mol;
  const key = (b: Bond) => b.a * mol.atoms.length + b.b;
  const known = new Set(mol.bonds.map(key));
  const merged = [...mol.bonds, ...perceiveBonds(mol, options).filter((b) => !known.has(key(b)))];
  merged.sort((x, y) => x.a - y.a || x.b - y.b);
  return { ...mol, bonds: merged };
}

function coversEveryAtom(n: number, bonds: readonly Bond[]): boolean {
  if (n <= 1) return true;
  const seen = new Uint8Array(n);
  for (const b of bonds) seen[b.a] = seen[b.b] = 1;
  return seen.every((x) => x === 1);
}
