// Runs every bench/*.bench.js in sequence, each in its own Node process (with --expose-gc), and prints
// its output. Usage: node bench/run.js [filter]   (npm run bench builds dist/ first)
import { readdirSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2] ?? '';
const benches = readdirSync(here)
  .filter((f) => f.endsWith('.bench.js') && f.includes(filter))
  .sort();
let failed = 0;
for (const file of benches) {
  process.stdout.write(`\n== ${file}\n`);
  const run = spawnSync(process.execPath, ['--expose-gc', join(here, file)], { stdio: 'inherit' });
  if (run.status !== 0) {
    failed++;
    process.stdout.write(`== ${file} failed (exit ${run.status ?? run.signal})\n`);
  }
}
process.stdout.write(`\n${benches.length - failed} of ${benches.length} benches ran\n`);
process.exitCode = failed > 0 ? 1 : 0;
