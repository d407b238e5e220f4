import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { KARPLUS_FORMS, karplusJ } from '../../src/analysis/karplus.js';

describe('karplusJ', () => {
  it("karplusJ(φ, 'karplus-1959') gives 1.845 Hz at 60° and 9.22 Hz at 180° (Karplus 1959, J. Chem. Phys. 30, 11; values derived, docs/methods.md#karplus)", () => {
    expect(karplusJ(60, 'karplus-1959')).toBeCloseTo(1.845, 3);
    expect(karplusJ(180, 'karplus-1959')).toBeCloseTo(9.22, 3);
    expect(karplusJ(-180, 'karplus-1959')).toBeCloseTo(9.22, 3);
    expect(karplusJ(0, 'karplus-1959')).toBeCloseTo(8.22, 3);
    expect(karplusJ(90, 'karplus-1959')).toBeCloseTo(-0.28, 3);
  });

  it("karplusJ(φ, 'karplus-1959') switches branch above |φ| = 90 (9.5 instead of 8.5 cos²φ)", () => {
    expect(karplusJ(120, 'karplus-1959')).toBeCloseTo(9.5 * 0.25 - 0.28, 10);
    expect(karplusJ(-120, 'karplus-1959')).toBeCloseTo(9.5 * 0.25 - 0.28, 10);
    expect(karplusJ(60, 'karplus-1959')).toBeCloseTo(8.5 * 0.25 - 0.28, 10);
  });

  it("karplusJ(φ, 'karplus-1963') gives 11.0, 4.0, 2.0, 13.0 Hz at 0, 60, 90, 180° (Karplus 1963, J. Am. Chem. Soc. 85, 2870; coefficients from memory)", () => {
    expect([0, 60, 90, 180].map((t) => karplusJ(t, 'karplus-1963'))).toEqual([
      expect.closeTo(11, 10),
      expect.closeTo(4, 10),
      expect.closeTo(2, 10),
      expect.closeTo(13, 10),
    ]);
  });

  it('every Karplus form is even in the torsion', () => {
    for (const method of KARPLUS_FORMS.keys()) {
      fc.assert(
        fc.property(fc.double({ min: -180, max: 180, noNaN: true }), (t) => {
          expect(karplusJ(-t, method)).toBeCloseTo(karplusJ(t, method), 9);
        }),
        { seed: 5150, numRuns: 300 },
      );
    }
  });

  it('karplusJ rejects an unknown form', () => {
    expect(() => karplusJ(60, 'karplus-2099' as never)).toThrow(RangeError);
  });
});
