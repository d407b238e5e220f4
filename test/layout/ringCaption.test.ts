import { describe, expect, it } from 'vitest';
import { descriptorRuns, numberText } from '../../src/layout/ring/ringCaption.js';
import { groupText } from '../../src/layout/ring/ringLabels.js';
import { buildGraph } from '../../src/perceive/graph.js';

describe('descriptorRuns', () => {
  it('descriptorRuns(4C1) is one run with Unicode super/subscript digits', () => {
    expect(descriptorRuns({ letter: 'C', above: ['4'], below: ['1'] })).toEqual([{ text: '⁴C₁', level: 'base' }]);
  });
  it('descriptorRuns(3,OB) and (OS2) raise or lower the locants that are not plain digits as smaller runs', () => {
    expect(descriptorRuns({ letter: 'B', above: ['3', 'O'], below: [] })).toEqual([{ text: '3,O', level: 'sup' }, { text: 'B', level: 'base' }]);
    expect(descriptorRuns({ letter: 'S', above: ['O'], below: ['2'] })).toEqual([{ text: 'O', level: 'sup' }, { text: 'S₂', level: 'base' }]);
  });
  it('numberText prints a true minus, no negative zero, and an em dash for null', () => {
    expect(numberText(-1.25, 1)).toBe('−1.3');
    expect(numberText(-0.0001, 2)).toBe('0.00');
    expect(numberText(null, 1)).toBe('—');
  });
});

describe('groupText', () => {
  it('groupText condenses CH₂OH, OH and CH₃ groups from the atom bonded to the ring', () => {
    // ring C0; C1 (H2, H3) – O4 – H5; methyl C6 (H7, H8, H9)
    const el = ['C', 'C', 'H', 'H', 'O', 'H', 'C', 'H', 'H', 'H'];
    const bonds = [[0, 1], [1, 2], [1, 3], [1, 4], [4, 5], [0, 6], [6, 7], [6, 8], [6, 9]].map(([a, b]) => ({ a: a!, b: b!, order: 1, perceived: false }));
    const mol = { atoms: el.map((element) => ({ element, name: null })) };
    const graph = buildGraph(el.length, bonds);
    expect(groupText(mol, graph, 1, 0)).toBe('CH₂OH');
    expect(groupText(mol, graph, 6, 0)).toBe('CH₃');
    expect(groupText(mol, graph, 4, 1)).toBe('OH');
  });

  it('groupText of a hydrogen-free CH₂OH is C–O, not CO (which reads as a carbonyl)', () => {
    const el = ['C', 'C', 'O'];
    const bonds = [[0, 1], [1, 2]].map(([a, b]) => ({ a: a!, b: b!, order: 1, perceived: true }));
    const mol = { atoms: el.map((element) => ({ element, name: null })) };
    expect(groupText(mol, buildGraph(3, bonds), 1, 0)).toBe('C–O');
  });
});
