/** Small 3-vector helpers on readonly tuples. Pure; never mutate inputs. */
import type { Vec3 } from '../model/molecule.js';

export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const scale = (a: Vec3, s: number): Vec3 => [a[0] * s, a[1] * s, a[2] * s];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const norm = (a: Vec3): number => Math.hypot(a[0], a[1], a[2]);
export const distance = (a: Vec3, b: Vec3): number => norm(sub(a, b));

/** Unit vector along `a`; `null` when `a` is shorter than `eps`. */
export function unit(a: Vec3, eps = 1e-12): Vec3 | null {
  const n = norm(a);
  return n < eps ? null : scale(a, 1 / n);
}

/** Component of `v` perpendicular to the unit vector `axis`. */
export function perpendicular(v: Vec3, axis: Vec3): Vec3 {
  return sub(v, scale(axis, dot(v, axis)));
}

/** Centroid of a list of points. */
export function centroid(points: readonly Vec3[]): Vec3 {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const p of points) {
    x += p[0];
    y += p[1];
    z += p[2];
  }
  const n = points.length || 1;
  return [x / n, y / n, z / n];
}

/** Angle between two vectors in radians, in [0, π]; robust near 0 and π. */
export function angleBetween(a: Vec3, b: Vec3): number {
  return Math.atan2(norm(cross(a, b)), dot(a, b));
}

export const RAD = Math.PI / 180;
export const DEG = 180 / Math.PI;

/** Wraps degrees into (−180, 180]. */
export function wrap180(deg: number): number {
  let x = deg % 360;
  if (x <= -180) x += 360;
  else if (x > 180) x -= 360;
  return x;
}

/** Wraps degrees into [0, 360); values within 1e-9 of 360 become 0. */
export function wrap360(deg: number): number {
  const x = ((deg % 360) + 360) % 360;
  return x > 360 - 1e-9 ? 0 : x;
}
