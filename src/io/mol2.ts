/**
 * Tripos MOL2 reader as a push-style line consumer: each `@<TRIPOS>MOLECULE` starts a record (name → title),
 * `@<TRIPOS>ATOM` rows `id name x y z type [subst_id [subst_name [charge]]]` (element from the SYBYL type
 * before the dot, residue from the substructure name, e.g. `ALA12` → ALA, 12), `@<TRIPOS>BOND` rows
 * `id a b type` (1, 2, 3; `ar` → 4, aromatic; `am` amide → 1; `du`, `un`, `nc` → 1). Other sections are
 * skipped. Format: Tripos Mol2 File Format (Tripos, St. Louis; common practice, from memory).
 */
import type { Atom } from '../model/molecule.js';
import { elementInfo } from '../model/elements.js';
import type { ReadLimits } from './limits.js';
import { fields, parseNumber } from './numbers.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, quote, type Emit, type LineConsumer } from './sink.js';

const BOND_ORDERS: Readonly<Record<string, number>> = { '1': 1, '2': 2, '3': 3, ar: 4, am: 1, du: 1, un: 1, nc: 1 };

interface Record_ {
  builder: RecordBuilder;
  title: string;
  line: number;
  index: number;
  ids: Map<number, number>;
  failed: boolean;
  headerLine: number;
}

export class Mol2Consumer implements LineConsumer {
  private section = '';
  private record: Record_ | null = null;
  private count = 0;
  private stopped = false;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
  ) {}

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    const t = line.trim();
    if (t.startsWith('@<TRIPOS>')) {
      this.section = t.slice(9).toUpperCase();
      if (this.section === 'MOLECULE') this.start(lineNo);
      return;
    }
    const r = this.record;
    if (!r || r.failed || t === '' || t.startsWith('#')) return;
    if (this.section === 'MOLECULE') {
      if (r.headerLine === 0) {
        r.title = t;
        r.headerLine = lineNo;
      }
      return;
    }
    if (this.section === 'ATOM') return this.atom(r, t, lineNo);
    if (this.section === 'BOND') return this.bond(r, t, lineNo);
  }

  end(lastLine: number): void {
    if (this.stopped) return;
    this.close();
    if (this.count === 0) this.emit(failure(issue('no-atoms', this.file, lastLine || 1, 'no @<TRIPOS>MOLECULE section'), true));
    this.stopped = true;
  }

  private start(lineNo: number): void {
    this.close();
    if (++this.count > this.limits.maxRecords) {
      this.stopped = true;
      this.emit(failure(issue('too-many-records', this.file, lineNo, `more than ${this.limits.maxRecords} records (option maxRecords)`), true));
      return;
    }
    this.record = { builder: new RecordBuilder(this.file, 'mol2', this.limits), title: '', line: lineNo, index: this.count, ids: new Map(), failed: false, headerLine: 0 };
  }

  private atom(r: Record_, t: string, lineNo: number): void {
    const f = fields(t);
    if (f.length < 6) return this.fail(r, lineNo, `expected id name x y z type, found ${quote(t)}`, 'bad-atom-line');
    const xyz = [parseNumber(f[2]!), parseNumber(f[3]!), parseNumber(f[4]!)];
    const bad = xyz.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) return this.fail(r, lineNo, `${'xyz'[bad]} coordinate ${quote(f[2 + bad]!)} is not a number`, 'bad-number');
    const type = f[5]!;
    const element = elementInfo(type.split('.')[0]!)?.symbol;
    if (!element) return this.fail(r, lineNo, `unknown element in atom type ${quote(type)}`, 'unknown-element');
    const id = Number(f[0]);
    if (!Number.isInteger(id)) return this.fail(r, lineNo, `atom id ${quote(f[0]!)} is not a whole number`, 'bad-atom-line');
    const sub = f[7] !== undefined ? /^(.*?)(-?\d+)$/.exec(f[7]) : null;
    const charge = f[8] !== undefined ? parseNumber(f[8]) : Number.NaN;
    const atom: Atom = {
      element,
      name: f[1]!,
      serial: id,
      ...(f[7] !== undefined && f[7] !== '****' ? (sub && sub[1] !== '' ? { residue: sub[1], residueNumber: Number(sub[2]) } : { residue: f[7], residueNumber: Number(f[6]) }) : {}),
      ...(Number.isFinite(charge) ? { partialCharge: charge } : {}),
    };
    r.ids.set(id, r.builder.atomCount);
    const err = r.builder.addAtom(atom, xyz[0]!, xyz[1]!, xyz[2]!, lineNo);
    if (err) {
      r.failed = true;
      this.emit(failure(err));
    }
  }

  private bond(r: Record_, t: string, lineNo: number): void {
    const f = fields(t);
    if (f.length < 4) return this.fail(r, lineNo, `expected id atom atom type, found ${quote(t)}`, 'bad-bond');
    const order = BOND_ORDERS[f[3]!.toLowerCase()];
    if (order === undefined) return this.fail(r, lineNo, `unknown bond type ${quote(f[3]!)}`, 'bad-bond');
    const a = r.ids.get(Number(f[1]));
    const b = r.ids.get(Number(f[2]));
    if (a === undefined || b === undefined) return this.fail(r, lineNo, `bond ${f[0]} refers to atom ${a === undefined ? f[1] : f[2]}, which is not in the molecule`, 'bad-bond');
    if (a !== b) r.builder.addBond(a, b, order);
  }

  private close(): void {
    const r = this.record;
    this.record = null;
    if (!r || r.failed) return;
    const result = r.builder.finish(r.title, {}, r.index, r.line, true);
    if ('code' in result) this.emit(failure(result));
    else this.emit({ ok: true, molecule: result });
  }

  private fail(r: Record_, lineNo: number, message: string, code: string): void {
    r.failed = true;
    this.emit(failure(issue(code, this.file, lineNo, message)));
  }
}
