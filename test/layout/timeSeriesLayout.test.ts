import { describe, expect, it } from 'vitest';
import { SeriesBuckets } from '../../src/analysis/seriesBuckets.js';
import { layoutTimeSeries, type SeriesSpec } from '../../src/layout/plots/timeSeriesLayout.js';
import { POINT_LIMIT } from '../../src/layout/plots/seriesMarks.js';
import type { ScenePath } from '../../src/layout/scene.js';

const phiSpec: SeriesSpec = { label: 'φ (°)', min: 0, max: 360, ticks: [0, 180, 360], wraps: true, binning: { min: 0, max: 360, bins: 72 } };
const paths = (items: readonly { type: string; role: string }[], role: string) => items.filter((i): i is ScenePath => i.type === 'path' && i.role === role);
const segments = (d: string) => [...d.matchAll(/M([\d.-]+),([\d.-]+)L([\d.-]+),([\d.-]+)/g)].map((m) => m.slice(1).map(Number));

describe('layoutTimeSeries', () => {
  it('layoutTimeSeries(short run) draws one dot per frame and joins only consecutive frames, never across a wrap', () => {
    const b = new SeriesBuckets(1, 1024, 1, [phiSpec.binning!]);
    const frames = [1, 2, 3, 4, 5, 20, 21, 22];
    const phis = [100, 110, 355, 5, 15, 200, 210, 220]; // 110 → 355 and 355 → 5 jump across the circle
    frames.forEach((f, i) => b.add(f, [phis[i]!], 0));
    const scene = layoutTimeSeries(b.buckets(), [phiSpec], ['chair']);
    const dots = paths(scene.items, 'series-point')[0]!.d.match(/a/g)!.length / 2;
    expect(dots).toBe(frames.length);
    const segs = segments(paths(scene.items, 'series')[0]!.d);
    // joined: 1–2 (100→110), 4–5 (5→15), 20–21, 21–22; not 2–3 nor 3–4 (wrap jumps), not 5–20 (frame gap)
    expect(segs.length).toBe(4);
    // every joining segment spans one frame step: the x distance of frames 1 and 2
    const dotXs = [...paths(scene.items, 'series-point')[0]!.d.matchAll(/M([\d.-]+),/g)].map((m) => Number(m[1]));
    const step = dotXs[1]! - dotXs[0]!;
    for (const [x1, , x2] of segs) expect(Math.abs(x2! - x1! - step)).toBeLessThan(0.05);
  });

  it('layoutTimeSeries(long run) draws column densities and a legend with its scale, no points', () => {
    const b = new SeriesBuckets(1, 64, 1, [phiSpec.binning!]);
    for (let f = 1; f <= POINT_LIMIT * 10; f++) b.add(f, [(f * 7.3) % 360], 0);
    const scene = layoutTimeSeries(b.buckets(), [phiSpec], ['chair']);
    expect(paths(scene.items, 'series-point').length).toBe(0);
    expect(scene.items.some((i) => i.type === 'path' && /^trace-\d$/.test(i.role))).toBe(true);
    expect(scene.items.some((i) => i.type === 'text' && /log scale/.test(i.text))).toBe(true);
    expect(JSON.stringify(scene)).not.toMatch(/NaN|null/);
  });

  it('layoutTimeSeries draws the muted series in grey and says what it is', () => {
    const b = new SeriesBuckets(2, 1024, 1, [phiSpec.binning!, phiSpec.binning!]);
    for (let f = 1; f <= 50; f++) b.add(f, f < 25 ? [NaN, f * 3] : [f * 3, NaN], 0);
    const scene = layoutTimeSeries(b.buckets(), [{ ...phiSpec, muted: { index: 1, note: 'grey: undefined here' } }], ['chair']);
    const muted = paths(scene.items, 'series-muted');
    expect(muted.length).toBe(2); // the dots and the legend swatch
    expect(muted[0]!.d.match(/a/g)!.length / 2).toBe(24);
    expect(scene.items.some((i) => i.type === 'text' && i.text === 'grey: undefined here')).toBe(true);
  });
});
