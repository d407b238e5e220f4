import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { altonaSundaralingam, altonaSundaralingamFit, fourierPseudorotation, leastSquaresAmplitude } from '../../src/geometry/pseudorotation.js';

const model = (p: number, amp: number) =>
  [0, 1, 2, 3, 4].map((j) => amp * Math.cos(((p + 144 * (j - 2)) * Math.PI) / 180));

describe('pseudorotation', () => {
  const nu = [-26.7, 46.3, -47.1, 33.4, -4.4];

  it('altonaSundaralingam(ν) gives P 166.35, τm 48.47 on a B-DNA deoxyribose (Altona & Sundaralingam 1972, J. Am. Chem. Soc. 94, 8205; values derived)', () => {
    const r = altonaSundaralingam(nu)!;
    expect(Math.abs(r.phaseDeg - 166.35)).toBeLessThan(0.01);
    expect(Math.abs(r.amplitudeDeg - 48.47)).toBeLessThan(0.01);
  });

  it('fourierPseudorotation(ν) gives P 166.64, νmax 49.83 on the same ring (derived)', () => {
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
        expect(altonaSundaralingamFit(model(p, amp))!.amplitudeDeg).toBeCloseTo(amp, 6);
      }),
      { seed: 7331, numRuns: 300 },
    );
  });

  it('altonaSundaralingamFit(ν) gives the closed form on the B-DNA check: P 166.35, τm 48.47 from ν2 / cos P', () => {
    const r = altonaSundaralingamFit(nu)!;
    expect(r.amplitudeMethod).toBe('closed-form');
    expect(Math.abs(r.phaseDeg - 166.35)).toBeLessThan(0.01);
    expect(Math.abs(r.amplitudeDeg - 48.47)).toBeLessThan(0.01);
  });

  it('altonaSundaralingamFit(ν) walked through P = 90° and 270° has the closed-form P and no jump in P or τm', () => {
    // a non-ideal ring: the model plus a fixed distortion, so closed form and fit differ (as in real rings)
    const bump = [1.5, -0.8, 0.6, -1.9, 0.9];
    for (const centre of [90, 270]) {
      let last: { p: number; t: number } | null = null;
      const methods = new Set<string>();
      for (let k = -500; k <= 500; k++) {
        const p0 = centre + k * 0.05;
        const v = model(p0, 40).map((x, j) => x + bump[j]!);
        const r = altonaSundaralingamFit(v)!;
        const closed = altonaSundaralingam(v);
        methods.add(r.amplitudeMethod);
        const y = v[4]! + v[1]! - (v[3]! + v[0]!);
        const x = 2 * v[2]! * (Math.sin(Math.PI / 5) + Math.sin((2 * Math.PI) / 5));
        const p = ((Math.atan2(y, x) * 180) / Math.PI + 360) % 360;
        expect(Math.abs(r.phaseDeg - p)).toBeLessThan(1e-9); // P is always the closed form
        if (closed) expect(Math.abs(closed.phaseDeg - r.phaseDeg)).toBeLessThan(1e-9);
        if (last) {
          expect(Math.abs(((r.phaseDeg - last.p + 540) % 360) - 180)).toBeLessThan(0.2); // steps of 0.05° in the model
          expect(Math.abs(r.amplitudeDeg - last.t)).toBeLessThan(0.2);
        }
        last = { p: r.phaseDeg, t: r.amplitudeDeg };
      }
      expect([...methods].sort()).toEqual(['blended', 'closed-form', 'least-squares']);
    }
  });

  it('leastSquaresAmplitude(ν, P) returns the model amplitude exactly and is what the fit uses at P = 90°', () => {
    expect(leastSquaresAmplitude(model(90, 38), 90)).toBeCloseTo(38, 10);
    const v = model(90, 38).map((x, j) => x + [0.5, -0.3, 0.2, 0.1, -0.4][j]!);
    const r = altonaSundaralingamFit(v)!;
    expect(r.amplitudeMethod).toBe('least-squares');
    expect(r.amplitudeDeg).toBeCloseTo(leastSquaresAmplitude(v, r.phaseDeg), 10);
  });

  it('pseudorotation of a flat ring is null, and a wrong torsion count is an error', () => {
    expect(altonaSundaralingam([0, 0, 0, 0, 0])).toBeNull();
    expect(fourierPseudorotation([0, 0, 0, 0, 0])).toBeNull();
    expect(altonaSundaralingamFit([0, 0, 0, 0, 0])).toBeNull();
    expect(() => fourierPseudorotation([1, 2, 3])).toThrow(RangeError);
  });
});
