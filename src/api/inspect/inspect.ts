/**
 * `inspect`: the `conformark/report@1` document for every record of a file (README.md "JSON documents").
 * Records stream one at a time; energies come from SD fields or XYZ comments with their units.
 */
import type { FormatName, Molecule } from '../../model/molecule.js';
import type { Warning } from '../../model/errors.js';
import { readRecords, type StreamOptions } from '../../io/readRecords.js';
import { detectFormat } from '../../io/detectFormat.js';
import { withFlatInputWarning } from '../flatInput.js';
import { findEnergy, type EnergyOptions } from '../../io/energy.js';
import { recordReport, type RecordReport, type RecordReportOptions } from '../../analysis/recordReport.js';
import { prepareRecord } from '../prepare.js';
import { heldRecords, type HoldOptions } from '../holdLimits.js';

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
}

/** The whole report. */
export interface InspectReport {
  schema: 'conformark/report@1';
  source: { path: string; format: FormatName };
  records: RecordReport[];
}

/**
 * Report of one molecule (bonds perceived when the file has none; energy found with its unit).
 * @example inspectMolecule(mol).rings[0]?.descriptor // '4C1'
 */
export function inspectMolecule(mol: Molecule, options: InspectOptions = {}): RecordReport {
  const { molecule, graph, rings } = prepareRecord(mol, { toleranceA: options.toleranceA });
  const report = recordReport(molecule, graph, rings, options);
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
 * Report of every record of a file (`-` for standard input), read as a stream.
 * @example (await inspectFile('conformers.sdf')).records.length
 */
export async function inspectFile(path: string, options: InspectOptions = {}): Promise<InspectReport> {
  const records: RecordReport[] = [];
  const flat = { warned: false };
  let format: FormatName | null = options.read?.format ?? null;
  for await (const mol of heldRecords(readRecords(path, options.read), path, options.hold)) {
    format ??= mol.source.format;
    const report = inspectMolecule(mol, options);
    records.push({ ...report, warnings: withFlatInputWarning(mol, report.warnings, flat) });
  }
  return { schema: 'conformark/report@1', source: { path, format: format ?? detectFormat(path) }, records };
}
