/**
 * `batch`: every figure for every record of a file, a contact sheet, supporting-information tables and
 * `manifest.json` (schema `conformark/batch@1`), all written atomically into one folder. A bad record is
 * reported (manifest `errors`, and in the result for stderr) and the rest is written.
 */
import { availableParallelism } from 'node:os';
import { ConformarkError, usageError, type Warning } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import type { StreamOptions } from '../../io/readRecords.js';
import type { HoldOptions } from '../holdLimits.js';
import { OutputFolder, type ManifestKind } from '../../io/outputFolder.js';
import type { BondSet } from '../../analysis/figureBonds.js';
import type { CouplingOptions } from '../../analysis/coupling.js';
import { energySpreadWarning, unitRequest, type EnergyOptions } from '../../io/energy.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme } from '../../render/themes.js';
import { prepareRecord } from '../prepare.js';
import { withFlatInputWarning } from '../flatInput.js';
import { analyseRecord, recordLabel, type RecordAnalysis } from '../recordAnalysis.js';
import { goodRecords, type RecordError } from '../recordStream.js';
import { canDraw, type FigureKind } from '../figures/figureKinds.js';
import { drawTasks, type FigureJob, type RecordTask } from './batchRender.js';
import { conformerSheets, type ConformerPanel, type ConformerRow, type SheetLayout } from '../figures/conformerSheet.js';
import { drawnRingForms } from '../figures/drawnRingForms.js';
import { formRuns, headingRuns, INFORMATIVE_NOTE, sharedTitle, sheetTargets, type SheetTarget } from '../figures/sheetRows.js';
import type { PreparedRecord } from '../prepare.js';
import { figureBytes, type FigureFormat } from '../figures/writeFigure.js';
import { supportTables } from '../tables/supportTables.js';
import { TABLE_WRITERS, fixed, type TableFormat } from '../tables/tableText.js';
import { jsonText } from '../jsonText.js';

/** Options of {@link batchFile}. */
export interface BatchOptions {
  /** Bonds drawn as Newman projections: `ring` (default), `rotatable`, `all`, or a list `1-2,3-4`. */
  readonly bonds?: BondSet | string;
  /** Also draw ring bonds between two sp² atoms (inside aromatic rings) with `ring`/`all`. Default false. */
  readonly sp2Bonds?: boolean;
  /** Figure formats, each figure and sheet written in every one. Default `['svg']`. */
  readonly formats?: readonly FigureFormat[];
  /** PNG resolution, dots per inch. Default 300. */
  readonly dpi?: number;
  /** Most pixels of one PNG figure or sheet. Default 64,000,000. */
  readonly maxPixels?: number;
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Prefix before every figure's own id prefix (`<prefix>r01-newman-3-4-`). Default none. */
  readonly idPrefix?: string;
  /** Write conformer sheets (one row per record). Default true. */
  readonly sheet?: boolean;
  /** Sheet format: `page` (17 cm wide, rows onto further sheets below 24 cm; default) or `slide` (16:9, 33.867 × 19.05 cm). */
  readonly sheetLayout?: SheetLayout;
  /**
   * Newman projections on the sheets: `informative` (default: the ring bond with most heavy substituents per ring
   * and exocyclic bonds to heavy groups, drawn for the sheet even when `bonds` does not write them as files) or
   * `drawn` (every Newman figure written, e.g. every ring bond).
   */
  readonly sheetNewmans?: SheetNewmans;
  /** Table formats. Default `['csv', 'md', 'tex']`; `[]` writes none. */
  readonly tables?: readonly TableFormat[];
  /** Worker threads for figures. Default min(4, available cores); at most the available cores. 1 draws in this thread. */
  readonly jobs?: number;
  /** Workers are used only above this many figures. Default 40. */
  readonly workerThreshold?: number;
  readonly energy?: EnergyOptions;
  readonly coupling?: CouplingOptions;
  readonly read?: StreamOptions;
  /** Caps on the records held at once (defaults 100,000 records, 2,000,000 atoms in all). */
  readonly hold?: HoldOptions;
  /** Progress callback: figures done, figures in total. */
  readonly onProgress?: (done: number, total: number) => void;
}

/** One `manifest.json` figure entry (atoms and rings 1-based; `path` relative to the folder). */
export interface ManifestFigure {
  readonly record: number | null;
  readonly kind: FigureKind | 'sheet';
  readonly bond: [number, number] | null;
  readonly ring: number | null;
  readonly path: string;
}

/** `manifest.json`. */
export interface BatchManifest {
  readonly schema: 'conformark/batch@1';
  readonly figures: ManifestFigure[];
  readonly tables: { kind: string; format: TableFormat; path: string }[];
  readonly errors: { record: number | null; code: string; line: number | null; message: string }[];
}

/** What {@link batchFile} did. */
export interface BatchResult {
  readonly manifest: BatchManifest;
  /** Bad records, with file and line for stderr. */
  readonly errors: readonly RecordError[];
  readonly warnings: readonly { readonly record: number; readonly warning: Warning }[];
  /** Things the user should know (e.g. a figure kind this build cannot draw). */
  readonly notes: readonly string[];
}

/** Which Newman projections a sheet row shows. */
export const SHEET_NEWMANS = ['informative', 'drawn'] as const;
export type SheetNewmans = (typeof SHEET_NEWMANS)[number];

interface Planned extends FigureJob {
  readonly record: number;
  readonly stem: string;
  readonly manifestBond: [number, number] | null;
  readonly manifestRing: number | null;
  /** Drawn for the sheet only, not written as a file. */
  readonly sheetOnly?: boolean;
  /** Name on the sheet (`C1–C2`, `ring`), for the sheet's note. */
  readonly name?: string;
}

const one = (a: number) => a + 1;

/** How `manifest.json` lists what a batch wrote. */
export const BATCH_MANIFEST: ManifestKind = {
  name: 'manifest.json',
  schema: 'conformark/batch@1',
  files: (doc) => [...(Array.isArray(doc.figures) ? doc.figures : [null]), ...(Array.isArray(doc.tables) ? doc.tables : [null])].map((e) => (e as { path?: unknown } | null)?.path),
};

/** Figures of one record, in order: Newman per drawn bond, then one ring figure per ring. */
function plan(a: RecordAnalysis, width: number, prefix: string, rings: boolean): Planned[] {
  const label = recordLabel(a.record, width);
  const jobs: Planned[] = a.bonds.map(({ bond }) => {
    const stem = `${label}-newman-${one(bond[0])}-${one(bond[1])}`;
    return { kind: 'newman', bond, idPrefix: `${prefix}${stem}-`, record: a.record, stem, manifestBond: [one(bond[0]), one(bond[1])], manifestRing: null };
  });
  if (rings) {
    a.rings.forEach((r, i) => {
      const stem = `${label}-ring${i + 1}-${r.shape}`;
      jobs.push({ kind: 'ring', ring: i, idPrefix: `${prefix}${stem}-`, record: a.record, stem, manifestBond: null, manifestRing: i + 1 });
    });
  }
  return jobs;
}

const sameBond = (x: readonly number[] | undefined, y: readonly number[] | undefined) =>
  x !== undefined && y !== undefined && ((x[0] === y[0] && x[1] === y[1]) || (x[0] === y[1] && x[1] === y[0]));

/**
 * A record's sheet row as indices into its jobs, adding sheet-only jobs for the informative figures `bonds` did
 * not draw. `drawn`: ring figures first, then every drawn Newman.
 */
function sheetRow(p: PreparedRecord, jobs: Planned[], mode: SheetNewmans, label: string, prefix: string): number[] {
  const ringsFirst = (js: number[]) => [...js.filter((j) => jobs[j]!.kind === 'ring'), ...js.filter((j) => jobs[j]!.kind !== 'ring')];
  if (mode === 'drawn') return ringsFirst(jobs.map((_, j) => j));
  return sheetTargets(p).map((t: SheetTarget, n) => {
    const found = jobs.findIndex((j) => j.kind === t.kind && (t.kind === 'ring' ? j.ring === t.target.ring : sameBond(j.bond, t.target.bond)));
    if (found >= 0) {
      jobs[found] = { ...jobs[found]!, name: t.name };
      return found;
    }
    jobs.push({ kind: t.kind, bond: t.target.bond, ring: t.target.ring, idPrefix: `${prefix}${label}-sheet-${n + 1}-`, record: -1, stem: '', manifestBond: null, manifestRing: null, sheetOnly: true, name: t.name });
    return jobs.length - 1;
  });
}

/**
 * Writes every figure, sheet and table for the records of `path` into `dir`, then `dir/manifest.json`.
 * @example const { manifest } = await batchFile('conformers.sdf', 'si-figures', { bonds: 'rotatable' })
 */
export async function batchFile(path: string, dir: string, options: BatchOptions = {}): Promise<BatchResult> {
  const theme = loadTheme(options.theme);
  const folder = OutputFolder.open(dir, BATCH_MANIFEST);
  try {
    return await batchInto(folder, path, theme, options);
  } catch (err) {
    folder.abort();
    throw err;
  }
}

async function batchInto(folder: OutputFolder, path: string, theme: Theme, options: BatchOptions): Promise<BatchResult> {
  const formats = options.formats ?? ['svg'];
  const prefix = options.idPrefix ?? '';
  const notes: string[] = [];
  const errors: RecordError[] = [];
  const warnings: { record: number; warning: Warning }[] = [];

  // 1. Read and analyse every record; a bad one becomes an error entry and the batch goes on.
  const analysed: { molecule: Molecule; prepared: PreparedRecord; analysis: RecordAnalysis }[] = [];
  let refusal: ConformarkError | null = null;
  const flat = { warned: false };
  for await (const mol of goodRecords(path, options, errors)) {
    try {
      const prepared = prepareRecord(mol);
      const analysis = analyseRecord(prepared, { bonds: options.bonds, sp2Bonds: options.sp2Bonds, coupling: options.coupling, energy: options.energy });
      // captions and tables need a unit: refuse rather than guess (thrown past the per-record catch below)
      if (analysis.energyWithoutUnit !== null) refusal = usageError('energy-unit-unknown', `record ${analysis.record}: ${unitRequest(analysis.energyWithoutUnit)}`, path);
      analysed.push({ molecule: prepared.molecule, prepared, analysis });
      for (const warning of withFlatInputWarning(mol, analysis.warnings, flat)) warnings.push({ record: analysis.record, warning });
    } catch (err) {
      if (!(err instanceof ConformarkError)) throw err;
      for (const i of err.issues) {
        errors.push({ record: mol.source.index, code: i.code, file: path, line: i.line ?? mol.source.line, message: `record ${mol.source.index}: ${i.message}` });
      }
    }
    if (refusal) throw refusal;
  }

  // 2. Plan the figures: names from zero-padded record numbers, ids unique per figure.
  // a loop, not Math.max(...list): spreading 100,000 numbers overflows the call stack
  let last = 0;
  for (const r of analysed) last = Math.max(last, r.analysis.record);
  for (const e of errors) last = Math.max(last, e.record ?? 0);
  const width = Math.max(2, String(last).length);
  const energies = analysed.flatMap((r) => (r.analysis.energy ? [r.analysis.energy.kcal] : []));
  const lowest = energies.length > 0 ? energies.reduce((m, e) => Math.min(m, e)) : null;
  const spread = energySpreadWarning(energies, [...new Set(analysed.flatMap((r) => (r.analysis.energy ? [r.analysis.energy.unit] : [])))].join(', '));
  if (spread) warnings.push({ record: analysed.filter((r) => r.analysis.energy).pop()!.analysis.record, warning: spread });
  const drawRings = canDraw('ring');
  if (!drawRings && analysed.some((r) => r.analysis.rings.length > 0)) notes.push('ring figures are not drawn: this build has no ring renderer');
  const planned = analysed.map((r) => plan(r.analysis, width, prefix, drawRings));
  const sheets = options.sheet !== false;
  const rowJobs = sheets ? analysed.map((r, k) => sheetRow(r.prepared, planned[k]!, options.sheetNewmans ?? 'informative', recordLabel(r.analysis.record, width), prefix)) : [];
  const tasks: RecordTask[] = analysed.map((r, k) => ({ molecule: r.molecule, jobs: planned[k]!.map(({ kind, bond, ring, idPrefix }) => ({ kind, bond, ring, idPrefix })) }));
  const total = tasks.reduce((n, t) => n + t.jobs.length, 0);

  // 3. Draw (on workers when there are many), then write every figure.
  const cores = availableParallelism();
  if (options.jobs !== undefined && options.jobs > cores) notes.push(`jobs ${options.jobs} is more than the ${cores} cores here: using ${cores}`);
  const threads = total > (options.workerThreshold ?? 40) ? Math.min(options.jobs ?? 4, cores) : 1;
  let done = 0;
  options.onProgress?.(0, total);
  const drawn = await drawTasks(tasks, { theme, formats: formats.filter((f) => f !== 'svg'), dpi: options.dpi, maxPixels: options.maxPixels }, threads, (n) => {
    done += n;
    options.onProgress?.(done, total);
  });
  const figures: ManifestFigure[] = [];
  planned.forEach((jobs, k) => {
    jobs.forEach((job, j) => {
      if (job.sheetOnly) return;
      const fig = drawn[k]![j]!;
      for (const format of formats) {
        const file = `${job.stem}.${format}`;
        folder.write(file, format === 'svg' ? `${fig.svg}\n` : fig.files.find((f) => f.format === format)!.data);
        figures.push({ record: job.record, kind: job.kind, bond: job.manifestBond, ring: job.manifestRing, path: file });
      }
    });
  });

  // 4. Conformer sheets: one row per record, the compound named once above the rows.
  if (sheets && analysed.length > 0) {
    const { header, rest } = sharedTitle(analysed.map((r) => r.analysis.title));
    const rows: ConformerRow[] = analysed.flatMap((r, k) => {
      const label = recordLabel(r.analysis.record, width);
      const panels: ConformerPanel[] = rowJobs[k]!.map((j) => {
        const fig = drawn[k]![j]!;
        const job = planned[k]![j]!;
        return { svg: fig.svg, width: fig.width, height: fig.height, name: job.name ?? (job.bond ? `${one(job.bond[0])}–${one(job.bond[1])}` : `ring ${(job.ring ?? 0) + 1}`) };
      });
      const energy = r.analysis.energy && lowest !== null ? `ΔE ${fixed(r.analysis.energy.kcal - lowest, 2)} kcal/mol` : '';
      return panels.length === 0 ? [] : [{ label, heading: headingRuns([label, rest[k]!, formRuns(drawnRingForms(r.prepared)), energy]), panels }];
    });
    const note = (options.sheetNewmans ?? 'informative') === 'informative' ? INFORMATIVE_NOTE : 'Each row: the ring figures, then every Newman projection written for the record.';
    const svgs = conformerSheets(rows, { theme, layout: options.sheetLayout, idPrefix: `${prefix}sheet-`, header, note, title: `Conformer sheet of ${path}` });
    for (const [s, svg] of svgs.entries()) {
      for (const format of formats) {
        const file = `sheet-${s + 1}.${format}`;
        folder.write(file, await figureBytes(svg, format, { dpi: options.dpi, maxPixels: options.maxPixels }));
        figures.push({ record: null, kind: 'sheet', bond: null, ring: null, path: file });
      }
    }
  }

  // 5. Tables, then the manifest.
  const tables: BatchManifest['tables'] = [];
  const tableFormats = options.tables ?? ['csv', 'md', 'tex'];
  if (tableFormats.length > 0) {
    for (const table of supportTables(analysed.map((r) => r.analysis))) {
      for (const format of tableFormats) {
        const file = `${table.kind}.${format}`;
        folder.write(file, TABLE_WRITERS.get(format)!(table));
        tables.push({ kind: table.kind, format, path: file });
      }
    }
  }
  const manifest: BatchManifest = {
    schema: 'conformark/batch@1',
    figures,
    tables,
    errors: errors.map(({ record, code, line, message }) => ({ record, code, line, message })),
  };
  folder.commit(jsonText(manifest));
  return { manifest, errors, warnings, notes };
}
