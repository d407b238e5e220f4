/** `conformark demo` renders the bundled scenario, and the committed gallery/ is exactly what it produces. */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { renderDemo } from '../../src/api/demo/demo.js';

const walk = (dir: string, root = dir): string[] =>
  readdirSync(dir).flatMap((n) => (statSync(join(dir, n)).isDirectory() ? walk(join(dir, n), root) : [relative(root, join(dir, n))])).sort();

describe('renderDemo', () => {
  it('renderDemo writes the same files, byte for byte, as the committed gallery/', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-demo-'));
    try {
      const result = await renderDemo({ outDir: dir, examplesDir: 'examples' });
      expect(result.files).toContain('index.html');
      const committed = walk('gallery');
      expect(walk(dir)).toEqual(committed);
      const differ = committed.filter((f) => !readFileSync(join(dir, f)).equals(readFileSync(join('gallery', f))));
      expect(differ).toEqual([]);
      // figures, reports and the gallery page carry no script; the explorer page's one script is allowed by its
      // hash alone under a policy that forbids every request (test/api/exploreBrowser.test.ts drives it)
      const explorer = (f: string) => f.endsWith('-explore.html');
      for (const f of committed.filter((x) => (x.endsWith('.svg') || x.endsWith('.json') || x.endsWith('.html')) && !explorer(x))) {
        expect(readFileSync(join(dir, f), 'utf8')).not.toMatch(/NaN|Infinity|undefined|<script|javascript:/);
      }
      const pages = committed.filter(explorer);
      expect(pages).toEqual(['w2-explore.html']);
      for (const f of pages) {
        const html = readFileSync(join(dir, f), 'utf8');
        expect(html).toMatch(/<meta http-equiv="Content-Security-Policy" content="default-src &#39;none&#39;;/);
        // (the packed records are base64, where any letters may meet: their JSON cannot hold NaN or Infinity)
        expect(html.replace(/"detail":"[A-Za-z0-9+/=]*"/g, '')).not.toMatch(/NaN|Infinity|javascript:/);
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 240_000);

  it('renderDemo refuses a non-empty folder it did not make, and deletes nothing there', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-demo-'));
    try {
      mkdirSync(join(dir, 'mine'));
      writeFileSync(join(dir, 'mine', 'notes.txt'), 'keep me');
      await expect(renderDemo({ outDir: dir, examplesDir: 'examples' })).rejects.toThrow(/not empty and was not made by conformark demo/);
      expect(readFileSync(join(dir, 'mine', 'notes.txt'), 'utf8')).toBe('keep me');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('renderDemo refuses a corrupt marker or one listing a folder with one clear line, before writing anything', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-demo-'));
    try {
      mkdirSync(join(dir, 'photos'));
      writeFileSync(join(dir, 'photos', 'a.jpg'), 'keep me');
      writeFileSync(join(dir, '.conformark-demo.json'), '{"schema":"conformark/demo@1","files":["photos"]}');
      await expect(renderDemo({ outDir: dir, examplesDir: 'examples' })).rejects.toThrow(/\.conformark-demo\.json: lists photos, which is a folder: refusing to write into this folder/);
      writeFileSync(join(dir, '.conformark-demo.json'), 'not json');
      await expect(renderDemo({ outDir: dir, examplesDir: 'examples' })).rejects.toThrow(/is not valid JSON/);
      expect(walk(dir)).toEqual(['.conformark-demo.json', 'photos/a.jpg']);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
