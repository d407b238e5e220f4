/**
 * Molfile / SD file reader as a push-style line consumer: header (title = first line), counts line, a V2000
 * or V3000 connection table, `M  CHG` charges, `M  END`, then `> <name>` data fields up to `$$$$`. Bonds and
 * orders come from the file. A bad record is reported and reading resumes after its `$$$$`.
 */
import type { Molecule } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import {
  parseChargeLine,
  parseCounts,
  parseV2000Atom,
  parseV2000Bond,
  scannedBond,
  scannedXyz,
  scanV2000Atom,
  scanV2000Bond,
} from './molV2000.js';
import { V3000Reader } from './molV3000.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, type Emit, type LineConsumer } from './sink.js';

const enum State {
  Header,
  Counts,
  Atoms,
  Bonds,
  V3000,
  Props,
  Data,
  Skip,
}

/** A line of small integers only: a bond line where an atom line was expected. */
const BOND_LIKE = /^(\s*\d{1,3}){3,7}\s*$/;

/** True when line `text[start, end)` starts with `prefix` (which holds no line break). */
function starts(text: string, start: number, end: number, prefix: string): boolean {
  return end - start >= prefix.length && text.startsWith(prefix, start);
}

/** `text.slice(start, end).trim() === ''`, without the slice for the usual printable ASCII first character. */
function isBlankLine(text: string, start: number, end: number): boolean {
  if (start === end) return true;
  const c = text.charCodeAt(start);
  if (c > 32 && c < 127) return false;
  return text.slice(start, end).trim() === '';
}

export class SdfConsumer implements LineConsumer {
  private state = State.Header;
  /** Header lines read so far (3 in all), the first (the title) and whether all were blank. */
  private headerLines = 0;
  private title = '';
  private headerBlank = true;
  private start = 0;
  private record = 0;
  private counts = { atoms: 0, bonds: 0 };
  private countsLine = 0;
  private builder!: RecordBuilder;
  private v3000: V3000Reader | null = null;
  private properties: Record<string, string> = {};
  private dataChars = 0;
  private field: string | null = null;
  private value: string | null = null;
  private stopped = false;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
  ) {}

  feed(line: string, lineNo: number): void {
    this.feedRange(line, 0, line.length, lineNo);
  }

  /** Reads line `text[start, end)`; the atom and bond blocks are scanned in place. */
  feedRange(text: string, start: number, end: number, lineNo: number): void {
    if (this.stopped) return;
    if (this.state !== State.Data && starts(text, start, end, '$$$$')) return this.endOfRecord();
    switch (this.state) {
      case State.Header:
        return this.headerLine(text, start, end, lineNo);
      case State.Counts:
        return this.countsLineIn(text.slice(start, end), lineNo);
      case State.Atoms:
        return this.atomLine(text, start, end, lineNo);
      case State.Bonds:
        return this.bondLine(text, start, end, lineNo);
      case State.V3000:
        return this.v3000Line(text.slice(start, end), lineNo);
      case State.Props:
        return this.propLine(text, start, end, lineNo);
      case State.Data:
        return this.dataLine(text, start, end, lineNo);
      case State.Skip:
        return;
    }
  }

  end(): void {
    if (this.stopped || this.state === State.Skip) return;
    if (this.state === State.Data) return this.finish();
    if (this.state === State.Header && this.headerBlank) return;
    this.fail(issue('truncated', this.file, this.truncationLine(), this.truncation()));
  }

  private headerLine(text: string, start: number, end: number, lineNo: number): void {
    if (this.headerLines === 0) {
      this.start = lineNo;
      this.record++;
      if (this.record > this.limits.maxRecords) {
        this.stopped = true;
        const message = `more than ${this.limits.maxRecords} records (option maxRecords)`;
        this.emit(failure(issue('too-many-records', this.file, lineNo, message), true));
        return;
      }
      this.title = text.slice(start, end);
    }
    if (this.headerBlank && !isBlankLine(text, start, end)) this.headerBlank = false;
    if (++this.headerLines === 3) this.state = State.Counts;
  }

  private countsLineIn(line: string, lineNo: number): void {
    const counts = parseCounts(line);
    if (typeof counts === 'string') return this.fail(issue('bad-count', this.file, lineNo, counts));
    this.builder = new RecordBuilder(this.file, 'sdf', this.limits);
    this.countsLine = lineNo;
    if (counts.v3000) {
      this.v3000 = new V3000Reader(this.file, this.builder, this.limits.maxAtoms);
      this.state = State.V3000;
      return;
    }
    if (counts.atoms > this.limits.maxAtoms) {
      const message = `counts line says ${counts.atoms} atoms; the limit is ${this.limits.maxAtoms} (option maxAtoms)`;
      return this.fail(issue('too-many-atoms', this.file, lineNo, message));
    }
    this.counts = counts;
    this.builder.reserve(counts.atoms);
    this.state = counts.atoms > 0 ? State.Atoms : counts.bonds > 0 ? State.Bonds : State.Props;
  }

  private atomLine(text: string, start: number, end: number, lineNo: number): void {
    let atom = scanV2000Atom(text, start, end);
    let { x, y, z } = scannedXyz;
    if (atom === null) {
      const line = text.slice(start, end);
      if (line.startsWith('M  ')) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
      if (line.startsWith('> ')) return this.fail(issue('truncated', this.file, this.countsLine, this.truncation()));
      const parsed = parseV2000Atom(line);
      if ('code' in parsed) {
        if (BOND_LIKE.test(line)) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
        return this.fail(issue(parsed.code, this.file, lineNo, parsed.message));
      }
      ({ x, y, z } = parsed);
      atom = { element: parsed.element, name: null, charge: parsed.charge };
    }
    const err = this.builder.addAtom(atom, x, y, z, lineNo);
    if (err) return this.fail(err);
    if (this.builder.atomCount === this.counts.atoms) this.state = this.counts.bonds > 0 ? State.Bonds : State.Props;
  }

  private bondsRead = 0;

  private bondLine(text: string, start: number, end: number, lineNo: number): void {
    if (starts(text, start, end, 'M  ')) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
    let bond: { readonly a: number; readonly b: number; readonly order: number } = scannedBond;
    if (!scanV2000Bond(text, start, end)) {
      const parsed = parseV2000Bond(text.slice(start, end));
      if (typeof parsed === 'string' && this.isAtomLine(text, start, end)) {
        return this.fail(issue('wrong-count', this.file, this.countsLine, `counts line says ${plural(this.counts.atoms, 'atom')}, but an atom line follows them (line ${lineNo})`));
      }
      if (typeof parsed === 'string') return this.fail(issue('bad-bond', this.file, lineNo, parsed));
      bond = parsed;
    }
    const n = this.builder.atomCount;
    const number = this.bondsRead + 1;
    if (bond.a < 1 || bond.a > n || bond.b < 1 || bond.b > n) {
      const end = bond.a < 1 || bond.a > n ? bond.a : bond.b;
      return this.fail(issue('bad-bond', this.file, lineNo, `bond ${number} refers to atom ${end}, but the record has ${n} atoms`));
    }
    if (bond.a === bond.b) return this.fail(issue('bad-bond', this.file, lineNo, `bond ${number} joins atom ${bond.a} to itself`));
    this.builder.addBond(bond.a - 1, bond.b - 1, bond.order);
    if (++this.bondsRead === this.counts.bonds) this.state = State.Props;
  }

  /** True for a V2000 atom line (coordinates and an element). */
  private isAtomLine(text: string, start: number, end: number): boolean {
    if (scanV2000Atom(text, start, end) !== null) return true;
    const line = text.slice(start, end);
    return /^\s*-?\d/.test(line) && !('code' in parseV2000Atom(line));
  }

  private v3000Line(line: string, lineNo: number): void {
    const err = this.v3000!.feed(line, lineNo);
    if (err) return this.fail(err);
    if (this.v3000!.done) this.state = State.Props;
  }

  /** The line after an `A  ` (atom alias) line is free text, whatever it looks like. */
  private aliasText = false;

  private propLine(text: string, start: number, end: number, lineNo: number): void {
    if (this.aliasText) {
      this.aliasText = false;
      return;
    }
    if (starts(text, start, end, 'A  ')) this.aliasText = true;
    // a counts line that says too few bonds (or atoms) must not drop the rest silently: a bond or atom line
    // here, before `M  END`, is one the counts line did not count
    if (this.v3000 === null && (BOND_LIKE.test(text.slice(start, end)) || this.isAtomLine(text, start, end))) {
      const what = BOND_LIKE.test(text.slice(start, end)) ? `${plural(this.counts.bonds, 'bond')}, but a bond line` : `${plural(this.counts.atoms, 'atom')}, but an atom line`;
      return this.fail(issue('wrong-count', this.file, this.countsLine, `counts line says ${what} follows them (line ${lineNo})`));
    }
    if (starts(text, start, end, 'M  END')) {
      this.state = State.Data;
      return;
    }
    if (starts(text, start, end, '> ') || (end - start === 1 && text.charCodeAt(start) === 62)) {
      this.state = State.Data; // lenient: a missing `M  END` before the data fields
      return this.dataLine(text, start, end, lineNo);
    }
    if (starts(text, start, end, 'M  CHG')) {
      const line = text.slice(start, end);
      const pairs = parseChargeLine(line);
      if (typeof pairs === 'string') return this.fail(issue('bad-charge', this.file, lineNo, pairs));
      this.applyCharges(pairs, lineNo);
    }
  }

  private chargesReset = false;

  private applyCharges(pairs: Array<[number, number]>, lineNo: number): void {
    const b = this.builder;
    if (!this.chargesReset) {
      // `M  CHG` supersedes every charge of the atom block (CTfile format)
      b.atoms.forEach((a, i) => b.setAtom(i, { ...a, charge: 0 }));
      this.chargesReset = true;
    }
    for (const [atom, charge] of pairs) {
      if (atom < 1 || atom > b.atomCount) {
        return this.fail(issue('bad-charge', this.file, lineNo, `charge given for atom ${atom}, but the record has ${b.atomCount} atoms`));
      }
      b.setAtom(atom - 1, { ...b.atoms[atom - 1]!, charge });
    }
  }

  private dataLine(text: string, start: number, end: number, lineNo: number): void {
    // the data block is the one part of a record without a count: bound it (10 lines' worth of the line limit)
    this.dataChars += end - start + 1;
    if (this.dataChars > 10 * this.limits.maxLineLength) {
      return this.fail(issue('data-too-long', this.file, lineNo, `the SD data fields of record ${this.record} are longer than ${10 * this.limits.maxLineLength} characters (10 × option maxLineLength)`));
    }
    if (this.field === null) {
      if (starts(text, start, end, '$$$$')) return this.endOfRecord();
      if (text.charCodeAt(start) === 62 && start < end) {
        // the name is between the first `<` and the next `>` (as /<([^>]*)>/ finds it), else the rest of the line
        const line = text.slice(start, end);
        const open = line.indexOf('<');
        const close = open < 0 ? -1 : line.indexOf('>', open + 1);
        this.field = close >= 0 ? line.slice(open + 1, close) : line.slice(1).trim();
        this.value = null;
      }
      return;
    }
    if (isBlankLine(text, start, end) || starts(text, start, end, '$$$$')) {
      setField(this.properties, this.field, this.value ?? '');
      this.field = null;
      if (starts(text, start, end, '$$$$')) this.endOfRecord();
      return;
    }
    const line = text.slice(start, end);
    this.value = this.value === null ? line : `${this.value}\n${line}`;
  }

  private endOfRecord(): void {
    // a missing `M  END` before `$$$$` is accepted (several writers omit it)
    if (this.state === State.Data || this.state === State.Props) this.finish();
    else if (this.state === State.Skip) this.reset();
    else if (this.state === State.Header && this.headerLines === 0) this.reset();
    else {
      this.fail(issue('truncated', this.file, this.truncationLine(), this.truncation()));
      this.reset();
    }
  }

  private finish(): void {
    if (this.field !== null) setField(this.properties, this.field, this.value ?? '');
    const title = this.title.trim();
    const result: Molecule | Issue = this.builder.finish(title, this.properties, this.record, this.start, true);
    if ('code' in result) this.fail(result);
    else this.emit({ ok: true, molecule: result });
    this.reset();
  }

  private truncationLine(): number {
    return this.state === State.Header || this.state === State.Counts ? this.start : this.countsLine;
  }

  private truncation(): string {
    if (this.state === State.Props) return 'record ends before M  END';
    if (this.state === State.Header || this.state === State.Counts) return 'record ends inside the header block';
    if (this.state === State.V3000) return 'record ends inside the V3000 table (no END CTAB)';
    if (this.state === State.Bonds) return `expected ${this.counts.bonds} bonds, found ${this.bondsRead}`;
    return `expected ${this.counts.atoms} atoms, found ${this.builder?.atomCount ?? 0}`;
  }

  private fail(i: Issue): void {
    this.emit(failure(i));
    this.state = State.Skip;
  }

  private reset(): void {
    this.state = State.Header;
    this.headerLines = 0;
    this.title = '';
    this.headerBlank = true;
    this.v3000 = null;
    this.properties = {};
    this.dataChars = 0;
    this.field = null;
    this.value = null;
    this.bondsRead = 0;
    this.chargesReset = false;
    this.aliasText = false;
  }
}

/** `1 bond`, `2 bonds`. */
function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** Stores a data field as an own property, also when it is named `__proto__` (plain assignment would drop it). */
function setField(properties: Record<string, string>, name: string, value: string): void {
  Object.defineProperty(properties, name, { value, enumerable: true, writable: true, configurable: true });
}
