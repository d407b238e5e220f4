/**
 * Fixed-column PDB records: ATOM/HETATM and CONECT (wwPDB, "Atomic Coordinate Entry Format Description",
 * version 3.3, 2012). The element comes from columns 77-78, else from the atom name (columns 13-16).
 */
import { elementInfo } from '../model/elements.js';
import { parseNumber, scanCount } from './numbers.js';
import { quote } from './sink.js';

/** Plain PDB, or PDBQT (AutoDock: partial charge in columns 71-76, atom type in columns 78-79). */
export type PdbDialect = 'pdb' | 'pdbqt';

/** One parsed ATOM/HETATM line. */
export interface PdbAtom {
  readonly serial: number;
  readonly name: string;
  readonly altLoc: string;
  readonly residue: string;
  /** Chain identifier (column 22), `''` when blank. */
  readonly chain: string;
  /** Residue sequence number (columns 23-26); NaN when blank or not a number. */
  readonly residueNumber: number;
  /** Insertion code (column 27), `''` when blank. */
  readonly insertionCode: string;
  /** Occupancy (columns 55-60), 1 when blank. */
  readonly occupancy: number;
  readonly element: string;
  readonly x: number;
  readonly y: number;
  readonly z: number;
  readonly charge: number;
  /** PDBQT partial charge (columns 71-76). */
  readonly partialCharge?: number;
}

/** Parses an ATOM/HETATM line, or returns `{ code, message }`. */
export function parsePdbAtom(line: string, dialect: PdbDialect = 'pdb'): PdbAtom | { code: string; message: string } {
  const xyz = [parseNumber(line.slice(30, 38)), parseNumber(line.slice(38, 46)), parseNumber(line.slice(46, 54))];
  const bad = xyz.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) {
    const text = line.slice(30 + 8 * bad, 38 + 8 * bad);
    const what = Number.isNaN(xyz[bad]) ? (text.trim() === '' ? 'is missing' : 'is not a number') : 'is not finite';
    return { code: 'bad-number', message: `${'xyz'[bad]} coordinate ${quote(text)} ${what} (columns ${31 + 8 * bad}-${38 + 8 * bad})` };
  }
  const rawName = line.slice(12, 16);
  const qt = dialect === 'pdbqt';
  const column = (qt ? line.slice(77, 79) : line.slice(76, 78)).trim();
  const element = column !== '' ? (qt ? autodockElement(column) : elementInfo(column)?.symbol) : elementFromName(rawName);
  if (!element) {
    const what = column !== '' ? `unknown ${qt ? 'atom type' : 'element'} ${quote(column)} (columns ${qt ? '78-79' : '77-78'})` : `no element for atom name ${quote(rawName)}`;
    return { code: 'unknown-element', message: what };
  }
  const serialText = line.slice(6, 11).trim();
  return {
    serial: scanCount(serialText, 0, serialText.length),
    name: rawName.trim(),
    altLoc: line.charAt(16),
    residue: line.slice(17, 20).trim(),
    chain: line.charAt(21).trim(),
    residueNumber: residueSeq(line.slice(22, 26)),
    insertionCode: line.charAt(26).trim(),
    occupancy: occupancyOf(line.slice(54, 60)),
    element,
    x: xyz[0]!,
    y: xyz[1]!,
    z: xyz[2]!,
    charge: qt ? 0 : parseCharge(line.slice(78, 80)),
    ...(qt && Number.isFinite(parseNumber(line.slice(70, 76))) ? { partialCharge: parseNumber(line.slice(70, 76)) } : {}),
  };
}

/**
 * Element of an AutoDock 4 atom type (Morris et al. 2009, J. Comput. Chem. 30, 2785): A is aromatic carbon,
 * NA/NS/OA/OS/SA acceptor nitrogen/oxygen/sulfur, HD/HS donor hydrogens; G0–G9/CG0–CG9 are glue pseudo-atoms
 * read as carbon; other types are element symbols.
 */
export function autodockElement(type: string): string | undefined {
  const t = type.trim();
  const upper = t.toUpperCase();
  if (upper === 'A' || /^C?G\d$/.test(upper)) return 'C';
  if (upper === 'NA' || upper === 'NS') return 'N';
  if (upper === 'OA' || upper === 'OS') return 'O';
  if (upper === 'SA') return 'S';
  if (upper === 'HD' || upper === 'HS') return 'H';
  return elementInfo(t)?.symbol;
}

/**
 * Element from a PDB atom name: columns 13-14 hold the right-justified symbol (` CA ` is carbon, `CA  `
 * calcium, `FE1 ` iron). Names starting with H in column 13 are hydrogens (`HG21`, `HO4`), not mercury or
 * holmium: a heavy element would normally carry columns 77-78.
 */
export function elementFromName(rawName: string): string | undefined {
  const name = rawName.padEnd(4);
  const first = name.charAt(0);
  if (/[A-Za-z]/.test(first)) {
    if (first === 'H' || first === 'h') return 'H';
    const two = name.slice(0, 2);
    const symbol = /^[A-Za-z]{2}$/.test(two) ? elementInfo(two)?.symbol : undefined;
    return symbol ?? elementInfo(first)?.symbol;
  }
  const letter = /[A-Za-z]/.exec(name.slice(1))?.[0];
  return letter ? elementInfo(letter)?.symbol : undefined;
}

/** resSeq as an integer (hybrid-36 and other non-numeric text give NaN: the atom then has no residue number). */
function residueSeq(text: string): number {
  const t = text.trim();
  return /^-?\d+$/.test(t) ? Number(t) : Number.NaN;
}

function occupancyOf(text: string): number {
  const v = parseNumber(text);
  return Number.isFinite(v) ? v : 1;
}

function parseCharge(text: string): number {
  const m = /^\s*(\d)([+-])\s*$/.exec(text);
  return m ? Number(m[1]) * (m[2] === '-' ? -1 : 1) : 0;
}

/** One CONECT line: the atom and the serials it is bonded to. */
export interface Conect {
  readonly line: number;
  readonly serial: number;
  readonly partners: readonly number[];
}

/** Parses a CONECT line (serials in columns 7-11, 12-16, 17-21, ...), or returns an error message. */
export function parseConect(line: string, lineNo: number): Conect | string {
  const serials: number[] = [];
  for (let from = 6; from < line.trimEnd().length; from += 5) {
    const text = line.slice(from, from + 5).trim();
    if (text === '') continue;
    const n = scanCount(text, 0, text.length);
    if (n < 0 || !Number.isFinite(n)) return `expected atom serial numbers in CONECT, found ${quote(text)}`;
    serials.push(n);
  }
  if (serials.length === 0) return 'CONECT without atom serial numbers';
  return { line: lineNo, serial: serials[0]!, partners: serials.slice(1) };
}
