/**
 * Newman view of a bond: every substituent of the front and back atoms projected onto the plane normal to
 * the bond, with azimuths measured clockwise from 12 o'clock as the viewer (at the front atom, looking at the
 * back atom) sees them, and every front/back pair with its IUPAC torsion (docs/methods.md#newman-projection, docs/methods.md#torsion).
 */
import type { Molecule, Vec3 } from '../model/molecule.js';
import { atomPosition } from '../model/molecule.js';
import { atomicMass } from '../model/elements.js';
import { usageError, type Warning } from '../model/errors.js';
import type { Graph } from '../perceive/graph.js';
import { cross, dot, norm, perpendicular, sub, unit, DEG, wrap180 } from '../geometry/vec3.js';
import { COLLINEAR_EPS } from '../geometry/torsion.js';
import { klynePrelog, torsionRelation, type KlynePrelog, type TorsionRelation } from '../geometry/klynePrelog.js';

/** Options of {@link newmanView}. */
export interface NewmanOptions {
  /**
   * Front substituent (0-based atom index) whose bond points straight up (12 o'clock).
   * Default: for a ring bond the front atom's ring neighbour in that ring; otherwise the heaviest front
   * substituent by atomic mass, ties broken by the lowest index.
   */
  readonly up?: number;
  /** Rings as cyclic atom lists (0-based), used to spot ring bonds and ring substituents. Default: none. */
  readonly rings?: readonly (readonly number[])[];
}

/** Conformation class from the smallest |torsion| δ over all pairs (docs/methods.md#staggered-eclipsed). */
export type NewmanConformation = 'staggered' | 'eclipsed' | 'intermediate';

/** One substituent of the front or back atom. */
export interface NewmanSubstituent {
  /** 0-based atom index. */
  readonly atom: number;
  readonly element: string;
  /** Clockwise from 12 o'clock as the viewer sees it, [0, 360); `null` when the bond lies on the axis. */
  readonly azimuthDeg: number | null;
  /** True when this substituent and its centre atom are neighbours in one of the given rings. */
  readonly inRing: boolean;
}

/** One front/back pair X–front–back–Y. */
export interface NewmanPair {
  readonly front: number;
  readonly back: number;
  /** IUPAC torsion X–front–back–Y = azimuth(Y) − azimuth(X), wrapped to (−180, 180]; `null` if undefined. */
  readonly torsionDeg: number | null;
  readonly klynePrelog: KlynePrelog | null;
  readonly relation: TorsionRelation | null;
}

/** Result of {@link newmanView}. Atom indices are 0-based. */
export interface NewmanView {
  readonly front: number;
  readonly back: number;
  readonly frontElement: string;
  readonly backElement: string;
  /** Front substituent drawn at 12 o'clock, or `null` when no front bond defines the direction. */
  readonly up: number | null;
  /** True when front and back are neighbours in one of the given rings. */
  readonly ringBond: boolean;
  readonly frontSubstituents: readonly NewmanSubstituent[];
  readonly backSubstituents: readonly NewmanSubstituent[];
  readonly pairs: readonly NewmanPair[];
  /** `null` when no pair has a defined torsion. */
  readonly conformation: NewmanConformation | null;
  /** Smallest |torsion| over the pairs, degrees; `null` when no pair has a defined torsion. */
  readonly minOffsetDeg: number | null;
  readonly warnings: readonly Warning[];
}

/** Eclipsed if δ ≤ 15°, staggered if δ ≥ 45° (docs/methods.md#staggered-eclipsed, common practice, no source). */
export const ECLIPSED_MAX_DEG = 15;
export const STAGGERED_MIN_DEG = 45;

const label = (mol: Molecule, i: number) => `${mol.atoms[i]?.element ?? '?'}${i + 1}`;

function ringNeighbours(rings: readonly (readonly number[])[], centre: number): Set<number> {
  const out = new Set<number>();
  for (const ring of rings) {
    const k = ring.indexOf(centre);
    if (k < 0) continue;
    out.add(ring[(k + 1) % ring.length]!);
    out.add(ring[(k + ring.length - 1) % ring.length]!);
  }
  return out;
}

/** The heaviest atom of `atoms` by atomic mass, ties by the lowest index. */
export function heaviestAtom(mol: Molecule, atoms: readonly number[]): number | undefined {
  let best: number | undefined;
  for (const i of atoms) {
    if (best === undefined) best = i;
    else {
      const d = atomicMass(mol.atoms[i]!.element) - atomicMass(mol.atoms[best]!.element);
      if (d > 0 || (d === 0 && i < best)) best = i;
    }
  }
  return best;
}

function chooseUp(mol: Molecule, front: number, back: number, subs: readonly number[], rings: NewmanOptions['rings'], up?: number): number | undefined {
  if (up !== undefined) {
    if (!subs.includes(up)) {
      throw usageError('bad-up-atom', `atom ${up + 1} is not bonded to the front atom ${label(mol, front)} (choose one of ${subs.map((i) => i + 1).join(', ') || 'none'})`);
    }
    return up;
  }
  for (const ring of rings ?? []) {
    const k = ring.indexOf(front);
    if (k < 0) continue;
    const next = ring[(k + 1) % ring.length]!;
    const prev = ring[(k + ring.length - 1) % ring.length]!;
    if (next === back && subs.includes(prev)) return prev;
    if (prev === back && subs.includes(next)) return next;
  }
  return heaviestAtom(mol, subs);
}

/**
 * Newman view of the bond front–back (0-based atoms), viewer at `front` looking at `back`.
 * Degenerate geometry gives `null` azimuths and torsions plus a warning, never NaN.
 * @example newmanView(mol, graph, 1, 2).pairs[0].torsionDeg // e.g. 180 for anti butane C1/C4
 */
export function newmanView(mol: Molecule, graph: Graph, front: number, back: number, options: NewmanOptions = {}): NewmanView {
  const n = mol.atoms.length;
  for (const i of [front, back]) {
    if (!Number.isInteger(i) || i < 0 || i >= n) throw usageError('bad-atom', `atom ${i + 1} does not exist (the record has ${n} atoms)`);
  }
  if (front === back) throw usageError('bad-bond', `a Newman bond needs two different atoms, got ${label(mol, front)} twice`);
  if (!graph.bonded(front, back)) throw usageError('not-bonded', `atoms ${label(mol, front)} and ${label(mol, back)} are not bonded`);
  const rings = options.rings ?? [];
  const warnings: Warning[] = [];
  const frontSubs = graph.neighbors[front]!.filter((i) => i !== back);
  const backSubs = graph.neighbors[back]!.filter((i) => i !== front);
  const pf = atomPosition(mol, front);
  const pb = atomPosition(mol, back);
  const axis = unit(sub(pb, pf), COLLINEAR_EPS);
  const bondName = `${label(mol, front)}-${label(mol, back)}`;
  if (!axis) warnings.push({ code: 'zero-length-bond', message: `bond ${bondName} has zero length: no Newman projection; check the coordinates` });

  const projected = (centre: Vec3, i: number): Vec3 | null => {
    if (!axis) return null;
    const v = perpendicular(sub(atomPosition(mol, i), centre), axis);
    return norm(v) < COLLINEAR_EPS ? null : v;
  };
  // Fiducial e1: the chosen up bond, else the next front bond that is not on the axis.
  let up = chooseUp(mol, front, back, frontSubs, options.rings, options.up);
  let e1: Vec3 | null = up === undefined ? null : unit(projected(pf, up) ?? [0, 0, 0]);
  if (!e1 && axis) {
    const other = frontSubs.find((i) => projected(pf, i) !== null);
    if (up !== undefined) warnings.push({ code: 'collinear-substituent', message: `atom ${label(mol, up)} lies on the ${bondName} axis; ${other === undefined ? 'no front bond can point up' : `atom ${label(mol, other)} points up instead`}` });
    up = other;
    e1 = other === undefined ? null : unit(projected(pf, other)!);
  }
  if (!e1 && axis) {
    // No usable front bond: orient by the first back bond, else by any direction normal to the axis.
    const firstBack = backSubs.map((i) => projected(pb, i)).find((v) => v !== null);
    e1 = unit(firstBack ?? perpendicular(Math.abs(axis[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0], axis));
  }
  const e2 = axis && e1 ? cross(axis, e1) : null;
  const azimuth = (centre: Vec3, i: number): number | null => {
    const v = projected(centre, i);
    if (!v || !e1 || !e2) return null;
    const deg = Math.atan2(dot(v, e2), dot(v, e1)) * DEG;
    const a = deg < 0 ? deg + 360 : deg;
    return a >= 360 - 1e-9 ? 0 : a;
  };
  const describe = (centre: number, pos: Vec3, subs: readonly number[]): NewmanSubstituent[] => {
    const inRing = ringNeighbours(rings, centre);
    return subs.map((atom) => {
      // The fiducial bond defines 12 o'clock: exactly 0, not a rounding residue.
      const az = centre === front && atom === up && e1 ? 0 : azimuth(pos, atom);
      if (az === null && axis) warnings.push({ code: 'collinear-substituent', message: `the bond ${label(mol, centre)}-${label(mol, atom)} lies on the ${bondName} axis: its azimuth and torsions are undefined` });
      return { atom, element: mol.atoms[atom]!.element, azimuthDeg: az, inRing: inRing.has(atom) };
    });
  };
  const frontList = describe(front, pf, frontSubs);
  const backList = describe(back, pb, backSubs);

  const pairs: NewmanPair[] = [];
  for (const x of frontList) {
    for (const y of backList) {
      const t = x.azimuthDeg === null || y.azimuthDeg === null ? null : wrap180(y.azimuthDeg - x.azimuthDeg);
      pairs.push({ front: x.atom, back: y.atom, torsionDeg: t, klynePrelog: t === null ? null : klynePrelog(t), relation: t === null ? null : torsionRelation(t) });
    }
  }
  const defined = pairs.filter((p) => p.torsionDeg !== null).map((p) => Math.abs(p.torsionDeg!));
  const minOffsetDeg = defined.length ? Math.min(...defined) : null;
  const conformation: NewmanConformation | null =
    minOffsetDeg === null ? null : minOffsetDeg <= ECLIPSED_MAX_DEG ? 'eclipsed' : minOffsetDeg >= STAGGERED_MIN_DEG ? 'staggered' : 'intermediate';
  const ringBond = ringNeighbours(rings, front).has(back);
  return {
    front, back,
    frontElement: mol.atoms[front]!.element,
    backElement: mol.atoms[back]!.element,
    up: up ?? null,
    ringBond,
    frontSubstituents: frontList,
    backSubstituents: backList,
    pairs, conformation, minOffsetDeg, warnings,
  };
}
