/**
 * Positions of the exocyclic bonds of a ring (docs/methods.md#axial-equatorial): the angle α between the bond (ring atom →
 * substituent) and the Cremer–Pople normal, folded into 0–90 with |cos|; the face (side of the normal); and the
 * trade word for the position, chosen by the ring's shape and the atom's place in its canonical form.
 *
 * Words per ring atom (tags: [C: IUPAC Gold Book A00546] for axial/equatorial and the pseudo- terms of
 * allylic, five- and seven-ring positions; the rest [common practice, no source], following docs/methods.md#axial-equatorial):
 * - chair: every atom `axial` / `equatorial`.
 * - half-chair (six-ring): the two exoplanar atoms `axial` / `equatorial`; the four in-plane atoms (allylic and
 *   olefinic) `pseudo-axial` / `pseudo-equatorial`.
 * - six-ring envelope (sofa): the flap atom `axial` / `equatorial`; the others `pseudo-axial` / `pseudo-equatorial`.
 * - boat: bow and stern atoms `flagpole` (smaller α) / `bowsprit`; the four side atoms `pseudo-axial` /
 *   `pseudo-equatorial`.
 * - twist-boat: the two atoms on an in-plane C2 axis (ideal z = 0) `isoclinal` (Eliel & Wilen 1994, from
 *   memory); the other four `pseudo-axial` / `pseudo-equatorial`.
 * - screw-boat, five-ring envelope and twist, seven- and larger rings, and rings far from every form
 *   (`puckered`): `pseudo-axial` / `pseudo-equatorial`.
 * - planar ring: `position` null (no axial/equatorial sense); `face` still given.
 * A ring 20–30° from its nearest form (`distorted`) takes that form's words.
 * Choosing between the two words of a pair: at an atom with two classified exocyclic bonds the smaller α takes
 * the axial-like word, unless the two α differ by less than `isoclinalDiffDeg` (then both `isoclinal`); at an
 * atom with one (or three) bonds, α ≤ `axialMaxDeg` → axial-like, α ≥ `equatorialMinDeg` → equatorial-like,
 * otherwise `isoclinal` [thresholds: common practice, no source].
 * Trigonal-planar ring atoms (three neighbours in all, valence-angle sum ≥ `planarSumDeg`): their single in-plane
 * substituent is not classified (`position` and `face` null), as docs/methods.md#axial-equatorial says for sp2 ring atoms.
 */
import { atomPosition, type Molecule, type Vec3 } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { angleBetween, dot, sub, unit, DEG } from '../geometry/vec3.js';
import type { Graph } from '../perceive/graph.js';
import type { CanonicalForm, RingShape } from './ringForms.js';
import type { ReferencePlane } from './ringForms.js';

/** Substituent position words (README.md "JSON documents", `position`). */
export type SubstituentPosition =
  | 'axial'
  | 'equatorial'
  | 'pseudo-axial'
  | 'pseudo-equatorial'
  | 'flagpole'
  | 'bowsprit'
  | 'isoclinal';

/** One exocyclic bond of a ring atom (0-based atoms inside the library). */
export interface RingSubstituent {
  readonly ringAtom: number;
  readonly atom: number;
  readonly element: string;
  /** Null for planar rings and for the in-plane substituent of a trigonal-planar ring atom. */
  readonly position: SubstituentPosition | null;
  /** Side of the Cremer–Pople normal; null when the bond lies in the mean plane or is not classified. */
  readonly face: 'top' | 'bottom' | null;
  /** Angle between the bond and the normal, folded into [0, 90], degrees. */
  readonly angleToNormalDeg: number;
}

/** Options of `ringSubstituents`. */
export interface SubstituentOptions {
  /** Largest α (deg) called axial at an atom with one exocyclic bond. Default 35. */
  readonly axialMaxDeg?: number;
  /** Smallest α (deg) called equatorial at an atom with one exocyclic bond. Default 55. */
  readonly equatorialMinDeg?: number;
  /** Two bonds at one atom whose α differ by less than this (deg) are both isoclinal. Default 10. */
  readonly isoclinalDiffDeg?: number;
  /** Valence-angle sum (deg) from which a three-connected ring atom counts as trigonal planar. Default 350. */
  readonly planarSumDeg?: number;
}

/** What the ring shape says about one ring position. */
type Role = 'plain' | 'pseudo' | 'bow' | 'axis' | 'none';
const WORDS: Record<'plain' | 'pseudo' | 'bow', [SubstituentPosition, SubstituentPosition]> = {
  plain: ['axial', 'equatorial'],
  pseudo: ['pseudo-axial', 'pseudo-equatorial'],
  bow: ['flagpole', 'bowsprit'],
};

/** The role of ring position j for a ring of this shape (rules in the file comment). */
function roleOf(j: number, shape: RingShape, form: CanonicalForm | null, plane: ReferencePlane | null): Role {
  const exoplanar = plane ? [...plane.above, ...plane.below].includes(j) : false;
  if (form === null && shape !== 'planar') return 'pseudo'; // seven- and eight-ring forms, puckered rings
  switch (shape) {
    case 'planar':
      return 'none';
    case 'chair':
      return 'plain';
    case 'half-chair':
      return exoplanar ? 'plain' : 'pseudo';
    case 'envelope':
      return form?.size === 6 && exoplanar ? 'plain' : 'pseudo';
    case 'boat':
      return exoplanar ? 'bow' : 'pseudo';
    case 'twist-boat':
      return form && Math.abs(form.z[j]!) < 1e-9 ? 'axis' : 'pseudo';
    default:
      return 'pseudo';
  }
}

function valenceAngleSum(mol: Pick<Molecule, 'coords'>, centre: number, nbrs: readonly number[]): number {
  const c = atomPosition(mol, centre);
  const v = nbrs.map((b) => sub(atomPosition(mol, b), c));
  return (angleBetween(v[0]!, v[1]!) + angleBetween(v[1]!, v[2]!) + angleBetween(v[0]!, v[2]!)) * DEG;
}

/**
 * Every exocyclic bond of every ring atom with its α, face and position word.
 * `ring` is in reference order; `normal` the Cremer–Pople normal; `plane` the chosen reference plane of `form`.
 */
export function ringSubstituents(
  mol: Pick<Molecule, 'atoms' | 'coords'>,
  graph: Graph,
  ring: readonly number[],
  normal: Vec3,
  shape: RingShape,
  form: CanonicalForm | null,
  plane: ReferencePlane | null,
  options: SubstituentOptions = {},
): RingSubstituent[] {
  const { axialMaxDeg = 35, equatorialMinDeg = 55, isoclinalDiffDeg = 10, planarSumDeg = 350 } = options;
  const inRing = new Set(ring);
  const out: RingSubstituent[] = [];
  ring.forEach((ra, j) => {
    const nbrs = graph.neighbors[ra]!;
    const exo = nbrs.filter((b) => !inRing.has(b));
    const trigonal = nbrs.length === 3 && exo.length === 1 && valenceAngleSum(mol, ra, nbrs) >= planarSumDeg;
    const origin = atomPosition(mol, ra);
    const measured = exo.map((atom) => {
      const u = unit(sub(atomPosition(mol, atom), origin));
      const c = u ? dot(u, normal) : 0;
      return { atom, c, alpha: Math.acos(Math.min(1, Math.abs(c))) * DEG };
    });
    const role = trigonal ? 'none' : roleOf(j, shape, form, plane);
    const words = role === 'none' || role === 'axis' ? null : WORDS[role];
    const alphas = measured.map((m) => m.alpha);
    const positionOf = (alpha: number): SubstituentPosition | null => {
      if (role === 'none') return null;
      if (role === 'axis' || words === null) return 'isoclinal';
      if (alphas.length === 2) {
        if (Math.abs(alphas[0]! - alphas[1]!) < isoclinalDiffDeg) return 'isoclinal';
        return alpha === Math.min(...alphas) ? words[0] : words[1];
      }
      if (alpha <= axialMaxDeg) return words[0];
      if (alpha >= equatorialMinDeg) return words[1];
      return 'isoclinal';
    };
    for (const m of measured) {
      const face = trigonal || Math.abs(m.c) < 1e-6 ? null : m.c > 0 ? 'top' : 'bottom';
      out.push({
        ringAtom: ra,
        atom: m.atom,
        element: mol.atoms[m.atom]!.element,
        position: positionOf(m.alpha),
        face,
        angleToNormalDeg: m.alpha,
      });
    }
  });
  return out;
}

/**
 * Cis or trans relation of two substituents of one ring from their faces (IUPAC: the ring mean plane is the
 * reference, Gold Book C01092). A substituent is given by its atom (0-based) or as a `RingSubstituent`; null when
 * either face is undefined.
 * @example relativeConfiguration(ring, 7, 9) // 'cis'
 */
export function relativeConfiguration(
  ring: { readonly substituents: readonly RingSubstituent[] },
  subA: number | RingSubstituent,
  subB: number | RingSubstituent,
): 'cis' | 'trans' | null {
  const find = (s: number | RingSubstituent) => {
    const found =
      typeof s === 'number'
        ? ring.substituents.find((x) => x.atom === s)
        : ring.substituents.find((x) => x.atom === s.atom && x.ringAtom === s.ringAtom);
    if (!found) {
      const atom = typeof s === 'number' ? s : s.atom;
      throw usageError('not-a-substituent', `atom ${atom + 1} is not a substituent of this ring`);
    }
    return found;
  };
  const a = find(subA);
  const b = find(subB);
  if (a.face === null || b.face === null) return null;
  return a.face === b.face ? 'cis' : 'trans';
}
