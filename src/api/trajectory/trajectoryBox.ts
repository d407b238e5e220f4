/**
 * The periodic box of a trajectory run: from `--box` (fixed for the run) or from each frame's file (PDB
 * CRYST1); and the bond limits that tell a ring split across the box from a whole one when there is no box.
 */
import { usageError } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import { elementInfo } from '../../model/elements.js';
import { BOND_TOLERANCE_A } from '../../perceive/perceiveBonds.js';
import { boxFromLengths, boxFromVectors, type PeriodicBox } from '../../geometry/periodicBox.js';

/**
 * Parses `a b c` (rectangular) or `a b c α β γ` (Å, degrees; spaces or commas between).
 * @example parseBox('40 40 40').lengths // [40, 40, 40]
 */
export function parseBox(text: string): PeriodicBox {
  const parts = text.trim().split(/[\s,]+/).map(Number);
  const [a, b, c, alpha = 90, beta = 90, gamma = 90] = parts as number[];
  const full = parts.length === 3 || parts.length === 6 ? boxFromLengths(a!, b!, c!, alpha, beta, gamma) : null;
  if (!full) throw usageError('bad-option', `--box expects "a b c" or "a b c alpha beta gamma" (Å, degrees; lengths > 0), got "${text}"`);
  return full;
}

/** The box of one frame from its file, remembering the last text so an unchanged cell is parsed once. */
export class FrameBoxes {
  private text = '';
  private box: PeriodicBox | null = null;

  /** The box of a frame with these properties (PDB `CRYST1`, GRO box line as `BOX_VECTORS`), or null. */
  of(properties: Readonly<Record<string, string>>): PeriodicBox | null {
    const vectors = properties.BOX_VECTORS;
    if (vectors !== undefined) {
      if (vectors !== this.text) {
        this.text = vectors;
        this.box = boxFromVectors(vectors.split(' ').map(Number));
      }
      return this.box;
    }
    const t = properties.CRYST1 ?? '';
    if (t !== this.text) {
      this.text = t;
      const p = t.split(' ').map(Number);
      // CRYST1 1 1 1 90 90 90 is the PDB convention for "no cell"
      this.box = p.length === 6 && !(p[0] === 1 && p[1] === 1 && p[2] === 1) ? boxFromLengths(p[0]!, p[1]!, p[2]!, p[3]!, p[4]!, p[5]!) : null;
    }
    return this.box;
  }
}

/**
 * The longest each ring bond ring[k]–ring[k+1] may be: the bond perception limit, sum of covalent radii
 * (Cordero et al. 2008, Dalton Trans. 2832) plus the tolerance.
 */
export function ringBondLimits(mol: Molecule, ring: ArrayLike<number>, toleranceA = BOND_TOLERANCE_A): Float64Array {
  const n = ring.length;
  const radius = (i: number) => elementInfo(mol.atoms[i]!.element)?.radius ?? 1.5;
  return Float64Array.from({ length: n }, (_, k) => radius(ring[k]!) + radius(ring[(k + 1) % n]!) + toleranceA);
}
