/**
 * Energy units and conversions, one table for the readers and the ensemble statistics.
 * Thermochemical calorie 4.184 J (definition); hartree and electronvolt from CODATA 2018 (Tiesinga et al. 2021,
 * Rev. Mod. Phys. 93, 025010): 2625.4996394799 kJ/mol and 96.485332123 kJ/mol.
 */
import { usageError } from './errors.js';

/** Energy units and their size in kcal/mol. */
export const ENERGY_UNITS = new Map([
  ['kcal/mol', { kcalPerMol: 1, source: 'definition' }],
  ['kJ/mol', { kcalPerMol: 1 / 4.184, source: '1 kcal = 4.184 kJ (thermochemical calorie)' }],
  ['hartree', { kcalPerMol: 2625.4996394799 / 4.184, source: 'CODATA 2018 (Tiesinga et al. 2021)' }],
  ['eV', { kcalPerMol: 96.485332123 / 4.184, source: 'CODATA 2018 (Tiesinga et al. 2021)' }],
] as const);

/** Names of the accepted energy units. */
export type EnergyUnit = typeof ENERGY_UNITS extends Map<infer K, unknown> ? K : never;

function unitSize(unit: string): number {
  const u = ENERGY_UNITS.get(unit as EnergyUnit);
  if (!u) throw usageError('bad-energy-unit', `unknown energy unit "${unit}"; use ${[...ENERGY_UNITS.keys()].join(', ')}`);
  return u.kcalPerMol;
}

/**
 * Converts an energy between units.
 * @example convertEnergy(1, 'hartree', 'kcal/mol') // 627.5094740…
 */
export function convertEnergy(value: number, from: EnergyUnit, to: EnergyUnit): number {
  return (value * unitSize(from)) / unitSize(to);
}

/**
 * Converts an energy to kcal/mol.
 * @example toKcalPerMol(1, 'hartree') // 627.5094740…
 */
export function toKcalPerMol(value: number, unit: EnergyUnit): number {
  return value * unitSize(unit);
}
