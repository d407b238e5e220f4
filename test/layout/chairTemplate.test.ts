import { describe, expect, it } from 'vitest';
import { chairFigure } from '../../src/api/figures/chair.js';
import { shoelaceArea } from '../../src/layout/ring/ringView.js';
import { d3dChair, ringMolecule } from '../helpers/ringBuilders.js';
import { readLines, type DrawnLine } from '../helpers/svgRead.js';

const DEG = 180 / Math.PI;
/** Angle between two drawn lines as undirected directions, degrees in [0, 90]. */
const lineAngle = (a: DrawnLine, b: DrawnLine) => {
  const d = Math.abs(Math.atan2(a.y2 - a.y1, a.x2 - a.x1) - Math.atan2(b.y2 - b.y1, b.x2 - b.x1)) * DEG % 180;
  return Math.min(d, 180 - d);
};

// GED-like chair (docs/methods.md#cremer-pople-checks, derived), two H per carbon in the local bisector plane (the same model)
const chair = ringMolecule(d3dChair(1.536, 111.4).points, { hydrogens: true });
const fig = chairFigure(chair.mol, { rings: [chair.ring], hydrogens: 'all' });
const lines = readLines(fig.svg);
const ringAtoms = fig.ring.atoms.map((a) => a + 1);
const ringBond = (a: number, b: number) => lines.find((l) => l.cls === 'ring-bond' && l.atoms.join() === `${a},${b}`)!;
const bondAt = (j: number) => ringBond(ringAtoms[j % 6]!, ringAtoms[(j + 1) % 6]!);

describe('chairTemplate (SVG read back by class and data-atoms)', () => {
  it('draws six ring bonds, six axial and six equatorial bonds, each starting at its ring atom', () => {
    expect(lines.filter((l) => l.cls === 'ring-bond')).toHaveLength(6);
    const axial = lines.filter((l) => l.cls === 'axial');
    const equatorial = lines.filter((l) => l.cls === 'equatorial');
    expect(axial).toHaveLength(6);
    expect(equatorial).toHaveLength(6);
    for (const l of [...axial, ...equatorial]) expect(ringAtoms).toContain(l.atoms[0]);
  });

  it('draws axial bonds vertical, up exactly at up atoms (z_j > 0) and on the top face', () => {
    for (const l of lines.filter((x) => x.cls === 'axial')) {
      expect(Math.abs(l.x2 - l.x1)).toBeLessThanOrEqual(0.011); // SVG coordinates are rounded to 0.01
      const j = ringAtoms.indexOf(l.atoms[0]!);
      const sub = fig.ring.substituents.find((s) => s.atom + 1 === l.atoms[1])!;
      expect(l.y2 < l.y1).toBe(fig.ring.z[j]! > 0);
      expect(l.y2 < l.y1).toBe(sub.face === 'top');
    }
  });

  it('draws opposite ring bonds parallel (within 0.1°)', () => {
    for (let j = 0; j < 3; j++) expect(lineAngle(bondAt(j), bondAt(j + 3))).toBeLessThan(0.1);
  });

  it('draws each equatorial bond parallel to both ring bonds once removed (within 1°), pointing away from the ring', () => {
    const xs = lines.filter((l) => l.cls === 'ring-bond').map((l) => l.x1);
    const ys = lines.filter((l) => l.cls === 'ring-bond').map((l) => l.y1);
    const [cx, cy] = [xs.reduce((s, x) => s + x, 0) / 6, ys.reduce((s, y) => s + y, 0) / 6];
    for (const l of lines.filter((x) => x.cls === 'equatorial')) {
      const j = ringAtoms.indexOf(l.atoms[0]!);
      expect(lineAngle(l, bondAt(j + 1))).toBeLessThan(1);
      expect(lineAngle(l, bondAt(j + 4))).toBeLessThan(1);
      expect((l.x2 - l.x1) * (l.x1 - cx) + (l.y2 - l.y1) * (l.y1 - cy)).toBeGreaterThan(0);
    }
  });

  it('keeps the numbering clockwise on screen, as seen from +n (shoelace sign)', () => {
    const pts = [0, 1, 2, 3, 4, 5].map((j) => ({ x: bondAt(j).x1, y: bondAt(j).y1 }));
    expect(shoelaceArea(pts)).toBeGreaterThan(0);
  });

  it('keeps the numbering clockwise when the ring is renumbered to start at a down atom (rotated, never mirrored)', () => {
    const order = [1, 2, 3, 4, 5, 0];
    const other = chairFigure(chair.mol, { rings: [order], ring: order, ordered: true });
    expect(other.ring.z[0]).toBeLessThan(0);
    const l = readLines(other.svg);
    const at = order.map((a, j) => l.find((x) => x.cls === 'ring-bond' && x.atoms.join() === `${a + 1},${order[(j + 1) % 6]! + 1}`)!);
    expect(shoelaceArea(at.map((x) => ({ x: x.x1, y: x.y1 })))).toBeGreaterThan(0);
  });

  it('tilts equatorial bonds down at up atoms and up at down atoms', () => {
    for (const l of lines.filter((x) => x.cls === 'equatorial')) {
      const j = ringAtoms.indexOf(l.atoms[0]!);
      expect(l.y2 > l.y1).toBe(fig.ring.z[j]! > 0);
    }
  });
});

describe('chairTemplate inner axial bonds and gaps (Scene read back)', () => {
  const items = fig.scene.items.filter((it) => it.type === 'line');
  const bonds = items.filter((l) => l.role !== 'bond-halo');
  const halos = items.filter((l) => l.role === 'bond-halo');
  const inner = fig.placement.bonds.filter((b) => b.front);

  it('flags exactly the two axial bonds that point across the ring (up from a front vertex, down from a back one) as front', () => {
    expect(inner).toHaveLength(2);
    for (const b of inner) {
      expect(b.role).toBe('axial');
      const v = fig.placement.points.get(b.atoms[0])!;
      const e = fig.placement.points.get(b.atoms[1])!;
      expect(v.near > 0 ? e.y < v.y : e.y > v.y).toBe(true);
    }
  });

  it('opens each gap under an inner axial bond, in the ring bond behind it, and never under a ring bond', () => {
    expect(halos).toHaveLength(2);
    for (const h of halos) expect(inner.some((b) => b.atoms.join() === h.atoms!.join())).toBe(true);
    // the halo is drawn after the ring bond it cuts and before its own axial bond
    const order = fig.scene.items;
    for (const h of halos) {
      const axial = order.findIndex((it) => it.type === 'line' && it.role === 'axial' && it.atoms!.join() === h.atoms!.join());
      expect(order.indexOf(h)).toBe(axial - 1);
    }
  });

  it('draws each inner axial bond past the far ring bond, its end clear of every bond it is not part of', () => {
    for (const b of inner) {
      const line = bonds.find((l) => l.role === 'axial' && l.atoms!.join() === b.atoms.join())!;
      for (const other of bonds.filter((l) => !l.atoms!.some((a) => b.atoms.includes(a)))) {
        const [dx, dy] = [other.x2 - other.x1, other.y2 - other.y1];
        const t = Math.max(0, Math.min(1, ((line.x2 - other.x1) * dx + (line.y2 - other.y1) * dy) / (dx * dx + dy * dy)));
        expect(Math.hypot(line.x2 - (other.x1 + t * dx), line.y2 - (other.y1 + t * dy))).toBeGreaterThan(1.2);
      }
    }
  });
});
