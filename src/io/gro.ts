/**
 * GROMACS GRO coordinate files (one or more frames) as a push-style line consumer. Each frame: a title line
 * (`t= 10.0` in it gives the time in ps), the atom count, one fixed-column line per atom — residue number
 * (columns 1–5), residue name (6–10), atom name (11–15), atom number (16–20), then x, y, z in nm in fields
 * whose width is the distance between the first two decimal points (8 for the usual %8.3f; velocities after
 * them are ignored) — and a box line of 3 or 9 numbers in nm: v1(x) v2(y) v3(z) [v1(y) v1(z) v2(x) v2(z) v3(x)
 * v3(y)]. Coordinates become Å. GRO has no elements: they are guessed from the atom name (see
 * `groElement`). Common practice, no source (format as GROMACS documents it).
 */
import type { Atom } from '../model/molecule.js';
import { elementInfo } from '../model/elements.js';
import type { ReadLimits } from './limits.js';
import { RecordBuilder } from './recordBuilder.js';
import { failure, issue, quote, type Emit, type LineConsumer } from './sink.js';

/** First letters that name the element of a force-field atom name on their own (CA is Cα, not calcium). */
const ONE_LETTER = new Set(['H', 'C', 'N', 'O', 'S', 'P', 'F', 'I']);

/**
 * Three-letter ion names that several MD force fields give both residue and atom (SOD for sodium, CLA for
 * chloride …): read by the first letters they would be sulfur, carbon or phosphorus. Common practice, no source.
 */
const ION_NAMES: Readonly<Record<string, string>> = { SOD: 'Na', POT: 'K', CLA: 'Cl', CAL: 'Ca', CES: 'Cs', LIT: 'Li', RUB: 'Rb', BAR: 'Ba' };

/**
 * The element of a GRO atom: an ion whose atom name is its residue name (`NA` in `NA`, `CL` in `CL`, `MG`,
 * `SOD` in `SOD`),
 * else the first letter when it is H, C, N, O, S, P, F or I (`CA`, `HW1`, `OW`, `1HB`), else the first two letters
 * (`Br`, `Zn`). Common practice, no source. Null when neither names an element.
 * @example groElement('CA', 'ALA') // 'C'
 * @example groElement('CL', 'CL') // 'Cl'
 */
export function groElement(name: string, residue: string): string | null {
  const letters = /^\d*([A-Za-z]+)/.exec(name)?.[1]?.toUpperCase() ?? '';
  if (letters === '') return null;
  const res = residue.replace(/[\d+-]+$/, '').toUpperCase();
  if (letters === res && letters.length <= 2) {
    const ion = elementInfo(letters)?.symbol;
    if (ion) return ion;
  }
  if (letters === res && ION_NAMES[letters]) return ION_NAMES[letters]!;
  if (ONE_LETTER.has(letters[0]!)) return letters[0]!;
  return elementInfo(letters.slice(0, 2))?.symbol ?? elementInfo(letters[0]!)?.symbol ?? null;
}

type Expect = 'title' | 'count' | 'atoms' | 'box';

export class GroConsumer implements LineConsumer {
  private expect: Expect = 'title';
  private builder: RecordBuilder | null = null;
  private title = '';
  private titleLine = 0;
  private atoms = 0;
  private width = 0;
  private count = 0;
  /** Atom lines of the current frame read so far (a failed frame still skips all of its lines). */
  private seen = 0;
  private failed = false;
  private stopped = false;

  constructor(
    private readonly file: string,
    private readonly limits: ReadLimits,
    private readonly emit: Emit,
  ) {}

  feed(line: string, lineNo: number): void {
    if (this.stopped) return;
    switch (this.expect) {
      case 'title':
        if (line.trim() === '') return;
        if (++this.count > this.limits.maxRecords) {
          this.stop(issue('too-many-records', this.file, lineNo, `more than ${this.limits.maxRecords} frames (option maxRecords)`));
          return;
        }
        this.title = line.trim();
        this.titleLine = lineNo;
        this.expect = 'count';
        return;
      case 'count': {
        const n = Number(line.trim());
        if (!Number.isInteger(n) || n < 1) {
          this.stop(issue('bad-count', this.file, lineNo, `expected the atom count of a GRO frame, found ${quote(line)}`));
          return;
        }
        this.atoms = n;
        this.builder = new RecordBuilder(this.file, 'gro', this.limits);
        this.builder.reserve(n);
        this.width = 0;
        this.seen = 0;
        this.failed = false;
        this.expect = 'atoms';
        return;
      }
      case 'atoms':
        this.atom(line, lineNo);
        if (++this.seen === this.atoms) this.expect = 'box';
        return;
      case 'box':
        this.box(line, lineNo);
    }
  }

  end(lastLine: number): void {
    if (this.stopped) return;
    if (this.expect === 'title' && this.count === 0) this.emit(failure(issue('no-atoms', this.file, lastLine || 1, 'no GRO frame (title, atom count, atom lines, box line)'), true));
    else if (this.expect !== 'title' && !this.failed) {
      const what = this.expect === 'box' ? 'its box line' : this.expect === 'count' ? 'its atom count' : `atom ${this.builder!.atomCount + 1} of ${this.atoms}`;
      this.emit(failure(issue('truncated-frame', this.file, lastLine, `frame ${this.count} (title at line ${this.titleLine}) ends before ${what}`), true));
    }
    this.stopped = true;
  }

  private atom(line: string, lineNo: number): void {
    if (this.failed) return;
    if (this.width === 0) {
      const d1 = line.indexOf('.', 20);
      const d2 = d1 < 0 ? -1 : line.indexOf('.', d1 + 1);
      this.width = d2 > d1 && d1 >= 0 ? d2 - d1 : 8;
    }
    const w = this.width;
    if (line.length < 20 + 3 * w - 1) return this.fail(lineNo, `a GRO atom line needs residue, atom and x y z in columns 1–${20 + 3 * w}, found ${quote(line)}`, 'bad-atom-line');
    const xyz = [0, 1, 2].map((k) => Number(line.slice(20 + k * w, 20 + (k + 1) * w)) * 10);
    const badAxis = xyz.findIndex((v) => !Number.isFinite(v) || line.slice(20, 20 + 3 * w).trim() === '');
    if (badAxis >= 0) return this.fail(lineNo, `${'xyz'[badAxis]} coordinate ${quote(line.slice(20 + badAxis * w, 20 + (badAxis + 1) * w))} is not a number`, 'bad-number');
    const residueNumber = Number(line.slice(0, 5));
    const residue = line.slice(5, 10).trim();
    const name = line.slice(10, 15).trim();
    const serial = Number(line.slice(15, 20));
    const element = groElement(name, residue);
    if (!element) return this.fail(lineNo, `cannot tell the element of atom name ${quote(name)} (residue ${residue})`, 'unknown-element');
    const atom: Atom = {
      element,
      name,
      residue,
      ...(Number.isInteger(residueNumber) ? { residueNumber } : {}),
      ...(Number.isInteger(serial) ? { serial } : {}),
    };
    const err = this.builder!.addAtom(atom, xyz[0]!, xyz[1]!, xyz[2]!, lineNo);
    if (err) {
      this.failed = true;
      this.emit(failure(err));
    }
  }

  private box(line: string, lineNo: number): void {
    this.expect = 'title';
    if (this.failed) return;
    const p = line.trim().split(/\s+/).map(Number);
    if ((p.length !== 3 && p.length !== 9) || !p.every(Number.isFinite)) {
      return this.fail(lineNo, `expected the box line (3 or 9 numbers, nm) after ${this.atoms} atoms, found ${quote(line)}`, 'bad-box');
    }
    const v = [p[0]!, p[3] ?? 0, p[4] ?? 0, p[5] ?? 0, p[1]!, p[6] ?? 0, p[7] ?? 0, p[8] ?? 0, p[2]!].map((x) => +(x * 10).toPrecision(12));
    const properties: Record<string, string> = { BOX_VECTORS: v.join(' ') };
    const t = /\bt=\s*(-?[\d.]+(?:[eE][-+]?\d+)?)/.exec(this.title);
    if (t && Number.isFinite(Number(t[1]))) properties.TIME_PS = t[1]!;
    const result = this.builder!.finish(this.title, properties, this.count, this.titleLine, false);
    if ('code' in result) this.emit(failure(result));
    else this.emit({ ok: true, molecule: result });
  }

  private fail(lineNo: number, message: string, code: string): void {
    this.failed = true;
    this.emit(failure(issue(code, this.file, lineNo, message)));
  }

  private stop(i: ReturnType<typeof issue>): void {
    this.stopped = true;
    this.emit(failure(i, true));
  }
}
