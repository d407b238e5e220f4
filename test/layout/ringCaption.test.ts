import { describe, expect, it } from 'vitest';
import { descriptorRuns, numberText } from '../../src/layout/ring/ringCaption.js';
import { groupText } from '../../src/layout/ring/ringLabels.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { groupLabel, isTerminalDouble } from '../../src/layout/text/groupLabel.js';

describe('descriptorRuns', () => {
  it('descriptorRuns(4C1) is a raised 4, the letter and a lowered 1 (typeset runs, not Unicode script digits)', () => {
    expect(descriptorRuns({ letter: 'C', above: ['4'], below: ['1'] })).toEqual([{ text: '4', level: 'sup' }, { text: 'C', level: 'base' }, { text: '1', level: 'sub' }]);
    expect(descriptorRuns({ letter: 'B', above: [], below: ['2', '5'] })).toEqual([{ text: 'B', level: 'base' }, { text: '2,5', level: 'sub' }]);
    expect(descriptorRuns({ letter: 'E', above: [], below: ['O'] })).toEqual([{ text: 'E', level: 'base' }, { text: 'O', level: 'sub' }]);
  });
  it('descriptorRuns(3,OB) and (OS2) raise or lower the locants that are not plain digits as smaller runs', () => {
    expect(descriptorRuns({ letter: 'B', above: ['3', 'O'], below: [] })).toEqual([{ text: '3,O', level: 'sup' }, { text: 'B', level: 'base' }]);
    expect(descriptorRuns({ letter: 'S', above: ['O'], below: ['2'] })).toEqual([{ text: 'O', level: 'sup' }, { text: 'S', level: 'base' }, { text: '2', level: 'sub' }]);
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

describe('groupLabel', () => {
  // ring C0 with: tBu C1(C2,C3,C4); OAc O5–C6(=O7)–C8; NHAc N9(H10)–C11(=O12)–C13; CO2Me C14(=O15)–O16–C17
  const el = ['C', 'C', 'C', 'C', 'C', 'O', 'C', 'O', 'C', 'N', 'H', 'C', 'O', 'C', 'C', 'O', 'O', 'C'];
  const pairs = [[0, 1], [1, 2], [1, 3], [1, 4], [0, 5], [5, 6], [6, 7], [6, 8], [0, 9], [9, 10], [9, 11], [11, 12], [11, 13], [0, 14], [14, 15], [14, 16], [16, 17]];
  const heavy = el.map((element) => ({ element, name: null }));
  // fill carbons to four bonds with hydrogens so the groups are what they claim to be
  const atoms = [...heavy];
  const bonds = pairs.map(([a, b]) => ({ a: a!, b: b!, order: (a === 6 && b === 7) || (a === 11 && b === 12) || (a === 14 && b === 15) ? 2 : 1, perceived: false }));
  for (const c of [2, 3, 4, 8, 13, 17]) for (let k = 0; k < 3; k++) { atoms.push({ element: 'H', name: null }); bonds.push({ a: c, b: atoms.length - 1, order: 1, perceived: false }); }
  const mol = { atoms };
  const graph = buildGraph(atoms.length, bonds);
  const text = (runs: readonly { text: string; shift?: string }[]) => runs.map((r) => (r.shift === 'sub' ? `_${r.text}` : r.text)).join('');
  it('groupLabel abbreviates tBu, OAc/AcO, NHAc/AcHN and CO₂Me/MeO₂C, the bonded atom at the bond end', () => {
    expect(text(groupLabel(mol, graph, 1, 0).forward)).toBe('tBu');
    expect([text(groupLabel(mol, graph, 5, 0).forward), text(groupLabel(mol, graph, 5, 0).reversed)]).toEqual(['OAc', 'AcO']);
    expect([text(groupLabel(mol, graph, 9, 0).forward), text(groupLabel(mol, graph, 9, 0).reversed)]).toEqual(['NHAc', 'AcHN']);
    expect([text(groupLabel(mol, graph, 14, 0).forward), text(groupLabel(mol, graph, 14, 0).reversed)]).toEqual(['CO_2Me', 'MeO_2C']);
    expect(isTerminalDouble(mol, graph, 14, 15)).toBe(true);
    expect(isTerminalDouble(mol, graph, 14, 16)).toBe(false);
  });
  it('groupLabel names a fused neighbour by its locant and falls back to a condensed formula', () => {
    expect(text(groupLabel(mol, graph, 1, 0, { rings: [[0, 1, 2, 3]], names: new Map([[1, 'C4a']]) }).forward)).toBe('C4a');
    // propyl without hydrogens: C0–Ca–Cb–Cc, written with bond dashes
    const p = buildGraph(4, [[0, 1], [1, 2], [2, 3]].map(([a, b]) => ({ a: a!, b: b!, order: 1, perceived: false })));
    const pm = { atoms: ['C', 'C', 'C', 'C'].map((element) => ({ element, name: null })) };
    expect([text(groupLabel(pm, p, 1, 0).forward), text(groupLabel(pm, p, 1, 0).reversed)]).toEqual(['C–C–C', 'C–C–C']);
  });
});
