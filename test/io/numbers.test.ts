import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { scanDecimal, scanFloat } from '../../src/io/numbers.js';

describe('scanDecimal', () => {
  it('scanDecimal(fixed-point text) gives the same number as scanFloat and Number (derived: one correctly rounded division)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -99_999_999, max: 99_999_999 }), fc.integer({ min: 0, max: 8 }), (m, places) => {
        const text = (m / 10 ** places).toFixed(places);
        const padded = `  ${text}|`;
        const value = scanDecimal(padded, 2, 2 + text.length);
        expect(Object.is(value, scanFloat(padded, 2, 2 + text.length))).toBe(true);
        expect(value).toBe(Number(text));
      }),
      { seed: 11, numRuns: 2000 },
    );
  });

  it('scanDecimal(other text) falls back to scanFloat: exponents, signs, long mantissas, junk', () => {
    for (const t of ['-0.0000', '+1.5', '1e3', '1.0D+00', '12345678901234567.5', '.5', '3.', '.', '-', '', '1.2.3', '1-2', 'abc']) {
      expect(Object.is(scanDecimal(t, 0, t.length), scanFloat(t, 0, t.length))).toBe(true);
    }
    expect(scanDecimal('-10000.0000-2', 0, 11)).toBe(-10000); // stops at the column end, not at the next sign
  });
});
