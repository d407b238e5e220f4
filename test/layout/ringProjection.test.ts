import { describe, expect, it } from 'vitest';
import { analyzeRing } from '../../src/analysis/ringAnalysis.js';
import { ringProjection } from '../../src/layout/ring/ringProjection.js';
import { shoelaceArea } from '../../src/layout/ring/ringView.js';
import { chairFigure } from '../../src/api/figures/chair.js';
import type { Molecule, Vec3 } from '../../src/model/molecule.js';
import { d2TwistBoat, d3dChair, fiveRingAt, ringMolecule, sixRingAt } from '../helpers/ringBuilders.js';
import { readLines } from '../helpers/svgRead.js';

const mirror = (mol: Molecule): Molecule => ({ ...mol, coords: mol.coords.map((v, i) => (i % 3 === 2 ? -v : v)) });

describe('ringProjection (docs/methods.md#chair-drawing view frame)', () => {
  // derived (docs/methods.md#chair-drawing): GED-like chair C–C 1.536, C–C–C 111.4, h toward the C1–C2 midpoint, e = 20°
  const { mol, graph, ring } = ringMolecule(d3dChair(1.536, 111.4).points);
  const analysis = analyzeRing(mol, graph, ring, { ordered: true });
  const p = ringProjection(analysis, mol);
  const pts = ring.map((a) => p.points.get(a)!);

  it('puts C3 and C6 at the right and left tips', () => {
    const xs = pts.map((q) => q.x);
    expect(xs.indexOf(Math.max(...xs))).toBe(2);
    expect(xs.indexOf(Math.min(...xs))).toBe(5);
  });

  it('gives the shoelace area +1.908 Å² in (x, y_svg): the ring reads clockwise, as from +n', () => {
    expect(shoelaceArea(pts)).toBeCloseTo(1.908, 3);
  });

  it('uses the default elevation of 20° and the mean ring bond as the unit length', () => {
    expect(p.elevationDeg).toBe(20);
    expect(p.unitLength).toBeCloseTo(1.536, 6);
  });

  it('draws the mirror image mirrored: seen edge-on (e = 0) the picture flips about the mean plane, y → −y', () => {
    const tb = ringMolecule(d2TwistBoat(1.536, 111.4), { hydrogens: true });
    const m = mirror(tb.mol);
    const a = ringProjection(analyzeRing(tb.mol, tb.graph, tb.ring, { ordered: true }), tb.mol, { elevationDeg: 0, hydrogens: 'all' });
    const b = ringProjection(analyzeRing(m, tb.graph, tb.ring, { ordered: true }), m, { elevationDeg: 0, hydrogens: 'all' });
    let moved = 0;
    for (const [atom, q] of a.points) {
      const r = b.points.get(atom)!;
      expect(r.x).toBeCloseTo(q.x, 9);
      expect(r.y).toBeCloseTo(-q.y, 9);
      if (Math.abs(q.y) > 0.1) moved++;
    }
    expect(moved).toBeGreaterThan(4);
    const svgA = chairFigure(tb.mol, { rings: [tb.ring] }).svg;
    const svgB = chairFigure(m, { rings: [tb.ring] }).svg;
    expect(svgB).not.toBe(svgA);
  });

  it('projects five-, six- and seven-rings of any shape, with their substituent bonds', () => {
    const seven = Array.from({ length: 7 }, (_, j): Vec3 => {
      const a = (-2 * Math.PI * j) / 7;
      return [1.6 * Math.cos(a), 1.6 * Math.sin(a), 0.3 * Math.cos(2 * a + 0.4)];
    });
    for (const points of [fiveRingAt(0.4, 36), sixRingAt(0.76, 90, 0), sixRingAt(0.6, 50.8, 30), seven]) {
      const r = ringMolecule(points, { hydrogens: true });
      const fig = chairFigure(r.mol, { rings: [r.ring], hydrogens: 'all' });
      expect(fig.view).toBe('projected');
      const lines = readLines(fig.svg);
      expect(lines.filter((l) => l.cls === 'ring-bond')).toHaveLength(points.length);
      expect(lines.filter((l) => l.cls !== 'ring-bond' && l.cls !== 'bond-halo')).toHaveLength(2 * points.length);
      expect(fig.svg).not.toMatch(/NaN/);
    }
  });
});

describe('layoutRing depth order', () => {
  it('draws a nearer bond after a farther one it crosses, with a bond-halo just before the nearer bond', () => {
    const tb = ringMolecule(d2TwistBoat(1.536, 111.4), { hydrogens: true });
    let crossings = 0;
    for (const elevationDeg of [5, 20, 35, 60]) {
      const fig = chairFigure(tb.mol, { rings: [tb.ring], elevationDeg });
      const near = (atoms: number[]) => atoms.reduce((s, a) => s + fig.placement.points.get(a - 1)!.near, 0) / 2;
      const lines = readLines(fig.svg);
      const bonds = lines.filter((l) => l.cls !== 'bond-halo');
      bonds.forEach((a, i) => bonds.slice(i + 1).forEach((b) => {
        if (a.atoms.some((x) => b.atoms.includes(x)) || !cross(a, b)) return;
        crossings++;
        expect(near(b.atoms)).toBeGreaterThanOrEqual(near(a.atoms));
        const k = lines.indexOf(b);
        expect(lines.slice(0, k).some((h) => h.cls === 'bond-halo' && h.atoms.join() === b.atoms.join())).toBe(true);
      }));
    }
    expect(crossings).toBeGreaterThan(0);
  });
});

function cross(a: { x1: number; y1: number; x2: number; y2: number }, b: typeof a): boolean {
  // proper crossing well inside both segments (the layout ignores touches within 2% of an end)
  const [rx, ry, sx, sy] = [a.x2 - a.x1, a.y2 - a.y1, b.x2 - b.x1, b.y2 - b.y1];
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-9) return false;
  const t = ((b.x1 - a.x1) * sy - (b.y1 - a.y1) * sx) / den;
  const u = ((b.x1 - a.x1) * ry - (b.y1 - a.y1) * rx) / den;
  return t > 0.05 && t < 0.95 && u > 0.05 && u < 0.95;
}
