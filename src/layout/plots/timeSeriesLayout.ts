/**
 * `time-series`: puckering coordinates against frame or time over background bands that show the majority
 * ring shape of each stretch. One panel per series, stacked, sharing the x axis. A short run is drawn frame by
 * frame (dots, lines only between consecutive frames); a long one as per-column densities on a log scale, so
 * 10⁶ frames read as well as 10³ (see seriesMarks.ts). A panel may show a second, muted series in grey: the
 * values of the first that are not meaningful (φ of a six-ring near the poles, where it is set by noise).
 */
import type { SeriesBinning, SeriesBucket } from '../../analysis/seriesBuckets.js';
import { formatTick, niceTicks, tickFormatter } from './plotTicks.js';
import { densityLegend } from './densityLegend.js';
import { columnCount, columnHistograms, densityMarks, drawsPoints, maxCell, pointMarks, type PanelFrame } from './seriesMarks.js';
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** One plotted panel. */
export interface SeriesSpec {
  /** Axis label with unit, e.g. `θ (°)`. */
  readonly label: string;
  readonly min: number;
  readonly max: number;
  readonly ticks: readonly number[];
  /** True for angles on a circle (φ, P): lines never join values more than half the range apart. */
  readonly wraps: boolean;
  /** Index of the series in the buckets. Default: the panel's position. */
  readonly index?: number;
  /** Bins of the series' histograms (needed for long runs; a panel without them shows its min/max envelope). */
  readonly binning?: SeriesBinning;
  /** A second series drawn in grey under the first, with the same binning, and the words saying what it is. */
  readonly muted?: { readonly index: number; readonly note: string };
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

const r2 = (v: number) => {
  const x = Math.round(v * 100) / 100;
  return x === 0 ? 0 : x;
};

/** Min/max envelope of a series without bins: one vertical stroke per bucket (long runs only). */
function envelope(buckets: readonly SeriesBucket[], s: number, f: PanelFrame, xs: (b: SeriesBucket) => number): SceneItem[] {
  const d = buckets.flatMap((b) => {
    const r = b.ranges[s];
    if (!r) return [];
    const lo = Math.max(f.min, r[0]), hi = Math.min(f.max, r[1]);
    return hi >= lo ? [`M${r2(xs(b))},${r2(f.yOf(hi) - 0.3)}V${r2(f.yOf(lo) + 0.3)}`] : [];
  }).join('');
  return d ? [{ type: 'path', role: 'series', d }] : [];
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
  const points = drawsPoints(buckets);
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
  // 2. Panels: grid, marks, frame and ticks.
  const xTicks = niceTicks(x0, x1, 6);
  const nCols = columnCount(buckets.length, PW);
  let densityMax = 0;
  const notes: string[] = [];
  series.forEach((spec, p) => {
    const t = panelTop(p);
    const sy = (v: number) => t + PH - ((Math.min(spec.max, Math.max(spec.min, v)) - spec.min) / (spec.max - spec.min)) * PH;
    const frame: PanelFrame = { xOf: (f) => sx(xOf(f)), yOf: sy, min: spec.min, max: spec.max, left, width: PW, dotR: Math.max(0.45, Math.min(1.1, PW / Math.max(1, buckets.length) / 2.2)) };
    for (const v of spec.ticks) items.push({ type: 'line', role: 'grid', x1: left, y1: sy(v), x2: left + PW, y2: sy(v) });
    const s = spec.index ?? p;
    if (points) {
      if (spec.muted) items.push(...pointMarks(buckets, spec.muted.index, frame, spec.wraps, 'series-muted', null));
      items.push(...pointMarks(buckets, s, frame, spec.wraps, 'series-point', 'series'));
    } else if (spec.binning) {
      const bin = spec.binning;
      const cols = columnHistograms(buckets, s, nCols, first, last);
      const muted = spec.muted ? columnHistograms(buckets, spec.muted.index, nCols, first, last) : null;
      const max = maxCell(cols);
      densityMax = Math.max(densityMax, max);
      if (muted) items.push(...densityMarks(muted, bin, frame, 1, 'series-muted', true));
      items.push(...densityMarks(cols, bin, frame, Math.max(1, max), 'trace'));
    } else {
      items.push(...envelope(buckets, s, frame, (b) => sx(xOf((b.xFirst + b.xLast) / 2))));
    }
    if (spec.muted) notes.push(spec.muted.note);
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
  // 3. Legends: the shapes that appear as bands, the density scale, the muted values.
  const s = tick.fontSize;
  const swatch = (x: number, yTop: number, role: string) => {
    const d = `M${r2(x)},${r2(yTop)}h${r2(s)}v${r2(s)}h${r2(-s)}Z`;
    items.push({ type: 'path', role, d }, { type: 'path', role: 'swatch-frame', d });
  };
  const used = [...new Set(buckets.map((b) => b.majority))].sort((a, b) => a - b).map((c) => categories[c] ?? 'puckered');
  y += tick.fontSize * 1.2;
  let x = left;
  items.push({ type: 'text', role: 'tick-label', x, y: y + s * 0.85, text: 'majority shape:', anchor: 'start', ...tick });
  x += measure('majority shape:', tick) + s * 0.6;
  for (const shape of used) {
    const w = s + s * 0.3 + measure(shape, tick) + s;
    if (x + w > left + PW && x > left) {
      x = left;
      y += s * 1.5;
    }
    swatch(x, y, `band-${shape}`);
    items.push({ type: 'text', role: 'tick-label', x: x + s * 1.3, y: y + s * 0.85, text: shape, anchor: 'start', ...tick });
    x += w;
  }
  let right = left + PW;
  if (!points && densityMax > 0) {
    y += s * 1.5;
    const legend = densityLegend(densityMax, left, y, m, measure, { head: `frames per column and bin (${nCols} columns, log scale):`, cls: 'trace' });
    items.push(...legend.items);
    right = Math.max(right, legend.right);
  }
  for (const note of [...new Set(notes)]) {
    y += s * 1.5;
    swatch(left, y, 'series-muted');
    items.push({ type: 'text', role: 'tick-label', x: left + s * 1.3, y: y + s * 0.85, text: note, anchor: 'start', ...tick });
    right = Math.max(right, left + s * 1.3 + measure(note, tick));
  }
  const samples = buckets.reduce((n, b) => n + b.samples, 0);
  const how = points
    ? `shown frame by frame (lines join consecutive frames only)`
    : `shown as the density of ${nCols} columns on a log scale`;
  return {
    kind: 'time-series',
    width: right + m.margin + tick.fontSize,
    height: y + s + m.margin,
    title: `Puckering of ${options.ringLabel ?? 'ring'} against ${dt ? 'time' : 'frame'} (${samples} frames)`,
    desc: `${series.map((sp) => sp.label).join(' and ')} against ${xLabel}, ${how}; background bands give the majority ring shape of each stretch.`,
    items,
  };
}
