/**
 * Every write is complete or absent: short writes, a full disk (a stub and a real small tmpfs), failing
 * fsync and rename, temporary files planted as symlinks, and standard input as a protected input.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, openSync, readFileSync, readdirSync, rmSync, statSync, symlinkSync, writeFileSync, closeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { writeAtomic } from '../../src/io/writeAtomic.js';
import { NODE_FILE_OPS, withFileOps, type FileOps } from '../../src/io/fileOps.js';
import { liveTemps, TempFile } from '../../src/io/tempFile.js';
import { TextStream } from '../../src/api/trajectory/csvStream.js';

const root = mkdtempSync(join(tmpdir(), 'cfm-write-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

const fresh = (name: string) => {
  const d = join(root, name);
  mkdirSync(d);
  return d;
};

/** A file system that writes at most `chunk` bytes per call and, after `capacity` bytes in all, none at all. */
function shortWrites(chunk: number, capacity = Infinity): FileOps {
  let total = 0;
  return {
    ...NODE_FILE_OPS,
    writeSync: (fd, data, offset, length) => {
      const n = Math.max(0, Math.min(chunk, length, capacity - total));
      total += n;
      return n === 0 ? 0 : NODE_FILE_OPS.writeSync(fd, data, offset, n);
    },
  };
}

const failing = (call: keyof FileOps, code: string): FileOps => ({
  ...NODE_FILE_OPS,
  [call]: () => {
    throw Object.assign(new Error(code), { code, syscall: call });
  },
});

describe('writeAtomic under a hostile file system', () => {
  it('writeAtomic goes on after short writes and writes every byte', async () => {
    const dir = fresh('short');
    const text = 'Cremer–Pople ⁴C₁ '.repeat(1000);
    await withFileOps(shortWrites(7), () => writeAtomic(join(dir, 'a.txt'), text));
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe(text);
    expect(readdirSync(dir)).toEqual(['a.txt']);
  });

  it('writeAtomic on a full disk (writes stop short) fails with one line, keeps the old file and leaves no temporary file', async () => {
    const dir = fresh('full');
    const path = join(dir, 'table.csv');
    writeFileSync(path, 'old,complete\n');
    await expect(withFileOps(shortWrites(4096, 10_000), () => writeAtomic(path, 'x'.repeat(50_000)))).rejects.toThrow(`${path}: cannot write: no space left on the device`);
    expect(readFileSync(path, 'utf8')).toBe('old,complete\n');
    expect(readdirSync(dir)).toEqual(['table.csv']);
    expect(liveTemps()).toEqual([]);
  });

  for (const [call, code, words] of [
    ['fsyncSync', 'EIO', 'EIO'],
    ['renameSync', 'EROFS', 'the file system is read-only'],
    ['openSync', 'EACCES', 'permission denied'],
  ] as const) {
    it(`writeAtomic when ${call} fails with ${code} reports "${words}", keeps the old file, leaves nothing behind`, async () => {
      const dir = fresh(`fail-${call}`);
      const path = join(dir, 'fig.svg');
      writeFileSync(path, '<svg/>');
      await expect(withFileOps(failing(call, code), () => writeAtomic(path, '<svg>new</svg>'))).rejects.toThrow(`cannot write: ${words}`);
      expect(readFileSync(path, 'utf8')).toBe('<svg/>');
      expect(readdirSync(dir)).toEqual(['fig.svg']);
    });
  }

  it('writeAtomic flushes to the disk (fsync) before the rename, opens exclusively with mode 0600', async () => {
    const dir = fresh('order');
    const calls: string[] = [];
    const ops: FileOps = {
      ...NODE_FILE_OPS,
      openSync: (p, flags, mode) => (calls.push(`open ${flags} ${mode.toString(8)}`), NODE_FILE_OPS.openSync(p, flags, mode)),
      fsyncSync: (fd) => (calls.push('fsync'), NODE_FILE_OPS.fsyncSync(fd)),
      renameSync: (a, b) => (calls.push('rename'), NODE_FILE_OPS.renameSync(a, b)),
    };
    await withFileOps(ops, () => writeAtomic(join(dir, 'x.json'), '{}'));
    expect(calls).toEqual(['open wx 600', 'fsync', 'rename']);
  });

  it('a replaced file keeps its mode; a new one gets the usual mode, not 0600', () => {
    const dir = fresh('mode');
    writeFileSync(join(dir, 'kept.txt'), 'old', { mode: 0o640 });
    writeAtomic(join(dir, 'kept.txt'), 'new');
    writeAtomic(join(dir, 'new.txt'), 'new');
    expect(statSync(join(dir, 'kept.txt')).mode & 0o777).toBe(0o640);
    expect(statSync(join(dir, 'new.txt')).mode & 0o777).toBe(0o666 & ~process.umask());
  });
});

describe('temporary files', () => {
  it('TempFile names are unpredictable (random, no process id) and differ for the same target', () => {
    const dir = fresh('names');
    const a = new TempFile(join(dir, 'out.svg'));
    const b = new TempFile(join(dir, 'out.svg'));
    expect(a.tmp).not.toBe(b.tmp);
    expect(basename(a.tmp)).toMatch(/^\.out\.svg\.[A-Za-z0-9_-]{12}\.tmp$/);
    expect(basename(a.tmp)).not.toContain(String(process.pid));
    a.remove();
    b.remove();
    expect(readdirSync(dir)).toEqual([]);
  });

  it('a symlink planted at the temporary path is never opened: the victim file is untouched and the write lands', async () => {
    const dir = fresh('planted');
    const victim = join(root, 'victim.txt');
    writeFileSync(victim, 'precious');
    let planted = 0;
    // an attacker who guessed the name: plant a link there just before the open
    const ops: FileOps = {
      ...NODE_FILE_OPS,
      openSync: (p, flags, mode) => {
        if (planted++ === 0) symlinkSync(victim, p);
        return NODE_FILE_OPS.openSync(p, flags, mode);
      },
    };
    await withFileOps(ops, () => writeAtomic(join(dir, 'fig.svg'), 'figure'));
    expect(readFileSync(victim, 'utf8')).toBe('precious');
    expect(readFileSync(join(dir, 'fig.svg'), 'utf8')).toBe('figure');
    // the planted link is left as it was (not followed, not removed)
    expect(readdirSync(dir).filter((f) => f !== 'fig.svg')).toHaveLength(1);
  });

  it('TextStream (the trajectory CSV) on a full disk fails on write, keeps the older table and removes its temporary file', async () => {
    const dir = fresh('stream');
    const path = join(dir, 'puckering.csv');
    writeFileSync(path, 'frame,Q\n1,0.55\n');
    await withFileOps(shortWrites(1 << 20, 100_000), () => {
      const out = new TextStream(path);
      try {
        for (let i = 0; i < 20_000; i++) out.write(`${i},0.5500\n`);
        out.commit();
      } catch (err) {
        out.abort();
        throw err;
      }
    }).then(
      () => expect.unreachable(),
      (err: Error) => expect(err.message).toBe(`${path}: cannot write: no space left on the device`),
    );
    expect(readFileSync(path, 'utf8')).toBe('frame,Q\n1,0.55\n');
    expect(readdirSync(dir)).toEqual(['puckering.csv']);
  });
});

/** A real 64 KiB tmpfs, when this process may mount one (root in a container that allows it). */
function smallTmpfs(): string | null {
  const at = join(root, 'tmpfs');
  mkdirSync(at);
  const r = spawnSync('mount', ['-t', 'tmpfs', '-o', 'size=64k', 'tmpfs', at], { encoding: 'utf8' });
  return r.status === 0 ? at : null;
}

describe('a real full disk', () => {
  const at = smallTmpfs();
  afterAll(() => {
    if (at) spawnSync('umount', [at]);
  });
  // skipped where mounting is not allowed (not root, or no CAP_SYS_ADMIN): the stubs above cover the logic
  it.skipIf(at === null)('writeAtomic and TextStream on a 64 KiB tmpfs: ENOSPC is one line, the old files stay whole', () => {
    const path = join(at!, 'summary.json');
    writeFileSync(path, '{"old":true}\n');
    expect(() => writeAtomic(path, 'y'.repeat(200_000))).toThrow('cannot write: no space left on the device');
    expect(readFileSync(path, 'utf8')).toBe('{"old":true}\n');
    const csv = join(at!, 'puckering.csv');
    writeFileSync(csv, 'frame\n1\n');
    const out = new TextStream(csv);
    expect(() => {
      for (let i = 0; i < 50_000; i++) out.write(`${i},0.5\n`);
      out.commit();
    }).toThrow('cannot write: no space left on the device');
    out.abort();
    expect(readFileSync(csv, 'utf8')).toBe('frame\n1\n');
    expect(readdirSync(at!).sort()).toEqual(['puckering.csv', 'summary.json']);
  });
});

describe('standard input is an input', () => {
  it('conformark newman - -o mol.svg < mol.svg is refused and mol.svg is kept', () => {
    const dir = fresh('stdin');
    const mol = join(dir, 'mol.svg');
    writeFileSync(mol, '3\nwater\nO 0 0 0\nH 0.96 0 0\nH -0.24 0.93 0\n');
    const fd = openSync(mol, 'r');
    try {
      const bin = new URL('../../bin/conformark.js', import.meta.url).pathname;
      const r = spawnSync('node', [bin, 'newman', '-', '--bond', '1-2', '-o', mol], { stdio: [fd, 'pipe', 'pipe'], encoding: 'utf8' });
      expect(r.stderr).toContain('refusing to overwrite the input file');
      expect(r.status).toBe(2);
    } finally {
      closeSync(fd);
    }
    expect(readFileSync(mol, 'utf8')).toContain('water');
  });
});
