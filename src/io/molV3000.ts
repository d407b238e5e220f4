/**
 * The V3000 connection table (`M  V30 ...` lines between `BEGIN CTAB` and `END CTAB`): COUNTS, the ATOM block
 * (`index type x y z aamap [CHG=n ...]`) and the BOND block (`index type atom1 atom2 ...`); other blocks are
 * skipped. Lines ending in `-` continue on the next `M  V30` line (BIOVIA, "CTfile Formats", 2020).
 */
import { elementInfo } from '../model/elements.js';
import type { Issue } from '../model/errors.js';
import { bondOrder } from './molV2000.js';
import { fields, parseNumber } from './numbers.js';
import type { RecordBuilder } from './recordBuilder.js';
import { issue, quote } from './sink.js';

type Block = 'none' | 'atom' | 'bond' | 'other';

/** Feeds V3000 lines into a `RecordBuilder`. */
export class V3000Reader {
  private block: Block = 'none';
  private pending = '';
  private pendingLine = 0;
  private ids = new Map<number, number>();
  private declaredAtoms = -1;
  private declaredBonds = -1;
  private countsLine = 0;
  private bondLines = 0;
  /** True once `END CTAB` was read. */
  done = false;

  constructor(
    private readonly file: string,
    private readonly builder: RecordBuilder,
    private readonly maxAtoms: number,
  ) {}

  /** Feeds one line of the record; returns an issue when the line is bad. */
  feed(line: string, lineNo: number): Issue | null {
    if (line.startsWith('M  END')) {
      return issue('truncated', this.file, lineNo, 'the V3000 table ends without END CTAB');
    }
    if (!line.startsWith('M  V30 ')) {
      return issue('bad-v3000', this.file, lineNo, `expected an 'M  V30' line inside the V3000 table, found ${quote(line)}`);
    }
    let body = line.slice(7);
    if (this.pending === '') this.pendingLine = lineNo;
    if (body.endsWith('-')) {
      this.pending += body.slice(0, -1);
      return null;
    }
    body = this.pending + body;
    this.pending = '';
    return this.statement(body.trim(), this.pendingLine);
  }

  private statement(body: string, lineNo: number): Issue | null {
    const f = fields(body);
    const head = f[0]?.toUpperCase();
    if (head === 'BEGIN') {
      const what = f[1]?.toUpperCase();
      this.block = what === 'ATOM' ? 'atom' : what === 'BOND' ? 'bond' : what === 'CTAB' ? 'none' : 'other';
      return null;
    }
    if (head === 'END') {
      const what = f[1]?.toUpperCase();
      if (what === 'CTAB') return this.close(lineNo);
      if (what === 'ATOM' && this.declaredAtoms >= 0 && this.builder.atomCount !== this.declaredAtoms) {
        return this.wrong(lineNo, `expected ${this.declaredAtoms} atoms, found ${this.builder.atomCount}`);
      }
      this.block = 'none';
      return null;
    }
    if (this.block === 'atom') return this.atom(f, lineNo);
    if (this.block === 'bond') return this.bond(f, lineNo);
    if (head === 'COUNTS' && this.block === 'none') return this.counts(f, lineNo);
    return null;
  }

  private counts(f: string[], lineNo: number): Issue | null {
    const atoms = Number(f[1]);
    const bonds = Number(f[2]);
    if (!/^\d+$/.test(f[1] ?? '') || !/^\d+$/.test(f[2] ?? '')) {
      return issue('bad-count', this.file, lineNo, `expected 'COUNTS atoms bonds ...', found ${quote(f.join(' '))}`);
    }
    if (atoms > this.maxAtoms) {
      const message = `counts line says ${f[1]} atoms; the limit is ${this.maxAtoms} (option maxAtoms)`;
      return issue('too-many-atoms', this.file, lineNo, message);
    }
    this.declaredAtoms = atoms;
    this.declaredBonds = bonds;
    this.countsLine = lineNo;
    return null;
  }

  private atom(f: string[], lineNo: number): Issue | null {
    if (f.length < 5) return issue('bad-atom-line', this.file, lineNo, `expected 'index type x y z ...', found ${quote(f.join(' '))}`);
    const id = Number(f[0]);
    const xyz = [parseNumber(f[2]!), parseNumber(f[3]!), parseNumber(f[4]!)];
    const bad = xyz.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) {
      const what = Number.isNaN(xyz[bad]) ? 'is not a number' : 'is not finite';
      return issue('bad-number', this.file, lineNo, `${'xyz'[bad]} coordinate ${quote(f[2 + bad]!)} ${what}`);
    }
    const element = elementInfo(f[1]!)?.symbol;
    if (!element) return issue('unknown-element', this.file, lineNo, `unknown element ${quote(f[1]!)}`);
    if (!Number.isInteger(id) || id < 1 || this.ids.has(id)) {
      return issue('bad-atom-line', this.file, lineNo, `atom index ${quote(f[0]!)} is not a new positive integer`);
    }
    const chg = f.find((t) => t.toUpperCase().startsWith('CHG='));
    const charge = chg ? Number(chg.slice(4)) : 0;
    this.ids.set(id, this.builder.atomCount);
    return this.builder.addAtom({ element, name: null, charge: Number.isInteger(charge) ? charge : 0 }, xyz[0]!, xyz[1]!, xyz[2]!, lineNo);
  }

  private bond(f: string[], lineNo: number): Issue | null {
    if (f.length < 4) return issue('bad-bond', this.file, lineNo, `expected 'index type atom atom', found ${quote(f.join(' '))}`);
    const type = Number(f[1]);
    const ends = [Number(f[2]), Number(f[3])].map((id) => this.ids.get(id));
    const missing = ends.findIndex((i) => i === undefined);
    if (missing >= 0) {
      const message = `bond ${f[0]} refers to atom ${f[2 + missing]}, which is not in the atom block`;
      return issue('bad-bond', this.file, lineNo, message);
    }
    if (ends[0] === ends[1]) return issue('bad-bond', this.file, lineNo, `bond ${f[0]} joins atom ${f[2]} to itself`);
    this.bondLines++;
    this.builder.addBond(ends[0]!, ends[1]!, Number.isInteger(type) ? bondOrder(type) : 1);
    return null;
  }

  private close(lineNo: number): Issue | null {
    this.done = true;
    if (this.declaredBonds >= 0 && this.bondLines !== this.declaredBonds) {
      return this.wrong(this.countsLine || lineNo, `expected ${this.declaredBonds} bonds, found ${this.bondLines}`);
    }
    return null;
  }

  private wrong(lineNo: number, message: string): Issue {
    return issue('wrong-count', this.file, this.countsLine || lineNo, message);
  }
}
