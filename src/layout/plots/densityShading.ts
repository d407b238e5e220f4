/**
 * Log-scaled shading levels for 2D histograms: a cell with count c gets level
 * ceil(L · ln(1 + c) / ln(1 + cmax)) of L, so a cell visited once is still visible next to one visited a
 * million times. Cells of one level share a role (`density-1` … `density-L`) and are drawn as one path.
 */
import type { SceneItem } from '../scene.js';

/** Number of shading levels. */
export const DENSITY_LEVELS = 6;

/** Level (1…L) of a count, given the largest count. */
export function densityLevel(count: number, maxCount: number, levels = DENSITY_LEVELS): number {
  if (count <= 0) return 0;
  if (maxCount <= 1) return levels;
  return Math.max(1, Math.min(levels, Math.ceil((levels * Math.log1p(count)) / Math.log1p(maxCount))));
}

/** Smallest count that reaches each level 1…L (for the legend). */
export function levelThresholds(maxCount: number, levels = DENSITY_LEVELS): number[] {
  const out: number[] = [];
  for (let l = 1; l <= levels; l++) {
    if (maxCount <= 1) out.push(1);
    else out.push(Math.max(1, Math.floor(Math.expm1(((l - 1) / levels) * Math.log1p(maxCount))) + 1));
  }
  return out;
}

/** Joins path pieces per level into one `path` item per non-empty level. */
export function levelPaths(pieces: readonly string[][], cls = 'density'): SceneItem[] {
  return pieces.flatMap((parts, i) => (parts.length ? [{ type: 'path' as const, role: `${cls}-${i + 1}`, d: parts.join('') }] : []));
}
