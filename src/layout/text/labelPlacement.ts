/**
 * Label placement without overlaps: axis-aligned text boxes tested against other boxes, line segments and
 * circle outlines; the first free candidate position wins (candidates are ordered by preference).
 */

export interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

export interface Segment {
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
}

export interface Ring {
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
}

/** What a new label must keep clear of. */
export interface Obstacles {
  readonly boxes: Box[];
  readonly segments: Segment[];
  readonly rings: Ring[];
}

export const grow = (b: Box, d: number): Box => ({ x0: b.x0 - d, y0: b.y0 - d, x1: b.x1 + d, y1: b.y1 + d });

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Parameter t along `a` where it properly crosses `b` (both interiors, ends trimmed by 2 %), or null. */
export function segmentCrossing(a: Segment, b: Segment): number | null {
  const [rx, ry] = [a.x2 - a.x1, a.y2 - a.y1];
  const [sx, sy] = [b.x2 - b.x1, b.y2 - b.y1];
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-9) return null;
  const t = ((b.x1 - a.x1) * sy - (b.y1 - a.y1) * sx) / den;
  const u = ((b.x1 - a.x1) * ry - (b.y1 - a.y1) * rx) / den;
  return t > 0.02 && t < 0.98 && u > 0.02 && u < 0.98 ? t : null;
}

/** True when the segment passes through the box interior (Liang–Barsky clipping). */
export function segmentHitsBox(s: Segment, b: Box): boolean {
  const dx = s.x2 - s.x1;
  const dy = s.y2 - s.y1;
  let t0 = 0;
  let t1 = 1;
  const clip = (p: number, q: number): boolean => {
    if (p === 0) return q > 0;
    const r = q / p;
    if (p < 0) {
      if (r > t1) return false;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return false;
      if (r < t1) t1 = r;
    }
    return true;
  };
  return clip(-dx, s.x1 - b.x0) && clip(dx, b.x1 - s.x1) && clip(-dy, s.y1 - b.y0) && clip(dy, b.y1 - s.y1) && t0 < t1;
}

/** True when the circle outline (radius r) passes through the box. */
export function ringHitsBox(c: Ring, b: Box): boolean {
  const nx = Math.max(b.x0, Math.min(c.cx, b.x1));
  const ny = Math.max(b.y0, Math.min(c.cy, b.y1));
  const near = Math.hypot(nx - c.cx, ny - c.cy);
  const far = Math.max(Math.hypot(b.x0 - c.cx, b.y0 - c.cy), Math.hypot(b.x1 - c.cx, b.y0 - c.cy), Math.hypot(b.x0 - c.cx, b.y1 - c.cy), Math.hypot(b.x1 - c.cx, b.y1 - c.cy));
  return near <= c.r && far >= c.r;
}

/** True when `box` (already grown by the clearance) touches nothing in `obstacles`. */
export function isFree(box: Box, obstacles: Obstacles): boolean {
  return (
    !obstacles.boxes.some((b) => boxesOverlap(box, b)) &&
    !obstacles.segments.some((s) => segmentHitsBox(s, box)) &&
    !obstacles.rings.some((r) => ringHitsBox(r, box))
  );
}

/**
 * Index of the first candidate box that, grown by `clearance`, is free of the obstacles; the last candidate
 * when none is (callers end their lists with a far-out fallback).
 */
export function firstFree(candidates: readonly Box[], obstacles: Obstacles, clearance: number): number {
  const i = candidates.findIndex((b) => isFree(grow(b, clearance), obstacles));
  return i < 0 ? candidates.length - 1 : i;
}

/**
 * The first candidate box that, grown by `clearance`, is free of the obstacles; the last one when none is.
 * Takes candidates made on demand, so a label placed at once costs one test.
 */
export function firstFreeOf(candidates: Iterable<Box>, obstacles: Obstacles, clearance: number): Box {
  let last: Box | undefined;
  for (const b of candidates) {
    if (isFree(grow(b, clearance), obstacles)) return b;
    last = b;
  }
  if (!last) throw new Error('firstFreeOf: no candidates');
  return last;
}

/**
 * Distance from a box centre to its edge along the unit direction (ux, uy), for a box of half sizes hw, hh:
 * puts a label just beyond a bond end in any direction.
 */
export function reachToEdge(hw: number, hh: number, ux: number, uy: number): number {
  const tx = Math.abs(ux) < 1e-12 ? Infinity : hw / Math.abs(ux);
  const ty = Math.abs(uy) < 1e-12 ? Infinity : hh / Math.abs(uy);
  return Math.min(tx, ty);
}
