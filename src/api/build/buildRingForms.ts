/**
 * Private to `build`: start geometries for the six-ring forms a plain conformer search misses, made by the
 * inverse Cremer–Pople formula (docs/methods.md#cremer-pople, step 6), and the shape of the minimised result (the same
 * classifier `inspect` uses, so `build` and `inspect` always agree on what a form is called).
 */
import type { Vec3 } from '../../model/molecule.js';
import { cremerPople, displacementsFromModes, meanPlane, sixRingModes } from '../../geometry/cremerPople.js';
import { add, cross, dot, scale, sub, unit } from '../../geometry/vec3.js';
import { classifyRing } from '../../analysis/ringShape.js';
import type { RingShape } from '../../analysis/ringForms.js';

/** One ring form to build: a target on the Cremer–Pople sphere. */
export interface RingTarget {
  /** `flipped-chair`, `twist-boat` or `boat`: what the start geometry is meant to be. */
  readonly kind: 'flipped-chair' | 'twist-boat' | 'boat';
  readonly thetaDeg: number;
  readonly phiDeg: number;
  /** Puckering amplitude of the start, Å. */
  readonly Q: number;
}

/** Six-ring shape label, as `classifyRing` gives it. */
export type SixRingShape = RingShape;

const SIX_LOCANTS = ['1', '2', '3', '4', '5', '6'];

/** Q of the boat and twist-boat starts: the model value of docs/methods.md#cremer-pople-checks (derived), Å. */
const BOAT_Q = 0.76;

/**
 * The starts tried for one ring: the flipped chair (θ → 180 − θ, same Q and φ), twist-boats at φ = 30, 90, …,
 * 330 and boats at φ = 0, 120, 240 (θ = 90). Boats are saddle points, so those starts usually relax to a
 * twist-boat; `build` says so in its notes.
 */
export function ringTargets(current: { Q: number; thetaDeg: number; phiDeg: number | null }): RingTarget[] {
  const targets: RingTarget[] = [
    { kind: 'flipped-chair', thetaDeg: 180 - current.thetaDeg, phiDeg: current.phiDeg ?? 0, Q: current.Q },
  ];
  for (const phiDeg of [30, 90, 150, 210, 270, 330]) targets.push({ kind: 'twist-boat', thetaDeg: 90, phiDeg, Q: BOAT_Q });
  for (const phiDeg of [0, 120, 240]) targets.push({ kind: 'boat', thetaDeg: 90, phiDeg, Q: BOAT_Q });
  return targets;
}

/**
 * Reshapes ring `ring` (atom indices in bonded order) of `coords` (3 per atom) to the target displacements:
 * each ring atom moves along the mean-plane normal to its target height. A part of the molecule hanging from
 * one ring atom turns and moves rigidly with that atom's local frame (the bisector of its two ring bonds and
 * the normal of their plane), so each exocyclic bond keeps its face of the ring and a sensible angle to the
 * ring bonds; a part bonded to several ring atoms (a fused ring) moves by the mean of their moves.
 * Returns new coordinates, or `null` for a degenerate ring.
 */
export function reshapeRing(
  coords: Float64Array,
  ring: readonly number[],
  neighbors: readonly (readonly number[])[],
  target: RingTarget,
): Float64Array | null {
  const plane = meanPlane(ring.map((i) => point(coords, i)));
  if (!plane) return null;
  const goal = displacementsFromModes(ring.length, sixRingModes(target.Q, target.thetaDeg, target.phiDeg));
  const out = coords.slice();
  ring.forEach((atom, j) => {
    const dz = goal[j]! - plane.z[j]!;
    for (let d = 0; d < 3; d++) out[3 * atom + d]! += dz * plane.normal[d]!;
  });
  const frames = ring.map((_, j) => {
    const before = localFrame(coords, ring, j);
    const after = localFrame(out, ring, j);
    return before && after ? { before, after } : null;
  });
  for (const { atoms, anchors } of branches(ring, neighbors)) {
    const j = ring.indexOf(anchors[0]!);
    const pair = anchors.length === 1 ? frames[j] : null;
    for (const atom of atoms) {
      const p = point(coords, atom);
      let q: Vec3;
      if (pair) {
        // local coordinates in the old frame of the anchor, placed in its new frame
        const rel = sub(p, point(coords, anchors[0]!));
        const [a, b, c] = pair.before.map((e) => dot(rel, e)) as [number, number, number];
        const [e1, e2, e3] = pair.after;
        q = add(point(out, anchors[0]!), add(scale(e1, a), add(scale(e2, b), scale(e3, c))));
      } else {
        const shift = anchors.map((x) => sub(point(out, x), point(coords, x)));
        q = add(p, scale(shift.reduce(add), 1 / shift.length));
      }
      out.set(q, 3 * atom);
    }
  }
  return out;
}

/** Orthonormal frame at ring atom j: outward bisector of its ring bonds, plane normal, their cross product. */
function localFrame(coords: Float64Array, ring: readonly number[], j: number): [Vec3, Vec3, Vec3] | null {
  const n = ring.length;
  const c = point(coords, ring[j]!);
  const a = sub(point(coords, ring[(j + n - 1) % n]!), c);
  const b = sub(point(coords, ring[(j + 1) % n]!), c);
  const e1 = unit(scale(add(unit(a) ?? a, unit(b) ?? b), -1));
  const e2 = unit(cross(a, b));
  if (!e1 || !e2) return null;
  return [e1, e2, cross(e1, e2)];
}

/** Connected parts of the molecule once the ring atoms are removed, each with the ring atoms it is bonded to. */
function branches(
  ring: readonly number[],
  neighbors: readonly (readonly number[])[],
): { atoms: number[]; anchors: number[] }[] {
  const inRing = new Set(ring);
  const seen = new Uint8Array(neighbors.length);
  const parts: { atoms: number[]; anchors: number[] }[] = [];
  for (const start of ring.flatMap((r) => neighbors[r]!.filter((k) => !inRing.has(k)))) {
    if (seen[start]) continue;
    seen[start] = 1;
    const atoms: number[] = [];
    const anchors = new Set<number>();
    const stack = [start];
    while (stack.length > 0) {
      const i = stack.pop()!;
      atoms.push(i);
      for (const k of neighbors[i]!) {
        if (inRing.has(k)) anchors.add(k);
        else if (!seen[k]) {
          seen[k] = 1;
          stack.push(k);
        }
      }
    }
    parts.push({ atoms, anchors: [...anchors] });
  }
  return parts;
}

/**
 * Shape of a six-ring (atoms in bonded order) with its Cremer–Pople θ, φ and Q: the shape `classifyRing` gives
 * (nearest canonical form, docs/methods.md#shape-assignment).
 */
export function sixRingShape(coords: Float64Array, ring: readonly number[]): {
  shape: SixRingShape;
  thetaDeg: number | null;
  phiDeg: number | null;
  Q: number;
} {
  const p = cremerPople(ring.map((i) => point(coords, i)));
  if (!p || p.thetaDeg === null) return { shape: 'planar', thetaDeg: null, phiDeg: null, Q: 0 };
  const { Q, thetaDeg, phiDeg } = p;
  return { shape: classifyRing(p, SIX_LOCANTS).shape, thetaDeg, phiDeg, Q };
}

/** Ring atoms in bonded order, starting from the lowest index and walking towards its lower-numbered neighbour. */
export function ringWalk(atoms: readonly number[], neighbors: readonly (readonly number[])[]): number[] | null {
  const members = new Set(atoms);
  const start = Math.min(...atoms);
  const order = [start];
  let prev = -1;
  let cur = start;
  for (let step = 1; step < atoms.length; step++) {
    const next = neighbors[cur]!.filter((k) => members.has(k) && k !== prev && !order.includes(k));
    if (next.length === 0) return null;
    prev = cur;
    cur = Math.min(...next);
    order.push(cur);
  }
  return neighbors[cur]!.includes(start) ? order : null;
}

function point(coords: Float64Array, i: number): Vec3 {
  return [coords[3 * i]!, coords[3 * i + 1]!, coords[3 * i + 2]!];
}
