import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { newmanView } from '../../src/analysis/newman.js';
import { layoutNewman, type NewmanLayoutOptions } from '../../src/layout/newman/newmanLayout.js';
import { textBox } from '../../src/layout/text/textBox.js';
import { boxesOverlap, grow, segmentHitsBox, type Box } from '../../src/layout/text/labelPlacement.js';
import type { Scene, SceneLine, SceneText } from '../../src/layout/scene.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { loadTheme, sceneMetrics } from '../../src/render/themes.js';
import { measureText } from '../../src/render/svgWindow.js';
import type { Molecule, Vec3 } from '../../src/model/molecule.js';
import { butane, cyclohexaneChair, ethane, molecule } from '../helpers/newmanMolecules.js';
import { angleGap } from '../helpers/svgRead.js';

const metrics = sceneMetrics(loadTheme('column'));
const scene = (m: Molecule, f: number, b: number, o: NewmanLayoutOptions = {}, rings?: number[][]) =>
  layoutNewman(newmanView(m, buildGraph(m.atoms.length, m.bonds!), f, b, { rings }), m, { metrics, measure: measureText, ...o });
const lines = (s: Scene, role: string) => s.items.filter((i): i is SceneLine => i.type === 'line' && i.role === role);
const texts = (s: Scene, role: string) => s.items.filter((i): i is SceneText => i.type === 'text' && i.role === role);
const az = (l: SceneLine) => ((Math.atan2(l.x2 - l.x1, -(l.y2 - l.y1)) * 180) / Math.PI + 360) % 360;

/** Ink boxes of every text item, rebuilt from the scene with the same measure the layout used. */
function boxesOf(s: Scene): Box[] {
  return s.items.filter((i): i is SceneText => i.type === 'text').map((t) => {
    const tb = textBox(t.text, t, measureText);
    const cy = t.y - tb.baseline;
    return { x0: t.x - tb.width / 2, y0: cy - tb.height / 2, x1: t.x + tb.width / 2, y1: cy + tb.height / 2 };
  });
}

describe('layoutNewman', () => {
  it('layoutNewman draws front bonds from the centre and back bonds from the rim', () => {
    const s = scene(butane(180), 1, 2);
    const circle = s.items.find((i) => i.type === 'circle' && i.role === 'back-atom')!;
    if (circle.type !== 'circle') throw new Error('no circle');
    for (const l of lines(s, 'front-bond')) expect([l.x1, l.y1]).toEqual([circle.cx, circle.cy]);
    for (const l of lines(s, 'back-bond')) expect(Math.hypot(l.x1 - circle.cx, l.y1 - circle.cy)).toBeCloseTo(circle.r, 6);
    expect(lines(s, 'front-bond')).toHaveLength(3);
    expect(lines(s, 'back-bond')).toHaveLength(3);
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
  });

  it('layoutNewman puts a +65° gauche back bond clockwise of the up bond (docs/methods.md#newman-projection: mirrored y reverses signs)', () => {
    const s = scene(butane(65), 1, 2);
    const c1 = lines(s, 'front-bond').find((l) => l.atoms![1] === 0)!;
    const c4 = lines(s, 'back-bond').find((l) => l.atoms![1] === 3)!;
    expect(az(c1)).toBeCloseTo(0, 6);
    expect(az(c4)).toBeCloseTo(65, 6);
    expect(c4.x2).toBeGreaterThan(c1.x2); // clockwise from 12 o'clock is to the right, up the page
    expect(c4.y2).toBeLessThan(c4.y1 + 1e-9);
  });

  it('layoutNewman ideal mode spaces bonds by 120°, offsets eclipsed by 8° and prints the measured torsion', () => {
    const st = scene(butane(65), 1, 2, { angles: 'ideal' });
    expect(lines(st, 'front-bond').map(az).sort((a, b) => a - b).map((x) => Math.round(x))).toEqual([0, 120, 240]);
    const back = lines(st, 'back-bond').map(az).sort((a, b) => a - b).map((x) => Math.round(x));
    expect(back).toEqual([65, 185, 305]);
    expect(texts(st, 'torsion-label').map((t) => t.text)).toEqual(['+65°']);
    const ec = scene(ethane(0), 0, 1, { angles: 'ideal' });
    const gaps = lines(ec, 'back-bond').map((b) => Math.min(...lines(ec, 'front-bond').map((f) => angleGap(az(b), az(f)))));
    gaps.forEach((g) => expect(g).toBeCloseTo(8, 6));
    expect(texts(ec, 'torsion-label').map((t) => t.text)).toEqual(['0°']);
  });

  it('layoutNewman hides, collapses or shows hydrogens', () => {
    const hide = scene(butane(180), 1, 2, { hydrogens: 'hide' });
    expect(lines(hide, 'front-bond').map((l) => l.atoms![1])).toEqual([0]);
    expect(texts(hide, 'atom-label').map((t) => t.text)).toEqual(['C', 'C']);
    const col = scene(butane(180), 1, 2, { hydrogens: 'collapse' });
    expect(lines(col, 'front-bond')).toHaveLength(3);
    expect(texts(col, 'atom-label').map((t) => t.atom)).toEqual([0, 3]);
    const len = (l: SceneLine) => Math.hypot(l.x2 - l.x1, l.y2 - l.y1);
    const [c, h] = [0, 7].map((a) => len(lines(col, 'front-bond').find((l) => l.atoms![1] === a)!));
    expect(h!).toBeLessThan(c!);
  });

  it('layoutNewman labels by element, id or atom name', () => {
    const m = butane(180);
    expect(texts(scene(m, 1, 2, { labels: 'id', hydrogens: 'hide' }), 'atom-label').map((t) => t.text)).toEqual(['C1', 'C4']);
    expect(texts(scene(m, 1, 2, { labels: 'name' }), 'atom-label').map((t) => t.text)).toContain('H21');
  });

  it('layoutNewman marks the heaviest pair by default, the requested pairs, or none', () => {
    const s = scene(butane(180), 1, 2);
    expect(s.items.filter((i) => i.role === 'torsion-arc').map((i) => ('atoms' in i ? i.atoms : undefined))).toEqual([[0, 1, 2, 3]]);
    const two = scene(butane(180), 1, 2, { mark: [[0, 3], [7, 9]] });
    expect(texts(two, 'torsion-label').map((t) => t.text)).toEqual(['180°', '+60°']);
    expect(scene(butane(180), 1, 2, { mark: [] }).items.some((i) => i.role === 'torsion-arc')).toBe(false);
    expect(() => scene(butane(180), 1, 2, { mark: [[3, 0]] })).toThrow(/cannot mark 4:1/);
  });

  it('layoutNewman captions the bond, conformation and marked torsion with Klyne–Prelog words', () => {
    const s = scene(butane(-65), 1, 2);
    expect(texts(s, 'caption').map((t) => t.text)).toEqual(['C2–C3, staggered', 'C1/C4 −65° (−sc, gauche)']);
    expect(scene(butane(-65), 1, 2, { caption: false }).items.some((i) => i.role === 'caption')).toBe(false);
  });

  it('layoutNewman marks ring bonds through the ring neighbour at 12 o’clock', () => {
    const { mol, ring } = cyclohexaneChair();
    const s = scene(mol, 1, 2, { labels: 'id' }, [ring]);
    const up = lines(s, 'front-bond').find((l) => l.atoms![1] === 0)!;
    expect(az(up)).toBeCloseTo(0, 6);
  });

  it('layoutNewman keeps labels apart and off every line (fast-check, random geometries)', () => {
    const c = fc.double({ min: -2, max: 2, noNaN: true });
    const pt = fc.tuple(c, c, c) as fc.Arbitrary<Vec3>;
    fc.assert(
      fc.property(fc.array(pt, { minLength: 6, maxLength: 6 }), fc.constantFrom('element', 'id') as fc.Arbitrary<'element' | 'id'>, (pts, labels) => {
        const p: Vec3[] = [[0, 0, 0], [1.5, 0, 0], ...pts.slice(0, 3), ...pts.slice(3).map((q): Vec3 => [q[0] + 1.5, q[1], q[2]])];
        const m = molecule('random', ['C', 'C', 'Cl', 'O', 'H', 'Br', 'H', 'N'], p, [[0, 1], [0, 2], [0, 3], [0, 4], [1, 5], [1, 6], [1, 7]]);
        const s = scene(m, 0, 1, { labels });
        const boxes = boxesOf(s).map((b) => grow(b, -0.05)); // tolerance for the rounding of the layout itself
        const segs = s.items.filter((i): i is SceneLine => i.type === 'line');
        for (let i = 0; i < boxes.length; i++) {
          for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i]!, boxes[j]!)).toBe(false);
          for (const l of segs) expect(segmentHitsBox(l, boxes[i]!)).toBe(false);
        }
      }),
      { seed: 777, numRuns: 60 },
    );
  });
});

describe('layoutNewman with atom names', () => {
  it('layoutNewman(…, { labels: "name" }) names atoms the same way in the labels, the caption and the description', () => {
    const base = butane(65);
    const names = base.atoms.map((a, i) => (i < 4 ? `C${String.fromCharCode(65 + i)}` : `H${i}`));
    const m = { ...base, atoms: base.atoms.map((a, i) => ({ ...a, name: names[i]! })) };
    const s = scene(m, 1, 2, { labels: 'name' });
    const caption = texts(s, 'caption').map((t) => t.text);
    expect(caption[0]).toMatch(/^CB–CC, /);
    expect(caption[1]).toMatch(/^CA\/CD [+−]\d+°/);
    expect(texts(s, 'atom-label').map((t) => t.text)).toEqual(expect.arrayContaining(['CA', 'CD']));
    expect(s.desc).toContain('Viewed from CB (front) towards CC (back)');
  });
});
