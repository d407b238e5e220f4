import { describe, expect, it } from 'vitest';
import { canDraw, contactSheet, figureSvg, newmanFigure } from '../../src/index.js';
import { butane, cyclohexaneChair } from '../helpers/newmanMolecules.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';

describe('figureSvg', () => {
  it('figureSvg draws a bond as the same Newman projection as newmanFigure, with the given id prefix', () => {
    const mol = butane(65);
    const svg = figureSvg(mol, { bond: [1, 2], idPrefix: 'slide3-' });
    expect(svg).toBe(newmanFigure(mol, { bond: [1, 2], idPrefix: 'slide3-' }).svg);
    expect(svg).toContain('id="slide3-title"');
    expect(xmlProblems(svg)).toEqual([]);
  });

  it('figureSvg perceives bonds for a record without them and refuses a non-bond or two targets', () => {
    const mol = { ...butane(180), bonds: null };
    expect(figureSvg(mol, { bond: [1, 2] })).toContain('class="back-atom"');
    expect(() => figureSvg(mol, { bond: [0, 3] })).toThrow(/not bonded/);
    expect(() => figureSvg(mol, { bond: [1, 2], ring: 0 })).toThrow(/exactly one of bond and ring/);
    expect(() => figureSvg(mol, {})).toThrow(/exactly one of bond and ring/);
  });

  it('figureSvg draws a ring when this build has a ring renderer, and says so when it has none', () => {
    const { mol } = cyclohexaneChair();
    expect(() => figureSvg(mol, { ring: 3 })).toThrow(/ring 3 does not exist/);
    if (canDraw('ring')) expect(xmlProblems(figureSvg(mol, { ring: 0, idPrefix: 'c-' }))).toEqual([]);
    else expect(() => figureSvg(mol, { ring: 0 })).toThrow(/cannot draw ring figures/);
  });
});

describe('contactSheet', () => {
  it('contactSheet nests each panel at its place and keeps every id unique', () => {
    const panels = [65, 180, -65].map((t, k) => {
      const { svg, scene } = newmanFigure(butane(t), { bond: [1, 2], idPrefix: `p${k}-` });
      return { svg, width: scene.width, height: scene.height, caption: [`butane ${t}°`] };
    });
    const sheet = contactSheet(panels, { idPrefix: 's-', columns: 2 });
    expect(xmlProblems(sheet)).toEqual([]);
    const nested = [...sheet.matchAll(/<svg x="([\d.]+)" y="([\d.]+)" width="([\d.]+)"[^>]*data-panel="([a-z])"/g)];
    expect(nested.map((m) => m[4])).toEqual(['a', 'b', 'c']);
    expect(Number(nested[2]![2])).toBeGreaterThan(Number(nested[0]![2])); // third panel on the second row
    const ids = [...sheet.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
    expect(sheet).toContain('>butane 180°<');
  });
});
