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
import { contactSheet, type ContactPanel } from '../figures/contactSheet.js';
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
  /** Write contact sheets. Default true. */
  readonly sheet?: boolean;
  /** Panels per contact sheet; more figures make more sheets. Default 24. */
  readonly sheetSize?: number;
  /** Panels per sheet row. Default 4. */
  readonly sheetColumns?: number;
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

interface Planned extends FigureJob {
  readonly record: number;
  readonly stem: string;
  readonly caption: readonly string[];
  readonly manifestBond: [number, number] | null;
  readonly manifestRing: number | null;
}

const one = (a: number) => a + 1;

/** How `manifest.json` lists what a batch wrote. */
export const BATCH_MANIFEST: ManifestKind = {
  name: 'manifest.json',
  schema: 'conformark/batch@1',
  files: (doc) => [...(Array.isArray(doc.figures) ? doc.figures : [null]), ...(Array.isArray(doc.tables) ? doc.tables : [null])].map((e) => (e as { path?: unknown } | null)?.path),
};

/** Figures of one record, in order: Newman per drawn bond, then one ring figure per ring. */
function plan(a: RecordAnalysis, width: number, prefix: string, lowest: number | null, rings: boolean): Planned[] {
  const label = recordLabel(a.record, width);
  const head = `${label} ${a.title}`.trim();
  const tail = a.energy && lowest !== null ? [`ΔE ${fixed(a.energy.kcal - lowest, 2)} kcal/mol`] : [];
  const jobs: Planned[] = a.bonds.map(({ bond }) => {
    const stem = `${label}-newman-${one(bond[0])}-${one(bond[1])}`;
    // the panel's own caption names the bond and its conformation
    return { kind: 'newman', bond, idPrefix: `${prefix}${stem}-`, record: a.record, stem, caption: [head, ...tail], manifestBond: [one(bond[0]), one(bond[1])], manifestRing: null };
  });
  if (rings) {
    a.rings.forEach((r, i) => {
      const stem = `${label}-ring${i + 1}-${r.shape}`;
      // the panel's own caption gives shape, descriptor and puckering; name the ring when there are several
      const caption = a.rings.length > 1 ? [head, `ring ${i + 1}`, ...tail] : [head, ...tail];
      jobs.push({ kind: 'ring', ring: i, idPrefix: `${prefix}${stem}-`, record: a.record, stem, caption, manifestBond: null, manifestRing: i + 1 });
    });
  }
  return jobs;
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
  const analysed: { molecule: Molecule; analysis: RecordAnalysis }[] = [];
  let refusal: ConformarkError | null = null;
  const flat = { warned: false };
  for await (const mol of goodRecords(path, options, errors)) {
    try {
      const prepared = prepareRecord(mol);
      const analysis = analyseRecord(prepared, { bonds: options.bonds, sp2Bonds: options.sp2Bonds, coupling: options.coupling, energy: options.energy });
      // captions and tables need a unit: refuse rather than guess (thrown past the per-record catch below)
      if (analysis.energyWithoutUnit !== null) refusal = usageError('energy-unit-unknown', `record ${analysis.record}: ${unitRequest(analysis.energyWithoutUnit)}`, path);
      analysed.push({ molecule: prepared.molecule, analysis });
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
  const planned = analysed.map((r) => plan(r.analysis, width, prefix, lowest, drawRings));
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
  const panels: ContactPanel[] = [];
  planned.forEach((jobs, k) => {
    jobs.forEach((job, j) => {
      const fig = drawn[k]![j]!;
      for (const format of formats) {
        const file = `${job.stem}.${format}`;
        folder.write(file, format === 'svg' ? `${fig.svg}\n` : fig.files.find((f) => f.format === format)!.data);
        figures.push({ record: job.record, kind: job.kind, bond: job.manifestBond, ring: job.manifestRing, path: file });
      }
      panels.push({ svg: fig.svg, width: fig.width, height: fig.height, caption: job.caption });
    });
  });

  // 4. Contact sheets, `sheetSize` panels each.
  if (options.sheet !== false && panels.length > 0) {
    const size = options.sheetSize ?? 24;
    for (let s = 0; s * size < panels.length; s++) {
      const svg = contactSheet(panels.slice(s * size, (s + 1) * size), {
        theme, idPrefix: `${prefix}sheet-${s + 1}-`, columns: options.sheetColumns, title: `Contact sheet ${s + 1} of ${path}`,
      });
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
