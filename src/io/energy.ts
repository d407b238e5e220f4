/**
 * Energies stored with a record: an SD data field or XYZ `key=value` property whose name contains "energy"
 * (any case) or is `E`, or the one named by the caller; else an energy on the XYZ comment line. The unit comes
 * from the caller, a unit word after the value, the field name, or a recognised file convention
 * (energyConventions.ts); otherwise it is unknown (`unit: null`, never guessed) and a warning says how to give it.
 */
import { ConformarkError, usageError, type Warning } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';
import { fields, parseNumber } from './numbers.js';

import type { EnergyUnit } from '../model/energyUnits.js';
import { propertyConvention, titleConvention, type EnergyUnitSource } from './energyConventions.js';

export { toKcalPerMol, type EnergyUnit } from '../model/energyUnits.js';
export { UNIT_SOURCE_WORDS, type EnergyUnitSource } from './energyConventions.js';

/** An energy as reported (`inspect --json` `energy`). */
export interface Energy {
  readonly value: number;
  /** The unit, or `null` when nothing in the file or the options says it (callers that need one refuse). */
  readonly unit: EnergyUnit | null;
  /** How the unit was known (`option`, `value`, `field-name` or a file convention), or `null` when unknown. */
  readonly unitFrom: EnergyUnitSource | null;
  /** The property it came from, or `title` for the comment line. */
  readonly field: string;
}

/** `Energy` plus the warning raised when the unit is unknown. */
export interface FoundEnergy extends Energy {
  readonly warning: Warning | null;
}

/** Options of `findEnergy`. */
export interface EnergyOptions {
  /** Property holding the energy. Default: the first whose name contains "energy" or is `E`. */
  readonly field?: string;
  /** Unit of the values (`kcal/mol`, `kJ/mol`, `hartree`/`Eh`/`au`, `eV`). Default: from the file, else unknown. */
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

/** The one-line request for a unit, used by every caller that refuses an energy without one. */
export function unitRequest(field: string): string {
  return `the energy in '${field}' has no unit: give it with --energy-unit (library: energy.unit) or put it in the SD field name, e.g. 'energy (kcal/mol)'`;
}

/**
 * Finds the energy of a record, or `null` when it has none.
 * Throws `ConformarkError` when `options.field` is missing or not a number, or `options.unit` is unknown.
 * @example findEnergy(mol) // { value: -12.5, unit: 'kcal/mol', unitFrom: 'value', field: 'energy', warning: null }
 */
export function findEnergy(mol: Molecule, options: EnergyOptions = {}): FoundEnergy | null {
  const forced = options.unit === undefined ? null : normalizeEnergyUnit(options.unit);
  if (options.unit !== undefined && forced === null) {
    throw usageError('bad-unit', `unknown energy unit '${options.unit}'; use kcal/mol, kJ/mol, hartree or eV`);
  }
  const found = options.field === undefined ? autoField(mol) : namedField(mol, options.field);
  if (!found) return null;
  const base = { value: found.value, field: found.field, warning: null };
  if (forced) return { ...base, unit: forced, unitFrom: 'option' };
  if (found.unit) return { ...base, unit: found.unit, unitFrom: found.unitFrom ?? 'value' };
  const named = unitFromName(found.field);
  if (named) return { ...base, unit: named, unitFrom: 'field-name' };
  const convention = found.field === 'title' ? null : propertyConvention(found.field, mol.properties, mol.source.format);
  if (convention) return { ...base, ...convention };
  return { ...base, unit: null, unitFrom: null, warning: { code: 'energy-unit-unknown', message: unitRequest(found.field) } };
}

interface Raw {
  readonly field: string;
  readonly value: number;
  readonly unit: EnergyUnit | null;
  readonly unitFrom?: EnergyUnitSource | null;
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
  const convention = titleConvention(mol.title);
  if (convention) return { field: 'title', ...convention };
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

/** Spreads (kcal/mol) outside which relative energies look like the wrong unit: common practice, no source. */
export const PLAUSIBLE_SPREAD_KCAL = { min: 0.01, max: 1000 } as const;

/**
 * A warning when the spread of energies (kcal/mol, two or more values) is under 0.01 or over 1,000 kcal/mol,
 * which is what hartree read as kcal/mol (or the reverse) looks like; `null` when it is plausible.
 * @example energySpreadWarning([0, 0.004], 'kcal/mol')?.code // 'energy-spread-implausible'
 */
export function energySpreadWarning(kcal: readonly number[], units: string): Warning | null {
  if (kcal.length < 2) return null;
  let lo = Infinity;
  let hi = -Infinity;
  for (const e of kcal) {
    lo = Math.min(lo, e);
    hi = Math.max(hi, e);
  }
  const spread = hi - lo;
  if (spread >= PLAUSIBLE_SPREAD_KCAL.min && spread <= PLAUSIBLE_SPREAD_KCAL.max) return null;
  const shown = spread < 1 ? spread.toPrecision(2) : spread.toFixed(0);
  return {
    code: 'energy-spread-implausible',
    message: `relative energies span ${shown} kcal/mol (read as ${units}); that looks like the wrong unit: check --energy-unit`,
  };
}
