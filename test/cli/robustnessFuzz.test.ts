/**
 * Fuzzing through the API the CLI calls: `inspectFile` on random mutations of valid files, `newmanFigure`
 * and `chairFigure` on random geometries including degenerate ones (collinear axes, coincident atoms,
 * zero-length bonds, flat rings, huge coordinates). Only ConformarkError may come out; no output carries
 * NaN, Infinity or `undefined`; every SVG is free of scripts and well formed. Fixed seeds; scale the number
 * of cases with FUZZ_RUNS (`npm run fuzz`).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inspectFile } from '../../src/api/inspect/inspect.js';
import { inspectText } from '../../src/api/inspect/inspectText.js';
import { jsonText } from '../../src/api/jsonText.js';
import { newmanFigure } from '../../src/api/figures/newman.js';
import { chairFigure } from '../../src/api/figures/chair.js';
import { toNewmanJson } from '../../src/analysis/newmanJson.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Bond, Molecule } from '../../src/model/molecule.js';
import { degenerateXyz, leaks, unsafeMarkup } from './robustnessHelpers.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';

const RUNS = Number(process.env.FUZZ_RUNS ?? 0);
/** Cases per property in `npm test` (a few thousand in all); FUZZ_RUNS replaces them. */
const runs = (normal: number) => (RUNS > 0 ? RUNS : normal);

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-fuzz-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A missing or non-finite value interpolated into prose ("atom undefined", "Cundefined", "NaN°"); the word itself may appear. */
const PROSE_LEAK = /\bNaN\b|Infinity|[A-Za-z0-9](?:undefined|null)\b|\b(?:undefined|null)[0-9°Å]|(?:atom|bond|ring|record) (?:undefined|null)\b/;

/** Fails the property unless `err` is a user error with a code and a one-line message. */
function expectUserError(err: unknown): void {
  if (!(err instanceof ConformarkError)) throw err;
  for (const issue of err.issues) {
    expect(issue.code).toMatch(/^[a-z][a-z0-9-]*$/);
    expect(issue.message).not.toContain('\n');
    // quoted input ('NaN' as the file wrote it) is fine; values computed by us are not
    expect(issue.message.replace(/'[^']*'/g, "''")).not.toMatch(PROSE_LEAK);
  }
}

const SDF_SIX = [
  'cyclohexane',
  '  conformark',
  '',
  '  6  6  0  0  0  0  0  0  0  0999 V2000',
  ...[
    [1.2613, 0.728, 0.2313],
    [0, 1.456, -0.2313],
    [-1.2613, 0.728, 0.2313],
    [-1.2613, -0.728, -0.2313],
    [0, -1.456, 0.2313],
    [1.2613, -0.728, -0.2313],
  ].map(([x, y, z]) => `${x!.toFixed(4).padStart(10)}${y!.toFixed(4).padStart(10)}${z!.toFixed(4).padStart(10)} C   0  0  0  0  0  0  0  0  0  0  0  0`),
  ...[[1, 2], [2, 3], [3, 4], [4, 5], [5, 6], [6, 1]].map(([a, b]) => `${String(a).padStart(3)}${String(b).padStart(3)}  1  0`),
  'M  END',
  '> <energy (kcal/mol)>',
  '1.25',
  '',
  '$$$$',
  '',
].join('\n');
const SEEDS: readonly (readonly [string, string])[] = [
  ['xyz', degenerateXyz()],
  ['sdf', SDF_SIX],
  ['pdb', 'ATOM      1  O   HOH A   1       0.000   0.000   0.000  1.00  0.00           O\nATOM      2  H1  HOH A   1       0.957   0.000   0.000  1.00  0.00           H\nATOM      3  H2  HOH A   1      -0.240   0.927   0.000  1.00  0.00           H\nCONECT    1    2    3\nEND\n'],
];

const piece = fc.oneof(
  fc.string({ maxLength: 8 }),
  fc.constantFrom('NaN', '1e308', '-1e308', '1e-320', '-0', '0', '99999', '$$$$', 'M  END', '\t', '\r', '\u202e', '<script>', ']]>', '&', '"', '\u0007', 'energy=abc', 'C', 'H'),
);
/** A random edit of the lines of a file. */
const edit = fc.oneof(
  fc.record({ kind: fc.constant('delete' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('duplicate' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('swap' as const), at: fc.nat(), to: fc.nat() }),
  fc.record({ kind: fc.constant('replace-token' as const), at: fc.nat(), token: fc.nat(), text: piece }),
  fc.record({ kind: fc.constant('insert-text' as const), at: fc.nat(), col: fc.nat(), text: piece }),
);
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function mutate(text: string, edits: readonly Edit[]): string {
  const lines = text.split('\n');
  for (const e of edits) {
    const i = e.at % lines.length;
    if (e.kind === 'delete' && lines.length > 1) lines.splice(i, 1);
    else if (e.kind === 'duplicate') lines.splice(i, 0, lines[i]!);
    else if (e.kind === 'swap') [lines[i], lines[e.to % lines.length]] = [lines[e.to % lines.length]!, lines[i]!];
    else if (e.kind === 'replace-token') {
      const tokens = lines[i]!.split(/(\s+)/);
      const words = tokens.map((t, k) => (/\S/.test(t) ? k : -1)).filter((k) => k >= 0);
      if (words.length > 0) tokens[words[e.token % words.length]!] = e.text;
      lines[i] = tokens.join('');
    } else if (e.kind === 'insert-text') {
      const line = lines[i]!;
      const col = line.length === 0 ? 0 : e.col % line.length;
      lines[i] = line.slice(0, col) + e.text + line.slice(col);
    }
  }
  return lines.join('\n');
}

describe('fuzzing the CLI-level API', () => {
  it('inspectFile(random mutation of a valid file) reports or throws ConformarkError; JSON and text are clean', async () => {
    let n = 0;
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...SEEDS), fc.array(edit, { minLength: 1, maxLength: 4 }), fc.boolean(), async ([ext, seed], edits, couplings) => {
        const path = join(dir, `case-${n++}.${ext}`);
        writeFileSync(path, mutate(seed, edits));
        try {
          const report = await inspectFile(path, { couplings });
          expect(leaks(jsonText(report))).toEqual([]);
          // titles are the file's text, and error lines quote the input ('NaN' as the file wrote it)
          expect(inspectText(report).replace(/"[^"\n]*"/g, '""').replace(/'[^'\n]*'/g, "''")).not.toMatch(PROSE_LEAK);
          for (const e of report.errors) expectUserError(new ConformarkError(e));
        } catch (err) {
          expectUserError(err);
        } finally {
          rmSync(path, { force: true });
        }
      }),
      { seed: 20261201, numRuns: runs(1200) },
    );
  }, 120_000);

  const coordinate = fc.oneof(
    { weight: 6, arbitrary: fc.double({ min: -3, max: 3, noNaN: true }) },
    { weight: 1, arbitrary: fc.constantFrom(0, -0, 1e-9, -1e-9, 1e6, -1e6, 1.54) },
  );
  const point = fc.tuple(coordinate, coordinate, coordinate);
  /** Two bonded centres and up to three substituents on each; some positions copied, collinear or on the axis. */
  const newmanCase = fc.record({
    back: fc.oneof(point, fc.constant([1.54, 0, 0] as [number, number, number]), fc.constant([0, 0, 0] as [number, number, number])),
    front: fc.array(point, { maxLength: 3 }),
    rear: fc.array(point, { maxLength: 3 }),
    elements: fc.array(fc.constantFrom('H', 'C', 'O', 'Cl'), { minLength: 8, maxLength: 8 }),
    onAxis: fc.boolean(),
    angles: fc.constantFrom('true' as const, 'ideal' as const),
    hydrogens: fc.constantFrom('show' as const, 'hide' as const, 'collapse' as const),
    labels: fc.constantFrom('element' as const, 'id' as const, 'name' as const),
  });

  it('newmanFigure(random geometry incl. degenerate) gives clean SVG and JSON or a ConformarkError', () => {
    fc.assert(
      fc.property(newmanCase, (c) => {
        const points = [[0, 0, 0] as const, c.back, ...c.front, ...c.rear];
        if (c.onAxis && c.front.length > 0) points[2] = [-c.back[0], -c.back[1], -c.back[2]];
        const bonds: Bond[] = [{ a: 0, b: 1, order: 1, perceived: false }];
        c.front.forEach((_, k) => bonds.push({ a: 0, b: 2 + k, order: 1, perceived: false }));
        c.rear.forEach((_, k) => bonds.push({ a: 1, b: 2 + c.front.length + k, order: 1, perceived: false }));
        const mol: Molecule = {
          title: 'fuzz <case> & "more"',
          atoms: points.map((_, i) => ({ element: i < 2 ? 'C' : c.elements[i - 2]!, name: `X${i + 1}` })),
          coords: Float64Array.from(points.flat()),
          bonds,
          properties: {},
          source: { file: 'fuzz.sdf', format: 'sdf', index: 1, line: 1 },
        };
        try {
          const fig = newmanFigure(mol, { bond: [0, 1], couplings: true, angles: c.angles, hydrogens: c.hydrogens, labels: c.labels });
          expect(leaks(fig.svg)).toEqual([]);
          expect(unsafeMarkup(fig.svg)).toEqual([]);
          expect(xmlProblems(fig.svg)).toEqual([]);
          expect(leaks(jsonText(toNewmanJson(fig.view, mol, { couplings: [...fig.couplings] })))).toEqual([]);
          for (const w of fig.warnings) expect(w.message).not.toMatch(PROSE_LEAK);
        } catch (err) {
          expectUserError(err);
          if (process.env.FUZZ_LOG) console.log((err as Error).message);
        }
      }),
      { seed: 4242, numRuns: runs(400) },
    );
  }, 120_000);

  /** A six-ring: radius, puckering scale, per-atom noise; sometimes flat, tiny or with two atoms on one spot. */
  const ringCase = fc.record({
    radius: fc.oneof(fc.double({ min: 1.2, max: 1.7, noNaN: true }), fc.constantFrom(1e-6, 0.2, 50)),
    pucker: fc.oneof(fc.double({ min: -0.4, max: 0.4, noNaN: true }), fc.constantFrom(0, 1e-7)),
    noise: fc.array(fc.double({ min: -0.05, max: 0.05, noNaN: true }), { minLength: 18, maxLength: 18 }),
    merge: fc.boolean(),
    view: fc.constantFrom(undefined, 'template' as const, 'projected' as const),
  });

  it('chairFigure(random six-ring incl. flat and collapsed) gives clean SVG or a ConformarkError', () => {
    fc.assert(
      fc.property(ringCase, (c) => {
        const coords = new Float64Array(18);
        for (let k = 0; k < 6; k++) {
          const a = (Math.PI / 3) * k;
          coords[3 * k] = c.radius * Math.cos(a) + c.noise[3 * k]!;
          coords[3 * k + 1] = c.radius * Math.sin(a) + c.noise[3 * k + 1]!;
          coords[3 * k + 2] = c.pucker * (k % 2 === 0 ? 1 : -1) + c.noise[3 * k + 2]!;
        }
        if (c.merge) coords.copyWithin(3, 0, 3);
        const mol: Molecule = {
          title: 'ring ]]> <script>',
          atoms: Array.from({ length: 6 }, (_, i) => ({ element: i === 0 ? 'O' : 'C', name: `C${i + 1}` })),
          coords,
          bonds: Array.from({ length: 6 }, (_, k) => ({ a: k, b: (k + 1) % 6, order: 1, perceived: false })),
          properties: {},
          source: { file: 'ring.sdf', format: 'sdf', index: 1, line: 1 },
        };
        try {
          const fig = chairFigure(mol, { view: c.view });
          expect(leaks(fig.svg)).toEqual([]);
          expect(unsafeMarkup(fig.svg)).toEqual([]);
          expect(xmlProblems(fig.svg)).toEqual([]);
        } catch (err) {
          expectUserError(err);
          if (process.env.FUZZ_LOG) console.log((err as Error).message);
        }
      }),
      { seed: 777, numRuns: runs(300) },
    );
  }, 120_000);
});
