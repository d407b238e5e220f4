import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { SeriesBuckets } from '../../src/analysis/seriesBuckets.js';
import { PolarGrid } from '../../src/analysis/polarGrid.js';

describe('SeriesBuckets', () => {
  it('buckets() keep every sample, the global min and max, and at most `capacity` buckets (fast-check, seed 31)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 1, maxLength: 3000 }), (values) => {
        const b = new SeriesBuckets(1, 16, 3);
        values.forEach((v, i) => b.add(i + 1, [v], i % 3));
        const out = b.buckets();
        expect(out.length).toBeLessThanOrEqual(16);
        expect(out.reduce((n, x) => n + x.samples, 0)).toBe(values.length);
        expect(Math.min(...out.map((x) => x.ranges[0]![0]))).toBe(Math.min(...values));
        expect(Math.max(...out.map((x) => x.ranges[0]![1]))).toBe(Math.max(...values));
        expect(out[0]!.xFirst).toBe(1);
        expect(out[out.length - 1]!.xLast).toBe(values.length);
        if (values.length > 16) expect(out.length).toBeGreaterThanOrEqual(8);
      }),
      { seed: 31, numRuns: 100 },
    );
  });

  it('buckets() histograms hold every finite sample in its bin through every merge (fast-check, seed 32)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.double({ min: -10, max: 370, noNaN: true }), fc.constant(NaN)), { minLength: 1, maxLength: 2000 }), (values) => {
        const b = new SeriesBuckets(1, 8, 1, [{ min: 0, max: 360, bins: 12 }]);
        values.forEach((v, i) => b.add(i + 1, [v], 0));
        const totals = new Array<number>(12).fill(0);
        for (const x of b.buckets()) x.histograms[0]!.forEach((c, k) => (totals[k]! += c));
        const expected = new Array<number>(12).fill(0);
        for (const v of values) if (Number.isFinite(v)) expected[Math.min(11, Math.max(0, Math.floor(v / 30)))]!++;
        expect(totals).toEqual(expected);
      }),
      { seed: 32, numRuns: 100 },
    );
  });

  it('buckets() skip non-finite values and report the majority category', () => {
    const b = new SeriesBuckets(2, 4, 2);
    b.add(1, [1, NaN], 1);
    const [first] = b.buckets();
    expect(first!.ranges).toEqual([[1, 1], null]);
    expect(first!.histograms).toEqual([[], []]);
    expect(first!.majority).toBe(1);
  });
});

describe('PolarGrid', () => {
  it('cells() tile the unit disc with cells of equal area', () => {
    const g = new PolarGrid(5);
    g.counts.fill(1);
    const cells = g.cells();
    expect(cells.length).toBe(150);
    const areas = cells.map((c) => (Math.PI * (c.outer ** 2 - c.inner ** 2) * (c.endDeg - c.startDeg)) / 360);
    for (const a of areas) expect(a).toBeCloseTo(Math.PI / 150, 12);
  });

  it('add(r, angle) puts a point in the cell that contains it, clamping beyond the rim', () => {
    const g = new PolarGrid(4);
    g.add(0.6, 100);
    g.add(1.5, -30);
    const cells = g.cells();
    expect(cells[0]).toMatchObject({ ring: 2, count: 1 });
    expect(cells[0]!.startDeg).toBeLessThanOrEqual(100);
    expect(cells[0]!.endDeg).toBeGreaterThan(100);
    expect(cells[1]).toMatchObject({ ring: 3, count: 1 });
    expect(cells[1]!.startDeg).toBeLessThanOrEqual(330);
    expect(g.clamped).toBe(1);
    expect(g.total).toBe(2);
  });
});
