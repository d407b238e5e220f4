import { describe, expect, it } from 'vitest';
import { analyzeRing } from '../../src/analysis/ringAnalysis.js';
import { SIX_RING_FORMS, FIVE_RING_FORMS, THETA_ENVELOPE, THETA_HALF_CHAIR, THETA_SCREW_BOAT } from '../../src/analysis/ringForms.js';
import { fiveRingAt, ringMolecule, sixRingAt } from '../helpers/ringBuilders.js';

// docs/methods.md#six-ring-forms table (pyranose order O5, C1…C5; derived), written out as plain text.
const NORTH = 'OE OH1 E1 2H1 2E 2H3 E3 4H3 4E 4H5 E5 OH5'.split(' ');
const EQUATOR = '3,OB 3S1 B1,4 5S1 2,5B 2SO B3,O 1S3 1,4B 1S5 B2,5 OS2'.split(' ');
const SOUTH = '3E 3H4 E4 5H4 5E 5HO EO 1HO 1E 1H2 E2 3H2'.split(' ');
// docs/methods.md#five-ring-forms furanose table (O4′, C1′…C4′; derived), φ2 = 0, 18, … 342.
const FIVE = 'OE OT1 E1 2T1 2E 2T3 E3 4T3 4E 4TO EO 1TO 1E 1T2 E2 3T2 3E 3T4 E4 OT4'.split(' ');

const pyranose = (points: ReturnType<typeof sixRingAt>) =>
  ringMolecule(points, { elements: ['O', 'C', 'C', 'C', 'C', 'C'] });
const shapeOf = (letter: string) =>
  ({ C: 'chair', B: 'boat', S: 'twist-boat', H: 'half-chair', E: 'envelope', T: 'twist' })[letter.replace(/[^A-Z]|O/g, '')[0]!];

describe('canonical six-ring forms (docs/methods.md#six-ring-forms, derived)', () => {
  const cases: [string, number, number][] = [
    ['4C1', 0, 0],
    ['1C4', 180, 0],
    ...NORTH.map((d, k): [string, number, number] => [d, k % 2 ? THETA_HALF_CHAIR : THETA_ENVELOPE, 30 * k]),
    ...EQUATOR.map((d, k): [string, number, number] => [d, 90, 30 * k]),
    ...SOUTH.map((d, k): [string, number, number] => [d, 180 - (k % 2 ? THETA_HALF_CHAIR : THETA_ENVELOPE), 30 * k]),
  ];

  it('the table lists all 38 forms and SIX_RING_FORMS adds the 12 screw-boats', () => {
    expect(new Set(cases.map((c) => c[0])).size).toBe(38);
    expect(SIX_RING_FORMS).toHaveLength(50);
    expect(SIX_RING_FORMS.filter((f) => f.shape === 'screw-boat')).toHaveLength(12);
  });

  it.each(cases)('analyzeRing of a pyranose built at %s (θ %f, φ %f) returns that form', (name, theta, phi) => {
    const { mol, graph, ring } = pyranose(sixRingAt(0.6, theta, phi));
    const r = analyzeRing(mol, graph, ring);
    expect(r.descriptor).toBe(name);
    expect(r.shape).toBe(shapeOf(name.replace('O', '')));
    expect(r.fit!.distanceDeg).toBeLessThan(1e-6);
    expect(r.fit!.quality).toBe('close');
  });

  it('analyzeRing of rings built at the screw-boat points gives shape screw-boat and no descriptor', () => {
    for (let k = 0; k < 6; k++) {
      for (const theta of [THETA_SCREW_BOAT, 180 - THETA_SCREW_BOAT]) {
        const { mol, graph, ring } = pyranose(sixRingAt(0.6, theta, 30 + 60 * k));
        const r = analyzeRing(mol, graph, ring);
        expect(r.shape).toBe('screw-boat');
        expect(r.descriptor).toBeNull();
      }
    }
  });

  it('analyzeRing of a carbocycle uses locants 1…6 (θ 0 → 1C4, θ 180 → 4C1, boat φ 0 → 1,4B)', () => {
    const desc = (theta: number, phi: number) => {
      const { mol, graph, ring } = ringMolecule(sixRingAt(0.6, theta, phi));
      return analyzeRing(mol, graph, ring).descriptor;
    };
    expect([desc(0, 0), desc(180, 0), desc(90, 0), desc(90, 330)]).toEqual(['1C4', '4C1', '1,4B', '1S3']);
  });

  it('descriptorParts and descriptorHtml typeset the descriptor (superscripts before, subscripts after)', () => {
    const { mol, graph, ring } = pyranose(sixRingAt(0.6, 90, 0));
    const r = analyzeRing(mol, graph, ring);
    expect(r.descriptorParts).toEqual({ letter: 'B', above: ['3', 'O'], below: [] });
    expect(r.descriptorHtml).toBe('<sup>3,O</sup>B');
    const c = pyranose(sixRingAt(0.6, 0, 0));
    expect(analyzeRing(c.mol, c.graph, c.ring).descriptorHtml).toBe('<sup>4</sup>C<sub>1</sub>');
  });
});

describe('canonical five-ring forms (docs/methods.md#five-ring-forms, derived)', () => {
  it('FIVE_RING_FORMS has 10 envelopes and 10 twists', () => {
    expect(FIVE_RING_FORMS.filter((f) => f.shape === 'envelope')).toHaveLength(10);
    expect(FIVE_RING_FORMS.filter((f) => f.shape === 'twist')).toHaveLength(10);
  });

  it.each(FIVE.map((d, k) => [d, 18 * k] as const))('analyzeRing of a furanose built at %s (φ2 %i) returns it', (name, phi) => {
    const { mol, graph, ring } = ringMolecule(fiveRingAt(0.4, phi), { elements: ['O', 'C', 'C', 'C', 'C'] });
    const r = analyzeRing(mol, graph, ring);
    expect(r.descriptor).toBe(name);
    expect(r.shape).toBe(name.includes('T') ? 'twist' : 'envelope');
    // P ≈ φ2 + 90 for ideal rings (docs/methods.md#five-ring-forms, derived; within ±0.6° there, ±1° here)
    const p = r.pseudorotation!.phaseDeg;
    expect(Math.abs(((p - phi - 90 + 540) % 360) - 180)).toBeLessThan(1);
  });
});
