import { describe, expect, it } from 'vitest';
import { figureLegibility } from '../../../src/layout/text/figureLegibility.js';
import type { Scene, SceneItem } from '../../../src/layout/scene.js';

const scene = (items: SceneItem[]): Scene => ({ kind: 't', width: 100, height: 100, title: '', desc: '', items });
const label = (text: string, x: number, y: number, atom: number): SceneItem => ({ type: 'text', role: 'atom-label', x, y, text, anchor: 'middle', fontSize: 8, fontWeight: 'normal', atom });
const bond = (x1: number, y1: number, x2: number, y2: number, atoms: [number, number]): SceneItem => ({ type: 'line', role: 'ring-bond', x1, y1, x2, y2, atoms });

describe('figureLegibility', () => {
  it('figureLegibility counts nothing for a label just beyond its own bond end', () => {
    const l = figureLegibility(scene([bond(10, 50, 40, 50, [0, 1]), label('OH', 40 + 1.5 + 4.8, 53, 1)]));
    expect(l.total).toBe(0);
  });

  it('figureLegibility counts a label nearer another bond end than its own, and one too far', () => {
    const l = figureLegibility(scene([bond(10, 50, 40, 50, [0, 1]), bond(60, 20, 60, 50, [2, 3]), label('OH', 57, 53, 1)]));
    expect(l.counts.labelNearerOther).toBe(1);
    expect(l.counts.labelFarFromBond).toBe(1);
    expect(l.counts.textOverlaps).toBe(1);
  });

  it('figureLegibility counts a bond end on another bond and an uncut crossing, not a crossing with a halo', () => {
    const cross = [bond(0, 0, 20, 20, [0, 1]), bond(0, 20, 20, 0, [2, 3])];
    expect(figureLegibility(scene(cross)).counts.uncutCrossings).toBe(1);
    const halo: SceneItem = { type: 'line', role: 'bond-halo', x1: 8, y1: 12, x2: 12, y2: 8, atoms: [2, 3] };
    expect(figureLegibility(scene([cross[0]!, halo, cross[1]!])).counts.uncutCrossings).toBe(0);
    expect(figureLegibility(scene([bond(0, 0, 20, 0, [0, 1]), bond(10, 0.5, 10, 20, [4, 5])])).counts.bondEndOnBond).toBe(1);
  });
});
