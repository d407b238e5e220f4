import { describe, expect, it } from 'vitest';
import { atomIndex } from '../../src/perceive/atomIndex.js';
import { molecule } from './fixtures.js';
import { failure, sugar } from './selection.js';

describe('atomIndex', () => {
  it('atomIndex reads a number as a 1-based file index and a name as an atom name', () => {
    expect(atomIndex(sugar, '1')).toBe(0);
    expect(atomIndex(sugar, ' 10 ')).toBe(9);
    expect(atomIndex(sugar, 'O5')).toBe(0);
    expect(atomIndex(sugar, 'C3')).toBe(3);
    expect(atomIndex(sugar, 'c3')).toBe(3); // case-insensitive when no exact match
  });

  it('atomIndex reports an index out of range with the atom count', () => {
    expect(failure(() => atomIndex(sugar, '99'))).toEqual(['unknown-atom', 'test.xyz: atom 99 does not exist (the record has 10 atoms)']);
    expect(failure(() => atomIndex(sugar, '0'))[0]).toBe('unknown-atom');
  });

  it('atomIndex reports an unknown name with the names that exist', () => {
    expect(failure(() => atomIndex(sugar, 'C9'))).toEqual([
      'unknown-atom',
      'test.xyz: no atom named C9; names in the record: O5, C1, C2, C3, C4, C5, O1, H (atom numbers are 1–10)',
    ]);
    const many = molecule(Array(30).fill('C'), Array.from({ length: 30 }, (_, i) => [i * 3, 0, 0]), null, Array.from({ length: 30 }, (_, i) => `C${i + 1}`));
    const [, message] = failure(() => atomIndex(many, 'N1'));
    expect(message).toContain('C12, … (18 more)');
    expect(message).not.toContain('C13');
    const nameless = molecule(['C', 'C'], [[0, 0, 0], [1.5, 0, 0]]);
    expect(failure(() => atomIndex(nameless, 'C1'))[1]).toBe(
      'test.xyz: no atom named C1; the record has no atom names (atom numbers are 1–2)',
    );
  });

  it('atomIndex reports an ambiguous name with the atoms that carry it', () => {
    expect(failure(() => atomIndex(sugar, 'H'))).toEqual([
      'ambiguous-atom',
      'test.xyz: atom name H is ambiguous: atoms 8, 9 carry it; use an atom number',
    ]);
    expect(failure(() => atomIndex(sugar, ' '))[0]).toBe('bad-selection');
  });
});
