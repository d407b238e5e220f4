import { describe, expect, it } from 'vitest';
import { layoutConformerSheets, type SheetRow } from '../../../src/layout/sheets/conformerSheet.js';
import { figureLegibility } from '../../../src/layout/text/figureLegibility.js';
import { measureText } from '../../../src/render/svgWindow.js';

const PAGE = (17 / 2.54) * 72;
const row = (k: number, n: number): SheetRow => ({
  label: `r${k}`,
  heading: [{ text: `r${k} · chair ` }, { text: '4', shift: 'sup' }, { text: 'C' }, { text: '1', shift: 'sub' }, { text: ' · ΔE 1.30 kcal/mol' }],
  panels: Array.from({ length: n }, (_, j) => ({ width: j === 0 ? 130 : 100, height: 115, name: j === 0 ? 'ring' : `C${j}–O${j}` })),
});

describe('layoutConformerSheets', () => {
  it('layoutConformerSheets keeps every conformer on one row, within 17 cm, and names the panels left out for width', () => {
    const pages = layoutConformerSheets([row(1, 3), row(2, 7), row(3, 2)], { maxWidth: PAGE, maxHeight: (24 / 2.54) * 72, header: 'methyl β-D-glucopyranoside', note: 'Each row: …', measure: measureText });
    expect(pages).toHaveLength(1);
    const { scene, placements } = pages[0]!;
    expect(scene.width).toBeLessThanOrEqual(PAGE);
    for (const r of [0, 1, 2]) expect(new Set(placements.filter((p) => p.row === r).map((p) => p.y)).size).toBe(1);
    for (const p of placements) expect(p.x + p.width).toBeLessThanOrEqual(scene.width);
    expect(placements.filter((p) => p.row === 1).map((p) => p.panel)).toEqual([0, 1, 2, 3]);
    const texts = scene.items.flatMap((i) => (i.type === 'text' ? [i] : []));
    expect(texts.filter((t) => t.role === 'sheet-header').map((t) => t.text)).toEqual(['methyl β-D-glucopyranoside']);
    expect(texts.filter((t) => t.role === 'sheet-note').map((t) => t.text).join(' ')).toContain('Left out for width: r2 C4–O4, C5–O5, C6–O6.');
    for (const t of texts) expect(t.fontSize).toBeGreaterThanOrEqual(6);
    expect(figureLegibility(scene, { measure: measureText }).problems).toEqual([]);
  });

  it('layoutConformerSheets puts rows that do not fit the height onto further sheets, a slide at its fixed 16:9 size', () => {
    const slide = { maxWidth: 1280, maxHeight: 720, fixedSize: true, measure: measureText };
    const pages = layoutConformerSheets([1, 2, 3, 4, 5].map((k) => row(k, 3)), slide);
    expect(pages.length).toBeGreaterThan(1);
    for (const { scene, placements } of pages) {
      expect([scene.width, scene.height]).toEqual([1280, 720]);
      for (const p of placements) expect(p.y + p.height).toBeLessThanOrEqual(720);
    }
    expect(pages.flatMap((p) => [...new Set(p.placements.map((q) => q.row))])).toEqual([0, 1, 2, 3, 4]);
  });
});
