/**
 * The fixed-column lines of an MDL V2000 connection table: counts line, atom lines, bond lines, `M  CHG`.
 * Columns follow the CTfile format (BIOVIA, "CTfile Formats", 2020); whitespace-separated fields are accepted
 * as a fallback because many writers misalign the atom block.
 */
import { elementInfo } from '../model/elements.js';
import type { Atom } from '../model/molecule.js';
import { fields, parseNumber, scanCount, scanDecimal } from './numbers.js';
import { quote } from './sink.js';

/** Counts line: atom and bond counts, and the version tag. */
export interface Counts {
  readonly atoms: number;
  readonly bonds: number;
  readonly v3000: boolean;
}

/** Parses a counts line, or returns an error message. */
export function parseCounts(line: string): Counts | string {
  if (/V3000/.test(line)) return { atoms: 0, bonds: 0, v3000: true };
  const atoms = columnInt(line, 0, 3);
  const bonds = columnInt(line, 3, 6);
  if (atoms < 0 || bonds < 0) return `expected a counts line (atoms, bonds, ..., V2000), found ${quote(line)}`;
  return { atoms, bonds, v3000: false };
}

/** One parsed V2000 atom line. */
export interface V2000Atom {
  readonly element: string;
  readonly x: number;
  readonly y: number;
  readonly z: number;
  readonly charge: number;
}

const CHARGE_CODES: readonly number[] = [0, 3, 2, 1, 0, -1, -2, -3];

/** Parses an atom line, or returns `{ code, message }`. Fixed columns are scanned in place (hot path). */
export function parseV2000Atom(line: string): V2000Atom | { code: string; message: string } {
  const fixed = line.length >= 34 && line.charCodeAt(30) === 32;
  let x = fixed ? columnFloat(line, 0, 10) : Number.NaN;
  let y = fixed ? columnFloat(line, 10, 20) : Number.NaN;
  let z = fixed ? columnFloat(line, 20, 30) : Number.NaN;
  let symbol = fixed ? columnText(line, 31, 34) : '';
  let chargeCode = fixed ? columnInt(line, 36, 39, 0) : 0;
  if (Number.isNaN(x) || Number.isNaN(y) || Number.isNaN(z) || symbol === '') {
    const f = fields(line);
    if (f.length < 4) return { code: 'bad-atom-line', message: `expected x y z and an element, found ${quote(line)}` };
    [x, y, z] = [parseNumber(f[0]!), parseNumber(f[1]!), parseNumber(f[2]!)];
    symbol = f[3]!;
    chargeCode = f[5] === undefined ? 0 : Number(f[5]);
  }
  if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) {
    const bad = [x, y, z].findIndex((v) => !Number.isFinite(v));
    const text = fields(line)[bad] ?? '';
    const what = Number.isNaN([x, y, z][bad]) ? 'is not a number' : 'is not finite';
    return { code: 'bad-number', message: `${'xyz'[bad]} coordinate ${quote(text)} ${what}` };
  }
  const element = symbolOf(symbol);
  if (!element) return { code: 'unknown-element', message: `unknown element ${quote(symbol)}` };
  return { element, x, y, z, charge: CHARGE_CODES[chargeCode] ?? 0 };
}

const symbols = new Map<string, string | null>();

/** Molfile element symbol → normalised symbol (cached), `null` when unknown (`R#`, `A`, `*`). */
function symbolOf(text: string): string | null {
  let hit = symbols.get(text);
  if (hit === undefined) {
    hit = elementInfo(text)?.symbol ?? null;
    if (symbols.size < 1000) symbols.set(text, hit);
  }
  return hit;
}

/** Start of the non-blank text in `line[from, to)` (blanks are spaces). */
function trimStart(line: string, from: number, to: number): number {
  while (from < to && line.charCodeAt(from) === 32) from++;
  return from;
}

/** End of the non-blank text in `line[from, to)`. */
function trimEnd(line: string, from: number, to: number): number {
  while (to > from && line.charCodeAt(to - 1) === 32) to--;
  return to;
}

/** Number in `line[from, to)` (`to` within the line), NaN when blank. */
function spanFloat(line: string, from: number, to: number): number {
  const s = trimStart(line, from, to);
  const e = trimEnd(line, s, to);
  return s < e ? scanDecimal(line, s, e) : Number.NaN;
}

/** Integer in `line[from, to)` (`to` within the line); `blank` if empty, -1 if not a non-negative integer. */
function spanInt(line: string, from: number, to: number, blank: number): number {
  const s = trimStart(line, from, to);
  const e = trimEnd(line, s, to);
  return s < e ? scanCount(line, s, e) : blank;
}

function columnFloat(line: string, from: number, to: number): number {
  return spanFloat(line, from, Math.min(to, line.length));
}

function columnText(line: string, from: number, to: number): string {
  const s = trimStart(line, from, Math.min(to, line.length));
  return line.slice(s, trimEnd(line, s, Math.min(to, line.length)));
}

/** Integer in fixed columns [from, to); `blank` if empty, -1 if not a non-negative integer. */
function columnInt(line: string, from: number, to: number, blank = -1): number {
  return spanInt(line, from, Math.min(to, line.length), blank);
}

/** Coordinates left by the last successful `scanV2000Atom` (one shared object: nothing allocated per atom). */
export const scannedXyz = { x: 0, y: 0, z: 0 };

/** Atoms are immutable, so one frozen atom per symbol text and charge code is shared between records. */
const atomCache = new Map<number, Atom | null>();

/**
 * The hot path for an atom line `text[start, end)` in exact fixed columns, read in place: returns the (shared)
 * atom and leaves x, y, z in `scannedXyz`, or returns `null` for anything else (misaligned, bad number,
 * unknown element), for which the caller takes `parseV2000Atom` with its fallbacks and messages.
 */
export function scanV2000Atom(text: string, start: number, end: number): Atom | null {
  if (end - start < 34 || text.charCodeAt(start + 30) !== 32) return null;
  const x = spanFloat(text, start, start + 10);
  const y = spanFloat(text, start + 10, start + 20);
  const z = spanFloat(text, start + 20, start + 30);
  if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) return null;
  const s = trimStart(text, start + 31, start + 34);
  const e = trimEnd(text, s, start + 34);
  if (s === e) return null;
  let key = 0;
  for (let i = s; i < e; i++) {
    const c = text.charCodeAt(i);
    if (c >= 128) return null;
    key = key * 128 + c;
  }
  const code = spanInt(text, start + 36, Math.min(start + 39, end), 0);
  key = key * 8 + (code >= 0 && code < 8 ? code : 0);
  let atom = atomCache.get(key);
  if (atom === undefined) {
    const element = symbolOf(text.slice(s, e));
    atom = element ? Object.freeze({ element, name: null, charge: CHARGE_CODES[code] ?? 0 }) : null;
    if (atomCache.size < 1000) atomCache.set(key, atom);
  }
  if (atom === null) return null;
  scannedXyz.x = x;
  scannedXyz.y = y;
  scannedXyz.z = z;
  return atom;
}

/** One parsed bond line (1-based atom numbers as in the file). */
export interface V2000Bond {
  readonly a: number;
  readonly b: number;
  readonly order: number;
}

/** Parses a bond line, or returns an error message. */
export function parseV2000Bond(line: string): V2000Bond | string {
  let a = columnInt(line, 0, 3);
  let b = columnInt(line, 3, 6);
  let type = columnInt(line, 6, 9);
  if (a < 0 || b < 0 || type < 0) {
    const f = fields(line);
    [a, b, type] = [f[0], f[1], f[2]].map((t) => (t !== undefined && /^\d+$/.test(t) ? Number(t) : -1)) as [number, number, number];
    if (a < 0 || b < 0 || type < 0) return `expected a bond line (atom, atom, type), found ${quote(line)}`;
  }
  return { a, b, order: bondOrder(type) };
}

/** The atoms and order left by the last successful `scanV2000Bond`. */
export const scannedBond = { a: 0, b: 0, order: 1 };

/** The hot path for a bond line `text[start, end)` in fixed columns: true when read, else use `parseV2000Bond`. */
export function scanV2000Bond(text: string, start: number, end: number): boolean {
  const a = spanInt(text, start, Math.min(start + 3, end), -1);
  const b = spanInt(text, start + 3, Math.min(start + 6, end), -1);
  const type = spanInt(text, start + 6, Math.min(start + 9, end), -1);
  if (a < 0 || b < 0 || type < 0) return false;
  scannedBond.a = a;
  scannedBond.b = b;
  scannedBond.order = bondOrder(type);
  return true;
}

/** Molfile bond type → order: 1, 2, 3, 4 (aromatic); query and special types count as 1. */
export function bondOrder(type: number): number {
  return type >= 1 && type <= 4 ? type : 1;
}

/** `M  CHG  n aaa vvv ...` → [atom (1-based), charge] pairs, or an error message. */
export function parseChargeLine(line: string): Array<[number, number]> | string {
  const f = fields(line.slice(6));
  const n = Number(f[0]);
  const pairs: Array<[number, number]> = [];
  for (let k = 0; k < n; k++) {
    const atom = Number(f[1 + 2 * k]);
    const charge = Number(f[2 + 2 * k]);
    if (!Number.isInteger(atom) || !Number.isInteger(charge)) return `malformed charge line ${quote(line)}`;
    pairs.push([atom, charge]);
  }
  return Number.isInteger(n) ? pairs : `malformed charge line ${quote(line)}`;
}
