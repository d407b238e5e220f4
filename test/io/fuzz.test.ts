/**
 * Fuzzing of every reader: random mutations of valid files (delete, duplicate, swap or replace lines; insert,
 * delete or replace characters) and random text. Only ParseError may come out, and every record that is
 * read is sound (finite coordinates, consistent sizes, bonds between existing atoms).
 * Runs a few thousand cases with a fixed seed; scale with FUZZ_RUNS (cases per reader).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseTextSettled } from '../../src/io/parseText.js';
import { ParseError } from '../../src/model/errors.js';
import type { FormatName } from '../../src/model/molecule.js';

const RUNS = Number(process.env.FUZZ_RUNS ?? 800);
const data = join(import.meta.dirname, '../data');
const read = (f: string) => readFileSync(join(data, f), 'utf8');

const XYZ = '3\nwater energy=-76.4 note="a b"\nO 0 0 0\nH 0.957 0 0\nH -0.24 0.927 0\n2\nH2\nH 0 0 0\nH 0 0 0.74\n';
const V3000 = read('bad/v3000-bad-bond.sdf').replace('1 1 5', '1 1 3');
const SDF = `${read('good-water.sdf').replace('$$$$', '> <energy>\n-1.5 kcal\n\n$$$$')}${V3000}`;
const PDB = `MODEL        1\n${read('good-water.pdb').replace('END\n', 'ENDMDL\n')}MODEL        2\n${read('good-water.pdb')}`;
const SEEDS: ReadonlyArray<readonly [FormatName, string]> = [['xyz', XYZ], ['sdf', SDF], ['pdb', PDB]];

const pieces = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.constantFrom('NaN', 'Infinity', '1e999', '-0', '999999999999', '$$$$', 'M  END', 'M  V30 END CTAB', 'ENDMDL', 'CONECT    1   77', '> <energy>', '\t', '  ', '\u0000', 'é', 'V3000', 'MODEL        3'),
);

/** One random edit of a list of lines. */
const edit = fc.oneof(
  fc.record({ kind: fc.constant('delete-line' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('duplicate-line' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('swap-lines' as const), at: fc.nat(), to: fc.nat() }),
  fc.record({ kind: fc.constant('replace-line' as const), at: fc.nat(), text: pieces }),
  fc.record({ kind: fc.constant('insert-text' as const), at: fc.nat(), col: fc.nat(), text: pieces }),
  fc.record({ kind: fc.constant('delete-chars' as const), at: fc.nat(), col: fc.nat(), n: fc.integer({ min: 1, max: 6 }) }),
);
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function apply(text: string, edits: readonly Edit[]): string {
  const lines = text.split('\n');
  for (const e of edits) {
    const i = e.at % Math.max(lines.length, 1);
    const line = lines[i] ?? '';
    if (e.kind === 'delete-line') lines.splice(i, 1);
    else if (e.kind === 'duplicate-line') lines.splice(i, 0, line);
    else if (e.kind === 'swap-lines') {
      const j = e.to % Math.max(lines.length, 1);
      [lines[i], lines[j]] = [lines[j] ?? '', line];
    } else if (e.kind === 'replace-line') lines[i] = e.text;
    else if (e.kind === 'insert-text') {
      const c = e.col % (line.length + 1);
      lines[i] = line.slice(0, c) + e.text + line.slice(c);
    } else {
      const c = e.col % (line.length + 1);
      lines[i] = line.slice(0, c) + line.slice(c + e.n);
    }
  }
  return lines.join('\n');
}

/** Parses and checks the invariants; anything thrown that is not a ParseError fails the property. */
function check(text: string, format?: FormatName): void {
  let settled;
  try {
    settled = parseTextSettled(text, { file: 'fuzz', format });
  } catch (err) {
    if (err instanceof ParseError) return;
    throw err;
  }
  for (const r of settled) {
    if (!r.ok) {
      expect(r.error).toBeInstanceOf(ParseError);
      for (const i of r.error.issues) expect(i.line === null || (Number.isInteger(i.line) && i.line >= 1)).toBe(true);
      continue;
    }
    const m = r.molecule;
    expect(m.coords.length).toBe(3 * m.atoms.length);
    expect(m.atoms.length).toBeGreaterThan(0);
    for (const v of m.coords) expect(Number.isFinite(v)).toBe(true);
    for (const b of m.bonds ?? []) {
      expect(b.a).toBeGreaterThanOrEqual(0);
      expect(b.a).toBeLessThan(b.b);
      expect(b.b).toBeLessThan(m.atoms.length);
    }
  }
}

describe('readers under fuzzing', () => {
  it.each(SEEDS)('parseTextSettled(mutated %s) throws only ParseError and never yields NaN', (format, seed) => {
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 5 }), fc.boolean(), (edits, forced) => {
        check(apply(seed, edits), forced ? format : undefined);
      }),
      { seed: 424242, numRuns: RUNS },
    );
  });

  it('parseTextSettled(random text) throws only ParseError for every format', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 300, unit: 'binary' }), fc.constantFrom<FormatName | undefined>('xyz', 'sdf', 'pdb', undefined), (text, format) => {
        check(text, format);
      }),
      { seed: 1201, numRuns: RUNS },
    );
  });
});
