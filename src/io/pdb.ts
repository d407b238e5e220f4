/**
 * PDB reader as a push-style line consumer: ATOM/HETATM (first alternate location only), CONECT (→ bonds,
 * deduplicated, order 1), MODEL/ENDMDL (→ frames). Title from TITLE, else COMPND, else HEADER, else the file
 * name. CONECT records usually follow the last model, so without a `conect` list given up front the models
 * are held until the end of the input; `readRecords` scans a PDB file's CONECT lines first and streams.
 */
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import { parseConect, parsePdbAtom, type Conect } from './pdbLine.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, type Emit, type LineConsumer } from './sink.js';

interface Model {
  readonly builder: RecordBuilder;
  readonly serials: Map<number, number>;
  readonly index: number;
  readonly line: number;
  altLoc: string;
  failed: boolean;
}

export class PdbConsumer implements LineConsumer {
  private titles = { TITLE: '', COMPND: '', HEADER: '' };
  private model: Model | null = null;
  private held: Model[] = [];
  private conect: Conect[];
  private readonly streaming: boolean;
  private count = 0;
  private stopped = false;

  /** `conect`: the file's CONECT records, when already known (then each model is emitted at ENDMDL). */
  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
    conect?: readonly Conect[],
  ) {
    this.conect = conect ? [...conect] : [];
    this.streaming = conect !== undefined;
  }

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    const tag = line.slice(0, 6).trimEnd();
    if (tag === 'ATOM' || tag === 'HETATM') return this.atom(line, lineNo);
    if (tag === 'MODEL') return this.startModel(lineNo);
    if (tag === 'ENDMDL') return this.closeModel();
    if (tag === 'END') return this.end();
    if (tag === 'CONECT') {
      if (this.streaming) return;
      const c = parseConect(line, lineNo);
      if (typeof c === 'string') return this.fatal(issue('bad-conect', this.file, lineNo, c));
      this.conect.push(c);
      return;
    }
    if (tag === 'TITLE' || tag === 'COMPND' || tag === 'HEADER') {
      const text = (tag === 'HEADER' ? line.slice(10, 50) : line.slice(10, 80)).trim();
      this.titles[tag] = this.titles[tag] ? `${this.titles[tag]} ${text}` : text;
    }
  }

  end(): void {
    if (this.stopped) return;
    this.closeModel();
    for (const m of this.held) this.release(m);
    this.held = [];
    this.stopped = true;
  }

  private startModel(lineNo: number): void {
    this.closeModel();
    if (++this.count > this.limits.maxRecords) {
      const message = `more than ${this.limits.maxRecords} records (option maxRecords)`;
      return this.fatal(issue('too-many-records', this.file, lineNo, message));
    }
    const builder = new RecordBuilder(this.file, 'pdb', this.limits);
    this.model = { builder, serials: new Map(), index: this.count, line: lineNo, altLoc: '', failed: false };
  }

  private atom(line: string, lineNo: number): void {
    if (!this.model) this.startModel(lineNo);
    const m = this.model;
    if (!m || m.failed) return;
    const a = parsePdbAtom(line);
    if ('code' in a) return this.failModel(m, issue(a.code, this.file, lineNo, a.message));
    if (a.altLoc !== ' ' && a.altLoc !== '') {
      if (m.altLoc === '') m.altLoc = a.altLoc;
      else if (a.altLoc !== m.altLoc) return;
    }
    if (a.serial >= 0 && !m.serials.has(a.serial)) m.serials.set(a.serial, m.builder.atomCount);
    const atom = {
      element: a.element,
      name: a.name,
      residue: a.residue,
      ...(Number.isNaN(a.residueNumber) ? {} : { residueNumber: a.residueNumber }),
      insertionCode: a.insertionCode,
      chain: a.chain,
      ...(a.serial >= 0 ? { serial: a.serial } : {}),
      altLoc: a.altLoc.trim(),
      charge: a.charge,
    };
    const err = m.builder.addAtom(atom, a.x, a.y, a.z, lineNo);
    if (err) this.failModel(m, err);
  }

  private closeModel(): void {
    const m = this.model;
    this.model = null;
    if (!m || m.failed) return;
    if (this.streaming) this.release(m);
    else this.held.push(m);
  }

  /** Applies CONECT bonds and emits the model. */
  private release(m: Model): void {
    for (const c of this.conect) {
      const a = m.serials.get(c.serial);
      for (const partner of [c.serial, ...c.partners]) {
        if (!m.serials.has(partner)) {
          const where = this.count > 1 ? ` in model ${m.index}` : '';
          const message = `CONECT refers to atom serial ${partner}, which is not in the file${where}`;
          return this.emit(failure(issue('bad-bond', this.file, c.line, message)));
        }
      }
      for (const partner of c.partners) {
        const b = m.serials.get(partner)!;
        if (b !== a) m.builder.addBond(a!, b, 1);
      }
    }
    const title = this.titles.TITLE || this.titles.COMPND || this.titles.HEADER || baseName(this.file);
    const result = m.builder.finish(title, {}, m.index, m.line, this.conect.length > 0);
    if ('code' in result) this.emit(failure(result));
    else this.emit({ ok: true, molecule: result });
  }

  private failModel(m: Model, i: Issue): void {
    m.failed = true;
    this.emit(failure(i));
  }

  private fatal(i: Issue): void {
    this.stopped = true;
    this.emit(failure(i, true));
  }
}

function baseName(file: string): string {
  if (file === '-' || file === '') return '';
  return (file.split(/[\\/]/).pop() ?? file).replace(/\.gz$/i, '');
}
