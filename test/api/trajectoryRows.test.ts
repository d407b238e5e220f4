import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { TrajectoryRows } from '../../src/api/trajectory/trajectoryRows.js';
import type { TextStream } from '../../src/api/trajectory/csvStream.js';

function rows(): { rows: TrajectoryRows; text: () => string } {
  let got = '';
  const rows = new TrajectoryRows({ write: (s: string) => void (got += s) } as unknown as TextStream);
  return { rows, text: () => (rows.flush(), got) };
}

const printed = (x: number, d: number) => String(Math.round(x * 10 ** d) / 10 ** d);

describe('TrajectoryRows', () => {
  it('TrajectoryRows.number prints what String(Math.round(x·10^d)/10^d) prints (common practice, no source)', () => {
    const { rows: r, text } = rows();
    const cases: [number, number][] = [[0, 4], [-0, 2], [-0.004, 2], [0.3, 2], [12.5, 4], [-179.999, 2], [99.995, 2], [1e-6, 6], [360, 0], [123456789, 6], [2 ** 60, 2]];
    for (const [x, d] of cases) {
      r.number(x, d);
      r.newline();
    }
    expect(text()).toBe(cases.map(([x, d]) => `${printed(x, d)}\n`).join(''));
  });

  it('TrajectoryRows.number agrees with String on random values and places (fixed seed)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.constantFrom(0, 2, 4, 6), (x, d) => {
        const { rows: r, text } = rows();
        r.number(x, d);
        expect(text()).toBe(printed(x, d));
      }),
      { seed: 4242, numRuns: 5000 },
    );
  });

  it('TrajectoryRows keeps rows whole and in order across many 64 KiB hand-overs, non-ASCII text included', () => {
    const { rows: r, text } = rows();
    let want = '';
    for (let k = 1; k <= 20_000; k++) {
      r.number(k, 0);
      r.comma();
      r.text(k % 3 === 0 ? '¹C₄' : 'twist-boat');
      r.comma();
      r.number(k / 7, 4);
      r.newline();
      want += `${k},${k % 3 === 0 ? '¹C₄' : 'twist-boat'},${printed(k / 7, 4)}\n`;
    }
    r.text('x'.repeat(70_000)); // longer than the buffer: passed through whole
    want += 'x'.repeat(70_000);
    expect(text()).toBe(want);
  });
});
