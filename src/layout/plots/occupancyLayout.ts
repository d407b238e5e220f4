/**
 * `occupancy`: one horizontal bar per ring shape, longest first, its length the fraction of analysed frames,
 * with the percentage written after it. Bars take the shape's band role, so colours match the time series.
 */
import { formatTick, niceTicks } from './plotTicks.js';
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** Options of `layoutOccupancy`. */
export interface OccupancyOptions {
  readonly metrics?: SceneMetrics;
  readonly measure?: TextMeasure;
  /** Words naming the ring in the title. Default `ring`. */
  readonly ringLabel?: string;
  /** Frames analysed, for the title. Default none. */
  readonly frames?: number;
}

/** Percentage text: one decimal, or "<0.1" for tiny non-zero fractions. */
export function percentText(fraction: number): string {
  const p = fraction * 100;
  return p > 0 && p < 0.05 ? '<0.1%' : `${p.toFixed(1)}%`;
}

/**
 * @example layoutOccupancy({ chair: 0.8, 'twist-boat': 0.2 })
 */
export function layoutOccupancy(occupancy: Readonly<Record<string, number>>, options: OccupancyOptions = {}): Scene {
  const m = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const tick = textStyle(m, 'tick-label');
  const label = textStyle(m, 'panel-title');
  const rows = Object.entries(occupancy).sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1));
  const nameW = Math.max(0, ...rows.map(([s]) => measure(s, label)));
  const left = m.margin + nameW + m.gap * 2;
  const BW = tick.fontSize * 30;
  const rowH = label.fontSize * 1.9;
  const top = m.margin + label.fontSize * 0.5;
  const items: SceneItem[] = [];
  const sx = (f: number) => left + f * BW;
  const bottom = top + rows.length * rowH;
  const ticks = niceTicks(0, 1, 5);
  for (const t of ticks) items.push({ type: 'line', role: 'grid', x1: sx(t), y1: top, x2: sx(t), y2: bottom });
  rows.forEach(([shape, f], i) => {
    const y = top + i * rowH + rowH * 0.18;
    const h = rowH * 0.64;
    const w = Math.max(f * BW, f > 0 ? 0.5 : 0);
    const d = `M${r2(left)},${r2(y)}h${r2(w)}v${r2(h)}h${r2(-w)}Z`;
    items.push({ type: 'path', role: `bar-${shape}`, d }, { type: 'path', role: 'bar-frame', d });
    items.push({ type: 'text', role: 'panel-title', x: left - m.gap * 2, y: y + h / 2 + label.fontSize * 0.35, text: shape, anchor: 'end', ...label });
    items.push({ type: 'text', role: 'tick-label', x: left + w + m.gap * 1.5, y: y + h / 2 + tick.fontSize * 0.35, text: percentText(f), anchor: 'start', ...tick });
  });
  items.push({ type: 'path', role: 'axis', d: `M${r2(left)},${r2(top)}V${r2(bottom)}H${r2(left + BW)}` });
  for (const t of ticks) {
    items.push({ type: 'line', role: 'axis', x1: sx(t), y1: bottom, x2: sx(t), y2: bottom + m.gap });
    items.push({ type: 'text', role: 'tick-label', x: sx(t), y: bottom + m.gap + tick.fontSize, text: `${formatTick(t * 100)}`, anchor: 'middle', ...tick });
  }
  const y = bottom + m.gap + tick.fontSize * 2.4;
  items.push({ type: 'text', role: 'panel-title', x: left + BW / 2, y, text: 'share of analysed frames (%)', anchor: 'middle', ...label });
  const pctW = measure('100.0%', tick);
  return {
    kind: 'occupancy',
    width: left + BW + m.gap * 1.5 + pctW + m.margin,
    height: y + label.fontSize * 0.4 + m.margin,
    title: `Ring shape occupancy of ${options.ringLabel ?? 'ring'}${options.frames === undefined ? '' : ` over ${options.frames} frames`}`,
    desc: `Fraction of analysed frames in each ring shape: ${rows.map(([s, f]) => `${s} ${percentText(f)}`).join(', ')}.`,
    items,
  };
}

const r2 = (v: number) => {
  const x = Math.round(v * 100) / 100;
  return x === 0 ? 0 : x;
};
