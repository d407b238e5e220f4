/** Shared pieces of the CLI robustness tests: an async runner for the built binary and degenerate inputs. */
import { spawn } from 'node:child_process';

export interface CliResult {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node bin/conformark.js ...args` (build first: `npx tsc -p tsconfig.build.json`), optional stdin. */
export function cli(args: readonly string[], options: { input?: string | Buffer; cwd?: string } = {}): Promise<CliResult> {
  return new Promise((resolve, reject) => {
    const bin = new URL('../../bin/conformark.js', import.meta.url).pathname;
    const child = spawn('node', [bin, ...args], { cwd: options.cwd ?? process.cwd(), stdio: ['pipe', 'pipe', 'pipe'] });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    child.stdout.on('data', (b: Buffer) => out.push(b));
    child.stderr.on('data', (b: Buffer) => err.push(b));
    child.on('error', reject);
    child.on('close', (status) => resolve({ status, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8') }));
    child.stdin.on('error', () => {}); // the program may stop reading early (e.g. an over-long line)
    child.stdin.end(options.input ?? '');
  });
}

/**
 * Non-finite numbers or missing values leaking into an output, as a list of findings (empty when clean).
 * JSON: anything outside string literals (text copied from the input may say "NaN"); SVG: attribute values
 * and the whole text; other text (tables, CSV, LaTeX, terminal): the whole text.
 */
export function leaks(text: string): string[] {
  const bad = /\bNaN\b|-?Infinity|\bundefined\b/g;
  const head = text.trimStart()[0];
  if (head === '{' || head === '[') return text.replace(/"(?:[^"\\]|\\.)*"/g, '""').match(bad) ?? [];
  if (head === '<') {
    const found = [...text.matchAll(/\s([\w:-]+)="([^"]*)"/g)].filter(([, , v]) => /\b(?:NaN|Infinity|undefined|null)\b/.test(v!)).map(([m]) => m.trim());
    return [...found, ...(text.match(/\bNaN\b|-?Infinity/g) ?? [])];
  }
  return text.match(/\bNaN\b|-?Infinity|[^a-z ]undefined|undefined[^\s.,;:)]/g) ?? [];
}

/** Elements that must never appear in a figure: scripts, HTML islands, embedded or external content. */
const FORBIDDEN_TAGS = /^(script|foreignobject|iframe|object|embed|image|use|style|a|animate|set|handler|listener)$/i;

/**
 * Unsafe markup in an SVG or HTML text, as a list of findings (empty when safe): forbidden elements, event
 * attributes (`on*=`), any non-fragment href, `url(`/`javascript:` in attribute values, DTDs, entities and
 * CDATA sections. Text content is not inspected: markup characters there are escaped, so it is inert.
 */
export function unsafeMarkup(svg: string): string[] {
  const found: string[] = [];
  if (/<!DOCTYPE|<!ENTITY|<!\[CDATA\[/i.test(svg)) found.push('DTD, entity or CDATA section');
  for (const [, name, attrs] of svg.matchAll(/<([A-Za-z][\w:.-]*)((?:\s+[^\s=>]+\s*=\s*(?:"[^"]*"|'[^']*'))*)\s*\/?>/g)) {
    if (FORBIDDEN_TAGS.test(name!)) found.push(`<${name}>`);
    for (const [, attr, value] of attrs!.matchAll(/\s([^\s=]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g)) {
      if (/^on/i.test(attr!)) found.push(`${name} ${attr}=`);
      if (/href$/i.test(attr!) && !(value ?? '').startsWith('#')) found.push(`${name} ${attr}="${value}"`);
      if (/url\(|javascript:|expression\(/i.test(value ?? '')) found.push(`${name} ${attr}="${value}"`);
    }
  }
  return found;
}

type P = readonly [number, number, number];

/** One XYZ frame. */
export function xyzFrame(title: string, atoms: readonly (readonly [string, ...P])[]): string {
  return `${atoms.length}\n${title}\n${atoms.map(([e, x, y, z]) => `${e} ${x.toFixed(5)} ${y.toFixed(5)} ${z.toFixed(5)}`).join('\n')}\n`;
}

/** A ring of `n` carbons of radius `r` Å with out-of-plane displacements `z(k)` and one H per carbon outward. */
export function ringFrame(title: string, n: number, r: number, z: (k: number) => number): string {
  const atoms: [string, number, number, number][] = [];
  for (let k = 0; k < n; k++) {
    const a = (2 * Math.PI * k) / n;
    atoms.push(['C', r * Math.cos(a), r * Math.sin(a), z(k)]);
  }
  for (let k = 0; k < n; k++) {
    const a = (2 * Math.PI * k) / n;
    atoms.push(['H', (r + 1.09) * Math.cos(a), (r + 1.09) * Math.sin(a), z(k)]);
  }
  return xyzFrame(title, atoms);
}

/**
 * Degenerate geometries, one frame each (energies in the comment for `ensemble`): 1 collinear torsion atoms
 * (H–C≡C–H on one line with two far H), 2 an exactly planar six-ring, 3 a nearly planar six-ring, 4 a
 * three-ring, 5 a very long bond axis with a substituent almost on it.
 */
export function degenerateXyz(): string {
  return [
    xyzFrame('collinear energy=0.0 kcal/mol', [['H', -1.06, 0, 0], ['C', 0, 0, 0], ['C', 1.2, 0, 0], ['H', 2.26, 0, 0]]),
    ringFrame('planar six-ring energy=1.0 kcal/mol', 6, 1.39, () => 0),
    ringFrame('nearly planar energy=2.0 kcal/mol', 6, 1.45, (k) => 1e-4 * (k % 2 === 0 ? 1 : -1)),
    ringFrame('three-ring energy=3.0 kcal/mol', 3, 0.87, () => 0),
    xyzFrame('nearly on axis energy=4.0 kcal/mol', [['C', 0, 0, 0], ['C', 1.54, 0, 0], ['H', -1.09, 1e-9, 0], ['H', 2.1, 0.9, 0.3]]),
  ].join('');
}

type Main = (argv: readonly string[]) => Promise<number>;
let loaded: Promise<Main> | null = null;

/**
 * Runs the built CLI's `main` (dist/cli/main.js, exactly what bin/conformark.js calls) inside this process,
 * capturing standard output and error: the same code path as the binary without a process start each time.
 * Runs must not overlap (they share process.stdout/stderr); inputs of one run stay protected for later runs.
 */
export async function cliInProcess(args: readonly string[]): Promise<CliResult> {
  const url = new URL('../../dist/cli/main.js', import.meta.url).href;
  loaded ??= import(url).then((m: { main: Main }) => m.main);
  const main = await loaded;
  const out: string[] = [];
  const err: string[] = [];
  const write = { out: process.stdout.write, err: process.stderr.write };
  const capture = (into: string[]) => ((chunk: string | Uint8Array) => {
    into.push(typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8'));
    return true;
  }) as typeof process.stdout.write;
  process.exitCode = undefined;
  process.stdout.write = capture(out);
  process.stderr.write = capture(err);
  try {
    const status = await main(['node', 'conformark', ...args]);
    return { status, stdout: out.join(''), stderr: err.join('') };
  } finally {
    process.stdout.write = write.out;
    process.stderr.write = write.err;
    process.exitCode = undefined;
  }
}
