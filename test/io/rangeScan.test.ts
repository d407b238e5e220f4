import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fieldEndIn, scanPlainInto, skipBlankIn } from '../../src/io/rangeScan.js';
import { cursor, scanNumberAt } from '../../src/io/numbers.js';

const out = new Float64Array(1);
const scan = (text: string, i = 0, end = text.length): [number, number] => {
  out[0] = 12345;
  const next = scanPlainInto(text, i, end, out, 0);
  return [next, out[0]!];
};

describe('rangeScan', () => {
  it('scanPlainInto(plain decimals) stores the value scanNumberAt gives and returns the index after it', () => {
    for (const t of ['1.5', ' -0.25 x', '\t+3.', '.5', '-0', '007.100', '123456789012345']) {
      const [next, value] = scan(t);
      expect(value).toBe(scanNumberAt(t, 0));
      expect(next).toBe(cursor.end);
    }
  });

  it('scanPlainInto stops at the end of the range, never reading the next line', () => {
    const text = 'C 1.25 -2.5 3\nH 9 9 9\n';
    const end = text.indexOf('\n');
    const [n1] = scan(text, 1, end);
    const [n2] = scan(text, n1, end);
    const [n3, z] = scan(text, n2, end);
    expect([n3, z]).toEqual([end, 3]);
    expect(scan(text, n3, end)[0]).toBe(-1); // no fourth field within the line
  });

  it('scanPlainInto refuses what only the full scanner handles (exponents, long mantissas, junk) and stores nothing', () => {
    for (const t of ['1e-3', '1.0D+00', '1234567890123456', 'abc', '-', '.', '', '  ', '1.2.3', '1,5', 'nan']) {
      expect(scan(t)).toEqual([-1, 12345]);
    }
  });

  it('scanPlainInto agrees with scanNumberAt on random fixed-point text wherever it accepts (fixed seed)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 9 }), fc.constantFrom('', ' ', '\t', '\r'), (x, d, tail) => {
        const t = ` ${x.toFixed(d)}${tail}`;
        const [next, value] = scan(t);
        if (next >= 0) expect(Object.is(value, scanNumberAt(t, 0))).toBe(true);
        else expect(t.replace(/\D/g, '').replace(/^0+/, '').length).toBeGreaterThan(15);
      }),
      { seed: 20240611, numRuns: 2000 },
    );
  });

  it('skipBlankIn and fieldEndIn stay inside [i, end)', () => {
    expect(skipBlankIn('  \t x', 0, 3)).toBe(3);
    expect(skipBlankIn('  \t x', 0, 6)).toBe(4);
    expect(fieldEndIn('abcdef', 1, 4)).toBe(4);
    expect(fieldEndIn('ab cd', 0, 5)).toBe(2);
  });
});
