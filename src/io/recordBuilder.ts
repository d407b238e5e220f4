/**
 * Collects one record's atoms, coordinates and file bonds while a reader walks its lines, then checks it
 * (overlapping atoms) and freezes it into a `Molecule`. Used by the molfile and PDB readers.
 */
import type { Atom, Bond, FormatName, Molecule } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import type { Warning } from '../model/errors.js';
import { residueContacts, sameResidueMessage } from './residueContacts.js';
import { findOverlap, overlapMessage } from './overlap.js';
import { issue } from './sink.js';

const NO_COORDS = new Float64Array(0);

export class RecordBuilder {
  readonly atoms: Atom[] = [];
  /** Line of the first atom; the others follow it line by line unless `atomLines` says otherwise. */
  private firstLine = 0;
  /** Line of each atom, for messages; only kept once atoms stop being on consecutive lines. */
  private atomLines: number[] | null = null;
  /** Allocated on the first atom or by `reserve`, so a record with a counts line gets one exact buffer. */
  private coords = NO_COORDS;
  private bonds: Bond[] = [];
  private warnings: Warning[] = [];

  constructor(
    private readonly file: string,
    private readonly format: FormatName,
    private readonly limits: ReadLimits,
  ) {}

  get atomCount(): number {
    return this.atoms.length;
  }

  get bondCount(): number {
    return this.bonds.length;
  }

  /** Adds an atom; returns an issue when the record would exceed `maxAtoms`. */
  addAtom(atom: Atom, x: number, y: number, z: number, line: number): Issue | null {
    if (this.atoms.length >= this.limits.maxAtoms) {
      return issue('too-many-atoms', this.file, line, `more than ${this.limits.maxAtoms} atoms in one record (option maxAtoms)`);
    }
    const k = 3 * this.atoms.length;
    if (k + 3 > this.coords.length) this.reserve(2 * this.atoms.length + 16);
    this.coords[k] = x;
    this.coords[k + 1] = y;
    this.coords[k + 2] = z;
    const n = this.atoms.length;
    if (n === 0) this.firstLine = line;
    else if (this.atomLines === null && line !== this.firstLine + n) {
      this.atomLines = Array.from({ length: n }, (_, i) => this.firstLine + i);
    }
    this.atomLines?.push(line);
    this.atoms.push(atom);
    return null;
  }

  /** The coordinate buffer so far (x, y, z of atom i at 3i…; may be longer than 3 × atomCount). */
  get coordinateBuffer(): Float64Array {
    return this.coords;
  }

  /** Records something the reader read past; it travels with the record. */
  addWarning(w: Warning): void {
    this.warnings.push(w);
  }

  /** Makes room for `n` atoms (a hint from a counts line; never trusted beyond `maxAtoms`). */
  reserve(n: number): void {
    const size = 3 * Math.min(n, this.limits.maxAtoms);
    if (size <= this.coords.length) return;
    const next = new Float64Array(size);
    next.set(this.coords);
    this.coords = next;
  }

  /** Replaces atom `i` (for charges given after the atom block). */
  setAtom(i: number, atom: Atom): void {
    this.atoms[i] = atom;
  }

  /** Adds a bond between 0-based atoms `a` and `b` (both must exist); a repeated pair is ignored. */
  addBond(a: number, b: number, order: number): void {
    const lo = a < b ? a : b;
    const hi = a < b ? b : a;
    this.bonds.push({ a: lo, b: hi, order, perceived: false });
  }

  /** The bonds without repeats (first one kept); a Set per bond was the hot spot of SDF reading. */
  private uniqueBonds(): Bond[] {
    const bonds = this.bonds;
    if (!hasRepeat(bonds)) return bonds;
    const keep = new Set<number>();
    return bonds.filter((b) => {
      const key = b.a * 4_294_967_296 + b.b;
      if (keep.has(key)) return false;
      keep.add(key);
      return true;
    });
  }

  /**
   * Checks and returns the record. `withBonds` false gives `bonds: null` (bonds are then perceived).
   * Returns an issue for a record without atoms, or for overlapping atoms (naming both, at the second's line).
   */
  finish(title: string, properties: Record<string, string>, index: number, line: number, withBonds: boolean): Molecule | Issue {
    const n = this.atoms.length;
    if (n === 0) return issue('empty-record', this.file, line, 'record has no atoms');
    const coords = this.coords.length === 3 * n ? this.coords : this.coords.slice(0, 3 * n);
    const lineOf = (j: number): number => this.atomLines?.[j] ?? this.firstLine + j;
    if (this.atoms[0]!.residue !== undefined) {
      // structure files: close contacts between residues, alternates or waters are warnings, not errors
      const contacts = residueContacts(this.atoms, coords, this.limits.minDistanceA);
      if (contacts.error) return issue('overlapping-atoms', this.file, lineOf(contacts.error[1]), sameResidueMessage(this.atoms, coords, contacts.error[0], contacts.error[1], this.limits.minDistanceA));
      this.warnings.push(...contacts.warnings);
    }
    const pair = this.atoms[0]!.residue !== undefined ? null : findOverlap(coords, n, this.limits.minDistanceA);
    if (pair) {
      const [i, j] = pair;
      const message = overlapMessage(this.atoms, coords, i, j, this.limits.minDistanceA);
      return issue('overlapping-atoms', this.file, lineOf(j), message);
    }
    return {
      title,
      atoms: this.atoms,
      coords,
      bonds: withBonds ? this.uniqueBonds() : null,
      properties,
      source: { file: this.file, format: this.format, index, line },
      ...(this.warnings.length > 0 ? { warnings: this.warnings } : {}),
    };
  }
}

/** True when a pair occurs twice: quadratic scan for the usual small records, a Set beyond. */
function hasRepeat(bonds: readonly Bond[]): boolean {
  const n = bonds.length;
  if (n > 256) return new Set(bonds.map((b) => b.a * 4_294_967_296 + b.b)).size !== n;
  for (let j = 1; j < n; j++) {
    const bj = bonds[j]!;
    for (let i = 0; i < j; i++) {
      const bi = bonds[i]!;
      if (bi.a === bj.a && bi.b === bj.b) return true;
    }
  }
  return false;
}
