/**
 * Collects one record's atoms, coordinates and file bonds while a reader walks its lines, then checks it
 * (overlapping atoms) and freezes it into a `Molecule`. Used by the molfile and PDB readers.
 */
import type { Atom, Bond, FormatName, Molecule } from '../model/molecule.js';
import type { Issue } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import { findOverlap, overlapMessage } from './overlap.js';
import { issue } from './sink.js';

export class RecordBuilder {
  readonly atoms: Atom[] = [];
  /** Line of each atom, for messages. */
  readonly atomLines: number[] = [];
  private coords: number[] = [];
  private bonds: Bond[] = [];
  private bondKeys = new Set<number>();

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
    this.atoms.push(atom);
    this.atomLines.push(line);
    this.coords.push(x, y, z);
    return null;
  }

  /** Replaces atom `i` (for charges given after the atom block). */
  setAtom(i: number, atom: Atom): void {
    this.atoms[i] = atom;
  }

  /** Adds a bond between 0-based atoms `a` and `b` (both must exist); a repeated pair is ignored. */
  addBond(a: number, b: number, order: number): void {
    const lo = Math.min(a, b);
    const hi = Math.max(a, b);
    const key = lo * 4_294_967_296 + hi;
    if (this.bondKeys.has(key)) return;
    this.bondKeys.add(key);
    this.bonds.push({ a: lo, b: hi, order, perceived: false });
  }

  /**
   * Checks and returns the record. `withBonds` false gives `bonds: null` (bonds are then perceived).
   * Returns an issue for a record without atoms, or for overlapping atoms (naming both, at the second's line).
   */
  finish(title: string, properties: Record<string, string>, index: number, line: number, withBonds: boolean): Molecule | Issue {
    const n = this.atoms.length;
    if (n === 0) return issue('empty-record', this.file, line, 'record has no atoms');
    const coords = Float64Array.from(this.coords);
    const pair = findOverlap(coords, n, this.limits.minDistanceA);
    if (pair) {
      const [i, j] = pair;
      const message = overlapMessage(this.atoms, coords, i, j, this.limits.minDistanceA);
      return issue('overlapping-atoms', this.file, this.atomLines[j] ?? line, message);
    }
    return {
      title,
      atoms: this.atoms,
      coords,
      bonds: withBonds ? this.bonds : null,
      properties,
      source: { file: this.file, format: this.format, index, line },
    };
  }
}
