/**
 * `time-series`: puckering coordinates against frame or time, down-sampled to min/max per bucket (a few
 * hundred columns whatever the number of frames), over background bands that show the majority ring shape of
 * each stretch. One panel per series, stacked, sharing the x axis; angles that wrap (φ, P) break the line
 * where they jump across 0/360.
 */
import { line } from 'd3-shape';
import type { SeriesBucket } from '../../analysis/seriesBuckets.js';
import { formatTick, niceTicks, tickFormatter } from './plotTicks.js';
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** One plotted series (index into the bucket ranges). */
export interface SeriesSpec {
  /** Axis label with unit, e.g. `θ (°)`. */
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly ticks: readonly number[];
  /** True for angles on a circle (φ, P): the line breaks where it jumps by more than half the range. */
  readonly wraps: boolean;
}

/** Options of `layoutTimeSeries`. */
export interface TimeSeriesOptions {
  readonly metrics?: SceneMetrics;
  readonly measure?: TextMeasure;
  /** Time between file frames and its unit; without it x is the frame number. Default none. */
  readonly timestep?: { readonly value: number; readonly unit: string };
  /** Words naming the ring in the title. Default `ring`. */
  readonly ringLabel?: string;
}

type Pt = [number, number] | null;

function seriesPoints(buckets: readonly SeriesBucket[], s: number, spec: SeriesSpec, xs: (b: SeriesBucket) => number, ys: (v: number) => number): Pt[] {
  const pts: Pt[] = [];
  const half = (spec.max - spec.min) / 2;
  let prev: [number, number] | null = null;
  for (const b of buckets) {
    const r = b.ranges[s];
    if (!r) {
      if (pts.length && pts[pts.length - 1] !== null) pts.push(null);
      prev = null;
      continue;
    }
    if (spec.wraps && r[1] - r[0] > half) {
      // the angle crossed 0/360 inside this column: its min and max say nothing, leave a gap
      if (pts.length && pts[pts.length - 1] !== null) pts.push(null);
      prev = null;
      continue;
    }
    if (spec.wraps && prev && (r[0] - prev[1] > half || prev[0] - r[1] > half)) pts.push(null);
    const x = xs(b);
    pts.push([x, ys(r[0])], [x, ys(r[1])]);
    prev = r;
  }
  return pts;
}

/**
 * Scene of stacked series panels with shape bands; `categories` names each bucket category (shape words).
 * @example layoutTimeSeries(buckets.buckets(), [thetaSpec, phiSpec], shapes)
 */
export function layoutTimeSeries(
  buckets: readonly SeriesBucket[],
  series: readonly SeriesSpec[],
  categories: readonly string[],
  options: TimeSeriesOptions = {},
): Scene {
  const m = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const tick = textStyle(m, 'tick-label');
  const title = textStyle(m, 'panel-title');
  const dt = options.timestep;
  const xOf = (frame: number) => (dt ? (frame - 1) * dt.value : frame);
  const first = buckets[0]?.xFirst ?? 1;
  const last = buckets[buckets.length - 1]?.xLast ?? 1;
  const x0 = xOf(first);
  const x1 = last > first ? xOf(last) : xOf(first + 1);
  const yLabelW = Math.max(...series.flatMap((s) => s.ticks.map((t) => measure(formatTick(t), tick))));
  const left = m.margin + yLabelW + m.gap * 2;
  const PW = tick.fontSize * 52;
  const PH = tick.fontSize * 11;
  const gapY = title.fontSize * 2.2;
  const sx = (v: number) => left + ((v - x0) / (x1 - x0)) * PW;
  const top0 = m.margin + title.fontSize * 1.3;
  const items: SceneItem[] = [];
  const panelTop = (i: number) => top0 + i * (PH + gapY);
  const bottom = panelTop(series.length - 1) + PH;
  // 1. Shape bands across every panel: runs of buckets with the same majority shape.
  for (let i = 0; i < buckets.length; ) {
    let j = i;
    while (j + 1 < buckets.length && buckets[j + 1]!.majority === buckets[i]!.majority) j++;
    // band edges half-way between neighbouring buckets, so a one-frame run is centred on its frame
    const a = i === 0 ? left : sx(xOf((buckets[i - 1]!.xLast + buckets[i]!.xFirst) / 2));
    const b = j + 1 < buckets.length ? sx(xOf((buckets[j]!.xLast + buckets[j + 1]!.xFirst) / 2)) : left + PW;
    const shape = categories[buckets[i]!.majority] ?? 'puckered';
    series.forEach((_, p) => {
      const t = panelTop(p);
      items.push({ type: 'path', role: `band-${shape}`, d: `M${r2(a)},${r2(t)}H${r2(b)}V${r2(t + PH)}H${r2(a)}Z` });
    });
    i = j + 1;
  }
  // 2. Panels: grid, series line, frame and ticks.
  const xTicks = niceTicks(x0, x1, 6);
  series.forEach((spec, p) => {
    const t = panelTop(p);
    const sy = (v: number) => t + PH - ((v - spec.min) / (spec.max - spec.min)) * PH;
    for (const v of spec.ticks) items.push({ type: 'line', role: 'grid', x1: left, y1: sy(v), x2: left + PW, y2: sy(v) });
    const pts = seriesPoints(buckets, p, spec, (b) => sx(xOf((b.xFirst + b.xLast) / 2)), sy);
    const d = line<Pt>()
      .defined((q) => q !== null)
      .x((q) => q![0])
      .y((q) => q![1])
      .digits(2)(pts);
    if (d) items.push({ type: 'path', role: 'series', d });
    items.push({ type: 'path', role: 'axis', d: `M${r2(left)},${r2(t)}V${r2(t + PH)}H${r2(left + PW)}` });
    for (const v of spec.ticks) {
      items.push({ type: 'line', role: 'axis', x1: left - m.gap, y1: sy(v), x2: left, y2: sy(v) });
      items.push({ type: 'text', role: 'tick-label', x: left - m.gap * 1.6, y: sy(v) + tick.fontSize * 0.35, text: formatTick(v), anchor: 'end', ...tick });
    }
    items.push({ type: 'text', role: 'panel-title', x: left, y: t - title.fontSize * 0.45, text: spec.label, anchor: 'start', ...title });
  });
  const xFormat = tickFormatter(xTicks);
  for (const v of xTicks) {
    const x = sx(v);
    items.push({ type: 'line', role: 'axis', x1: x, y1: bottom, x2: x, y2: bottom + m.gap });
    items.push({ type: 'text', role: 'tick-label', x, y: bottom + m.gap + tick.fontSize, text: xFormat(v), anchor: 'middle', ...tick });
  }
  const xLabel = dt ? `time (${dt.unit})` : 'frame';
  let y = bottom + m.gap + tick.fontSize * 2.3;
  items.push({ type: 'text', role: 'panel-title', x: left + PW / 2, y, text: xLabel, anchor: 'middle', ...title });
  // 3. Legend of the shapes that appear as bands.
  const used = [...new Set(buckets.map((b) => b.majority))].sort((a, b) => a - b).map((c) => categories[c] ?? 'puckered');
  y += tick.fontSize * 1.2;
  let x = left;
  const s = tick.fontSize;
  items.push({ type: 'text', role: 'tick-label', x, y: y + s * 0.85, text: 'majority shape:', anchor: 'start', ...tick });
  x += measure('majority shape:', tick) + s * 0.6;
  for (const shape of used) {
    const w = s + s * 0.3 + measure(shape, tick) + s;
    if (x + w > left + PW && x > left) {
      x = left;
      y += s * 1.5;
    }
    const d = `M${r2(x)},${r2(y)}h${r2(s)}v${r2(s)}h${r2(-s)}Z`;
    items.push({ type: 'path', role: `band-${shape}`, d }, { type: 'path', role: 'swatch-frame', d });
    items.push({ type: 'text', role: 'tick-label', x: x + s * 1.3, y: y + s * 0.85, text: shape, anchor: 'start', ...tick });
    x += w;
  }
  const samples = buckets.reduce((n, b) => n + b.samples, 0);
  return {
    kind: 'time-series',
    width: left + PW + m.margin + tick.fontSize,
    height: y + s + m.margin,
    title: `Puckering of ${options.ringLabel ?? 'ring'} against ${dt ? 'time' : 'frame'} (${samples} frames)`,
    desc: `${series.map((s) => s.label).join(' and ')} against ${xLabel}, shown as the minimum–maximum envelope of ${buckets.length} columns; background bands give the majority ring shape of each stretch.`,
    items,
  };
}

const r2 = (v: number) => {
  const x = Math.round(v * 100) / 100;
  return x === 0 ? 0 : x;
};
