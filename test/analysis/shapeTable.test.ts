import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ShapeTable, PLANAR_FORM, PUCKERED_FORM } from '../../src/analysis/shapeTable.js';
import { classifyRing } from '../../src/analysis/ringShape.js';
import { cremerPople, displacementsFromModes, ringFromDisplacements, sixRingModes } from '../../src/geometry/cremerPople.js';
import { PuckerKernel, PuckerValues } from '../../src/geometry/puckerKernel.js';
import { readFileSync } from 'node:fs';
import { parseText } from '../../src/io/parseText.js';

const SIX = ['O', '1', '2', '3', '4', '5'];
const FIVE = ['1', '2', '3', '4', '5'];

describe('ShapeTable', () => {
  it('classify(Q, q2, θ, φ) gives the shape and descriptor of classifyRing for six-rings (fast-check, seed 21)', () => {
    const table = new ShapeTable(SIX);
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.8, noNaN: true }), fc.double({ min: 0, max: 180, noNaN: true }), fc.double({ min: 0, max: 359.99, noNaN: true }), (Q, theta, phi) => {
        const pk = cremerPople(ringFromDisplacements(displacementsFromModes(6, sixRingModes(Q, theta, phi))))!;
        const ref = classifyRing(pk, SIX);
        const form = table.classify(pk.Q, pk.amplitudes[0]!.q, pk.thetaDeg!, pk.amplitudes[0]!.phaseDeg!);
        expect(table.shapeOf(form)).toBe(ref.shape);
        expect(table.descriptorOf(form)).toBe(ref.descriptor);
      }),
      { seed: 21, numRuns: 400 },
    );
  });

  it('classify gives the shape and descriptor of classifyRing for five-rings (fast-check, seed 22)', () => {
    const table = new ShapeTable(FIVE);
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.6, noNaN: true }), fc.double({ min: 0, max: 359.99, noNaN: true }), (q, phi) => {
        const pk = cremerPople(ringFromDisplacements(displacementsFromModes(5, [{ m: 2, q, phaseDeg: phi }])))!;
        const ref = classifyRing(pk, FIVE);
        const form = table.classify(pk.Q, pk.amplitudes[0]!.q, NaN, pk.amplitudes[0]!.phaseDeg!);
        expect(table.shapeOf(form)).toBe(ref.shape);
        expect(table.descriptorOf(form)).toBe(ref.descriptor);
      }),
      { seed: 22, numRuns: 300 },
    );
  });

  it('classify names the pyranose chairs 4C1 and 1C4 (docs/methods.md#six-ring-forms, derived)', () => {
    const table = new ShapeTable(SIX);
    expect(table.descriptorOf(table.classify(0.57, 0.01, 2, 0))).toBe('4C1');
    expect(table.descriptorOf(table.classify(0.57, 0.01, 178, 0))).toBe('1C4');
  });

  it('classify returns PLANAR_FORM below 0.1 Å, PUCKERED_FORM for a nine-ring and for a seven-ring without displacements', () => {
    expect(new ShapeTable(SIX).classify(0.05, 0.01, 50, 10)).toBe(PLANAR_FORM);
    const seven = new ShapeTable(['1', '2', '3', '4', '5', '6', '7']);
    expect(seven.classify(0.6, 0.3, NaN, 10)).toBe(PUCKERED_FORM);
    expect(seven.shapeOf(PUCKERED_FORM)).toBe('puckered');
    const nine = new ShapeTable(['1', '2', '3', '4', '5', '6', '7', '8', '9']);
    expect(nine.classify(0.6, 0.3, NaN, 10, new Float64Array(9).fill(0.2))).toBe(PUCKERED_FORM);
  });

  for (const n of [7, 8] as const) {
    it(`classify with the kernel's displacements gives classifyRing's shape for ${n}-rings (fast-check, seed ${30 + n})`, () => {
      const locants = Array.from({ length: n }, (_, i) => String(i + 1));
      const table = new ShapeTable(locants);
      const kernel = new PuckerKernel(n);
      const v = new PuckerValues();
      const ring = Int32Array.from(locants, (_, i) => i);
      const modes = fc.tuple(...Array.from({ length: n === 7 ? 2 : 3 }, () => fc.tuple(fc.double({ min: 0, max: 0.6, noNaN: true }), fc.double({ min: 0, max: 359.99, noNaN: true }))));
      fc.assert(
        fc.property(modes, (qs) => {
          const pts = ringFromDisplacements(displacementsFromModes(n, qs.map(([q, phaseDeg], k) => ({ m: k + 2, q, phaseDeg: k + 2 === n / 2 ? 0 : phaseDeg }))));
          const pk = cremerPople(pts)!;
          const ref = classifyRing(pk, locants);
          expect(kernel.measure(Float64Array.from(pts.flat()), ring, v)).toBe(true);
          const form = table.classify(v.Q, v.q2, v.thetaDeg, v.phaseDeg, kernel.displacements);
          expect(table.shapeOf(form)).toBe(ref.shape);
          expect(table.descriptorOf(form)).toBeNull();
        }),
        { seed: 30 + n, numRuns: 300 },
      );
    });
  }

  it('names the ideal seven-ring forms of test/data/medium-rings (scripts/fixtures/medium-ring-forms.mjs, derived)', () => {
    const records = parseText(readFileSync('test/data/medium-rings/ideal-7.xyz', 'utf8'), { file: 'ideal-7.xyz' });
    const table = new ShapeTable(['1', '2', '3', '4', '5', '6', '7']);
    const kernel = new PuckerKernel(7);
    const v = new PuckerValues();
    const shapes = records.map((mol) => {
      kernel.measure(Float64Array.from(mol.coords), Int32Array.from([0, 1, 2, 3, 4, 5, 6]), v);
      return table.shapeOf(table.classify(v.Q, v.q2, v.thetaDeg, v.phaseDeg, kernel.displacements));
    });
    expect(shapes).toEqual(['chair', 'twist-chair', 'boat', 'twist-boat']);
  });
});
