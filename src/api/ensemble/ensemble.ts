/**
 * `ensemble`: conformers ranked by energy with relative energies, Boltzmann populations (docs/methods.md#boltzmann) with
 * degeneracies, duplicates merged by heavy-atom RMSD, ring shapes and population-weighted ⟨³J(H,H)⟩.
 *
 * Duplicate rule: a record within the RMSD threshold of a lower-energy record is the same structure found
 * twice. It is listed with `duplicateOf` and population 0, and its Boltzmann weight is NOT added to the record
 * it duplicates: counting both would double that structure's weight. (Symmetry-equivalent copies that are
 * meant to count go in the degeneracy field instead.)
 */
import { ConformarkError, usageError, type Warning } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import type { StreamOptions } from '../../io/readRecords.js';
import type { HoldOptions } from '../holdLimits.js';
import { energySpreadWarning, findEnergy, normalizeEnergyUnit, unitRequest, UNIT_SOURCE_WORDS, type EnergyOptions } from '../../io/energy.js';
import { toKcalPerMol } from '../../model/energyUnits.js';
import { boltzmannPopulations, ensembleAverage } from '../../analysis/boltzmann.js';
import { findDuplicates } from '../../analysis/duplicates.js';
import { analyzeRing } from '../../analysis/ringAnalysis.js';
import { isSkippedCoupling, ringCouplings, type Coupling, type CouplingMethod, type CouplingOptions } from '../../analysis/coupling.js';
import { prepareRecord, type PreparedRecord } from '../prepare.js';
import { withFlatInputWarning } from '../flatInput.js';
import { goodRecords, type RecordError } from '../recordStream.js';

/** Options of {@link ensembleFile} / {@link ensembleOf}. */
export interface EnsembleOptions {
  /** Temperature, K. Default 298.15. */
  readonly temperatureK?: number;
  /** Energy field and unit (default: the first field whose name contains "energy", unit from its name). */
  readonly energy?: EnergyOptions;
  /** SD field or XYZ key holding each record's degeneracy g (docs/methods.md#boltzmann). Default: g = 1 for every record. */
  readonly degeneracyField?: string;
  /** Heavy-atom RMSD (Å) at or below which two records are duplicates. Default 0.125. */
  readonly rmsdThresholdA?: number;
  /** Coupling equation for ⟨J⟩ (default Haasnoot–de Leeuw–Altona 1980). */
  readonly coupling?: CouplingOptions;
  readonly read?: StreamOptions;
  /** Caps on the records held at once (defaults 100,000 records, 2,000,000 atoms in all). */
  readonly hold?: HoldOptions;
}

/** One conformer of the report (`conformark/ensemble@1` `conformers[]`). */
export interface EnsembleConformer {
  readonly record: number;
  readonly title: string;
  /** kcal/mol. */
  readonly energy: number;
  /** kcal/mol above the lowest record. */
  readonly relativeEnergy: number;
  /** Boltzmann fraction (0 for a duplicate). */
  readonly population: number;
  readonly degeneracy: number;
  /** Record number of the lower-energy record this one duplicates, or `null`. */
  readonly duplicateOf: number | null;
  readonly rings: { readonly shape: string; readonly descriptor: string | null }[];
}

/** The `--json` document. Conformers in energy order. */
export interface EnsembleReport {
  readonly schema: 'conformark/ensemble@1';
  readonly temperatureK: number;
  readonly unit: 'kcal/mol';
  readonly conformers: EnsembleConformer[];
  readonly averages: { couplings: { front: number; back: number; jHz: number; method: CouplingMethod }[] };
  readonly notes: string[];
}

/** A report plus the prepared records in the same order (for figures) and per-record problems. */
export interface EnsembleResult {
  readonly report: EnsembleReport;
  readonly prepared: readonly PreparedRecord[];
  readonly errors: readonly RecordError[];
  readonly warnings: readonly { readonly record: number; readonly warning: Warning }[];
}

/** True when an energy field name says it holds free energies (`free energy`, `Gibbs`, `G`, `ΔG`, `dG`). */
export function isFreeEnergyField(name: string): boolean {
  return /free[\s_-]*energ|gibbs/i.test(name) || /(^|[^A-Za-z])(ΔG|dG|G)([^A-Za-z]|$)/.test(name);
}

function degeneracyOf(mol: Molecule, field: string | undefined): number {
  if (field === undefined) return 1;
  const text = mol.properties[field] ?? Object.entries(mol.properties).find(([k]) => k.toLowerCase() === field.toLowerCase())?.[1];
  const value = text === undefined ? Number.NaN : Number(text.trim());
  if (text === undefined) throw usageError('missing-degeneracy', `record ${mol.source.index} has no field '${field}'`, mol.source.file);
  if (!(Number.isFinite(value) && value > 0)) throw usageError('bad-degeneracy', `field '${field}' of record ${mol.source.index} is not a positive number: '${text.trim().slice(0, 40)}'`, mol.source.file);
  return value;
}

const sameAtoms = (mols: readonly Molecule[]) =>
  mols.every((m) => m.atoms.length === mols[0]!.atoms.length && m.atoms.every((a, i) => a.element === mols[0]!.atoms[i]!.element));

/** Energy window for duplicates, kcal/mol: common practice, no source. */
const ENERGY_WINDOW_KCAL = 0.05;

/**
 * Ranks molecules that all carry energies (throws a user error for one without).
 * @example ensembleOf(mols).report.conformers[0]?.population
 */
export function ensembleOf(molecules: readonly Molecule[], options: EnsembleOptions = {}): Omit<EnsembleResult, 'errors'> {
  const temperatureK = options.temperatureK ?? 298.15;
  const threshold = options.rmsdThresholdA ?? 0.125;
  const notes: string[] = [];
  const warnings: { record: number; warning: Warning }[] = [];
  // 1. Energies (kcal/mol) and degeneracies; sort by energy (ties keep file order).
  const rows = molecules.map((mol) => {
    const e = findEnergy(mol, options.energy);
    if (!e) throw usageError('no-energy', `record ${mol.source.index} has no energy (name the field with the energy field option)`, mol.source.file);
    // populations need a unit: refuse rather than guess
    if (e.unit === null) throw usageError('energy-unit-unknown', `record ${mol.source.index}: ${unitRequest(e.field)}`, mol.source.file);
    return { mol, energy: toKcalPerMol(e.value, e.unit), unit: e.unit, unitFrom: e.unitFrom!, field: e.field, g: degeneracyOf(mol, options.degeneracyField) };
  });
  rows.sort((a, b) => a.energy - b.energy || a.mol.source.index - b.mol.source.index);
  if (rows.length === 0) throw usageError('no-records', 'no records with energies to rank');
  const flat = { warned: false };
  for (const r of rows) for (const warning of withFlatInputWarning(r.mol, [], flat)) warnings.push({ record: r.mol.source.index, warning });
  const spread = energySpreadWarning(rows.map((r) => r.energy), [...new Set(rows.map((r) => r.unit))].join(', '));
  if (spread) warnings.push({ record: rows[rows.length - 1]!.mol.source.index, warning: spread });
  // 2. Duplicates among records with the same atoms in the same order.
  const comparable = sameAtoms(rows.map((r) => r.mol));
  const dup = comparable ? findDuplicates(rows.map((r) => r.mol), { rmsdThresholdA: threshold, energies: rows.map((r) => r.energy), energyWindow: ENERGY_WINDOW_KCAL }) : rows.map(() => null);
  // 3. Populations over the unique records only.
  const unique = rows.flatMap((r, i) => (dup[i] === null ? [i] : []));
  const boltz = boltzmannPopulations(unique.map((i) => rows[i]!.energy), { temperatureK, degeneracies: unique.map((i) => rows[i]!.g) });
  const population = new Map(unique.map((i, k) => [i, boltz.populations[k]!]));
  const lowest = rows[0]!.energy;
  // 4. Rings of each record, and ⟨J⟩ over the unique ones.
  const prepared = rows.map((r) => prepareRecord(r.mol));
  const conformers: EnsembleConformer[] = rows.map((r, i) => ({
    record: r.mol.source.index,
    title: r.mol.title,
    energy: r.energy,
    relativeEnergy: r.energy - lowest,
    population: population.get(i) ?? 0,
    degeneracy: r.g,
    duplicateOf: dup[i] === null || dup[i] === undefined ? null : rows[dup[i]!]!.mol.source.index,
    rings: prepared[i]!.rings.map((ring) => {
      const a = analyzeRing(prepared[i]!.molecule, prepared[i]!.graph, ring);
      return { shape: a.shape, descriptor: a.descriptor };
    }),
  }));
  const couplings = comparable ? averageCouplings(unique.map((i) => prepared[i]!), boltz.populations, options.coupling) : [];
  // 5. What the numbers mean.
  const fields = [...new Set(rows.map((r) => r.field))];
  const units = [...new Set(rows.map((r) => r.unit))];
  notes.push(
    fields.every(isFreeEnergyField)
      ? `populations from free energies (field ${fields.map((f) => `'${f}'`).join(', ')})`
      : `populations from energies (field ${fields.map((f) => `'${f}'`).join(', ')}), not free energies: entropy differences between conformers are ignored`,
  );
  if (units.some((u) => u !== 'kcal/mol')) notes.push(`energies converted to kcal/mol from ${units.join(', ')}`);
  const sources = [...new Set(rows.map((r) => r.unitFrom))];
  notes.push(`energy unit ${sources.map((u) => UNIT_SOURCE_WORDS[u]).join('; ')}`);
  if (spread) notes.push(spread.message);
  notes.push(options.degeneracyField === undefined ? 'degeneracy 1 for every record (no degeneracy field given)' : `degeneracies from field '${options.degeneracyField}'`);
  notes.push(
    comparable
      ? `duplicates: heavy-atom RMSD after optimal superposition (Horn quaternion fit, atoms matched by number, no symmetry permutations) at most ${threshold} Å to a lower-energy record whose energy is within ${ENERGY_WINDOW_KCAL} kcal/mol (so hydrogen rotamers stay apart); a duplicate gets population 0 and its weight is not added to the record it duplicates (it is the same structure found twice; counting both would double it)`
      : 'duplicates not searched and couplings not averaged: the records do not share atom numbering',
  );
  if (couplings.length > 0) notes.push(`⟨³J(H,H)⟩: population-weighted average of each conformer's J (not of the torsions), method ${couplings[0]!.method}`);
  return {
    report: { schema: 'conformark/ensemble@1', temperatureK, unit: 'kcal/mol', conformers, averages: { couplings }, notes },
    prepared,
    warnings,
  };
}

/** ⟨J⟩ for each ring H–H pair present in every conformer (1-based atoms). */
function averageCouplings(records: readonly PreparedRecord[], populations: readonly number[], options: CouplingOptions | undefined): EnsembleReport['averages']['couplings'] {
  const perRecord = records.map((p) => {
    const map = new Map<string, Coupling>();
    for (const ring of p.rings) {
      for (const c of ringCouplings(p.molecule, p.graph, ring, options)) if (!isSkippedCoupling(c)) map.set(`${c.front}-${c.back}`, c);
    }
    return map;
  });
  const first = perRecord[0];
  if (!first) return [];
  return [...first.entries()]
    .filter(([key]) => perRecord.every((m) => m.has(key)))
    .map(([key, c]) => ({ front: c.front + 1, back: c.back + 1, jHz: ensembleAverage(populations, perRecord.map((m) => m.get(key)!.jHz)), method: c.method }))
    .sort((a, b) => a.front - b.front || a.back - b.back);
}

/**
 * Reads every record of `path` and ranks them; bad records and records without energy become errors.
 * @example (await ensembleFile('conformers.sdf')).report.conformers.map((c) => c.population)
 */
export async function ensembleFile(path: string, options: EnsembleOptions = {}): Promise<EnsembleResult> {
  const unit = options.energy?.unit;
  if (unit !== undefined && normalizeEnergyUnit(unit) === null) {
    throw usageError('bad-unit', `unknown energy unit '${unit}'; use kcal/mol, kJ/mol, hartree or eV`);
  }
  const errors: RecordError[] = [];
  const good: Molecule[] = [];
  let refusal: ConformarkError | null = null;
  for await (const mol of goodRecords(path, options, errors)) {
    try {
      const e = findEnergy(mol, options.energy);
      if (!e) throw usageError('no-energy', `record ${mol.source.index} has no energy; it is left out`);
      degeneracyOf(mol, options.degeneracyField);
      good.push(mol);
      if (e.unit === null) refusal = usageError('energy-unit-unknown', `record ${mol.source.index}: ${unitRequest(e.field)}`, path);
    } catch (err) {
      if (!(err instanceof ConformarkError)) throw err;
      const issue = err.issues[0]!;
      errors.push({ record: mol.source.index, code: issue.code, file: path, line: mol.source.line, message: issue.message });
    }
    if (refusal) throw refusal;
  }
  if (good.length === 0) {
    const why = errors[0] ? `: ${errors[0].message}` : '';
    throw usageError('no-records', `no record with an energy to rank${why}`, path);
  }
  return { ...ensembleOf(good, options), errors };
}
