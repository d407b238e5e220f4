/**
 * Boltzmann populations of a conformer ensemble (docs/methods.md#boltzmann):
 *   p_i = g_i exp(−ΔE_i / RT) / Σ_k g_k exp(−ΔE_k / RT),  ΔE_i = E_i − E_min,
 * computed as a log-sum-exp so that nothing underflows. Pass free energies when you have them; populations
 * from electronic energies or enthalpies ignore entropy differences (the caller says so in its output).
 */
import { usageError } from '../model/errors.js';
import { convertEnergy, type EnergyUnit } from '../model/energyUnits.js';

export { ENERGY_UNITS, convertEnergy, type EnergyUnit } from '../model/energyUnits.js';

/** Gas constant, kJ mol⁻¹ K⁻¹ (CODATA, exact since 2019 — from memory). */
export const GAS_CONSTANT_KJ = 8.314462618e-3;
/** Gas constant, kcal mol⁻¹ K⁻¹ (= GAS_CONSTANT_KJ / 4.184, thermochemical calorie). */
export const GAS_CONSTANT_KCAL = 1.987204259e-3;

/** Options for `boltzmannPopulations`. */
export interface BoltzmannOptions {
  /** Temperature in K. Default 298.15. */
  readonly temperatureK?: number;
  /** Unit of the energies (and of the relative energies returned). Default `'kcal/mol'`. */
  readonly unit?: EnergyUnit;
  /**
   * Degeneracy g_i of each listed structure (how many symmetry-equivalent or enantiomeric copies it stands
   * for). Default 1 each. Use 1 when every copy is listed separately.
   */
  readonly degeneracies?: readonly number[];
}

/** Populations of an ensemble, in input order. */
export interface BoltzmannResult {
  readonly temperatureK: number;
  readonly unit: EnergyUnit;
  /** E_i − E_min in `unit`. */
  readonly relativeEnergies: readonly number[];
  /** Fractions summing to 1. */
  readonly populations: readonly number[];
  /** Index of the lowest energy (first one on ties). */
  readonly lowest: number;
}

/**
 * Boltzmann populations of conformers with the given energies.
 * @example boltzmannPopulations([0, 0.66], { degeneracies: [1, 2] }).populations[1] // ≈ 0.3963 (butane gauche)
 */
export function boltzmannPopulations(energies: readonly number[], options: BoltzmannOptions = {}): BoltzmannResult {
  const { temperatureK = 298.15, unit = 'kcal/mol', degeneracies } = options;
  if (!(Number.isFinite(temperatureK) && temperatureK > 0)) {
    throw usageError('bad-temperature', `temperature must be a positive number of kelvin, got ${temperatureK}`);
  }
  const rt = convertEnergy(GAS_CONSTANT_KCAL * temperatureK, 'kcal/mol', unit);
  const bad = energies.findIndex((e) => !Number.isFinite(e));
  if (bad >= 0) throw usageError('bad-energy', `energy ${bad + 1} is not a finite number`);
  const g = degeneracies ?? energies.map(() => 1);
  if (g.length !== energies.length) {
    throw usageError('bad-degeneracy', `${g.length} degeneracies given for ${energies.length} energies`);
  }
  const badG = g.findIndex((x) => !(Number.isFinite(x) && x > 0));
  if (badG >= 0) throw usageError('bad-degeneracy', `degeneracy ${badG + 1} must be a positive number`);
  if (energies.length === 0) return { temperatureK, unit, relativeEnergies: [], populations: [], lowest: -1 };

  let lowest = 0;
  energies.forEach((e, i) => {
    if (e < energies[lowest]!) lowest = i;
  });
  const relativeEnergies = energies.map((e) => e - energies[lowest]!);
  const logWeights = relativeEnergies.map((d, i) => Math.log(g[i]!) - d / rt);
  const top = logWeights.reduce((m, w) => (w > m ? w : m), -Infinity);
  const logSum = top + Math.log(logWeights.reduce((acc, w) => acc + Math.exp(w - top), 0));
  const populations = logWeights.map((w) => Math.exp(w - logSum));
  return { temperatureK, unit, relativeEnergies, populations, lowest };
}

/**
 * Population-weighted average Σ p_i v_i of a per-conformer value, e.g. ⟨J⟩ from each conformer's J.
 * Average observables such as J, never the torsions they come from (docs/methods.md#boltzmann).
 * @example ensembleAverage([0.25, 0.75], [12, 4]) // 6
 */
export function ensembleAverage(populations: readonly number[], values: readonly number[]): number {
  if (populations.length !== values.length) {
    throw usageError('length-mismatch', `${values.length} values given for ${populations.length} populations`);
  }
  let sum = 0;
  populations.forEach((p, i) => {
    sum += p * values[i]!;
  });
  return sum;
}
