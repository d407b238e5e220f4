/**
 * Where a file leaves an energy's unit unsaid, the program family that wrote it may still fix it. Each convention
 * recognised here is named in `Energy.unitFrom` and in the ensemble notes; anything else has an unknown unit and
 * the callers that need one (ensemble, batch captions, populations) refuse instead of guessing.
 *
 * - `semiempirical-comment`: an XYZ comment `energy: -44.99 gnorm: 0.0004 …`, as tight-binding semiempirical
 *   programs write optimisation outputs — hartree (from memory).
 * - `conformer-ensemble-comment`: an XYZ comment that is one decimal number and nothing else, as conformer-search
 *   programs built on those methods write their ensembles — hartree (from memory).
 * - `quantum-trajectory-comment`: an XYZ comment `Coordinates from … E -232.123…`, as quantum-chemistry programs
 *   write optimisation trajectories — hartree (from memory).
 * - `extended-xyz`: an `energy=` key on an extended-XYZ comment (one that also carries `Properties=` or `Lattice=`)
 *   — eV, the convention of that format and the atomistic-simulation tools that write it (from memory).
 * - `modelling-suite-field`: SD fields named `r_mmod_…Energy…`, as one commercial modelling suite writes
 *   force-field energies — kJ/mol (from memory).
 */
import type { EnergyUnit } from '../model/energyUnits.js';
import { fields, parseNumber } from './numbers.js';

/** How the unit of an energy was known. */
export type EnergyUnitSource =
  | 'option'
  | 'value'
  | 'field-name'
  | 'semiempirical-comment'
  | 'conformer-ensemble-comment'
  | 'quantum-trajectory-comment'
  | 'extended-xyz'
  | 'modelling-suite-field';

/** One sentence per convention, for notes (`energies in hartree: …`). */
export const UNIT_SOURCE_WORDS: Readonly<Record<EnergyUnitSource, string>> = {
  option: 'as given',
  value: 'from the unit word after the value',
  'field-name': 'from the field name',
  'semiempirical-comment': "from the comment form 'energy: … gnorm: …' of semiempirical programs (hartree)",
  'conformer-ensemble-comment': 'from comment lines holding one number, as conformer-search programs write ensembles (hartree)',
  'quantum-trajectory-comment': "from the comment form 'Coordinates from … E …' of quantum-chemistry trajectories (hartree)",
  'extended-xyz': 'from the extended-XYZ convention for energy= (eV)',
  'modelling-suite-field': 'from the r_mmod_ field-name convention (kJ/mol)',
};

/** A title-line energy: value, unit (or null) and how the unit was known. */
export interface TitleEnergy {
  readonly value: number;
  readonly unit: EnergyUnit | null;
  readonly unitFrom: EnergyUnitSource | null;
}

const NUMBER = String.raw`([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)`;
const SEMIEMPIRICAL = new RegExp(String.raw`^\s*energy:\s*${NUMBER}\s+gnorm:\s*\S+`, 'i');
const QM_TRAJECTORY = new RegExp(String.raw`^\s*Coordinates from\b.*\bE\s+${NUMBER}\s*$`);

/** Recognises an energy on an XYZ comment line by the conventions above; `null` when there is none. */
export function titleConvention(title: string): TitleEnergy | null {
  const semi = SEMIEMPIRICAL.exec(title);
  if (semi) return { value: parseNumber(semi[1]!), unit: 'hartree', unitFrom: 'semiempirical-comment' };
  const qm = QM_TRAJECTORY.exec(title);
  if (qm) return { value: parseNumber(qm[1]!), unit: 'hartree', unitFrom: 'quantum-trajectory-comment' };
  const bare = fields(title);
  if (bare.length === 1 && Number.isFinite(parseNumber(bare[0]!)) && /[.eE]/.test(bare[0]!)) {
    return { value: parseNumber(bare[0]!), unit: 'hartree', unitFrom: 'conformer-ensemble-comment' };
  }
  return null;
}

/** The unit a property's name or file convention fixes when its value has no unit word. */
export function propertyConvention(
  name: string,
  properties: Readonly<Record<string, string>>,
  format: string,
): { unit: EnergyUnit; unitFrom: EnergyUnitSource } | null {
  if (format === 'xyz' && /energy/i.test(name)) {
    const keys = Object.keys(properties).map((k) => k.toLowerCase());
    if (keys.includes('properties') || keys.includes('lattice')) return { unit: 'eV', unitFrom: 'extended-xyz' };
  }
  if (/^r_mmod_.*energy/i.test(name)) return { unit: 'kJ/mol', unitFrom: 'modelling-suite-field' };
  return null;
}
