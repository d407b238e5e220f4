/**
 * Safety of what conformark writes: hostile themes are refused with one line per problem, text from files is
 * escaped and cleaned in every figure, labels longer than 200 characters are cut with a warning, the failure
 * shell prints "internal error" plus a hint (stack only with --debug), and atomic writes keep old files.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadTheme } from '../../src/render/themes.js';
import { parseTheme } from '../../src/render/theme.js';
import { renderSvg } from '../../src/render/renderSvg.js';
import { ConformarkError } from '../../src/model/errors.js';
import { MAX_LABEL_LENGTH, safeText, sceneTextWarnings } from '../../src/layout/text/safeText.js';
import type { Scene } from '../../src/layout/scene.js';
import { newmanFigure } from '../../src/api/figures/newman.js';
import { chairFigure } from '../../src/api/figures/chair.js';
import { ensembleText } from '../../src/api/ensemble/ensembleText.js';
import { tableMarkdown } from '../../src/api/tables/tableText.js';
import { protectInput, writeAtomic } from '../../src/io/writeAtomic.js';
import { parseText } from '../../src/io/parseText.js';
import { reportFailure, usageLine } from '../../src/cli/main.js';
import { CommanderError } from 'commander';
import { butane, cyclohexaneChair } from '../helpers/newmanMolecules.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';
import { leaks, unsafeMarkup } from './robustnessHelpers.js';

const good = () => JSON.parse(JSON.stringify(loadTheme('column'))) as Record<string, any>;
const themeIssues = (json: unknown): string[] => {
  try {
    parseTheme(json, 'hostile.json');
  } catch (err) {
    expect(err).toBeInstanceOf(ConformarkError);
    return (err as ConformarkError).issues.map((i) => i.message);
  }
  return [];
};

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-safety-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('hostile themes', () => {
  const CASES: readonly (readonly [string, (t: Record<string, any>) => void, string])[] = [
    ['CSS breaking out of a colour', (t) => (t.roles['front-bond'] = { stroke: 'red;} svg{display:none' }), 'theme.roles.front-bond.stroke: expected a colour (#rgb, #rrggbb, currentColor or none), got "red;} svg{display:none"'],
    ['a javascript: url', (t) => (t.defaults.line.fill = 'url(javascript:alert(1))'), 'theme.defaults.line.fill: expected a colour (#rgb, #rrggbb, currentColor or none), got "url(javascript:alert(1))"'],
    ['a huge number', (t) => (t.sizes.bondLength = 1e308), 'theme.sizes.bondLength: expected a number from 1 to 1000, got 1e+308'],
    ['a negative size', (t) => (t.sizes.margin = -5), 'theme.sizes.margin: expected a number from 0 to 500, got -5'],
    ['a number as text', (t) => (t.defaults.text.fontSize = '12px'), 'theme.defaults.text.fontSize: expected a number from 1 to 200, got "12px"'],
    ['a font outside the list', (t) => (t.fontFamily = 'x</style><script>'), 'theme.fontFamily: expected one of DejaVu Sans, sans-serif, Helvetica, Arial, Liberation Sans, got "x</style><script>"'],
    ['markup in the description', (t) => (t.description = '<script>alert(1)</script>'), 'theme.description: expected plain text of at most 200 characters without markup characters'],
    ['a name that is not a word', (t) => (t.name = 'x" onload="alert(1)'), 'theme.name: expected a lower-case name of letters, digits and hyphens'],
  ];

  it.each(CASES)('parseTheme refuses %s with one message naming the field', (_what, spoil, message) => {
    const t = good();
    spoil(t);
    expect(themeIssues(t)).toEqual([message]);
  });

  it.each(['__proto__', 'constructor', 'toString', 'hasOwnProperty'])('parseTheme refuses a top-level "%s" key as an unknown field (no prototype lookup)', (key) => {
    const text = JSON.stringify(good()).replace(/^\{/, `{"${key}": {"polluted": true},`);
    const issues = themeIssues(JSON.parse(text));
    expect(issues).toEqual([`theme.${key}: unknown field (allowed: name, description, unit, fontFamily, background, sizes, defaults, roles)`]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('parseTheme refuses "__proto__" inside a role style and as a role name', () => {
    const first = Object.keys(good().roles)[0]!;
    const style = JSON.parse(JSON.stringify(good()).replace(`"${first}":{`, `"${first}":{"__proto__":{"stroke":"red"},`));
    expect(themeIssues(style)).toEqual([`theme.roles.${first}.__proto__: unknown field (allowed: stroke, fill, strokeWidth, strokeDasharray, strokeLinecap, fontSize, fontWeight, opacity)`]);
    const role = JSON.parse(JSON.stringify(good()).replace('"roles":{', '"roles":{"__proto__":{"stroke":"#000"},'));
    expect(themeIssues(role)).toEqual(['theme.roles.__proto__: role names are lower-case words joined by hyphens']);
  });

  it('loadTheme refuses a theme file larger than 256 KiB without reading it all', () => {
    const path = join(dir, 'big.json');
    writeFileSync(path, `{"description": "${'x'.repeat(300 * 1024)}"}`);
    expect(() => loadTheme(path)).toThrow('the theme file is larger than 256 KiB');
  });
});

describe('text from files in figures', () => {
  const nasty = `<script>alert(1)</script> & "q" 's ]]> \u0001\u001b[31m \u202eevil\u2066 \ud800 end`;
  const scene = (text: string, title = text): Scene => ({
    kind: 'newman', width: 100, height: 60, title, desc: 'what the figure shows',
    items: [{ type: 'text', role: 'atom-label', x: 10, y: 20, text, anchor: 'start', fontSize: 8, fontWeight: 'normal' }],
  });

  it('safeText replaces controls, bidi overrides and lone surrogates, and cuts long text with an ellipsis', () => {
    expect(safeText('a\u0001b\u202ec\u2066d\ud800e\tf\ng').text).toBe('a\ufffdb\ufffdc\ufffdd\ufffde f g');
    expect(safeText('plain C1').replaced).toBe(false);
    const long = safeText('y'.repeat(500));
    expect(long.truncated).toBe(true);
    expect([...long.text]).toHaveLength(MAX_LABEL_LENGTH);
    expect(long.text.endsWith('y…')).toBe(true);
    expect(safeText('😀'.repeat(300)).text).toBe(`${'😀'.repeat(199)}…`); // never splits a surrogate pair
  });

  it('unsafeMarkup (the checker used on every output) finds scripts, handlers, external links and CSS urls', () => {
    expect(unsafeMarkup('<svg><script>x</script><g onclick="a"/><a href="http://x">l</a><rect fill="url(http://x)"/><use href="#ok"/></svg>')).toEqual([
      '<script>', 'g onclick=', '<a>', 'a href="http://x"', 'rect fill="url(http://x)"', '<use>',
    ]);
    expect(unsafeMarkup('<svg><text>&lt;script&gt; onload=&quot;x&quot;</text></svg>')).toEqual([]);
  });

  it('leaks (the checker used on every output) finds NaN, Infinity and undefined values but not quoted input', () => {
    expect(leaks('{"a": NaN, "b": "NaN title", "c": -Infinity}')).toEqual(['NaN', '-Infinity']);
    expect(leaks('<svg><line x1="NaN" y1="1"/><text x="1">fine</text></svg>')).toEqual(['x1="NaN"', 'NaN']);
    expect(leaks('ring 1: phase is undefined\nQ undefinedÅ')).toEqual(['undefinedÅ']);
    expect(leaks('{"title": "NaN on axis", "Q": 0.5}')).toEqual([]);
  });

  it('renderSvg escapes markup and writes only XML-valid characters for hostile titles and labels', () => {
    const svg = renderSvg(scene(nasty));
    expect(unsafeMarkup(svg)).toEqual([]);
    expect(svg).toContain('&lt;script&gt;alert(1)&lt;/script&gt; &amp; ');
    expect(svg).toContain(']]&gt;');
    expect(svg).not.toMatch(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u202a-\u202e\u2066-\u2069]/);
    expect(xmlProblems(svg)).toEqual([]);
  });

  it('renderSvg cuts a 300-character label to 200 and sceneTextWarnings says so once', () => {
    const text = `C${'x'.repeat(299)}`;
    const svg = renderSvg(scene(text, 'short title'));
    expect(svg).toContain(`>${text.slice(0, 199)}…</text>`);
    expect(sceneTextWarnings(scene(text, 'short title'))).toEqual([
      { code: 'long-label', message: `the text '${text.slice(0, 29)}…' is longer than 200 characters; the figure shows it cut short` },
    ]);
    expect(sceneTextWarnings(scene('C1'))).toEqual([]);
    expect(sceneTextWarnings(scene('C\u202e1')).map((w) => w.code)).toEqual(['unsafe-text']);
  });

  it('newmanFigure and chairFigure with hostile atom names and titles write safe, well-formed SVG', () => {
    const names = (n: number) => Array.from({ length: n }, (_, i) => (i % 2 === 0 ? `<b onload="x">${i}` : `]]>&${i}\u202e`));
    const mol = butane(60);
    const hostile = { ...mol, title: nasty, atoms: mol.atoms.map((a, i) => ({ ...a, name: names(mol.atoms.length)[i]! })) };
    const newman = newmanFigure(hostile, { bond: [1, 2], labels: 'name' });
    const { mol: ring } = cyclohexaneChair();
    const chair = chairFigure({ ...ring, title: nasty, atoms: ring.atoms.map((a, i) => ({ ...a, name: names(ring.atoms.length)[i]! })) }, { labels: 'name' });
    for (const svg of [newman.svg, chair.svg]) {
      expect(unsafeMarkup(svg)).toEqual([]);
      expect(svg).not.toContain('\u202e');
      expect(xmlProblems(svg)).toEqual([]);
    }
    expect(newman.warnings.map((w) => w.code)).toContain('unsafe-text');
  });

  it('ensembleText and tableMarkdown keep terminal escapes and HTML out of text output', () => {
    const report = {
      schema: 'conformark/ensemble@1', temperatureK: 298.15, unit: 'kcal/mol', notes: [],
      averages: { couplings: [] },
      conformers: [{ record: 1, title: `\u001b[2J${nasty}`, energy: 0, relativeEnergy: 0, population: 1, degeneracy: 1, duplicateOf: null, rings: [] }],
    } as unknown as Parameters<typeof ensembleText>[0];
    const text = ensembleText(report);
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u202e]/);
    const md = tableMarkdown({ caption: 'c', columns: [{ key: 'title', label: 'title' }], rows: [[nasty]] } as unknown as Parameters<typeof tableMarkdown>[0]);
    expect(md).not.toContain('<script>');
    expect(md).toContain('&lt;script&gt;');
  });
});

describe('the failure shell', () => {
  const capture = () => {
    const lines: string[] = [];
    const spy = vi.spyOn(process.stderr, 'write').mockImplementation((s: string | Uint8Array) => {
      lines.push(String(s));
      return true;
    });
    return { lines, restore: () => spy.mockRestore() };
  };

  it('reportFailure(bug) prints "internal error" and a hint to report it, and the stack only with --debug', () => {
    const bug = new TypeError('cannot read properties of undefined (reading "x")\n    at somewhere');
    const plain = capture();
    expect(reportFailure(bug, false, 'newman')).toBe(2);
    plain.restore();
    expect(plain.lines).toEqual([
      'conformark: internal error: cannot read properties of undefined (reading "x")\n',
      'conformark: this is a bug; rerun with --debug and report the output\n',
    ]);
    const debug = capture();
    reportFailure(bug, true, 'newman');
    debug.restore();
    expect(debug.lines[0]).toBe('conformark: internal error: cannot read properties of undefined (reading "x")\n');
    expect(debug.lines[1]).toContain('TypeError: cannot read properties of undefined');
  });

  it('reportFailure(user error) prints one line per issue, cleaned of terminal escapes', () => {
    const out = capture();
    const err = new ConformarkError({ code: 'bad-number', file: 'x.xyz', line: 3, message: "x coordinate '\u001b[31m' is not a number" });
    expect(reportFailure(err, true, 'inspect')).toBe(2);
    out.restore();
    expect(out.lines).toEqual(["conformark: x.xyz:3: x coordinate '\ufffd[31m' is not a number\n"]);
  });

  it('usageLine turns commander messages into one line of ours with a help hint', () => {
    const err = new CommanderError(1, 'commander.unknownOption', "error: unknown option '--jsn'\n(Did you mean --json?)");
    expect(usageLine(err, 'inspect')).toBe("conformark: unknown option '--jsn' (did you mean --json?); see conformark inspect --help");
  });
});

describe('SD data fields', () => {
  it('parseText keeps a data field named __proto__ as a plain field and leaves the prototype alone', () => {
    const water = readFileSync('test/data/good-water.sdf', 'utf8').replace('$$$$', '> <__proto__>\n{"polluted": true}\n\n$$$$');
    const [mol] = parseText(water, { file: 'w.sdf' });
    expect(mol!.properties['__proto__']).toBe('{"polluted": true}');
    expect(Object.keys(mol!.properties)).toContain('__proto__');
    expect(Object.getPrototypeOf(mol!.properties)).toBe(Object.prototype);
  });
});

describe('writeAtomic', () => {
  it('writeAtomic keeps the old file when the data cannot be written, and leaves no temporary file', () => {
    const folder = mkdtempSync(join(dir, 'atomic-'));
    const path = join(folder, 'figure.svg');
    writeFileSync(path, 'old');
    expect(() => writeAtomic(join(path, 'inside.svg'), 'new')).toThrow('cannot write: a part of the path is not a folder');
    expect(() => writeAtomic(folder, 'new')).toThrow('is a folder; give a file name to write to');
    expect(readFileSync(path, 'utf8')).toBe('old');
    writeAtomic(path, 'new');
    expect(readFileSync(path, 'utf8')).toBe('new');
    expect(readdirSync(folder)).toEqual(['figure.svg']);
  });

  it('writeAtomic refuses a protected input, also through another spelling of its path', () => {
    const folder = mkdtempSync(join(dir, 'protect-'));
    const input = join(folder, 'in.sdf');
    writeFileSync(input, 'input');
    protectInput(input);
    expect(() => writeAtomic(`${folder}/./in.sdf`, 'x')).toThrow('refusing to overwrite the input file');
    expect(readFileSync(input, 'utf8')).toBe('input');
  });
});
