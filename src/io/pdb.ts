/**
 * PDB (and PDBQT) reader as a push-style line consumer: ATOM/HETATM with one alternate location per residue
 * (see `keepAltLocs`), CONECT (→ bonds, order 1, per model where they fit: see `conectBonds`), MODEL/ENDMDL
 * and bare `END` lines (→ frames). Title from TITLE, else COMPND, else HEADER, else the file name. CRYST1 (the periodic
 * cell) → the `CRYST1` property, `a b c α β γ`. CONECT
 * records usually follow the last model, so without a `conect` list given up front the models are held until
 * the end of the input; `readRecords` scans a PDB file's CONECT lines first and streams.
 */
import type { Atom } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import { keepAltLocs, type PendingAtom } from './pdbAltLoc.js';
import { conectBonds } from './pdbConect.js';
import { parseConect, parsePdbAtom, type Conect, type PdbDialect } from './pdbLine.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, type Emit, type LineConsumer } from './sink.js';

/** Column ends of a, b, c, α, β, γ in a CRYST1 record (the first field starts at column 7). */
const CRYST1_ENDS = [15, 24, 33, 40, 47, 54];

interface Model {
  readonly builder: RecordBuilder;
  readonly serials: Map<number, number>;
  readonly dropped: Set<number>;
  readonly index: number;
  readonly line: number;
  /** Atoms of the residue being read, kept back until it is complete. */
  pending: PendingAtom<{ atom: Atom; x: number; y: number; z: number; line: number; serial: number }>[];
  residueKey: string;
  failed: boolean;
}

export class PdbConsumer implements LineConsumer {
  private titles = { TITLE: '', COMPND: '', HEADER: '' };
  private model: Model | null = null;
  private held: Model[] = [];
  private conect: Conect[];
  private readonly streaming: boolean;
  /** Element of each serial where it first appeared (the atoms CONECT records describe). */
  private readonly reference = new Map<number, string>();
  private count = 0;
  private explicitModels = false;
  private stopped = false;
  /** The last CRYST1 cell, `a b c α β γ` (Å, degrees), passed on as the `CRYST1` property of each model. */
  private cryst1 = '';

  /** `conect`: the file's CONECT records, when already known (then each model is emitted at ENDMDL). */
  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
    conect?: readonly Conect[],
    private readonly dialect: PdbDialect = 'pdb',
  ) {
    this.conect = conect ? [...conect] : [];
    this.streaming = conect !== undefined;
  }

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    const tag = line.slice(0, 6).trimEnd();
    if (tag === 'ATOM' || tag === 'HETATM') return this.atom(line, lineNo);
    if (tag === 'MODEL') {
      this.explicitModels = true;
      return this.startModel(lineNo);
    }
    if (tag === 'ENDMDL' || tag === 'END') return this.closeModel();
    if (tag === 'CONECT') {
      if (this.streaming) return;
      const c = parseConect(line, lineNo);
      if (typeof c === 'string') return this.fatal(issue('bad-conect', this.file, lineNo, c));
      this.conect.push(c);
      return;
    }
    if (tag === 'CRYST1') {
      const cell = CRYST1_ENDS.map((end, k) => line.slice(k === 0 ? 6 : CRYST1_ENDS[k - 1], end).trim());
      this.cryst1 = cell.every((f) => f !== '' && Number.isFinite(Number(f))) ? cell.join(' ') : '';
      return;
    }
    if (tag === 'TER') return this.flushResidue();
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
    const builder = new RecordBuilder(this.file, this.dialect, this.limits);
    this.model = { builder, serials: new Map(), dropped: new Set(), index: this.count, line: lineNo, pending: [], residueKey: '', failed: false };
  }

  private atom(line: string, lineNo: number): void {
    if (!this.model) this.startModel(lineNo);
    const m = this.model;
    if (!m || m.failed) return;
    const a = parsePdbAtom(line, this.dialect);
    if ('code' in a) return this.failModel(m, issue(a.code, this.file, lineNo, a.message));
    const key = `${a.chain}|${line.slice(22, 27)}`;
    if (key !== m.residueKey) {
      this.flushResidue();
      m.residueKey = key;
    }
    const atom: Atom = {
      element: a.element,
      name: a.name,
      residue: a.residue,
      ...(Number.isNaN(a.residueNumber) ? {} : { residueNumber: a.residueNumber }),
      insertionCode: a.insertionCode,
      chain: a.chain,
      ...(a.serial >= 0 ? { serial: a.serial } : {}),
      altLoc: a.altLoc.trim(),
      charge: a.charge,
      ...(a.partialCharge === undefined ? {} : { partialCharge: a.partialCharge }),
    };
    m.pending.push({ name: a.name, altLoc: a.altLoc.trim(), occupancy: a.occupancy, payload: { atom, x: a.x, y: a.y, z: a.z, line: lineNo, serial: a.serial } });
  }

  /** Adds the current residue's atoms to the model, one alternate location kept. */
  private flushResidue(): void {
    const m = this.model;
    if (!m || m.failed || m.pending.length === 0) return;
    const { kept, dropped } = keepAltLocs(m.pending, this.limits.altLoc);
    m.pending = [];
    for (const d of dropped) if (d.payload.serial >= 0) m.dropped.add(d.payload.serial);
    for (const { payload: p } of kept) {
      if (p.serial >= 0 && !m.serials.has(p.serial)) {
        m.serials.set(p.serial, m.builder.atomCount);
        if (!this.reference.has(p.serial)) this.reference.set(p.serial, p.atom.element);
      }
      const err = m.builder.addAtom(p.atom, p.x, p.y, p.z, p.line);
      if (err) return this.failModel(m, err);
    }
  }

  private closeModel(): void {
    this.flushResidue();
    const m = this.model;
    this.model = null;
    if (!m || m.failed) return;
    if (this.streaming) this.release(m);
    else this.held.push(m);
  }

  /** Applies CONECT bonds where they fit the model, and emits it. */
  private release(m: Model): void {
    let withBonds = this.conect.length > 0;
    if (withBonds) {
      const { bonds, warning, error } = conectBonds(this.conect, {
        serials: m.serials,
        dropped: m.dropped,
        elements: m.builder.atoms.map((a) => a.element),
        coords: m.builder.coordinateBuffer,
        index: this.count > 1 || this.explicitModels ? m.index : 0,
      }, this.reference, !this.streaming || !this.explicitModels);
      if (error) return this.emit(failure(issue('bad-bond', this.file, error.line, error.message)));
      if (warning) m.builder.addWarning(warning);
      if (bonds === null) withBonds = false;
      else for (const [a, b] of bonds) m.builder.addBond(a, b, 1);
    }
    const title = this.titles.TITLE || this.titles.COMPND || this.titles.HEADER || baseName(this.file);
    const result = m.builder.finish(title, this.cryst1 ? { CRYST1: this.cryst1 } : {}, m.index, m.line, withBonds);
    if ('code' in result) this.emit(failure(result));
    else this.emit({ ok: true, molecule: result });
  }

  private failModel(m: Model, i: Issue): void {
    m.failed = true;
    m.pending = [];
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
