import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseText, parseTextSettled } from '../../src/io/parseText.js';
import { readRecordsSettled } from '../../src/io/readRecords.js';
import { ParseError } from '../../src/model/errors.js';

const dir = join(import.meta.dirname, '../data/bad');

/** file → every outcome in order: 'ok' or [code, line, message]. */
const CASES: ReadonlyArray<readonly [string, ReadonlyArray<'ok' | readonly [string, number | null, string]>]> = [
  ['empty.xyz', [['empty-file', null, 'the file is empty']]],
  ['blank.xyz', [['empty-file', null, 'the file is empty']]],
  ['truncated.xyz', [['truncated', 1, 'expected 3 atoms, found 2']]],
  ['wrong-count.xyz', [['wrong-count', 1, 'expected 3 atoms, found 2'], 'ok']],
  ['extra-atoms.xyz', ['ok', ['wrong-count', 6, 'more atom lines than the count line of frame 1 says (3)']]],
  ['garbage.bin', [['binary-input', 1, 'this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text']]],
  ['nan.xyz', [['bad-number', 4, "x coordinate 'NaN' is not a number"]]],
  ['infinite.xyz', [['bad-number', 4, "x coordinate '1e999' is not finite"]]],
  ['not-a-number.xyz', [['bad-number', 4, "y coordinate 'abc' is not a number"]]],
  ['unknown-element.xyz', [['unknown-element', 4, "unknown element 'Qz'"]]],
  ['huge-count.xyz', [['too-many-atoms', 1, 'count line says 999999999999 atoms; the limit is 1000000 (option maxAtoms)']]],
  ['overlap.xyz', [['overlapping-atoms', 5, 'atoms 2 (H) and 3 (H) are 0.12 Å apart, closer than 0.4 Å']]],
  ['no-count.xyz', [['bad-count', 1, "expected an atom count, found 'water'"]]],
  ['negative-count.xyz', [['bad-count', 1, "expected an atom count, found '-3'"]]],
  ['short-line.xyz', [['bad-atom-line', 3, "expected an element and x y z, found 'O 0.000 0.000'"]]],
  ['bad-bond.sdf', [['bad-bond', 9, 'bond 2 refers to atom 4, but the record has 3 atoms']]],
  ['truncated.sdf', [['truncated', 4, 'expected 3 atoms, found 2']]],
  ['truncated-bonds.sdf', [['truncated', 4, 'expected 2 bonds, found 1']]],
  ['wrong-count.sdf', [['wrong-count', 4, 'expected 4 atoms, found 3']]],
  ['few-bonds.sdf', [['wrong-count', 4, 'counts line says 1 bond, but a bond line follows them (line 9)']]],
  ['few-atoms.sdf', [['wrong-count', 4, 'counts line says 2 atoms, but an atom line follows them (line 7)']]],
  ['bad-counts.sdf', [['bad-count', 4, "expected a counts line (atoms, bonds, ..., V2000), found 'x  y  0  0  0  0  0  0  0  0999 V2000'"]]],
  ['nan.sdf', [['bad-number', 6, "x coordinate 'NaN' is not a number"]]],
  ['unknown-element.sdf', [['unknown-element', 6, "unknown element 'Qq'"]]],
  ['bad-charge.sdf', [['bad-charge', 10, 'charge given for atom 9, but the record has 3 atoms']]],
  ['no-m-end.sdf', [['truncated', 4, 'record ends before M  END']]],
  ['one-bad-of-three.sdf', ['ok', ['bad-bond', 20, 'bond 2 refers to atom 7, but the record has 3 atoms'], 'ok']],
  ['v3000-bad-bond.sdf', [['bad-bond', 14, 'bond 2 refers to atom 5, which is not in the atom block']]],
  ['v3000-truncated.sdf', [['truncated', 16, 'the V3000 table ends without END CTAB']]],
  ['v3000-wrong-count.sdf', [['wrong-count', 6, 'expected 3 atoms, found 2']]],
  ['v3000-huge-count.sdf', [['too-many-atoms', 6, 'counts line says 999999999999 atoms; the limit is 1000000 (option maxAtoms)']]],
  ['bad-conect.pdb', [['bad-bond', 5, 'CONECT refers to atom serial 99, which is not in the file']]],
  ['bad-conect-text.pdb', [['bad-conect', 5, "expected atom serial numbers in CONECT, found 'two'"]]],
  ['bad-coords.pdb', [['bad-number', 3, "x coordinate 'x.957' is not a number (columns 31-38)"]]],
  ['unknown-element.pdb', [['unknown-element', 3, "unknown element 'XX' (columns 77-78)"]]],
  ['overlap.pdb', [['overlapping-atoms', 3, 'atoms A/HOH1/O (atom 1) and A/HOH1/H1 (atom 2) are 0.10 Å apart inside one residue, closer than 0.4 Å']]],
];

type Outcome = 'ok' | readonly [string, number | null, string];
const outcome = (r: { ok: true } | { ok: false; error: ParseError }): Outcome => {
  if (r.ok) return 'ok';
  const i = r.error.issues[0]!;
  return [i.code, i.line, i.message];
};
/** The corpus is read as XYZ when the name does not tell (garbage.bin). */
const format = (file: string) => (file.endsWith('.bin') ? ('xyz' as const) : undefined);

describe('bad input corpus (test/data/bad)', () => {
  it.each(CASES)('parseTextSettled(%s) reports the expected issues', (file, expected) => {
    const bytes = readFileSync(join(dir, file));
    const text = file.endsWith('.bin') ? bytes.toString('latin1') : bytes.toString('utf8');
    expect(parseTextSettled(text, { file, format: format(file) }).map(outcome)).toEqual(expected);
  });

  it.each(CASES)('readRecordsSettled(%s) streams the same outcomes', async (file, expected) => {
    const got: Outcome[] = [];
    for await (const r of readRecordsSettled(join(dir, file), { format: format(file) })) got.push(outcome(r));
    expect(got).toEqual(expected);
  });

  it('parseText(bad file) throws a ParseError whose issues carry file and line', () => {
    const text = readFileSync(join(dir, 'one-bad-of-three.sdf'), 'utf8');
    let caught: unknown;
    try {
      parseText(text, { file: 'one-bad-of-three.sdf' });
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(ParseError);
    expect((caught as ParseError).message).toBe('one-bad-of-three.sdf:20: bond 2 refers to atom 7, but the record has 3 atoms');
  });
});
