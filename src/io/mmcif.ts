/**
 * mmCIF reader as a push-style line consumer: the `_atom_site` loop (author chain, residue number, insertion
 * code and atom names, as in PDB files; label ids where no author id is given), one record per
 * `pdbx_PDB_model_num`, one alternate location per residue (`keepAltLocs`). Title from `_struct.title`, else
 * the data block name. Bonds are perceived from coordinates. Only the current model is held.
 */
import type { Atom } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import { elementInfo } from '../model/elements.js';
import { cifTokens } from './cifTokens.js';
import type { ReadLimits } from './limits.js';
import { parseNumber } from './numbers.js';
import { keepAltLocs, type PendingAtom } from './pdbAltLoc.js';
import { elementFromName } from './pdbLine.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, quote, type Emit, type LineConsumer } from './sink.js';

type Payload = { atom: Atom; x: number; y: number; z: number; line: number };

interface Model {
  readonly builder: RecordBuilder;
  readonly number: string;
  readonly index: number;
  readonly line: number;
  pending: PendingAtom<Payload>[];
  residueKey: string;
  failed: boolean;
}

/** Column positions of the `_atom_site` items this reader uses (-1 when absent). */
type Columns = Record<(typeof ITEMS)[number], number>;
const ITEMS = [
  'id', 'type_symbol', 'label_atom_id', 'auth_atom_id', 'label_alt_id', 'label_comp_id', 'auth_comp_id',
  'label_asym_id', 'auth_asym_id', 'label_seq_id', 'auth_seq_id', 'pdbx_PDB_ins_code', 'Cartn_x', 'Cartn_y',
  'Cartn_z', 'occupancy', 'pdbx_formal_charge', 'pdbx_PDB_model_num',
] as const;

/** `.` and `?` are CIF's "not applicable" and "unknown". */
const value = (t: string | undefined): string => (t === undefined || t === '.' || t === '?' ? '' : t);

export class MmcifConsumer implements LineConsumer {
  private state: 'outside' | 'loop-head' | 'atom-site' | 'other-loop' = 'outside';
  private head: string[] = [];
  private headLine = 0;
  private columns: Columns | null = null;
  private tokens: string[] = [];
  private rowLine = 0;
  private model: Model | null = null;
  private count = 0;
  private title = '';
  private block = '';
  private sawAtomSite = false;
  private stopped = false;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
  ) {}

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    const t = line.trimStart();
    if (this.state === 'atom-site' && t !== '' && !t.startsWith('_') && !t.startsWith('loop_') && !t.startsWith('data_') && !t.startsWith('#')) {
      return this.row(line, lineNo);
    }
    if (this.state === 'atom-site') this.endLoop(lineNo);
    if (this.state === 'loop-head') {
      if (t.startsWith('_')) {
        this.head.push(t.split(/\s/, 1)[0]!);
        return;
      }
      this.startLoop(lineNo);
      if ((this.state as string) === 'atom-site') return this.feed(line, lineNo);
    }
    if (t.startsWith('data_')) this.block = t.slice(5).trim();
    else if (t.startsWith('loop_')) {
      this.state = 'loop-head';
      this.head = [];
      this.headLine = lineNo;
    } else if (t.startsWith('_')) {
      this.state = 'outside';
      if (/^_struct\.title\s/.test(t)) this.title = value(cifTokens(t)?.[1]);
    }
  }

  end(lastLine: number): void {
    if (this.stopped) return;
    if (this.state === 'loop-head') this.startLoop(lastLine);
    if (this.state === 'atom-site') this.endLoop(lastLine);
    this.closeModel();
    if (!this.sawAtomSite) this.fail(issue('no-atoms', this.file, lastLine || 1, 'no _atom_site loop with Cartn_x, Cartn_y, Cartn_z (small-molecule CIF with fractional coordinates is not read yet)'), true);
    this.stopped = true;
  }

  private startLoop(lineNo: number): void {
    if (!this.head[0]?.startsWith('_atom_site.')) {
      this.state = 'other-loop';
      return;
    }
    const names = this.head.map((h) => h.slice('_atom_site.'.length));
    const cols = Object.fromEntries(ITEMS.map((k) => [k, names.indexOf(k)])) as Columns;
    for (const k of ['Cartn_x', 'Cartn_y', 'Cartn_z'] as const) {
      if (cols[k] < 0) return this.fail(issue('bad-header', this.file, this.headLine, `the _atom_site loop has no _atom_site.${k}`), true);
    }
    if (cols.type_symbol < 0 && cols.label_atom_id < 0 && cols.auth_atom_id < 0) {
      return this.fail(issue('bad-header', this.file, this.headLine, 'the _atom_site loop has neither type_symbol nor atom names'), true);
    }
    this.columns = cols;
    this.sawAtomSite = true;
    this.state = 'atom-site';
    this.tokens = [];
    this.rowLine = lineNo;
  }

  private endLoop(lineNo: number): void {
    this.state = 'outside';
    if (this.tokens.length > 0) {
      const message = `an _atom_site row has ${this.tokens.length} values, expected ${this.head.length}`;
      this.fail(issue('bad-atom-line', this.file, this.rowLine || lineNo, message), true);
    }
  }

  private row(line: string, lineNo: number): void {
    const toks = cifTokens(line);
    if (toks === null) return this.fail(issue('bad-atom-line', this.file, lineNo, 'a text field (;) inside the _atom_site loop'), true);
    if (this.tokens.length === 0) this.rowLine = lineNo;
    for (const tok of toks) {
      this.tokens.push(tok);
      if (this.tokens.length === this.head.length) {
        this.atom(this.tokens, this.rowLine);
        if (this.stopped) return;
        this.tokens = [];
        this.rowLine = lineNo;
      }
    }
  }

  private atom(v: readonly string[], lineNo: number): void {
    const c = this.columns!;
    const get = (k: keyof Columns): string => (c[k] < 0 ? '' : value(v[c[k]]));
    const modelNo = get('pdbx_PDB_model_num') || '1';
    if (!this.model || this.model.number !== modelNo) this.startModel(modelNo, lineNo);
    const m = this.model;
    if (!m || m.failed) return;
    const xyz = (['Cartn_x', 'Cartn_y', 'Cartn_z'] as const).map((k) => parseNumber(get(k)));
    const bad = xyz.findIndex((x) => !Number.isFinite(x));
    if (bad >= 0) return this.failModel(m, issue('bad-number', this.file, lineNo, `${'xyz'[bad]} coordinate ${quote(get((['Cartn_x', 'Cartn_y', 'Cartn_z'] as const)[bad]!))} is not a number (_atom_site.Cartn_${'xyz'[bad]})`));
    const name = get('auth_atom_id') || get('label_atom_id');
    const symbol = get('type_symbol');
    const element = symbol !== '' ? elementInfo(symbol)?.symbol : elementFromName(` ${name}`.slice(0, 4));
    if (!element) return this.failModel(m, issue('unknown-element', this.file, lineNo, `unknown element ${quote(symbol || name)} (_atom_site.type_symbol)`));
    const seq = get('auth_seq_id') || get('label_seq_id');
    const residue = get('auth_comp_id') || get('label_comp_id');
    const chain = get('auth_asym_id') || get('label_asym_id');
    const insertion = get('pdbx_PDB_ins_code');
    const serial = Number.parseInt(get('id'), 10);
    const charge = Number.parseInt(get('pdbx_formal_charge'), 10);
    const occupancy = parseNumber(get('occupancy'));
    const altLoc = get('label_alt_id');
    const atom: Atom = {
      element,
      name,
      residue,
      ...(/^-?\d+$/.test(seq) ? { residueNumber: Number(seq) } : {}),
      insertionCode: insertion,
      chain,
      ...(Number.isInteger(serial) && String(serial) === get('id') ? { serial } : {}),
      altLoc,
      charge: Number.isInteger(charge) ? charge : 0,
    };
    const key = `${chain}|${seq}|${insertion}|${residue}`;
    if (key !== m.residueKey) {
      this.flushResidue();
      m.residueKey = key;
    }
    m.pending.push({ name, altLoc, occupancy: Number.isFinite(occupancy) ? occupancy : 1, payload: { atom, x: xyz[0]!, y: xyz[1]!, z: xyz[2]!, line: lineNo } });
  }

  private startModel(number: string, lineNo: number): void {
    this.closeModel();
    if (++this.count > this.limits.maxRecords) {
      return this.fail(issue('too-many-records', this.file, lineNo, `more than ${this.limits.maxRecords} records (option maxRecords)`), true);
    }
    this.model = { builder: new RecordBuilder(this.file, 'mmcif', this.limits), number, index: this.count, line: lineNo, pending: [], residueKey: '', failed: false };
  }

  private flushResidue(): void {
    const m = this.model;
    if (!m || m.failed || m.pending.length === 0) return;
    const { kept } = keepAltLocs(m.pending, this.limits.altLoc);
    m.pending = [];
    for (const { payload: p } of kept) {
      const err = m.builder.addAtom(p.atom, p.x, p.y, p.z, p.line);
      if (err) return this.failModel(m, err);
    }
  }

  private closeModel(): void {
    this.flushResidue();
    const m = this.model;
    this.model = null;
    if (!m || m.failed) return;
    const result = m.builder.finish(this.title || this.block || 'mmCIF', {}, m.index, m.line, false);
    if ('code' in result) this.emit(failure(result));
    else this.emit({ ok: true, molecule: result });
  }

  private failModel(m: Model, i: Issue): void {
    m.failed = true;
    m.pending = [];
    this.emit(failure(i));
  }

  private fail(i: Issue, fatal: boolean): void {
    if (fatal) this.stopped = true;
    this.emit(failure(i, fatal));
  }
}
