/**
 * Shared geometry of the round plots (hemisphere maps and the pseudorotation wheel): angles are degrees
 * clockwise from 12 o'clock, radii fractions of the disc radius; y points down as in SVG.
 */

const RAD = Math.PI / 180;

/** Rounds to 2 decimals for path data (-0 → 0). */
export const r2 = (x: number): number => {
  const v = Math.round(x * 100) / 100;
  return v === 0 ? 0 : v;
};

/** A round plot area: centre and radius in scene units. */
export interface Disc {
  readonly cx: number;
  readonly cy: number;
  readonly R: number;
}

/** Scene point at fraction `rho` of the radius and angle `angleDeg` (clockwise from 12 o'clock). */
export function discPoint(disc: Disc, rho: number, angleDeg: number): [number, number] {
  const a = angleDeg * RAD;
  return [disc.cx + disc.R * rho * Math.sin(a), disc.cy - disc.R * rho * Math.cos(a)];
}

/**
 * Path of an annular sector (a wedge when `inner` is 0; a full ring or disc when the sweep is 360°).
 * Absolute commands, 2 decimals.
 */
export function sectorPath(disc: Disc, inner: number, outer: number, startDeg: number, endDeg: number): string {
  const sweep = endDeg - startDeg;
  if (sweep >= 360 - 1e-9) {
    const ring = (rho: number) => {
      const [x0, y0] = discPoint(disc, rho, 0);
      const [x1, y1] = discPoint(disc, rho, 180);
      const r = r2(disc.R * rho);
      return `M${r2(x0)},${r2(y0)}A${r},${r} 0 1 1 ${r2(x1)},${r2(y1)}A${r},${r} 0 1 1 ${r2(x0)},${r2(y0)}Z`;
    };
    return inner > 0 ? ring(outer) + ring(inner) : ring(outer);
  }
  const large = sweep > 180 ? 1 : 0;
  const ro = r2(disc.R * outer);
  const [ax, ay] = discPoint(disc, outer, startDeg);
  const [bx, by] = discPoint(disc, outer, endDeg);
  let d = `M${r2(ax)},${r2(ay)}A${ro},${ro} 0 ${large} 1 ${r2(bx)},${r2(by)}`;
  if (inner > 0) {
    const ri = r2(disc.R * inner);
    const [cx, cy] = discPoint(disc, inner, endDeg);
    const [ex, ey] = discPoint(disc, inner, startDeg);
    d += `L${r2(cx)},${r2(cy)}A${ri},${ri} 0 ${large} 0 ${r2(ex)},${r2(ey)}Z`;
  } else d += `L${r2(disc.cx)},${r2(disc.cy)}Z`;
  return d;
}

/** A full circle as a path (for rims and grid circles drawn as paths). */
export function circlePath(disc: Disc, rho: number): string {
  return sectorPath(disc, 0, rho, 0, 360);
}
