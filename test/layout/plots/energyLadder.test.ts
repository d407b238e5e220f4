import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { layoutEnergyLadder, type LadderLevel } from '../../../src/layout/plots/energyLadder.js';
import { figureLegibility, textItemBox } from '../../../src/layout/text/figureLegibility.js';
import type { SceneLine, SceneText } from '../../../src/layout/scene.js';
import { measureText } from '../../../src/render/svgWindow.js';

const lines = (s: ReturnType<typeof layoutEnergyLadder>, role: string) => s.items.filter((i): i is SceneLine => i.type === 'line' && i.role === role);
const texts = (s: ReturnType<typeof layoutEnergyLadder>, role: string) => s.items.filter((i): i is SceneText => i.type === 'text' && i.role === role);
const chair = (label: string, e: number, p = 0.1): LadderLevel => ({ label, relativeEnergy: e, population: p, form: 'chair', descriptor: [{ text: '4', shift: 'sup' }, { text: 'C' }, { text: '1', shift: 'sub' }] });
const boat = (label: string, e: number): LadderLevel => ({ label, relativeEnergy: e, population: 0, form: 'twist-boat' });

describe('layoutEnergyLadder', () => {
  it('layoutEnergyLadder draws one column per ring form, the lowest form first, each headed by its name', () => {
    const scene = layoutEnergyLadder([boat('r3', 5.2), chair('r1', 0), chair('r2', 1.3), boat('r4', 6.1)], { measure: measureText });
    expect(texts(scene, 'column-label').map((t) => t.text)).toEqual(['chair', 'twist-boat']);
    const x0 = new Map(lines(scene, 'level').map((l) => [l.y1, l.x1]));
    const byLabel = (name: string) => texts(scene, 'level-label').find((t) => t.text.startsWith(`${name} `))!;
    expect(byLabel('r1').x).toBe(byLabel('r2').x);
    expect(byLabel('r3').x).toBeGreaterThan(byLabel('r1').x + 40);
    expect(new Set(x0.values()).size).toBe(2);
    expect(byLabel('r2').text).toBe('r2 4C1 1.30 (10.0 %)');
    expect(byLabel('r2').runs?.find((r) => r.shift === 'sup')?.text).toBe('4');
  });

  it('layoutEnergyLadder merges near-equal levels into one bracketed label block with horizontal leaders, each line at its energy', () => {
    const scene = layoutEnergyLadder([0, 0.01, 0.02, 2].map((e, i) => chair(`r${i + 1}`, e, 0.25)), { measure: measureText });
    const levels = lines(scene, 'level');
    const [y0, y2] = [levels.find((l) => l.x2 > l.x1)!.y1, Math.min(...levels.map((l) => l.y1))];
    const bottom = Math.max(...levels.map((l) => l.y1));
    expect(bottom - y2).toBeGreaterThan(50);
    // the three near-equal lines keep their true spacing (0.01 kcal/mol apart on a 2 kcal/mol span)
    const near = levels.map((l) => l.y1).sort((a, b) => b - a).slice(0, 3);
    expect(near[0]! - near[1]!).toBeCloseTo((bottom - y2) * 0.005, 6);
    expect(y0).toBeGreaterThan(0);
    const leaders = lines(scene, 'leader');
    expect(leaders.filter((l) => Math.abs(l.x1 - l.x2) < 1e-9)).toHaveLength(1); // one bracket
    for (const l of leaders) expect(Math.abs(l.x1 - l.x2) < 1e-9 || Math.abs(l.y1 - l.y2) < 1e-9).toBe(true);
    const boxes = texts(scene, 'level-label').map((t) => textItemBox(t, measureText));
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxes[i]!.y1 <= boxes[j]!.y0 || boxes[j]!.y1 <= boxes[i]!.y0).toBe(true);
  });

  it('layoutEnergyLadder with unit kJ/mol converts the labels and the axis (1 kcal = 4.184 kJ)', () => {
    const scene = layoutEnergyLadder([chair('r1', 0, 0.9), chair('r2', 1, 0.1)], { unit: 'kJ/mol', measure: measureText });
    expect(texts(scene, 'axis-label')[0]!.text).toBe('ΔE (kJ/mol)');
    expect(texts(scene, 'level-label').map((t) => t.text)).toContain('r2 4C1 4.2 (10.0 %)');
    const ticks = texts(scene, 'tick-label').map((t) => Number(t.text));
    expect(ticks[0]).toBe(0);
    expect(ticks[ticks.length - 1]!).toBeGreaterThanOrEqual(4.184);
    // ticks are evenly spaced on the page and in value
    const ys = texts(scene, 'tick-label').map((t) => t.y);
    for (let k = 2; k < ys.length; k++) expect(ys[k]! - ys[k - 1]!).toBeCloseTo(ys[1]! - ys[0]!, 6);
  });

  it('layoutEnergyLadder passes the legibility check with zero counts for any energies and forms (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: 0, max: 12, noNaN: true }), fc.constantFrom('chair', 'twist-boat', 'boat')), { minLength: 1, maxLength: 30 }), (raw) => {
        const levels = raw.map(([e, form], i) => ({ ...chair(`r${i + 1}`, e), form }));
        const scene = layoutEnergyLadder(levels, { measure: measureText });
        expect(figureLegibility(scene, { measure: measureText }).problems).toEqual([]);
        expect(texts(scene, 'level-label')).toHaveLength(levels.length);
        for (const l of lines(scene, 'leader')) expect(Math.abs(l.x1 - l.x2) < 1e-9 || Math.abs(l.y1 - l.y2) < 1e-9).toBe(true);
        for (const t of scene.items.filter((i): i is SceneText => i.type === 'text')) {
          const b = textItemBox(t, measureText);
          expect(b.x0).toBeGreaterThanOrEqual(0);
          expect(b.y0).toBeGreaterThanOrEqual(0);
          expect(b.x1).toBeLessThanOrEqual(scene.width);
          expect(b.y1).toBeLessThanOrEqual(scene.height);
        }
      }),
      { seed: 1515, numRuns: 120 },
    );
  });
});
