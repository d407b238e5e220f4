import { describe, expect, it } from 'vitest';
import { ringSelection } from '../../src/perceive/ringSelection.js';
import { findRings } from '../../src/perceive/findRings.js';
import { failure, graph, sugar } from './selection.js';

const rings = findRings(graph);

describe('ringSelection', () => {
  it('ringSelection reads a ring number as listed (1-based) and returns a copy', () => {
    expect(rings).toEqual([[0, 1, 2, 3, 4, 5]]);
    const picked = ringSelection(sugar, graph, rings, '1');
    expect(picked).toEqual([0, 1, 2, 3, 4, 5]);
    picked.push(99);
    expect(rings[0]).toHaveLength(6);
  });

  it('ringSelection uses an atom list in exactly the order given', () => {
    expect(ringSelection(sugar, graph, rings, '2-3-4-5-6-1')).toEqual([1, 2, 3, 4, 5, 0]);
    expect(ringSelection(sugar, graph, rings, 'O5-C5-C4-C3-C2-C1')).toEqual([0, 5, 4, 3, 2, 1]);
    expect(ringSelection(sugar, graph, rings, '1-2-3-4-5-6-1')).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('ringSelection reports a walk that is not closed along bonds', () => {
    expect(failure(() => ringSelection(sugar, graph, rings, '1-2-3-4-6-5'))).toEqual([
      'not-bonded',
      "test.xyz: atoms 4 and 6 are not bonded, so '1-2-3-4-6-5' is not a closed ring walk",
    ]);
    expect(failure(() => ringSelection(sugar, graph, rings, '1-2-3-4-5'))[1]).toBe(
      "test.xyz: atoms 5 and 1 are not bonded, so '1-2-3-4-5' is not a closed ring walk",
    );
  });

  it('ringSelection reports unknown ring numbers, short lists and repeated atoms', () => {
    expect(failure(() => ringSelection(sugar, graph, rings, '2'))).toEqual(['unknown-ring', 'test.xyz: ring 2 does not exist (the record has 1 ring)']);
    expect(failure(() => ringSelection(sugar, graph, [], '1'))[1]).toBe('test.xyz: ring 1 does not exist (the record has no rings)');
    expect(failure(() => ringSelection(sugar, graph, rings, '0'))[0]).toBe('unknown-ring');
    expect(failure(() => ringSelection(sugar, graph, rings, '1-2'))[0]).toBe('bad-selection');
    expect(failure(() => ringSelection(sugar, graph, rings, '1-2-3-2'))[0]).toBe('bad-selection');
    expect(failure(() => ringSelection(sugar, graph, rings, '1--2-3'))[0]).toBe('bad-selection');
    expect(failure(() => ringSelection(sugar, graph, rings, '1-2-3-4-5-77'))[0]).toBe('unknown-atom');
  });
});
