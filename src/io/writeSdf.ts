/**
 * MDL molfile / SD file writer (our own; openchemlib's `toMolfile` rescales coordinates, seen with openchemlib 9.25).
 * Each record: title line, a fixed program line (no timestamp, so output is byte-identical run to run), a
 * comment line, the connection table, `M  CHG`, `M  END`, one `> <name>` data field per property, `$$$$`.
 * V2000 is written while atoms and bonds both fit in three digits (≤ 999), V3000 beyond that.
 */
import type { Molecule } from '../model/molecule.js';

/** Options for `formatSdf`. */
export interface SdfOptions {
  /**
   * Text of the third header line of every record (the molfile comment line), cut to 80 characters.
   * Default: empty.
   */
  readonly comment?: string;
  /** Decimal places of the coordinates, 0–4 (V2000 columns hold 10 characters). Default: 4. */
  readonly digits?: number;
}

/** Program line: columns 3–10 program name, 11–20 a zero date (deterministic), 21–22 dimension code. */
const PROGRAM_LINE = '  confmark00000000003D';
/** Largest count the V2000 counts line can hold. */
const V2000_LIMIT = 999;

/**
 * Formats molecules as one SD file (a single record is also a valid molfile, plus `$$$$`).
 * Bonds of order 4 are written as aromatic (type 4); a molecule with `bonds: null` gets an empty bond block.
 * @example writeAtomic('out.sdf', formatSdf(molecules))
 */
export function formatSdf(mols: readonly Molecule[], options: SdfOptions = {}): string {
  const comment = oneLine(options.comment ?? '').slice(0, 80);
  const digits = Math.max(0, Math.min(4, Math.trunc(options.digits ?? 4)));
  return mols.map((mol) => formatRecord(mol, comment, digits)).join('');
}

function formatRecord(mol: Molecule, comment: string, digits: number): string {
  const bonds = mol.bonds ?? [];
  const big = mol.atoms.length > V2000_LIMIT || bonds.length > V2000_LIMIT;
  const lines = [oneLine(mol.title).slice(0, 80), PROGRAM_LINE, comment];
  lines.push(...(big ? v3000Table(mol, digits) : v2000Table(mol, digits)));
  lines.push('M  END');
  for (const [name, value] of Object.entries(mol.properties)) lines.push(...dataField(name, value));
  lines.push('$$$$');
  return `${lines.join('\n')}\n`;
}

function v2000Table(mol: Molecule, digits: number): string[] {
  const bonds = mol.bonds ?? [];
  const out = [`${pad(mol.atoms.length, 3)}${pad(bonds.length, 3)}  0  0  0  0  0  0  0  0999 V2000`];
  mol.atoms.forEach((atom, i) => {
    const xyz = [0, 1, 2].map((k) => pad(fixed(mol.coords[3 * i + k]!, digits), 10)).join('');
    const symbol = atom.element.padEnd(3);
    out.push(`${xyz} ${symbol} 0${pad(chargeCode(atom.charge ?? 0), 3)}  0  0  0  0  0  0  0  0  0  0`);
  });
  for (const { a, b, order } of bonds) out.push(`${pad(a + 1, 3)}${pad(b + 1, 3)}${pad(bondType(order), 3)}  0`);
  const charged = mol.atoms.flatMap((atom, i) => (atom.charge ? [[i + 1, atom.charge] as const] : []));
  for (let start = 0; start < charged.length; start += 8) {
    const chunk = charged.slice(start, start + 8);
    out.push(`M  CHG${pad(chunk.length, 3)}${chunk.map(([i, q]) => ` ${pad(i, 3)} ${pad(q, 3)}`).join('')}`);
  }
  return out;
}

function v3000Table(mol: Molecule, digits: number): string[] {
  const bonds = mol.bonds ?? [];
  const out = ['  0  0  0     0  0            999 V3000', 'M  V30 BEGIN CTAB'];
  out.push(`M  V30 COUNTS ${mol.atoms.length} ${bonds.length} 0 0 0`, 'M  V30 BEGIN ATOM');
  mol.atoms.forEach((atom, i) => {
    const xyz = [0, 1, 2].map((k) => fixed(mol.coords[3 * i + k]!, digits)).join(' ');
    const charge = atom.charge ? ` CHG=${atom.charge}` : '';
    out.push(`M  V30 ${i + 1} ${atom.element} ${xyz} 0${charge}`);
  });
  out.push('M  V30 END ATOM');
  if (bonds.length > 0) {
    out.push('M  V30 BEGIN BOND');
    bonds.forEach(({ a, b, order }, k) => out.push(`M  V30 ${k + 1} ${bondType(order)} ${a + 1} ${b + 1}`));
    out.push('M  V30 END BOND');
  }
  out.push('M  V30 END CTAB');
  return out;
}

/** `> <name>` header, the value's lines (blank lines dropped: a blank line ends a field), then a blank line. */
function dataField(name: string, value: string): string[] {
  const body = value.split(/\r?\n/).map((l) => l.trimEnd()).filter((l) => l.length > 0);
  return [`> <${oneLine(name).replace(/[<>]/g, '')}>`, ...body, ''];
}

/** Atom-block charge code of the V2000 format: +3..−3 → 1, 2, 3, 5, 6, 7; anything else is left to `M  CHG`. */
function chargeCode(q: number): number {
  return q >= -3 && q <= 3 && q !== 0 ? 4 - q : 0;
}

/** Molfile bond type: 1, 2, 3, or 4 (aromatic); anything else is written as single. */
function bondType(order: number): number {
  return order >= 1 && order <= 4 ? Math.trunc(order) : 1;
}

/** Fixed-point text without a negative zero. */
function fixed(x: number, digits: number): string {
  const s = x.toFixed(digits);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

function pad(value: number | string, width: number): string {
  return String(value).padStart(width);
}

function oneLine(text: string): string {
  return text.replace(/[\r\n\t]+/g, ' ').trimEnd();
}
