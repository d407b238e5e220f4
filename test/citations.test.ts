/**
 * Citations stay inside the repository: code, tests, scripts and docs cite published sources or
 * `docs/methods.md#anchor`, never notes that a clone of the project does not have, and every cited anchor exists.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '..');
const THIS_FILE = relative(ROOT, import.meta.filename).split('\\').join('/');

/** Folders and top-level files whose text is checked. */
const FOLDERS = ['src', 'test', 'scripts', 'bench', 'examples', 'templates', 'docs', 'bin'];
const FILES = ['README.md', 'DEVELOPERS.md', 'CHANGELOG.md', 'package.json', '.dependency-cruiser.cjs', 'vitest.config.ts'];
const TEXT = /\.(ts|js|mjs|cjs|json|md|sh|py|txt|html|css)$/;

function walk(dir: string, out: string[]): void {
  for (const name of readdirSync(join(ROOT, dir))) {
    if (name === 'node_modules' || name === '__golden__' || name.startsWith('.')) continue;
    const rel = `${dir}/${name}`;
    if (statSync(join(ROOT, rel)).isDirectory()) walk(rel, out);
    else if (TEXT.test(name)) out.push(rel);
  }
}

function checkedFiles(): string[] {
  const out: string[] = [];
  for (const dir of FOLDERS) {
    try {
      walk(dir, out);
    } catch {
      // folder absent in this checkout
    }
  }
  for (const f of FILES) {
    try {
      if (statSync(join(ROOT, f)).isFile()) out.push(f);
    } catch {
      // file absent
    }
  }
  return out.filter((f) => f !== THIS_FILE);
}

// Built from parts so this file does not match itself.
const NOTES = ['METHODS', 'DESIGN', 'STYLE', 'STYLE-MODELS', 'LIBRARIES'];
/** Mentions of the outside notes: `NAME.md`, `NAME §…`, or the bare upper-case words METHODS/DESIGN/LIBRARIES. */
const OUTSIDE = [
  new RegExp(`\\b(${NOTES.join('|')})\\.md\\b`),
  new RegExp(`\\b(${NOTES.join('|')})\\s*§`),
  new RegExp(`(?<![A-Za-z_])(${['METHODS', 'DESIGN', 'LIBRARIES'].join('|')})(?![A-Za-z_])`),
  new RegExp(['\\.\\.', 'shared'].join('/')),
  new RegExp(['', 'work', ''].join('/')),
];

/** Outside mentions as `file:line: text`. */
export function outsideCitations(files: readonly string[]): string[] {
  const hits: string[] = [];
  for (const f of files) {
    const lines = readFileSync(join(ROOT, f), 'utf8').split('\n');
    lines.forEach((line, i) => {
      if (OUTSIDE.some((re) => re.test(line))) hits.push(`${f}:${i + 1}: ${line.trim().slice(0, 120)}`);
    });
  }
  return hits;
}

const ANCHOR_USE = /docs\/methods\.md#([A-Za-z0-9_-]+)/g;

describe('citations', () => {
  const files = checkedFiles();

  it('no source, test, script or doc cites notes outside the repository', () => {
    expect(files.length).toBeGreaterThan(100);
    expect(outsideCitations(files)).toEqual([]);
  });

  it('the outside-citation check catches each form it looks for', () => {
    const samples = [
      ['METHODS', 'md §2.4'].join('.'),
      ['DESIGN', ' §3'].join(''),
      ['see ', 'LIBRARIES'].join(''),
      ['..', 'shared', 'STYLE.md'].join('/'),
      ['', 'work', 'notes'].join('/'),
    ];
    for (const s of samples) expect(OUTSIDE.some((re) => re.test(s)), s).toBe(true);
    for (const s of ['COUPLING_METHODS', 'const STYLE = `', 'docs/methods.md#torsion']) {
      expect(OUTSIDE.some((re) => re.test(s)), s).toBe(false);
    }
  });

  it('every docs/methods.md#anchor cited in the repository exists', () => {
    const methods = readFileSync(join(ROOT, 'docs/methods.md'), 'utf8');
    const anchors = new Set([...methods.matchAll(/<a id="([^"]+)"><\/a>/g)].map((m) => m[1]!));
    expect(anchors.size).toBeGreaterThan(20);
    const missing: string[] = [];
    let cited = 0;
    for (const f of files.filter((name) => name !== 'docs/methods.md')) {
      const lines = readFileSync(join(ROOT, f), 'utf8').split('\n');
      lines.forEach((line, i) => {
        for (const m of line.matchAll(ANCHOR_USE)) {
          cited++;
          if (!anchors.has(m[1]!)) missing.push(`${f}:${i + 1}: #${m[1]}`);
        }
      });
    }
    expect(cited).toBeGreaterThan(50);
    expect(missing).toEqual([]);
  });

  it('every in-page link of docs/methods.md points to an anchor it has', () => {
    const methods = readFileSync(join(ROOT, 'docs/methods.md'), 'utf8');
    const anchors = new Set([...methods.matchAll(/<a id="([^"]+)"><\/a>/g)].map((m) => m[1]!));
    const links = [...methods.matchAll(/\]\(#([^)]+)\)/g)].map((m) => m[1]!);
    expect(links.length).toBeGreaterThan(10);
    expect(links.filter((l) => !anchors.has(l))).toEqual([]);
  });

  it('every src/ and test/ path named in docs/methods.md exists', () => {
    const methods = readFileSync(join(ROOT, 'docs/methods.md'), 'utf8');
    const paths = [...methods.matchAll(/`((?:src|test|templates)\/[^`*]+?)`/g)].map((m) => m[1]!);
    expect(paths.length).toBeGreaterThan(30);
    const absent = paths.filter((p) => {
      try {
        statSync(join(ROOT, p));
        return false;
      } catch {
        return true;
      }
    });
    expect(absent).toEqual([]);
  });

  it('docs/methods.md names a source beside every method and says which tests check it', () => {
    const methods = readFileSync(join(ROOT, 'docs/methods.md'), 'utf8');
    const sections = methods.split(/<a id="/).slice(1);
    for (const s of sections) {
      const id = s.slice(0, s.indexOf('"'));
      if (id === 'references') continue;
      expect(s, id).toMatch(/Source:|source\*\*|no source|from memory|derived/);
    }
  });
});
