/** A molecule with bonds: the file's own, or perceived from coordinates when the file gave none. */
import type { Molecule } from '../model/molecule.js';
import { perceiveBonds, type PerceiveBondsOptions } from './perceiveBonds.js';

/**
 * Returns `mol` itself when the file gave bonds (`mol.bonds !== null`, even an empty list), else a new
 * Molecule whose `bonds` are perceived from the coordinates (see {@link perceiveBonds}). Never mutates `mol`.
 * @example withBonds(ethanolXyz).bonds?.length // 8 (perceived: C–C, C–O, O–H and five C–H)
 */
export function withBonds(mol: Molecule, options: PerceiveBondsOptions = {}): Molecule {
  if (mol.bonds !== null) return mol;
  return { ...mol, bonds: perceiveBonds(mol, options) };
}
