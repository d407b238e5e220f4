/**
 * Energies stored with a record: an SD data field or XYZ `key=value` property whose name contains "energy"
 * (any case) or is `E`, or the one named by the caller; else an `energy: -12.3` phrase or a bare number on the
 * XYZ comment line (as CREST/xtb ensembles write it, in hartree). The unit comes from the caller, a unit word
 * after the value, or the field name; otherwise it is assumed and a warning says so.
 */
import { ConformarkError, usageError, type Warning } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';
import { fields, parseNumber } from './numbers.js';

import type { EnergyUnit } from '../model/energyUnits.js';

export { toKcalPerMol, type EnergyUnit } from '../model/energyUnits.js';

/** An energy as reported (`inspect --json` `energy`). */
export interface Energy {
  readonly value: number;
  readonly unit: EnergyUnit;
  /** The property it came from, or `title` for the comment line. */
  readonly field: string;
}

/** `Energy` plus the warning raised when the unit had to be assumed. */
export interface FoundEnergy extends Energy {
  readonly warning: Warning | null;
}

/** Options of `findEnergy`. */
export interface EnergyOptions {
  /** Property holding the energy. Default: the first whose name contains "energy" or is `E`. */
  readonly field?: string;
  /** Unit of the values (`kcal/mol`, `kJ/mol`, `hartree`/`Eh`/`au`, `eV`). Default: from the file, else assumed. */
  readonly unit?: string;
}


/**
 * Normalises a unit word: `kcal`, `kcal/mol`, `kcal·mol-1` → `kcal/mol`; `kJ`… → `kJ/mol`; `hartree`, `Eh`,
 * `au`, `a.u.` → `hartree`; `eV` → `eV`. Returns `null` for anything else.
 */
export function normalizeEnergyUnit(text: string): EnergyUnit | null {
  const t = text.trim().toLowerCase().replace(/^[([]|[)\]]$/g, '');
  if (t.startsWith('kcal')) return 'kcal/mol';
  if (t.startsWith('kj')) return 'kJ/mol';
  if (/^(hartrees?|eh|e_h|au|a\.u\.?)$/.test(t)) return 'hartree';
  if (t === 'ev') return 'eV';
  return null;
}

/** Unit named inside a field name (`Energy_kcal`, `E(kJ/mol)`, `energy_Eh`, `MMFF94 energy [eV]`). */
function unitFromName(name: string): EnergyUnit | null {
  const lower = name.toLowerCase();
  if (lower.includes('kcal')) return 'kcal/mol';
  if (/kj/.test(lower)) return 'kJ/mol';
  if (lower.includes('hartree')) return 'hartree';
  const words = name.replace(/([a-z])([A-Z][a-z])/g, '$1 $2').toLowerCase().split(/[^a-z.]+/);
  for (const w of words) {
    if (w === 'eh' || w === 'au' || w === 'a.u.') return 'hartree';
    if (w === 'ev') return 'eV';
  }
  return null;
}

const isEnergyName = (name: string): boolean => /energy/i.test(name) || name === 'E' || name === 'e';

/**
 * Finds the energy of a record, or `null` when it has none.
 * Throws `ConformarkError` when `options.field` is missing or not a number, or `options.unit` is unknown.
 * @example findEnergy(mol) // { value: -12.5, unit: 'kcal/mol', field: 'energy', warning: null }
 */
export function findEnergy(mol: Molecule, options: EnergyOptions = {}): FoundEnergy | null {
  const forced = options.unit === undefined ? null : normalizeEnergyUnit(options.unit);
  if (options.unit !== undefined && forced === null) {
    throw usageError('bad-unit', `unknown energy unit '${options.unit}'; use kcal/mol, kJ/mol, hartree or eV`);
  }
  const found = options.field === undefined ? autoField(mol) : namedField(mol, options.field);
  if (!found) return null;
  const unit = forced ?? found.unit ?? unitFromName(found.field);
  if (unit) return { value: found.value, unit, field: found.field, warning: null };
  const assumed: EnergyUnit = found.field === 'title' && found.bare ? 'hartree' : 'kcal/mol';
  const message =
    `record ${mol.source.index}: the energy in '${found.field}' has no unit; assumed ${assumed}` +
    ' (give the unit with the energy unit option)';
  return { value: found.value, unit: assumed, field: found.field, warning: { code: 'energy-unit-assumed', message } };
}

interface Raw {
  readonly field: string;
  readonly value: number;
  readonly unit: EnergyUnit | null;
  readonly bare?: boolean;
}

/** Value text `-12.5 kcal/mol` → number and unit word; `null` if it does not start with a finite number. */
function readValue(field: string, text: string, title: string): Raw | null {
  const f = fields(text);
  const value = f[0] === undefined ? Number.NaN : parseNumber(f[0]);
  if (!Number.isFinite(value)) return null;
  let unit = f[1] === undefined ? null : normalizeEnergyUnit(f[1]);
  if (unit === null && f.length === 1) {
    // XYZ comment: `energy=-12.5 kcal` keeps the unit word outside the value
    const at = title.indexOf(`${field}=${text}`);
    if (at >= 0) unit = normalizeEnergyUnit(fields(title.slice(at + field.length + 1 + text.length))[0] ?? '');
  }
  return { field, value, unit };
}

function autoField(mol: Molecule): Raw | null {
  for (const [name, text] of Object.entries(mol.properties)) {
    if (!isEnergyName(name)) continue;
    const raw = readValue(name, text, mol.title);
    if (raw) return raw;
  }
  const bare = fields(mol.title);
  if (bare.length === 1 && Number.isFinite(parseNumber(bare[0]!)) && /[.eE]/.test(bare[0]!)) {
    return { field: 'title', value: parseNumber(bare[0]!), unit: null, bare: true };
  }
  const m = /\benergy\s*[:=]?\s*(\S+)\s*(\S*)/i.exec(mol.title);
  if (m && Number.isFinite(parseNumber(m[1]!))) {
    return { field: 'title', value: parseNumber(m[1]!), unit: normalizeEnergyUnit(m[2]!) };
  }
  return null;
}

function namedField(mol: Molecule, field: string): Raw {
  const props = mol.properties;
  const name = field in props ? field : Object.keys(props).find((k) => k.toLowerCase() === field.toLowerCase());
  if (name === undefined) {
    const list = Object.keys(props);
    const has = list.length > 0 ? `; its fields are ${list.map((k) => `'${k}'`).join(', ')}` : '; it has no fields';
    throw new ConformarkError({ code: 'missing-energy-field', file: mol.source.file, line: mol.source.line, message: `record ${mol.source.index} has no field '${field}'${has}` });
  }
  const raw = readValue(name, props[name]!, mol.title);
  if (!raw) {
    const message = `field '${name}' of record ${mol.source.index} is not a number: '${props[name]!.slice(0, 40)}'`;
    throw new ConformarkError({ code: 'bad-energy', file: mol.source.file, line: mol.source.line, message });
  }
  return raw;
}
