/**
 * The marks of one time-series panel, chosen by the length of the run. Up to `POINT_LIMIT` frames: one dot per
 * frame, joined by a line only between consecutive frames (a gap in the frames, or a wrapping angle jumping
 * across 0/360, leaves the line open, so sparse frames are never bridged). Longer runs: the buckets are summed
 * into pixel-wide columns and each column is shaded per value bin on the log scale of the pucker map, so a
 * frame visited once stays visible beside a stretch visited ten thousand times, and an angle that wraps still
 * reads as where it spends its time. Pure: returns Scene items.
 */
import type { SeriesBinning, SeriesBucket } from '../../analysis/seriesBuckets.js';
import type { SceneItem } from '../scene.js';
import { densityLevel, DENSITY_LEVELS, levelPaths } from './densityShading.js';

/** Most frames drawn one by one; longer runs are drawn as column densities. */
export const POINT_LIMIT = 400;

/** Plot geometry of one panel: x and y maps, the y range shown, and the dot radius. */
export interface PanelFrame {
  readonly xOf: (frame: number) => number;
  readonly yOf: (value: number) => number;
  readonly min: number;
  readonly max: number;
  readonly left: number;
  readonly width: number;
  readonly dotR: number;
}

/** True when the run is short enough to draw every frame (one sample per bucket, at most POINT_LIMIT). */
export function drawsPoints(buckets: readonly SeriesBucket[]): boolean {
  return buckets.length <= POINT_LIMIT && buckets.every((b) => b.samples === 1);
}

/** Smallest frame step between neighbouring buckets (the stride of the run), 1 for a single frame. */
export function frameStep(buckets: readonly SeriesBucket[]): number {
  let step = Infinity;
  for (let i = 1; i < buckets.length; i++) step = Math.min(step, buckets[i]!.xFirst - buckets[i - 1]!.xLast);
  return Number.isFinite(step) && step > 0 ? step : 1;
}

const r2 = (v: number) => {
  const x = Math.round(v * 100) / 100;
  return x === 0 ? 0 : x;
};

/** Dots and joining lines of series `s` (one sample per bucket); `role` names the dots, `role-line` nothing. */
export function pointMarks(buckets: readonly SeriesBucket[], s: number, f: PanelFrame, wraps: boolean, dotRole: string, lineRole: string | null): SceneItem[] {
  const step = frameStep(buckets);
  const half = (f.max - f.min) / 2;
  const dots: string[] = [];
  const lines: string[] = [];
  let prev: { x: number; v: number; frame: number } | null = null;
  const d = f.dotR;
  for (const b of buckets) {
    const r = b.ranges[s];
    if (!r) {
      prev = null;
      continue;
    }
    const v = r[0];
    const x = f.xOf(b.xFirst);
    const y = f.yOf(v);
    dots.push(`M${r2(x - d)},${r2(y)}a${r2(d)},${r2(d)} 0 1,0 ${r2(2 * d)},0a${r2(d)},${r2(d)} 0 1,0 ${r2(-2 * d)},0Z`);
    if (lineRole && prev && b.xFirst - prev.frame <= step * 1.0001 && !(wraps && Math.abs(v - prev.v) > half)) {
      lines.push(`M${r2(f.xOf(prev.frame))},${r2(f.yOf(prev.v))}L${r2(x)},${r2(y)}`);
    }
    prev = { x, v, frame: b.xFirst };
  }
  const items: SceneItem[] = [];
  if (lineRole && lines.length) items.push({ type: 'path', role: lineRole, d: lines.join('') });
  if (dots.length) items.push({ type: 'path', role: dotRole, d: dots.join('') });
  return items;
}

/** Column count for a panel `width` wide: about one column per 1.5 units, never more than the buckets. */
export function columnCount(buckets: number, width: number): number {
  return Math.max(1, Math.min(buckets, Math.floor(width / 1.5)));
}

/** Per-column histograms of series `s`: the buckets summed into `n` equal x intervals from `x0` to `x1`. */
export function columnHistograms(buckets: readonly SeriesBucket[], s: number, n: number, x0: number, x1: number): (number[] | null)[] {
  const cols: (number[] | null)[] = Array.from({ length: n }, () => null);
  const span = x1 - x0 || 1;
  for (const b of buckets) {
    const h = b.histograms[s];
    if (!h || h.length === 0) continue;
    const c = Math.min(n - 1, Math.max(0, Math.floor((((b.xFirst + b.xLast) / 2 - x0) / span) * n)));
    const col = (cols[c] ??= new Array<number>(h.length).fill(0));
    for (let k = 0; k < h.length; k++) col[k]! += h[k]!;
  }
  return cols;
}

/** Largest cell count over columns. */
export function maxCell(cols: readonly (readonly number[] | null)[]): number {
  let m = 0;
  for (const c of cols) if (c) for (const v of c) if (v > m) m = v;
  return m;
}

/**
 * Shaded cells of column histograms: role `${cls}-L` per density level (log scale against `maxCount`), or one
 * role `cls` for every non-empty cell when `flat`. Runs of equal level in a column become one rectangle.
 */
export function densityMarks(cols: readonly (readonly number[] | null)[], bin: SeriesBinning, f: PanelFrame, maxCount: number, cls: string, flat = false): SceneItem[] {
  const n = cols.length;
  const w = (bin.max - bin.min) / bin.bins;
  const pieces: string[][] = Array.from({ length: flat ? 1 : DENSITY_LEVELS }, () => []);
  cols.forEach((col, c) => {
    if (!col) return;
    const xa = f.left + (c / n) * f.width;
    const xb = f.left + ((c + 1) / n) * f.width;
    let k = 0;
    while (k < col.length) {
      const level = col[k]! > 0 ? (flat ? 1 : densityLevel(col[k]!, maxCount)) : 0;
      let j = k;
      while (j + 1 < col.length && (col[j + 1]! > 0 ? (flat ? 1 : densityLevel(col[j + 1]!, maxCount)) : 0) === level) j++;
      if (level > 0) {
        const lo = Math.max(f.min, bin.min + k * w);
        const hi = Math.min(f.max, bin.min + (j + 1) * w);
        if (hi > lo) {
          const ya = f.yOf(hi);
          const yb = f.yOf(lo);
          pieces[level - 1]!.push(`M${r2(xa)},${r2(ya)}H${r2(xb)}V${r2(yb)}H${r2(xa)}Z`);
        }
      }
      k = j + 1;
    }
  });
  if (flat) return pieces[0]!.length ? [{ type: 'path', role: cls, d: pieces[0]!.join('') }] : [];
  return levelPaths(pieces, cls);
}
