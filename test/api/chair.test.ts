import { describe, expect, it } from 'vitest';
import { chairFigure } from '../../src/api/figures/chair.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Molecule } from '../../src/model/molecule.js';
import { d2TwistBoat, ringMolecule } from '../helpers/ringBuilders.js';
import { minimisedConformers } from '../helpers/fromOpenchemlib.js';
import { readLines } from '../helpers/svgRead.js';

/** Classes of the drawn bonds from ring atoms to their heavy substituents, read back from the SVG. */
function heavyClasses(mol: Molecule, svg: string, ring: readonly number[]): Map<number, string> {
  const out = new Map<number, string>();
  for (const l of readLines(svg)) {
    const [a, b] = l.atoms;
    if (l.cls === 'ring-bond' || l.cls === 'bond-halo' || a === undefined || b === undefined) continue;
    if (ring.includes(a - 1) && mol.atoms[b - 1]!.element !== 'H') out.set(b - 1, l.cls);
  }
  return out;
}

describe('chairFigure on openchemlib MMFF94s structures', () => {
  it('draws all five heavy substituents of β-D-glucopyranose as equatorial in the 4C1 template', () => {
    const { mol, rings } = minimisedConformers('OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O', 1)[0]!;
    const fig = chairFigure(mol, { rings });
    expect(fig.view).toBe('template');
    expect(fig.ring.descriptor).toBe('4C1');
    const classes = heavyClasses(mol, fig.svg, fig.ring.atoms);
    expect([...classes.values()]).toEqual(['equatorial', 'equatorial', 'equatorial', 'equatorial', 'equatorial']);
  });

  it('draws O1 of α-D-glucopyranose axial, pointing down (bottom face) at the down atom C1', () => {
    const { mol, rings } = minimisedConformers('OC[C@H]1O[C@H](O)[C@H](O)[C@@H](O)[C@@H]1O', 1)[0]!;
    const fig = chairFigure(mol, { rings });
    const c1 = fig.ring.atoms[1]!;
    const o1 = fig.ring.substituents.find((s) => s.ringAtom === c1 && s.element === 'O')!;
    expect(o1.position).toBe('axial');
    expect(o1.face).toBe('bottom');
    const line = readLines(fig.svg).find((l) => l.cls === 'axial' && l.atoms.join() === `${c1 + 1},${o1.atom + 1}`)!;
    expect(line.y2).toBeGreaterThan(line.y1);
    expect(Math.abs(line.x2 - line.x1)).toBeLessThanOrEqual(0.011);
  });

  it('draws the methyl of the lowest-energy methylcyclohexane equatorial, labelled CH₃', () => {
    const { mol, rings } = minimisedConformers('CC1CCCCC1', 1)[0]!;
    const fig = chairFigure(mol, { rings });
    expect([...heavyClasses(mol, fig.svg, fig.ring.atoms).values()]).toEqual(['equatorial']);
    expect(fig.svg).toContain('>CH<tspan font-size="6" baseline-shift="-1.92">3</tspan></text>');
  });
});

describe('chairFigure choices and errors', () => {
  const tb = ringMolecule(d2TwistBoat(1.536, 111.4), { hydrogens: true });

  it('defaults to the projected view for a twist-boat', () => {
    const fig = chairFigure(tb.mol, { rings: [tb.ring] });
    expect(fig.ring.shape).toBe('twist-boat');
    expect(fig.view).toBe('projected');
    expect(fig.svg).toContain('class="conformark ring-projection');
  });

  it('refuses the template for a non-chair, pointing to the projected view', () => {
    expect(() => chairFigure(tb.mol, { rings: [tb.ring], view: 'template' })).toThrow(
      /^.+: ring 1 is a twist-boat \(\d,?\w*S\w+\), not a chair: use --view projected$/,
    );
    expect(() => chairFigure(tb.mol, { rings: [tb.ring], view: 'template' })).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: 'not-a-chair', file: tb.mol.source.file })] }));
  });

  it('fails with "no ring to draw in record N" for a record without rings', () => {
    const mol: Molecule = {
      title: 'ethane', atoms: [{ element: 'C', name: null }, { element: 'C', name: null }],
      coords: Float64Array.from([0, 0, 0, 1.54, 0, 0]), bonds: [{ a: 0, b: 1, order: 1, perceived: false }],
      properties: {}, source: { file: 'x.xyz', format: 'xyz', index: 2, line: 5 },
    };
    const err = (() => { try { chairFigure(mol); } catch (e) { return e; } })();
    expect(err).toBeInstanceOf(ConformarkError);
    expect((err as ConformarkError).message).toBe('x.xyz: no ring to draw in record 2');
  });

  it('picks the first six-ring by default and a ring by its number', () => {
    const { mol, rings } = minimisedConformers('C1CC1C1CCCCC1', 1)[0]!;
    expect(rings.map((r) => r.length)).toContain(3);
    const fig = chairFigure(mol, { rings: [...rings].sort((a, b) => a.length - b.length) });
    expect(fig.ring.size).toBe(6);
    const three = chairFigure(mol, { rings: [...rings].sort((a, b) => a.length - b.length), ring: 1 });
    expect(three.ring.size).toBe(3);
    expect(() => chairFigure(mol, { rings, ring: 9 })).toThrow(/ring 9 does not exist/);
  });

  it('captions shape, typeset descriptor and Q/θ/φ; hides hydrogens on request', () => {
    const fig = chairFigure(tb.mol, { rings: [tb.ring], hydrogens: 'hide' });
    const captions = fig.scene.items.filter((i) => i.type === 'text' && i.role === 'caption');
    expect(captions.map((i) => (i as { text: string }).text).join('|')).toMatch(/^twist-boat \dS\d\|Q 0\.765 Å  θ 90\.0°  φ \d+\.\d°$/);
    // the descriptor locants are typeset runs (raised and lowered), not Unicode script digits
    expect((captions[0] as { runs?: { shift?: string }[] }).runs?.map((r) => r.shift ?? 'base')).toEqual(['base', 'sup', 'base', 'sub']);
    expect(readLines(fig.svg).filter((l) => l.cls !== 'ring-bond')).toHaveLength(0);
    expect(fig.svg).not.toContain('>H</text>');
  });

  it('is deterministic and honours the id prefix', () => {
    const a = chairFigure(tb.mol, { rings: [tb.ring], idPrefix: 'f1-' }).svg;
    expect(chairFigure(tb.mol, { rings: [tb.ring], idPrefix: 'f1-' }).svg).toBe(a);
    expect(a).toContain('id="f1-title"');
  });
});
