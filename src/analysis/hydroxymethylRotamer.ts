/**
 * The rotamer of a pyranose's exocyclic hydroxymethyl group about C5–C6, in the carbohydrate convention: two
 * letters for the position of O6 relative to O5, then to C4 (g gauche, t trans), from the torsions
 * O5–C5–C6–O6 and C4–C5–C6–O6 — gg, gt or tg (Marchessault & Pérez 1979, Biopolymers 18, 2369; Bock & Duus
 * 1994, J. Carbohydr. Chem. 13, 513, from memory). A torsion within 120° of 0 is gauche, else trans.
 */
import { atomPosition, type Molecule, type Vec3 } from '../model/molecule.js';
import { torsion } from '../geometry/torsion.js';

/** The rotamer and the two torsions behind it, degrees. */
export interface HydroxymethylRotamer {
  readonly rotamer: string;
  readonly o5Deg: number;
  readonly c4Deg: number;
}

/**
 * The hydroxymethyl rotamer of the atoms named O5, C4, C5, C6, O6 (chemical names, `chemicalNumbering`), or
 * null when any is missing or a torsion is undefined.
 * @example hydroxymethylRotamer(mol, numbering.names)?.rotamer // 'gt'
 */
export function hydroxymethylRotamer(mol: Pick<Molecule, 'coords'>, names: ReadonlyMap<number, string>): HydroxymethylRotamer | null {
  const atomOf = new Map([...names].map(([a, n]) => [n, a]));
  const ids = ['O5', 'C4', 'C5', 'C6', 'O6'].map((n) => atomOf.get(n));
  if (ids.some((a) => a === undefined)) return null;
  const [o5, c4, c5, c6, o6] = ids.map((a) => atomPosition(mol, a!)) as [Vec3, Vec3, Vec3, Vec3, Vec3];
  const a = torsion(o5, c5, c6, o6);
  const b = torsion(c4, c5, c6, o6);
  if (a === null || b === null) return null;
  const letter = (t: number) => (Math.abs(t) < 120 ? 'g' : 't');
  return { rotamer: `${letter(a)}${letter(b)}`, o5Deg: a, c4Deg: b };
}
