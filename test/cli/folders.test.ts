/**
 * Folders owned by a command under concurrent and interrupted runs: a second batch into a busy folder is
 * refused, SIGINT and SIGTERM mid-batch and mid-trajectory leave the previous state byte for byte.
 * Build first: `npx tsc -p tsconfig.build.json`.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { createGzip } from 'node:zlib';
import { cli, ringFrame } from './robustnessHelpers.js';

const root = mkdtempSync(join(tmpdir(), 'cfm-folders-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));
const bin = new URL('../../bin/conformark.js', import.meta.url).pathname;

const chair = (title: string, tilt: number) => ringFrame(title, 6, 1.45, (k) => (k % 2 === 0 ? -0.25 : 0.25) + tilt);
const records = (n: number) => Array.from({ length: n }, (_, r) => chair(`rec ${r + 1} energy=${(r * 0.01).toFixed(2)} kcal/mol`, r * 1e-4)).join('');

/** Every file under `dir` with its bytes, for before/after comparisons. */
function snapshot(dir: string): Map<string, string> {
  const out = new Map<string, string>();
  const walk = (d: string): void => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out.set(relative(dir, p), readFileSync(p).toString('base64'));
    }
  };
  walk(dir);
  return out;
}

function start(args: readonly string[]): { child: ChildProcess; done: Promise<{ status: number | null; stderr: string }> } {
  const child = spawn('node', [bin, ...args], { stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  child.stderr!.on('data', (b: Buffer) => (stderr += b.toString('utf8')));
  const done = new Promise<{ status: number | null; stderr: string }>((resolve) => child.on('close', (status) => resolve({ status, stderr })));
  return { child, done };
}

/** Waits (polling) until `test` holds; fails after `ms`. */
async function until(test: () => boolean, ms = 60_000): Promise<void> {
  const end = Date.now() + ms;
  while (!test()) {
    if (Date.now() > end) throw new Error('condition never held');
    await new Promise((r) => setTimeout(r, 5));
  }
}

const hasLock = (dir: string) => existsSync(join(dir, '.conformark.lock'));
const hasTemp = (dir: string) => existsSync(dir) && readdirSync(dir).some((f) => f.endsWith('.tmp'));

describe('folders under concurrent and interrupted runs', () => {
  const small = join(root, 'small.xyz');
  const big = join(root, 'big.xyz');
  writeFileSync(small, records(3));
  writeFileSync(big, records(60));

  it('a second batch into a folder another batch is writing is refused with one line; the first run\'s manifest lists exactly its files', async () => {
    const dir = join(root, 'concurrent');
    const first = start(['batch', big, '-d', dir]);
    await until(() => hasLock(dir));
    const second = await cli(['batch', small, '-d', dir]);
    expect(second.status).toBe(2);
    expect(second.stderr).toMatch(/^conformark: .*concurrent: folder is in use by process \d+ \(lock file \.conformark\.lock\); wait for it to finish/);
    expect(second.stderr.trim().split('\n')).toHaveLength(1);
    expect((await first.done).status).toBe(0);
    const manifest = JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8')) as { figures: { path: string }[]; tables: { path: string }[] };
    const listed = [...manifest.figures, ...manifest.tables].map((f) => f.path);
    expect(readdirSync(dir).sort()).toEqual([...listed, 'manifest.json'].sort());
  }, 120_000);

  for (const [signal, code] of [['SIGTERM', 143], ['SIGINT', 130]] as const) {
    it(`${signal} mid-batch leaves the previous run's folder byte for byte (no new figures, no temporary files, no lock)`, async () => {
      const dir = join(root, `batch-${signal}`);
      expect((await cli(['batch', small, '-d', dir, '--bonds', 'all'])).status).toBe(0);
      writeFileSync(join(dir, 'notes.txt'), 'mine');
      const before = snapshot(dir);
      const run = start(['batch', big, '-d', dir]);
      await until(() => hasLock(dir));
      await new Promise((r) => setTimeout(r, 300));
      run.child.kill(signal);
      const { status, stderr } = await run.done;
      expect(status).toBe(code);
      expect(stderr).toContain(`stopped by ${signal}; outputs left as they were before the run`);
      expect(snapshot(dir)).toEqual(before);
    }, 120_000);
  }

  it('SIGINT mid-trajectory (the CSV half streamed) leaves the previous puckering.csv, summary and figures', async () => {
    const dir = join(root, 'trajectory');
    const short = join(root, 'short.xyz');
    writeFileSync(short, Array.from({ length: 20 }, (_, k) => chair(`frame ${k + 1}`, 0)).join(''));
    expect((await cli(['trajectory', short, '-d', dir])).status).toBe(0);
    const before = snapshot(dir);
    // 200,000 frames (about 2 s of work), as a 0.3 MB gzip
    const long = join(root, 'long.xyz.gz');
    await new Promise<void>((resolve, reject) => {
      const gz = createGzip({ level: 1 });
      gz.pipe(createWriteStream(long)).on('finish', resolve).on('error', reject);
      const block = chair('frame', 0).repeat(1000);
      for (let i = 0; i < 200; i++) gz.write(block);
      gz.end();
    });
    const run = start(['trajectory', long, '-d', dir]);
    await until(() => hasTemp(dir));
    run.child.kill('SIGINT');
    const { status } = await run.done;
    expect(status).toBe(130);
    expect(snapshot(dir)).toEqual(before);
  }, 120_000);
});
