/**
 * Molfile / SD file reader as a push-style line consumer: header (title = first line), counts line, a V2000
 * or V3000 connection table, `M  CHG` charges, `M  END`, then `> <name>` data fields up to `$$$$`. Bonds and
 * orders come from the file. A bad record is reported and reading resumes after its `$$$$`.
 */
import type { Atom, Molecule } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import { parseChargeLine, parseCounts, parseV2000Atom, parseV2000Bond } from './molV2000.js';
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

const neutral = new Map<string, Atom>();

/** Atoms are immutable, so the neutral atom of each element is shared between records. */
function molAtom(element: string, charge: number): Atom {
  if (charge !== 0) return { element, name: null, charge };
  let atom = neutral.get(element);
  if (!atom) neutral.set(element, (atom = Object.freeze({ element, name: null, charge: 0 })));
  return atom;
}

export class SdfConsumer implements LineConsumer {
  private state = State.Header;
  private header: string[] = [];
  private start = 0;
  private record = 0;
  private counts = { atoms: 0, bonds: 0 };
  private countsLine = 0;
  private builder!: RecordBuilder;
  private v3000: V3000Reader | null = null;
  private properties: Record<string, string> = {};
  private field: string | null = null;
  private value: string[] = [];
  private stopped = false;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
  ) {}

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    if (this.state !== State.Data && line.startsWith('$$$$')) return this.endOfRecord();
    switch (this.state) {
      case State.Header:
        return this.headerLine(line, lineNo);
      case State.Counts:
        return this.countsLineIn(line, lineNo);
      case State.Atoms:
        return this.atomLine(line, lineNo);
      case State.Bonds:
        return this.bondLine(line, lineNo);
      case State.V3000:
        return this.v3000Line(line, lineNo);
      case State.Props:
        return this.propLine(line, lineNo);
      case State.Data:
        return this.dataLine(line);
      case State.Skip:
        return;
    }
  }

  end(): void {
    if (this.stopped || this.state === State.Skip) return;
    if (this.state === State.Data) return this.finish();
    if (this.state === State.Header && this.header.every((l) => l.trim() === '')) return;
    this.fail(issue('truncated', this.file, this.truncationLine(), this.truncation()));
  }

  private headerLine(line: string, lineNo: number): void {
    if (this.header.length === 0) {
      this.start = lineNo;
      this.record++;
      if (this.record > this.limits.maxRecords) {
        this.stopped = true;
        const message = `more than ${this.limits.maxRecords} records (option maxRecords)`;
        this.emit(failure(issue('too-many-records', this.file, lineNo, message), true));
        return;
      }
    }
    this.header.push(line);
    if (this.header.length === 3) this.state = State.Counts;
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

  private atomLine(line: string, lineNo: number): void {
    if (line.startsWith('M  ')) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
    if (line.startsWith('> ')) return this.fail(issue('truncated', this.file, this.countsLine, this.truncation()));
    const atom = parseV2000Atom(line);
    if ('code' in atom) {
      if (BOND_LIKE.test(line)) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
      return this.fail(issue(atom.code, this.file, lineNo, atom.message));
    }
    const { element, x, y, z, charge } = atom;
    const err = this.builder.addAtom(molAtom(element, charge), x, y, z, lineNo);
    if (err) return this.fail(err);
    if (this.builder.atomCount === this.counts.atoms) this.state = this.counts.bonds > 0 ? State.Bonds : State.Props;
  }

  private bondsRead = 0;

  private bondLine(line: string, lineNo: number): void {
    if (line.startsWith('M  ')) return this.fail(issue('wrong-count', this.file, this.countsLine, this.truncation()));
    const bond = parseV2000Bond(line);
    if (typeof bond === 'string') return this.fail(issue('bad-bond', this.file, lineNo, bond));
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

  private v3000Line(line: string, lineNo: number): void {
    const err = this.v3000!.feed(line, lineNo);
    if (err) return this.fail(err);
    if (this.v3000!.done) this.state = State.Props;
  }

  private propLine(line: string, lineNo: number): void {
    if (line.startsWith('M  END')) {
      this.state = State.Data;
      return;
    }
    if (line.startsWith('> ') || line === '>') {
      this.state = State.Data; // lenient: a missing `M  END` before the data fields
      return this.dataLine(line);
    }
    if (line.startsWith('M  CHG')) {
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

  private dataLine(line: string): void {
    if (this.field === null) {
      if (line.startsWith('$$$$')) return this.endOfRecord();
      if (line.startsWith('>')) {
        const m = /<([^>]*)>/.exec(line);
        this.field = m ? m[1]! : line.slice(1).trim();
        this.value = [];
      }
      return;
    }
    if (line.trim() === '' || line.startsWith('$$$$')) {
      this.properties[this.field] = this.value.join('\n');
      this.field = null;
      if (line.startsWith('$$$$')) this.endOfRecord();
      return;
    }
    this.value.push(line);
  }

  private endOfRecord(): void {
    // a missing `M  END` before `$$$$` is accepted (several writers omit it)
    if (this.state === State.Data || this.state === State.Props) this.finish();
    else if (this.state === State.Skip) this.reset();
    else if (this.state === State.Header && this.header.length === 0) this.reset();
    else {
      this.fail(issue('truncated', this.file, this.truncationLine(), this.truncation()));
      this.reset();
    }
  }

  private finish(): void {
    if (this.field !== null) this.properties[this.field] = this.value.join('\n');
    const title = (this.header[0] ?? '').trim();
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
    this.header = [];
    this.v3000 = null;
    this.properties = {};
    this.field = null;
    this.value = [];
    this.bondsRead = 0;
    this.chargesReset = false;
  }
}
