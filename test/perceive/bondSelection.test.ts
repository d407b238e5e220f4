import { describe, expect, it } from 'vitest';
import { bondListSelection, bondSelection } from '../../src/perceive/bondSelection.js';
import { failure, graph, sugar } from './selection.js';

describe('bondSelection', () => {
  it('bondSelection resolves numbers and names in the order given', () => {
    expect(bondSelection(sugar, graph, '2-3')).toEqual([1, 2]);
    expect(bondSelection(sugar, graph, '3-2')).toEqual([2, 1]);
    expect(bondSelection(sugar, graph, 'C1-O5')).toEqual([1, 0]);
    expect(bondSelection(sugar, graph, 'C1 - 7')).toEqual([1, 6]);
  });

  it('bondSelection reports unbonded, missing and malformed bonds', () => {
    expect(failure(() => bondSelection(sugar, graph, '3-5'))).toEqual(['not-bonded', 'test.xyz: atoms 3 and 5 are not bonded']);
    expect(failure(() => bondSelection(sugar, graph, '3-99'))).toEqual([
      'unknown-atom',
      'test.xyz: atom 99 does not exist (the record has 10 atoms)',
    ]);
    expect(failure(() => bondSelection(sugar, graph, '3'))[0]).toBe('bad-selection');
    expect(failure(() => bondSelection(sugar, graph, '1-2-3'))[0]).toBe('bad-selection');
    expect(failure(() => bondSelection(sugar, graph, '3-'))[0]).toBe('bad-selection');
    expect(failure(() => bondSelection(sugar, graph, 'C2-3'))).toEqual(['bad-selection', "test.xyz: bond 'C2-3' names atom 3 twice"]);
  });
});

describe('bondListSelection', () => {
  it('bondListSelection resolves a comma-separated list in order', () => {
    expect(bondListSelection(sugar, graph, '1-2, C2-C3,4-5')).toEqual([[0, 1], [2, 3], [3, 4]]);
    expect(bondListSelection(sugar, graph, '2-1')).toEqual([[1, 0]]);
  });

  it('bondListSelection reports an empty entry and the first bad bond', () => {
    expect(failure(() => bondListSelection(sugar, graph, '1-2,,3-4'))[0]).toBe('bad-selection');
    expect(failure(() => bondListSelection(sugar, graph, '1-2,3-5'))[1]).toBe('test.xyz: atoms 3 and 5 are not bonded');
  });
});
