/**
 * Registry of input formats: name → extensions, a content sniffer, and a factory for its line consumer.
 * Shared code looks formats up here and never branches on a format's name.
 */
import type { FormatName } from '../model/molecule.js';
import type { ReadLimits } from './limits.js';
import { GroConsumer } from './gro.js';
import { MmcifConsumer } from './mmcif.js';
import { Mol2Consumer } from './mol2.js';
import { PdbConsumer } from './pdb.js';
import type { Conect } from './pdbLine.js';
import { SdfConsumer } from './sdf.js';
import type { Emit, LineConsumer } from './sink.js';
import { XyzConsumer } from './xyz.js';

/** What a consumer factory may be given beyond file, limits and sink. */
export interface ConsumerExtras {
  /** XYZ: coordinate buffers given back by the caller, reused for frames of equal size. */
  readonly pool?: Float64Array[];
  /** PDB: the file's CONECT records, scanned beforehand, so models can be streamed. */
  readonly conect?: readonly Conect[];
}

export interface FormatSpec {
  /** File extensions (lower case, with the dot), `.gz` excluded. */
  readonly extensions: readonly string[];
  /** Scores how well the first lines of a file fit this format: 0 (not at all) … 3 (certain). */
  readonly sniff: (lines: readonly string[]) => number;
  readonly consumer: (file: string, limits: ReadLimits, emit: Emit, extras: ConsumerExtras) => LineConsumer;
}

const PDB_TAGS = /^(ATOM  |HETATM|HEADER|TITLE |COMPND|REMARK|CRYST1|MODEL |SEQRES|EXPDTA|AUTHOR)/;

export const FORMATS: ReadonlyMap<FormatName, FormatSpec> = new Map<FormatName, FormatSpec>([
  [
    'xyz',
    {
      extensions: ['.xyz'],
      sniff: (lines) => {
        const first = lines.findIndex((l) => l.trim() !== '');
        if (first < 0 || !/^\s*\d+\s*$/.test(lines[first]!)) return 0;
        const atom = lines[first + 2];
        return atom !== undefined && /^\s*[A-Za-z]{1,2}\d*\s+\S+\s+\S+\s+\S+/.test(atom) ? 3 : 1;
      },
      consumer: (file, limits, emit, extras) => new XyzConsumer(file, limits, emit, { pool: extras.pool }),
    },
  ],
  [
    'sdf',
    {
      extensions: ['.sdf', '.sd', '.mol', '.mdl'],
      sniff: (lines) => {
        if (/V[23]000/.test(lines[3] ?? '')) return 3;
        return lines.some((l) => l.startsWith('M  END') || l.startsWith('$$$$')) ? 2 : 0;
      },
      consumer: (file, limits, emit) => new SdfConsumer(file, limits, emit),
    },
  ],
  [
    'pdb',
    {
      extensions: ['.pdb', '.ent'],
      sniff: (lines) => {
        const hits = lines.filter((l) => PDB_TAGS.test(l)).length;
        return hits === 0 ? 0 : lines.some((l) => /^(ATOM  |HETATM)/.test(l)) ? 3 : 2;
      },
      consumer: (file, limits, emit, extras) => new PdbConsumer(file, limits, emit, extras.conect),
    },
  ],
  [
    'pdbqt',
    {
      extensions: ['.pdbqt'],
      // AutoDock's torsion tree lines only occur in PDBQT
      sniff: (lines) => (lines.some((l) => /^(ROOT|ENDROOT|BRANCH|TORSDOF)\b/.test(l)) && lines.some((l) => /^(ATOM  |HETATM)/.test(l)) ? 3 : 0),
      consumer: (file, limits, emit, extras) => new PdbConsumer(file, limits, emit, extras.conect, 'pdbqt'),
    },
  ],
  [
    'mmcif',
    {
      extensions: ['.cif', '.mmcif'],
      sniff: (lines) => (lines.some((l) => l.startsWith('_atom_site.')) ? 3 : lines.some((l) => l.startsWith('data_')) ? 1 : 0),
      consumer: (file, limits, emit) => new MmcifConsumer(file, limits, emit),
    },
  ],
  [
    'mol2',
    {
      extensions: ['.mol2', '.ml2'],
      sniff: (lines) => (lines.some((l) => l.startsWith('@<TRIPOS>')) ? 3 : 0),
      consumer: (file, limits, emit) => new Mol2Consumer(file, limits, emit),
    },
  ],
  [
    'gro',
    {
      extensions: ['.gro'],
      // title, atom count, then fixed-column atom lines with a decimal point in the coordinate fields
      sniff: (lines) => (/^\s*\d+\s*$/.test(lines[1] ?? '') && /^[\s\d]{5}.{15}\s*-?\d+\.\d+/.test(lines[2] ?? '') ? 2 : 0),
      consumer: (file, limits, emit) => new GroConsumer(file, limits, emit),
    },
  ],
]);
