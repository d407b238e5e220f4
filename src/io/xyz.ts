/**
 * XYZ reader as a push-style line consumer: count line, comment line (the title; `key=value` pairs become
 * properties), then one `element x y z` line per atom; any number of frames. Built for trajectories: no regex
 * per atom line, numbers scanned in place, one Float64Array per frame, and the atom list of the previous frame
 * reused when the elements repeat. A bad frame is reported and reading resumes at the next count line.
 */
import type { Atom } from '../model/molecule.js';
import type { ReadLimits } from './limits.js';
import { elementSymbol, isLabel } from './elementSymbol.js';
import { cursor, fieldEnd, scanCount, scanFloat, scanNumberAt, skipBlank } from './numbers.js';
import { findOverlap, overlapMessage } from './overlap.js';
import { failure, issue, quote, type Emit, type LineConsumer } from './sink.js';
import { XyzRecord } from './xyzRecord.js';
import { fieldEndIn, scanPlainInto, skipBlankIn } from './rangeScan.js';

/** Options of the XYZ consumer beyond the limits. */
export interface XyzConsumerOptions {
  /**
   * Coordinate buffers handed back by the reader's user (frame streaming): a frame of matching size takes
   * one instead of allocating.
   */
  readonly pool?: Float64Array[];
}

const enum State {
  Count,
  Comment,
  Atoms,
  /** Skipping the rest of a bad frame whose length is known. */
  SkipAtoms,
  /** Lost: skipping until a line that looks like a count line. */
  Resync,
}

const AXES = ['x', 'y', 'z'] as const;

export class XyzConsumer implements LineConsumer {
  private state = State.Count;
  private count = 0;
  private found = 0;
  private start = 0;
  /** Frames started so far (count lines read). */
  private frame = 0;
  private title = '';
  private coords: Float64Array = new Float64Array(0);
  private atoms: Atom[] = [];
  private prevAtoms: readonly Atom[] = [];
  private prevTokens: string[] = [];
  private sameAsPrev = true;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
    private readonly options: XyzConsumerOptions = {},
  ) {}

  feed(line: string, lineNo: number): void {
    this.feedRange(line, 0, line.length, lineNo);
  }

  /**
   * Reads line `text[start, end)`. Count and atom lines are scanned in place; a line off the common path
   * (a bad or unusual line, an element that changes) is re-read as a string, so messages stay the same.
   */
  feedRange(text: string, start: number, end: number, lineNo: number): void {
    switch (this.state) {
      case State.Atoms:
        if (!this.atomInPlace(text, start, end)) this.atomLine(lineOf(text, start, end), lineNo);
        return;
      case State.Count:
        this.countLine(text, start, end, lineNo);
        return;
      case State.Comment:
        this.title = lineOf(text, start, end).trim();
        this.state = State.Atoms;
        return;
      case State.SkipAtoms: {
        const line = lineOf(text, start, end);
        if (isCountLine(line)) this.countLine(line, 0, line.length, lineNo);
        else if (++this.found >= this.count) this.state = State.Count;
        return;
      }
      case State.Resync: {
        const line = lineOf(text, start, end);
        if (isCountLine(line)) this.countLine(line, 0, line.length, lineNo);
      }
    }
  }

  end(): void {
    if (this.state === State.Comment || this.state === State.Atoms) {
      this.fail('truncated', this.start, `expected ${this.count} atoms, found ${this.found}`, State.Count);
    }
  }

  private countLine(text: string, start: number, end: number, lineNo: number): void {
    const s = skipBlankIn(text, start, end);
    if (s === end) return; // blank lines between frames
    const e = fieldEndIn(text, s, end);
    const n = skipBlankIn(text, e, end) === end ? scanCount(text, s, e) : -1;
    if (n < 0) {
      const line = lineOf(text, start, end);
      const more = this.frame > 0 && looksLikeAtom(line);
      const message = more
        ? `more atom lines than the count line of frame ${this.frame} says (${this.count})`
        : `expected an atom count, found ${quote(line)}`;
      this.fail(more ? 'wrong-count' : 'bad-count', lineNo, message, State.Resync);
      return;
    }
    this.start = lineNo;
    this.count = n;
    if (++this.frame > this.limits.maxRecords) {
      const message = `more than ${this.limits.maxRecords} records (option maxRecords)`;
      this.emit(failure(issue('too-many-records', this.file, lineNo, message), true));
      this.state = State.Resync;
      return;
    }
    this.found = 0;
    if (n === 0) return this.fail('wrong-count', lineNo, 'atom count is 0', State.Count);
    if (n > this.limits.maxAtoms) {
      const shown = e - s > 15 ? text.slice(s, e) : String(n);
      const message = `count line says ${shown} atoms; the limit is ${this.limits.maxAtoms} (option maxAtoms)`;
      return this.fail('too-many-atoms', lineNo, message, State.Resync);
    }
    const pool = this.options.pool;
    const spare = pool !== undefined && pool.length > 0 && pool[pool.length - 1]!.length === 3 * n ? pool.pop() : undefined;
    this.coords = spare ?? new Float64Array(3 * n);
    this.sameAsPrev = this.prevAtoms.length === n;
    this.atoms = this.sameAsPrev ? [] : new Array<Atom>(n);
    this.state = State.Comment;
  }

  private atomLine(line: string, lineNo: number): void {
    const k = this.found;
    const s = skipBlank(line, 0);
    const e = fieldEnd(line, s);
    const coords = this.coords;
    const x = scanNumberAt(line, e);
    const y = scanNumberAt(line, cursor.end);
    const z = scanNumberAt(line, cursor.end);
    // x - x is NaN for NaN and ±Infinity alike: one test for the three coordinates
    if (x - x + (y - y) + (z - z) !== 0) return this.badCoordinates(line, lineNo, s, e);
    coords[3 * k] = x;
    coords[3 * k + 1] = y;
    coords[3 * k + 2] = z;
    if (!this.atomName(line, s, e, k, lineNo)) return;
    this.found = k + 1;
    if (this.found === this.count) this.finish();
  }

  /**
   * The hot path: atom `found` from a well-formed line whose element is the one of the previous frame.
   * False for anything else, which `atomLine` then reads afresh.
   */
  private atomInPlace(text: string, start: number, end: number): boolean {
    if (!this.sameAsPrev) return false;
    const k = this.found;
    const s = skipBlankIn(text, start, end);
    const e = fieldEndIn(text, s, end);
    const prev = this.prevTokens[k]!;
    if (prev.length !== e - s || !text.startsWith(prev, s)) return false;
    // -1 from any of the three (an unusual or bad field): the string path decides
    const coords = this.coords;
    const px = scanPlainInto(text, e, end, coords, 3 * k);
    const py = px < 0 ? -1 : scanPlainInto(text, px, end, coords, 3 * k + 1);
    if (py < 0 || scanPlainInto(text, py, end, coords, 3 * k + 2) < 0) return false;
    this.found = k + 1;
    if (this.found === this.count) this.finish();
    return true;
  }

  /** Slow path: says which field of an atom line is missing, not a number or not finite. */
  private badCoordinates(line: string, lineNo: number, s: number, e: number): void {
    let p = e;
    for (let axis = 0; axis < 3; axis++) {
      const a = skipBlank(line, p);
      p = fieldEnd(line, a);
      if (a === p) return this.shortAtomLine(line, lineNo, s);
      const v = scanFloat(line, a, p);
      if (!Number.isFinite(v)) {
        const what = Number.isNaN(v) ? 'is not a number' : 'is not finite';
        return this.badAtom(lineNo, `${AXES[axis]} coordinate ${quote(line.slice(a, p))} ${what}`, 'bad-number');
      }
    }
  }

  /** A line with fewer than four fields: the frame ended early (blank or next count line) or is broken. */
  private shortAtomLine(line: string, lineNo: number, s: number): void {
    if (s === line.length || isCountLine(line)) {
      this.fail('wrong-count', this.start, `expected ${this.count} atoms, found ${this.found}`, State.Count);
      if (s !== line.length) this.countLine(line, 0, line.length, lineNo);
      return;
    }
    this.badAtom(lineNo, `expected an element and x y z, found ${quote(line)}`, 'bad-atom-line');
  }

  /** Records the element of atom k; false (after reporting) when it is unknown. */
  private atomName(line: string, s: number, e: number, k: number, lineNo: number): boolean {
    if (this.sameAsPrev) {
      const prev = this.prevTokens[k]!;
      if (prev.length === e - s && line.startsWith(prev, s)) return true;
      this.sameAsPrev = false;
      this.atoms = this.prevAtoms.slice(0, k);
    }
    const token = line.slice(s, e);
    const element = elementSymbol(token);
    if (element === null) {
      this.badAtom(lineNo, `unknown element ${quote(token)}`, 'unknown-element');
      return false;
    }
    this.atoms[k] = { element, name: isLabel(token) ? token : null };
    this.prevTokens[k] = token;
    return true;
  }

  private finish(): void {
    const n = this.count;
    const atoms = this.sameAsPrev ? this.prevAtoms : this.atoms;
    this.state = State.Count;
    const pair = findOverlap(this.coords, n, this.limits.minDistanceA);
    if (pair) {
      const [i, j] = pair;
      const message = overlapMessage(atoms, this.coords, i, j, this.limits.minDistanceA);
      return this.fail('overlapping-atoms', this.start + 2 + j, message, State.Count);
    }
    this.prevAtoms = atoms;
    this.prevTokens.length = n;
    const source = { file: this.file, format: 'xyz' as const, index: this.frame, line: this.start };
    const molecule = new XyzRecord(this.title, atoms, this.coords, source);
    this.emit({ ok: true, molecule });
  }

  private badAtom(lineNo: number, message: string, code: string): void {
    this.fail(code, lineNo, message, State.SkipAtoms);
    this.found++;
    if (this.found >= this.count) this.state = State.Count;
  }

  private fail(code: string, line: number, message: string, next: State): void {
    this.state = next;
    this.prevAtoms = [];
    this.emit(failure(issue(code, this.file, line, message)));
  }
}

/** Line `text[start, end)` as a string (the string itself when it is the whole line). */
function lineOf(text: string, start: number, end: number): string {
  return start === 0 && end === text.length ? text : text.slice(start, end);
}

/** A line with one non-negative integer and nothing else. */
function isCountLine(line: string): boolean {
  const s = skipBlank(line, 0);
  const e = fieldEnd(line, s);
  return s < e && skipBlank(line, e) === line.length && scanCount(line, s, e) >= 0;
}

/** A line whose first field is a word and whose next three are numbers. */
function looksLikeAtom(line: string): boolean {
  let p = fieldEnd(line, skipBlank(line, 0));
  for (let axis = 0; axis < 3; axis++) {
    const a = skipBlank(line, p);
    p = fieldEnd(line, a);
    if (a === p || Number.isNaN(scanFloat(line, a, p))) return false;
  }
  return true;
}
