/** Stroke-only torsion marker: an open circular arc between two azimuths, drawn with d3-path. */
import { pathRound } from 'd3-path';

const RAD = Math.PI / 180;

/**
 * SVG path of the arc of radius `r` about (cx, cy) from azimuth `fromDeg` sweeping `sweepDeg` (positive =
 * clockwise on screen). Azimuths are clockwise from 12 o'clock; d3-path angles are from +x, clockwise in
 * SVG's y-down space, hence the −90° shift. An open arc (not d3-shape's `arc()`, which closes a band when the
 * radii are equal; seen with svg.js 3.2.8).
 * @example torsionArcPath(50, 50, 10, 0, 60) // 'M50,40A10,10,0,0,1,58.66,45'
 */
export function torsionArcPath(cx: number, cy: number, r: number, fromDeg: number, sweepDeg: number, digits = 2): string {
  const a0 = (fromDeg - 90) * RAD;
  const a1 = (fromDeg + sweepDeg - 90) * RAD;
  // pathRound fixes the digits once here, so the SVG never carries float noise.
  const p = pathRound(digits);
  p.arc(cx, cy, r, a0, a1, sweepDeg < 0);
  return p.toString();
}

/** Points along the same arc, for overlap tests (one point every ≤ 10°, both ends included). */
export function torsionArcPoints(cx: number, cy: number, r: number, fromDeg: number, sweepDeg: number): [number, number][] {
  const n = Math.max(2, Math.ceil(Math.abs(sweepDeg) / 10) + 1);
  return Array.from({ length: n }, (_, k) => {
    const a = (fromDeg + (sweepDeg * k) / (n - 1)) * RAD;
    return [cx + r * Math.sin(a), cy - r * Math.cos(a)] as [number, number];
  });
}
