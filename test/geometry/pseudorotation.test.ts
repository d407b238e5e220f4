import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { altonaSundaralingam, fourierPseudorotation } from '../../src/geometry/pseudorotation.js';

const model = (p: number, amp: number) =>
  [0, 1, 2, 3, 4].map((j) => amp * Math.cos(((p + 144 * (j - 2)) * Math.PI) / 180));

describe('pseudorotation', () => {
  const nu = [-26.7, 46.3, -47.1, 33.4, -4.4];

  it('altonaSundaralingam(ν) gives P 166.35, τm 48.47 on the B-DNA deoxyribose check (METHODS.md §4.2, derived)', () => {
    const r = altonaSundaralingam(nu)!;
    expect(Math.abs(r.phaseDeg - 166.35)).toBeLessThan(0.01);
    expect(Math.abs(r.amplitudeDeg - 48.47)).toBeLessThan(0.01);
  });

  it('fourierPseudorotation(ν) gives P 166.64, νmax 49.83 on the same ring (METHODS.md §4.2, derived)', () => {
    const r = fourierPseudorotation(nu)!;
    expect(Math.abs(r.phaseDeg - 166.64)).toBeLessThan(0.01);
    expect(Math.abs(r.amplitudeDeg - 49.83)).toBeLessThan(0.01);
  });

  it('both forms return P and νmax exactly for torsions of the AS model ν_j = νmax cos(P + 144(j − 2))', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 359.9, noNaN: true }), fc.double({ min: 5, max: 60, noNaN: true }), (p, amp) => {
        const f = fourierPseudorotation(model(p, amp))!;
        expect(Math.abs(((f.phaseDeg - p + 540) % 360) - 180)).toBeLessThan(1e-8);
        expect(f.amplitudeDeg).toBeCloseTo(amp, 8);
        const as = altonaSundaralingam(model(p, amp))!;
        expect(Math.abs(((as.phaseDeg - p + 540) % 360) - 180)).toBeLessThan(1e-8);
        if (Math.abs(Math.cos((p * Math.PI) / 180)) > 0.05) expect(as.amplitudeDeg).toBeCloseTo(amp, 6);
      }),
      { seed: 7331, numRuns: 300 },
    );
  });

  it('pseudorotation of a flat ring is null, and a wrong torsion count is an error', () => {
    expect(altonaSundaralingam([0, 0, 0, 0, 0])).toBeNull();
    expect(fourierPseudorotation([0, 0, 0, 0, 0])).toBeNull();
    expect(() => fourierPseudorotation([1, 2, 3])).toThrow(RangeError);
  });
});
