/**
 * 2D input: a record of four or more atoms whose every z is 0, as 2D SD files and sketches are. Its rings are
 * "planar" only because the drawing is, so the callers warn once per file and drop the per-ring "nearly planar"
 * warnings that would repeat it.
 */
import type { Molecule } from '../model/molecule.js';
import type { Warning } from '../model/errors.js';

/** The one warning for a 2D file. */
export const FLAT_INPUT_WARNING: Warning = {
  code: 'two-dimensional-input',
  message: '2D coordinates: conformations need 3D input',
};

/**
 * True when `mol` has at least four atoms and every z is exactly 0.
 * @example isTwoDimensional(sketch) // true
 */
export function isTwoDimensional(mol: Pick<Molecule, 'coords'>): boolean {
  const n = mol.coords.length / 3;
  if (n < 4) return false;
  for (let i = 0; i < n; i++) if (mol.coords[3 * i + 2] !== 0) return false;
  return true;
}

/**
 * A record's warnings with 2D input taken into account: the first 2D record of a file gets the 2D warning
 * (`state.warned` remembers), and a 2D record's "nearly planar" ring warnings are dropped.
 */
export function withFlatInputWarning(mol: Pick<Molecule, 'coords'>, warnings: readonly Warning[], state: { warned: boolean }): Warning[] {
  if (!isTwoDimensional(mol)) return [...warnings];
  const kept = warnings.filter((w) => w.code !== 'ring-nearly-planar');
  if (state.warned) return kept;
  state.warned = true;
  return [FLAT_INPUT_WARNING, ...kept];
}
