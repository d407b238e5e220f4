/** The README's library example runs as written (against the built package) and prints what it says. */
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

describe('README.md', () => {
  it('README library example runs against dist/ and its commented results hold', () => {
    const readme = readFileSync('README.md', 'utf8');
    const block = /## Library\n\n```js\n([\s\S]*?)```/.exec(readme)?.[1];
    expect(block).toBeDefined();
    const dir = mkdtempSync(join(tmpdir(), 'conformark-readme-'));
    try {
      const code = block!
        .replace("from 'conformark'", `from '${pathToFileURL(resolve('dist/index.js')).href}'`)
        .replaceAll("'c1c2.pdf'", `'${join(dir, 'c1c2.pdf')}'`);
      const script = join(dir, 'example.mjs');
      writeFileSync(script, code);
      const r = spawnSync('node', [script], { encoding: 'utf8', cwd: process.cwd() });
      expect(r.stderr).toBe('');
      expect(r.status).toBe(0);
      const lines = r.stdout.split('\n');
      expect(lines[0]).toMatch(/^chair 4C1 0\.\d{3}$/);
      expect(lines[1]).toMatch(/^staggered/);
      expect(readFileSync(join(dir, 'c1c2.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
