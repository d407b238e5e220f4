/**
 * The ring's own viewing frame (docs/methods.md#chair-drawing "how to draw from coordinates" [D]): n = the Cremer–Pople
 * normal, h = a unit in-plane direction, viewer on the +n side at elevation e; forward f = cos e·h − sin e·n,
 * up u = sin e·h + cos e·n, right r = f × u; screen x = p·r, y_svg = −(p·u). A proper rotation, never a mirror,
 * so the ring reads clockwise on screen exactly when it reads clockwise from +n.
 */
import type { Vec3 } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { cross, dot, scale, sub, unit, add, RAD } from '../../geometry/vec3.js';

/** Orthonormal viewing frame about a ring centre. */
export interface RingViewFrame {
  readonly centre: Vec3;
  readonly normal: Vec3;
  /** Into the screen (away from the viewer). */
  readonly forward: Vec3;
  readonly up: Vec3;
  readonly right: Vec3;
}

/** A point on screen (Å, y down) with its nearness to the viewer (Å, larger = nearer). */
export interface ViewPoint {
  readonly x: number;
  readonly y: number;
  readonly near: number;
}

/**
 * Viewing frame from the ring normal, an in-plane direction `toward` (any vector; its in-plane part is used)
 * and the elevation in degrees. Null when `toward` is parallel to the normal.
 * @example ringViewFrame(ring.centre, ring.normal, midpointC1C2MinusCentre, 20)
 */
export function ringViewFrame(centre: Vec3, normal: Vec3, toward: Vec3, elevationDeg: number): RingViewFrame | null {
  const h = unit(sub(toward, scale(normal, dot(toward, normal))));
  if (!h) return null;
  const e = elevationDeg * RAD;
  const forward = add(scale(h, Math.cos(e)), scale(normal, -Math.sin(e)));
  const up = add(scale(h, Math.sin(e)), scale(normal, Math.cos(e)));
  return { centre, normal, forward, up, right: cross(forward, up) };
}

/** Screen position of a 3D point in the frame (relative to the ring centre). */
export function projectPoint(frame: RingViewFrame, p: Vec3): ViewPoint {
  const d = sub(p, frame.centre);
  return { x: dot(d, frame.right), y: -dot(d, frame.up), near: -dot(d, frame.forward) };
}

/** Signed shoelace area of a screen polygon (x, y_svg): positive when it runs clockwise on screen. */
export function shoelaceArea(points: readonly { readonly x: number; readonly y: number }[]): number {
  let s = 0;
  points.forEach((p, i) => {
    const q = points[(i + 1) % points.length]!;
    s += p.x * q.y - q.x * p.y;
  });
  return s / 2;
}

/** The elevation as given, or a clear error when it is not a number of degrees in [−90, 90]. */
export function checkElevation(elevationDeg: number): number {
  if (!Number.isFinite(elevationDeg) || elevationDeg < -90 || elevationDeg > 90) {
    throw usageError('bad-option', `elevation must be a number of degrees from -90 to 90, got ${elevationDeg}`);
  }
  return elevationDeg;
}
