import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// Runs the built CLI (bin/ → dist/, as npm test builds it first) with a preload that lists every module file loaded.
const dir = mkdtempSync(join(tmpdir(), 'conformark-modules-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function loadedModules(...args: string[]): string[] {
  const list = join(dir, 'modules.txt');
  const run = spawnSync('node', ['--import', './test/helpers/recordModules.mjs', 'bin/conformark.js', ...args], {
    encoding: 'utf8', env: { ...process.env, CONFORMARK_MODULE_LIST: list },
  });
  expect(run.status, run.stderr).toBe(0);
  return readFileSync(list, 'utf8').split('\n').filter((f) => f !== '');
}

/** Packages (and our modules) that only PNG, PDF, DOM documents, progress bars or the font engine need. */
const HEAVY = /node_modules\/(@resvg|pdfkit|svg-to-pdfkit|svgdom|@svgdotjs|fontkit|cli-progress|openchemlib)\/|render\/svgDocument\.js$/;
const sdf = 'examples/w2-methylcyclohexanol.sdf';

describe('the CLI loads only what a command uses', () => {
  it.each([
    ['--version', ['--version']],
    ['inspect', ['inspect', sdf]],
    ['newman -o x.svg', ['newman', sdf, '--bond', '2-3', '-o', join(dir, 'x.svg')]],
  ])('conformark %s loads no PNG, PDF, DOM, font engine or progress module', (_name, args) => {
    const files = loadedModules(...args);
    expect(files.some((f) => f.endsWith('dist/cli/main.js'))).toBe(true); // the list is real
    expect(files.filter((f) => HEAVY.test(f))).toEqual([]);
  });

  it('conformark newman -o x.png loads resvg (the check sees packages when they load)', () => {
    const files = loadedModules('newman', sdf, '--bond', '2-3', '-o', join(dir, 'x.png'));
    expect(files.some((f) => f.includes('node_modules/@resvg/'))).toBe(true);
  });
});
