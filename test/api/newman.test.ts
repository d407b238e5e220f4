import { mkdtempSync, readFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { newmanFigure } from '../../src/api/figures/newman.js';
import { figureFormat, writeFigure } from '../../src/api/figures/writeFigure.js';
import { butane } from '../helpers/newmanMolecules.js';

describe('newmanFigure', () => {
  it('newmanFigure returns the SVG, the view and its warnings for a bond', () => {
    const { svg, view, warnings, scene } = newmanFigure(butane(65), { bond: [1, 2], theme: 'projector', idPrefix: 'b-' });
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('width="');
    expect(svg).toMatch(/height="[\d.]+px"/);
    expect(view.pairs.find((p) => p.front === 0 && p.back === 3)!.klynePrelog).toBe('+sc');
    expect(warnings).toEqual([]);
    expect(scene.kind).toBe('newman');
  });

  it('newmanFigure refuses a molecule without bonds, with a user error', () => {
    expect(() => newmanFigure({ ...butane(65), bonds: null }, { bond: [1, 2] })).toThrow(/has no bonds/);
  });
});

describe('writeFigure', () => {
  it('writeFigure writes SVG, PNG or PDF by extension', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cmk-fig-'));
    const { svg } = newmanFigure(butane(180), { bond: [1, 2] });
    await writeFigure(join(dir, 'a.svg'), svg);
    await writeFigure(join(dir, 'a.png'), svg);
    await writeFigure(join(dir, 'a.pdf'), svg);
    expect(readFileSync(join(dir, 'a.svg'), 'utf8')).toBe(`${svg}\n`);
    expect(readFileSync(join(dir, 'a.png')).subarray(1, 4).toString()).toBe('PNG');
    expect(readFileSync(join(dir, 'a.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
    await writeFigure(join(dir, 'b.out'), svg, { format: 'png' });
    expect(existsSync(join(dir, 'b.out'))).toBe(true);
  });

  it('figureFormat rejects an unknown extension', () => {
    expect(figureFormat('x.PDF')).toBe('pdf');
    expect(() => figureFormat('x.jpg')).toThrow(/use \.svg, \.png or \.pdf/);
  });
});
