// CLI start-up CPU (user + sys of the whole process, from /usr/bin/time) against `node -e 0`, interleaved
// rounds, median per command: `--version`, `inspect` of a 10-record SD file, `newman -o x.svg`, `chair -o x.svg`.
// Goal: each within 2.5x of bare node. Falls back to wall time (noisier) where /usr/bin/time is missing.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const cli = join(root, 'bin', 'conformark.js');
const sdf = join(root, 'examples', 'w2-methylcyclohexanol.sdf');
const out = mkdtempSync(join(tmpdir(), 'conformark-start-'));
const ROUNDS = Number(process.env.ROUNDS ?? 7);
const TIME = '/usr/bin/time';
const haveTime = existsSync(TIME);

const commands = {
  'node -e 0': ['-e', '0'],
  '--version': [cli, '--version'],
  inspect: [cli, 'inspect', sdf],
  'newman -o x.svg': [cli, 'newman', sdf, '--bond', '2-3', '-o', join(out, 'n.svg')],
  'chair -o x.svg': [cli, 'chair', sdf, '-o', join(out, 'c.svg')],
};

/** CPU seconds (user + sys) of one run, or wall seconds without /usr/bin/time. */
function run(args) {
  if (haveTime) {
    const r = spawnSync(TIME, ['-f', '%U %S', process.execPath, ...args], { encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`${args.join(' ')} failed: ${r.stderr}`);
    const [user, sys] = r.stderr.trim().split('\n').at(-1).split(' ').map(Number);
    return user + sys;
  }
  const t = performance.now();
  const r = spawnSync(process.execPath, args, { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`${args.join(' ')} failed: ${r.stderr}`);
  return (performance.now() - t) / 1000;
}

const times = Object.fromEntries(Object.keys(commands).map((k) => [k, []]));
for (const args of Object.values(commands)) run(args); // warm the file cache
for (let r = 0; r < ROUNDS; r++) for (const [name, args] of Object.entries(commands)) times[name].push(run(args));
rmSync(out, { recursive: true, force: true });

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const base = median(times['node -e 0']);
console.log(`${haveTime ? 'CPU (user+sys)' : 'wall time'}, median of ${ROUNDS} interleaved rounds`);
for (const [name, xs] of Object.entries(times)) {
  const m = median(xs);
  const ratio = name === 'node -e 0' ? '' : `  ratio ${(m / base).toFixed(2)}x node -e 0 (goal <= 2.5x)`;
  console.log(`${name.padEnd(16)} ${(m * 1000).toFixed(0).padStart(6)} ms${ratio}`);
}
