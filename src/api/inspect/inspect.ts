/**
 * `inspect`: the `conformark/report@1` document for every record of a file (README.md "JSON documents").
 * Records stream one at a time; energies come from SD fields or XYZ comments with their units.
 */
import type { FormatName, Molecule } from '../../model/molecule.js';
import type { Warning } from '../../model/errors.js';
import type { StreamOptions } from '../../io/readRecords.js';
import { ConformarkError } from '../../model/errors.js';
import { recordOutcomes, type RecordError } from '../recordStream.js';
import { detectFormat } from '../../io/detectFormat.js';
import { withFlatInputWarning } from '../flatInput.js';
import { findEnergy, type EnergyOptions } from '../../io/energy.js';
import { recordReport, type RecordReport, type RecordReportOptions } from '../../analysis/recordReport.js';
import { prepareRecord } from '../prepare.js';
import type { RingScopeOptions } from '../../perceive/ringScope.js';
import { holdCounter, type HoldOptions } from '../holdLimits.js';

/** Options of `inspectFile` / `inspectMolecule`. */
export interface InspectOptions extends RecordReportOptions {
  /** Energy field and unit (default: the first field whose name contains "energy", unit from its name). */
  readonly energy?: EnergyOptions;
  /** Reader options (format, limits). */
  readonly read?: StreamOptions;
  /** Bond tolerance for perception, Å (default 0.40). */
  readonly toleranceA?: number;
  /** Caps on what the report holds: records and atoms over all records (defaults 100,000 and 2,000,000). */
  readonly hold?: HoldOptions;
  /** Which rings are analysed: chelate rings, disulfide loops, the size limit (defaults: none, none, 12). */
  readonly ringScope?: RingScopeOptions;
}

/** The whole report. */
export interface InspectReport {
  schema: 'conformark/report@1';
  source: { path: string; format: FormatName };
  records: RecordReport[];
  /** Bad records read past (the others are analysed), in file order; empty when every record was good. */
  errors: RecordError[];
}

/**
 * Report of one molecule (bonds perceived when the file has none; energy found with its unit).
 * @example inspectMolecule(mol).rings[0]?.descriptor // '4C1'
 */
export function inspectMolecule(mol: Molecule, options: InspectOptions = {}): RecordReport {
  const { molecule, graph, rings, setAside } = prepareRecord(mol, { toleranceA: options.toleranceA, ...options.ringScope });
  const report = recordReport(molecule, graph, rings, options, setAside);
  const energy = findEnergy(molecule, options.energy);
  const warnings: Warning[] = [...report.warnings];
  if (energy?.warning) warnings.push(energy.warning);
  return {
    ...report,
    energy: energy ? { value: energy.value, unit: energy.unit, unitFrom: energy.unitFrom, field: energy.field } : null,
    warnings,
  };
}

/**
 * Report of every record of a file (`-` for standard input), read as a stream. A bad record (one the reader
 * or the bond perception refuses) is listed in `errors` and the others are analysed; when no record is good
 * at all, or reading cannot go on (binary data, an over-long line), the problems are thrown as one
 * `ConformarkError`.
 * @example (await inspectFile('conformers.sdf')).records.length
 */
export async function inspectFile(path: string, options: InspectOptions = {}): Promise<InspectReport> {
  const records: RecordReport[] = [];
  const errors: RecordError[] = [];
  const flat = { warned: false };
  const hold = holdCounter(path, options.hold);
  let format: FormatName | null = options.read?.format ?? null;
  for await (const outcome of recordOutcomes(path, options.read)) {
    if ('error' in outcome) {
      if (outcome.error.record === null) throw new ConformarkError(outcome.error);
      errors.push(outcome.error);
      continue;
    }
    const mol = outcome.molecule;
    hold.add(mol);
    format ??= mol.source.format;
    try {
      const report = inspectMolecule(mol, options);
      records.push({ ...report, warnings: withFlatInputWarning(mol, report.warnings, flat) });
    } catch (err) {
      if (!(err instanceof ConformarkError)) throw err;
      for (const i of err.issues) errors.push({ record: mol.source.index, code: i.code, file: i.file || path, line: i.line ?? mol.source.line, message: `record ${mol.source.index}: ${i.message}` });
    }
  }
  if (records.length === 0 && errors.length > 0) throw new ConformarkError(errors.map(({ code, file, line, message }) => ({ code, file, line, message })));
  return { schema: 'conformark/report@1', source: { path, format: format ?? detectFormat(path) }, records, errors };
}
