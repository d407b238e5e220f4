/** A folder a command owns: exact manifests, forged manifests refused, links never followed, one run at a time. */
import { afterAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { OutputFolder, isRelativeName, type ManifestKind } from '../../src/io/outputFolder.js';
import { LOCK_NAME } from '../../src/io/folderLock.js';
import { abandonOutputs } from '../../src/io/abandonOutputs.js';

const root = mkdtempSync(join(tmpdir(), 'cfm-folder-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));
let n = 0;
const fresh = () => {
  const d = join(root, `f${++n}`);
  mkdirSync(d);
  return d;
};

const KIND: ManifestKind = { name: 'manifest.json', schema: 'test/folder@1', files: (doc) => (Array.isArray(doc.files) ? doc.files : [null]) };
const manifest = (files: readonly string[]) => JSON.stringify({ schema: 'test/folder@1', files });

function run(dir: string, files: Record<string, string>): void {
  const out = OutputFolder.open(dir, KIND);
  for (const [name, text] of Object.entries(files)) out.write(name, text);
  out.commit(manifest(Object.keys(files)));
}

describe('OutputFolder', () => {
  it('isRelativeName accepts plain relative paths only', () => {
    for (const ok of ['a.svg', 'w3-si/manifest.json', 'x/y/z.csv']) expect(isRelativeName(ok), ok).toBe(true);
    for (const bad of ['', '/etc/passwd', '../x', 'a/../../x', 'a//b', './a', 'a\\b', 'a\0b', 'a/', 42, null]) expect(isRelativeName(bad), String(bad)).toBe(false);
  });

  it('a rerun removes exactly the earlier outputs it did not write again; files the user added stay', () => {
    const dir = fresh();
    run(dir, { 'a.svg': 'A', 'b.svg': 'B', 'sub/c.csv': 'C' });
    writeFileSync(join(dir, 'notes.txt'), 'mine');
    writeFileSync(join(dir, 'sub', 'mine.txt'), 'mine too');
    run(dir, { 'a.svg': 'A2' });
    expect(readdirSync(dir).sort()).toEqual(['a.svg', 'manifest.json', 'notes.txt', 'sub']);
    expect(readdirSync(join(dir, 'sub'))).toEqual(['mine.txt']);
    expect(readFileSync(join(dir, 'a.svg'), 'utf8')).toBe('A2');
    expect(JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8')).files).toEqual(['a.svg']);
  });

  it('nothing appears before commit, and abort leaves the previous state byte for byte', () => {
    const dir = fresh();
    run(dir, { 'a.svg': 'A' });
    const out = OutputFolder.open(dir, KIND);
    out.write('a.svg', 'new A');
    out.write('b.svg', 'new B');
    expect(readFileSync(join(dir, 'a.svg'), 'utf8')).toBe('A');
    expect(existsSync(join(dir, 'b.svg'))).toBe(false);
    out.abort();
    expect(readdirSync(dir).sort()).toEqual(['a.svg', 'manifest.json']);
  });

  it('abandonOutputs (the signal handler) removes staged files and the lock', () => {
    const dir = fresh();
    run(dir, { 'a.svg': 'A' });
    const out = OutputFolder.open(dir, KIND);
    out.write('b.svg', 'B');
    expect(readdirSync(dir)).toContain(LOCK_NAME);
    expect(abandonOutputs()).toBe(1);
    expect(readdirSync(dir).sort()).toEqual(['a.svg', 'manifest.json']);
  });

  const forged: [string, string, RegExp][] = [
    ['corrupt JSON', '{"schema": "test/folder@1", "files": [', /is not valid JSON/],
    ['another kind of manifest', JSON.stringify({ schema: 'other@1', files: [] }), /is not a test\/folder@1 manifest/],
    ['files not a list', JSON.stringify({ schema: 'test/folder@1', files: 'a.svg' }), /not a plain path/],
    ['a path out of the folder', manifest(['../outside.txt']), /lists "\.\.\/outside\.txt", which is not a plain path inside the folder/],
    ['an absolute path', manifest(['/etc/hostname']), /not a plain path inside the folder/],
    ['a folder', manifest(['sub']), /lists sub, which is a folder/],
  ];
  for (const [what, text, message] of forged) {
    it(`open refuses a manifest with ${what}, before writing anything, and removes nothing`, () => {
      const dir = fresh();
      mkdirSync(join(dir, 'sub'));
      writeFileSync(join(dir, 'sub', 'keep.txt'), 'keep');
      writeFileSync(join(dir, 'manifest.json'), text);
      expect(() => OutputFolder.open(dir, KIND)).toThrow(message);
      expect(readdirSync(dir).sort()).toEqual(['manifest.json', 'sub']);
      expect(readFileSync(join(dir, 'sub', 'keep.txt'), 'utf8')).toBe('keep');
    });
  }

  it('a manifest path through a planted symlink is refused and the linked folder is untouched', () => {
    const dir = fresh();
    const elsewhere = fresh();
    writeFileSync(join(elsewhere, 'data.csv'), 'precious');
    symlinkSync(elsewhere, join(dir, 'link'));
    writeFileSync(join(dir, 'manifest.json'), manifest(['link/data.csv']));
    expect(() => OutputFolder.open(dir, KIND)).toThrow(/lists link\/data\.csv, but link is a symbolic link/);
    expect(readFileSync(join(elsewhere, 'data.csv'), 'utf8')).toBe('precious');
  });

  it('write refuses to go through a symlinked sub-folder; a symlink at an output name is replaced, not followed', () => {
    const dir = fresh();
    const elsewhere = fresh();
    writeFileSync(join(elsewhere, 'victim.svg'), 'precious');
    symlinkSync(elsewhere, join(dir, 'sub'));
    symlinkSync(join(elsewhere, 'victim.svg'), join(dir, 'fig.svg'));
    const out = OutputFolder.open(dir, KIND);
    expect(() => out.write('sub/x.svg', 'x')).toThrow(/sub is a symbolic link or a file, not a folder: refusing to write through it/);
    out.write('fig.svg', 'mine');
    out.commit(manifest(['fig.svg']));
    expect(readFileSync(join(elsewhere, 'victim.svg'), 'utf8')).toBe('precious');
    expect(readFileSync(join(dir, 'fig.svg'), 'utf8')).toBe('mine');
  });

  it('a second run into a locked folder is refused with a clear line; after commit the folder is free', () => {
    const dir = fresh();
    const first = OutputFolder.open(dir, KIND);
    expect(() => OutputFolder.open(dir, KIND)).toThrow(/folder is in use by this run \(lock file \.conformark\.lock\)/);
    first.commit(manifest([]));
    OutputFolder.open(dir, KIND).abort();
    expect(readdirSync(dir)).toEqual(['manifest.json']);
  });

  it('a lock left by a process that is gone is taken over; one held by a live process is not', () => {
    const dir = fresh();
    const dead = spawnSync('node', ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' }).stdout;
    writeFileSync(join(dir, LOCK_NAME), `${dead}\n`);
    OutputFolder.open(dir, KIND).abort();
    writeFileSync(join(dir, LOCK_NAME), `${process.ppid}\n`);
    expect(() => OutputFolder.open(dir, KIND)).toThrow(`folder is in use by process ${process.ppid}`);
  });

  it('a folder owned whole (the demo) refuses a non-empty folder without its manifest', () => {
    const dir = fresh();
    writeFileSync(join(dir, 'thesis.tex'), 'mine');
    expect(() => OutputFolder.open(dir, { ...KIND, ownsWholeFolder: 'conformark demo' })).toThrow(/not empty and was not made by conformark demo/);
    expect(readdirSync(dir)).toEqual(['thesis.tex']);
  });
});
