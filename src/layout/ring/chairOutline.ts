/**
 * The stylised chair outline a chemist draws by hand: a fixed 2D figure, not a projection. Six ring bonds of one
 * length (the unit), a centre of inversion (so the three pairs of opposite bonds are parallel), one tip a clear
 * peak and the other a clear valley, and no ring bond near horizontal. Axial bonds are vertical; equatorial bonds
 * are parallel to the ring bonds once removed (the two bonds parallel to each other by inversion).
 *
 * Construction [common practice, no source; numbers chosen by eye on rendered figures]: the three bond directions
 * are e₁ (peak tip → its back neighbour, TIP_DEG below horizontal), e₂ (the long back edge, EDGE_DEG above
 * horizontal) and e₃ (back edge → valley tip, STEEP_DEG below). With unit e₁, e₂, e₃ the first vertex is
 * −(e₁ + e₂ + e₃)/2 and the rest follow by adding e₁, e₂ and then by inversion. TIP_DEG > EDGE_DEG moves the two
 * inner vertices apart, so an inner axial bond crosses the far long edge about half a bond from either end (clear
 * of a ring-O label there). The family is `right-peak` and its left–right mirror image `right-valley` (same
 * size and angles), used for the two chairs of a ring flip.
 *
 * Coordinates are screen units (ring bond = 1), y pointing down as in SVG; vertices are listed clockwise on the
 * screen, so ring atom j sits at vertex (start + j) mod 6 and a ring numbered clockwise seen from its +n side is
 * drawn clockwise (turned, never mirrored: the mirror outline gets its own clockwise vertex list).
 */

/** The two outlines of the family: the right-hand tip is a peak or a valley. */
export type ChairOutlineKind = 'right-peak' | 'right-valley';

/** One vertex of an outline: screen point (unit bond, y down), up or down, and its depth (+1 front, −1 back). */
export interface OutlineVertex {
  readonly x: number;
  readonly y: number;
  readonly up: boolean;
  readonly near: number;
}

/** Angle of the tip bonds e₁ from horizontal, degrees (sin ≥ 0.3: the peak stands 0.37 bond above its neighbour). */
export const TIP_DEG = 22;
/** Angle of the long edges e₂ from horizontal, degrees (the rule asks for more than 10°). */
export const EDGE_DEG = 12;
/** Angle of the steep ring bonds e₃ from horizontal, degrees; with the two above, width:height ≈ 2.26. */
export const STEEP_DEG = 62;
/** Length of every substituent bond as a fraction of the ring bond. */
export const SUBSTITUENT_FRACTION = 0.8;

const RAD = Math.PI / 180;

/**
 * The six vertices of an outline, clockwise on screen; index 0 is the right-hand tip.
 * @example chairOutline('right-valley')[0] // the right tip, a valley: { up: false, … }
 */
export function chairOutline(kind: ChairOutlineKind): readonly OutlineVertex[] {
  // y up while building; right-peak listed counter-clockwise: R, BR, BL, L, FL, FR
  const e1 = [-Math.cos(TIP_DEG * RAD), -Math.sin(TIP_DEG * RAD)], e2 = [-Math.cos(EDGE_DEG * RAD), Math.sin(EDGE_DEG * RAD)], e3 = [-Math.cos(STEEP_DEG * RAD), -Math.sin(STEEP_DEG * RAD)];
  const v0 = [-(e1[0]! + e2[0]! + e3[0]!) / 2, -(e1[1]! + e2[1]! + e3[1]!) / 2];
  const v1 = [v0[0]! + e1[0]!, v0[1]! + e1[1]!];
  const v2 = [v1[0]! + e2[0]!, v1[1]! + e2[1]!];
  const ccw = [v0, v1, v2, [-v0[0]!, -v0[1]!], [-v1[0]!, -v1[1]!], [-v2[0]!, -v2[1]!]];
  const near = [0, -1, -1, 0, 1, 1];
  const up = [true, false, true, false, true, false];
  // clockwise from the right tip: R, FR, FL, L, BL, BR (indices 0, 5, 4, 3, 2, 1)
  const order = [0, 5, 4, 3, 2, 1];
  if (kind === 'right-peak') return order.map((i) => ({ x: ccw[i]![0]!, y: -ccw[i]![1]!, up: up[i]!, near: near[i]! }));
  // mirror image in x; the mirror of the left tip (a valley) is the new right tip, listed clockwise again
  const mirrored = [3, 4, 5, 0, 1, 2];
  return mirrored.map((i) => ({ x: -ccw[i]![0]!, y: -ccw[i]![1]!, up: up[i]!, near: near[i]! }));
}

/** Outline whose right tip matches an atom that is up (`right-peak`) or down (`right-valley`). */
export function outlineFor(rightTipUp: boolean): ChairOutlineKind {
  return rightTipUp ? 'right-peak' : 'right-valley';
}

/**
 * Unit direction of the equatorial bond at vertex j of an outline (vertices clockwise): parallel to the ring
 * bonds once removed, (j+1, j+2) and (j+4, j+5), pointing away from the ring centre.
 */
export function equatorialDirection(vertices: readonly { x: number; y: number }[], j: number): { x: number; y: number } {
  const a = vertices[(j + 1) % 6]!, b = vertices[(j + 2) % 6]!;
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  let d = { x: (b.x - a.x) / len, y: (b.y - a.y) / len };
  const cx = vertices.reduce((t, v) => t + v.x, 0) / 6, cy = vertices.reduce((t, v) => t + v.y, 0) / 6;
  const v = vertices[j]!;
  if (d.x * (v.x - cx) + d.y * (v.y - cy) < 0) d = { x: -d.x, y: -d.y };
  return d;
}
