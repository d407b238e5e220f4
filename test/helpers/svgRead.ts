/** Reads drawn bonds back out of an SVG string, the way a script using the semantic markup would. */

export interface DrawnLine {
  readonly cls: string;
  readonly atoms: number[];
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
}

const attr = (tag: string, name: string): string | undefined => new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1];

/** Every `<line>` with its class, 1-based `data-atoms` and coordinates. */
export function readLines(svg: string): DrawnLine[] {
  return [...svg.matchAll(/<line\b[^>]*>/g)].map(([tag]) => ({
    cls: attr(tag, 'class') ?? '',
    atoms: (attr(tag, 'data-atoms') ?? '').split(' ').filter(Boolean).map(Number),
    x1: Number(attr(tag, 'x1')),
    y1: Number(attr(tag, 'y1')),
    x2: Number(attr(tag, 'x2')),
    y2: Number(attr(tag, 'y2')),
  }));
}

/** Azimuth of a drawn line, clockwise from 12 o'clock on the page (SVG y points down), degrees [0, 360). */
export function pageAzimuth(l: DrawnLine): number {
  const a = (Math.atan2(l.x2 - l.x1, -(l.y2 - l.y1)) * 180) / Math.PI;
  return a < 0 ? a + 360 : a;
}

/** Clockwise angle from line a to line b as read off the page, wrapped to (−180, 180]. */
export function clockwiseAngle(a: DrawnLine, b: DrawnLine): number {
  let d = (pageAzimuth(b) - pageAzimuth(a)) % 360;
  if (d <= -180) d += 360;
  if (d > 180) d -= 360;
  return d;
}

/** Angular distance between two angles in degrees, in [0, 180]. */
export function angleGap(a: number, b: number): number {
  const d = Math.abs((((a - b) % 360) + 540) % 360 - 180);
  return d;
}

/** Every `<path>` with its class and `d`. */
export function svgPaths(svg: string): { cls: string; d: string }[] {
  return [...svg.matchAll(/<path\b[^>]*>/g)].map(([tag]) => ({ cls: attr(tag, 'class') ?? '', d: attr(tag, 'd') ?? '' }));
}

/** The axis-aligned rectangles `Mx0,y0Hx1Vy1Hx0Z` of a path's `d` (other sub-paths skipped), corners sorted. */
export function pathRects(d: string): { x0: number; y0: number; x1: number; y1: number }[] {
  return [...d.matchAll(/M(-?[\d.]+),(-?[\d.]+)H(-?[\d.]+)V(-?[\d.]+)H-?[\d.]+Z/g)].map((m) => {
    const [xa, ya, xb, yb] = m.slice(1).map(Number) as [number, number, number, number];
    return { x0: Math.min(xa, xb), y0: Math.min(ya, yb), x1: Math.max(xa, xb), y1: Math.max(ya, yb) };
  });
}
