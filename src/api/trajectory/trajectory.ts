/**
 * `trajectory`: ring puckering over every frame of a trajectory, streamed in constant memory. Frame 1 fixes
 * bonds, ring and numbering; each analysed frame then costs one Cremer–Pople kernel call, one shape lookup, a
 * CSV line and a few counters. Writes `puckering.csv`, `summary.json` and the figures into a folder.
 */
import { ConformarkError, ParseError, usageError, type Warning } from '../../model/errors.js';
import type { FormatName } from '../../model/molecule.js';
import type { Frame } from '../../io/readFrames.js';
import type { ReadOptions } from '../../io/limits.js';
import { protectInput } from '../../io/writeAtomic.js';
import { OutputFolder, type ManifestKind } from '../../io/outputFolder.js';
import { PHASE_THRESHOLD } from '../../geometry/cremerPople.js';
import { PuckerValues } from '../../geometry/puckerKernel.js';
import { torsionAt } from '../../geometry/torsionAt.js';
import { longRingBond, makeWhole, type PeriodicBox } from '../../geometry/periodicBox.js';
import { PLANAR_FORM, PUCKERED_FORM } from '../../analysis/shapeTable.js';
import { TrajectoryStats, type DwellStats } from '../../analysis/trajectoryStats.js';
import type { RingShapeOptions } from '../../analysis/ringShape.js';
import type { FigureFormat } from '../figures/writeFigure.js';
import type { Theme } from '../../render/theme.js';
import { openTrajectory, type SourceFrame, type TrajectorySource } from './trajectorySource.js';
import { TextStream } from './csvStream.js';
import { TrajectoryRows } from './trajectoryRows.js';
import { convertTime, parseStartTime, parseTimestep, type Timestep } from './timestep.js';
import { trajectorySetup, type TrajectorySetup } from './trajectorySetup.js';
import { FrameBoxes, parseBox, ringBondLimits } from './trajectoryBox.js';
import { TrajectoryPlots } from './trajectoryPlots.js';
import { SHAPE_ORDER } from './trajectoryTheme.js';
import { writeTrajectoryFiles } from './trajectoryOutput.js';

/** Options of `analyzeTrajectory`. */
export interface TrajectoryOptions extends RingShapeOptions {
  /** Output folder (created). Required. */
  readonly dir: string;
  /** Ring: its number as `inspect` lists it, or an ordered atom list `1-2-3-4-5-6`. Default `1`. */
  readonly ring?: string;
  /** Analyse every Nth frame, counted from `from`. Default 1. */
  readonly stride?: number;
  /** First frame analysed (from 1). Default 1. */
  readonly from?: number;
  /** Last frame analysed. Default: the last frame. */
  readonly to?: number;
  /** Time between file frames, e.g. `{ value: 2, unit: 'ps' }` or `"2 ps"`. Default none (x is the frame). */
  readonly timestep?: Timestep | string;
  /** Time of frame 1, e.g. `"10 ns"` (used with a timestep). Default: from the file where it carries it (DCD), else 0. */
  readonly startTime?: Timestep | string;
  /** Torsions to add as CSV columns, `A-B-C-D` (numbers from 1 or atom names). Default none. */
  readonly torsions?: readonly string[];
  /** Figure formats written for each figure. Default `['svg']`. */
  readonly formats?: readonly FigureFormat[];
  /** PNG resolution, dots per inch. Default 300. */
  readonly dpi?: number;
  /** Most pixels of one PNG figure. Default 64,000,000. */
  readonly maxPixels?: number;
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Bond tolerance for perception on frame 1, Å. Default 0.40. */
  readonly toleranceA?: number;
  /** Outer radius of the five-ring wheel, degrees of τm. Default 60. */
  readonly maxAmplitudeDeg?: number;
  /**
   * Periodic box for every frame, `"a b c"` or `"a b c α β γ"` (Å, degrees), or a box object. Default: the
   * file's own cell (PDB CRYST1) where it has one. With a box, the ring (and each torsion) is made whole by
   * the minimum image along its bonds in every frame; without one, a ring bond longer than the bond cut-off
   * stops the run.
   */
  readonly box?: PeriodicBox | string;
  /** Topology for a coordinate-only trajectory (DCD): a PDB (or SDF/MOL/XYZ) of the same atoms in the same order. */
  readonly topology?: string;
  /** Reader options (format, limits). */
  readonly read?: ReadOptions;
  /** Called every few thousand frames and at the end with frames read and frames analysed. */
  readonly onProgress?: (framesRead: number, framesAnalysed: number) => void;
}

/** What `analyzeTrajectory` returns (the content of `summary.json` plus the files written). */
export interface TrajectorySummary {
  readonly schema: 'conformark/trajectory@1';
  readonly source: { readonly path: string; readonly format: FormatName | 'dcd' | null; readonly topology: string | null };
  readonly ring: { readonly atoms: readonly number[]; readonly size: number; readonly locants: readonly string[]; readonly referenceRule: string };
  readonly frames: { readonly read: number; readonly analysed: number; readonly first: number; readonly last: number; readonly from: number; readonly to: number | null; readonly stride: number };
  readonly timestep: Timestep | null;
  /** Time of frame 1 in the timestep's unit (0 unless given or read from the file); null without a timestep. */
  readonly startTime: number | null;
  /** Where the periodic box came from: `option` (`--box`), `file` (at least one frame's own cell) or null. */
  readonly box: 'option' | 'file' | null;
  readonly occupancy: Readonly<Record<string, number>>;
  readonly counts: Readonly<Record<string, number>>;
  readonly transitions: Readonly<Record<string, Readonly<Record<string, number>>>>;
  readonly dwell: Readonly<Record<string, DwellStats>>;
  /** The same statistics by ring form (descriptor, or the shape word where there is none): a chair flip shows here. */
  readonly forms: {
    readonly occupancy: Readonly<Record<string, number>>;
    readonly transitions: Readonly<Record<string, Readonly<Record<string, number>>>>;
    readonly dwell: Readonly<Record<string, DwellStats>>;
  };
  readonly torsions: readonly string[];
  readonly warnings: readonly Warning[];
  /** Paths written (relative to `dir`). */
  readonly files: readonly string[];
}

/** How `summary.json` lists what a trajectory run wrote. */
export const TRAJECTORY_MANIFEST: ManifestKind = {
  name: 'summary.json',
  schema: 'conformark/trajectory@1',
  files: (doc) => (Array.isArray(doc.files) ? doc.files : [null]).filter((f) => f !== 'summary.json'),
};

function frameIssue(path: string, frame: Frame, code: string, message: string): ConformarkError {
  return new ConformarkError({ code, file: path, line: frame.line || null, message: `frame ${frame.index} ${message}` });
}

/** The error for a ring bond longer than the bond cut-off (after the minimum image when there is a box). */
function brokenRing(path: string, frame: Frame, c: Float64Array, ring: Int32Array, k: number, boxed: boolean): ConformarkError {
  const i = ring[k]!, j = ring[(k + 1) % ring.length]!;
  const d = Math.hypot(c[3 * j]! - c[3 * i]!, c[3 * j + 1]! - c[3 * i + 1]!, c[3 * j + 2]! - c[3 * i + 2]!);
  const bond = `ring bond ${i + 1}-${j + 1} is ${d.toFixed(2)} Å`;
  const message = boxed
    ? `ring broken at frame ${frame.index}: ${bond} even at its nearest periodic image (wrong box?)`
    : `ring broken across the periodic box at frame ${frame.index} (${bond}): give the box (--box "a b c") or unwrap the trajectory`;
  return new ConformarkError({ code: 'ring-broken', file: path, line: frame.line || null, message });
}

/** Adds "frame N:" to a reader error about the frame after `last`. */
function withFrame(err: ParseError, last: number): ParseError {
  return new ParseError(err.issues.map((i) => ({ ...i, message: `frame ${last + 1}: ${i.message}` })));
}

/**
 * Analyses ring puckering over a trajectory (multi-frame XYZ, multi-MODEL PDB, multi-record SDF; `.gz` too)
 * and writes `puckering.csv`, `summary.json`, `pucker-map`, `time-series` and `occupancy` figures to `dir`.
 * @example const s = await analyzeTrajectory('md.xyz.gz', { dir: 'out', ring: '1', timestep: '2 ps' }); s.occupancy.chair
 */
export async function analyzeTrajectory(path: string, options: TrajectoryOptions): Promise<TrajectorySummary> {
  // 1. Options, resolved once.
  if (path === '-') throw usageError('bad-input', 'trajectory reads its file twice (frame 1 first): give a file, not standard input');
  const stride = options.stride ?? 1;
  const from = options.from ?? 1;
  const to = options.to ?? Infinity;
  if (to < from) throw usageError('bad-option', `--to ${to} is before --from ${from}`);
  const given = typeof options.timestep === 'string' ? parseTimestep(options.timestep) : options.timestep ?? null;
  protectInput(path);
  if (options.topology !== undefined) protectInput(options.topology);
  // 2. Frame 1 fixes bonds, ring, numbering and torsions.
  const source = await openTrajectory(path, options.topology, options.read);
  let folder: OutputFolder | null = null;
  try {
    const timestep: Timestep | null = given ?? (source.timestepPs !== null ? { value: +source.timestepPs.toPrecision(9), unit: 'ps' } : null);
    const setup = trajectorySetup(source.first, { ...options, ring: options.ring ?? '1', torsions: options.torsions ?? [] });
    folder = OutputFolder.open(options.dir, TRAJECTORY_MANIFEST);
    return await analyseInto(folder, path, source, setup, { ...options, stride, from, to, timestep });
  } catch (err) {
    folder?.abort();
    await source.frames.return?.(undefined);
    throw err;
  }
}

interface Resolved extends Omit<TrajectoryOptions, 'timestep'> {
  readonly stride: number;
  readonly from: number;
  readonly to: number;
  readonly timestep: Timestep | null;
}

async function analyseInto(folder: OutputFolder, path: string, source: TrajectorySource, setup: TrajectorySetup, options: Resolved): Promise<TrajectorySummary> {
  const { stride, from, to, timestep } = options;
  const { first } = source;
  const { ring, kernel, table, torsions } = setup;
  const n = ring.length;
  const startGiven = typeof options.startTime === 'string' ? parseStartTime(options.startTime) : options.startTime ?? null;
  const start = !timestep ? 0 : startGiven ? convertTime(startGiven.value, startGiven.unit, timestep.unit) : source.startPs !== null ? convertTime(source.startPs, 'ps', timestep.unit) : 0;
  const maxRingAtom = Math.max(...ring, ...torsions.flat());
  const csv = new TextStream(folder.path('puckering.csv'));
  folder.adopt('puckering.csv', csv.temporary);
  const timeColumn = timestep ? [`time_${timestep.unit}`] : [];
  const fiveColumns = n === 5 ? ['P', 'tauM'] : [];
  csv.write(`${['frame', ...timeColumn, 'Q', 'thetaDeg', 'phiDeg', ...fiveColumns, 'shape', 'descriptor', ...setup.torsionColumns].join(',')}\n`);
  const rows = new TrajectoryRows(csv);
  const stats = new TrajectoryStats({ stride, timestep: timestep?.value });
  const formStats = new TrajectoryStats({ stride, timestep: timestep?.value });
  const plots = new TrajectoryPlots(n, options.maxAmplitudeDeg ?? 60);
  const catOf = (form: number) => SHAPE_ORDER.indexOf(table.shapeOf(form) as (typeof SHAPE_ORDER)[number]);
  const formCat = table.shapes.map((_, i) => catOf(i));
  const planarCat = catOf(PLANAR_FORM);
  const puckeredCat = catOf(PUCKERED_FORM);
  const csvDescriptor = table.descriptors.map((d) => (d === null ? '' : /[",]/.test(d) ? `"${d.replace(/"/g, '""')}"` : d));
  const v = new PuckerValues();
  const optionBox = typeof options.box === 'string' ? parseBox(options.box) : options.box ?? null;
  const fileBoxes = !optionBox && !source.binary && first.source.format === 'pdb' ? new FrameBoxes() : null;
  const limits = ringBondLimits(first, ring, options.toleranceA);
  let boxedFrames = 0;
  let read = 0;
  let analysed = 0;
  let firstAnalysed = 0;
  let lastAnalysed = 0;
  let planarFrames = 0;
  const it = source.frames;
  try {
    // 3. The stream: one line and a few counters per analysed frame.
    for (;;) {
      let next: IteratorResult<SourceFrame>;
      try {
        next = await it.next();
      } catch (err) {
        throw err instanceof ParseError ? withFrame(err, read) : err;
      }
      if (next.done) break;
      const frame = next.value;
      read++;
      if (options.onProgress && (read & 4095) === 0) options.onProgress(read, analysed);
      const idx = frame.index;
      if (idx < from) continue;
      if (idx > to) break;
      if ((idx - from) % stride !== 0) continue;
      const c = frame.coords;
      if (c.length !== 3 * setup.atomCount) {
        const missing = c.length / 3 <= maxRingAtom ? ` (atom ${maxRingAtom + 1}, used by the analysis, is missing)` : '';
        throw frameIssue(path, frame, 'frame-atom-count', `has ${c.length / 3} atoms, frame 1 had ${setup.atomCount}${missing}`);
      }
      const box = optionBox ?? frame.cell ?? fileBoxes?.of(frame.properties) ?? null;
      if (box) {
        boxedFrames++;
        makeWhole(c, ring, box);
        for (const t of torsions) makeWhole(c, t, box);
      }
      const broken = longRingBond(c, ring, limits);
      if (broken >= 0) throw brokenRing(path, frame, c, ring, broken, box !== null);
      if (!kernel.measure(c, ring, v) || !Number.isFinite(v.Q)) {
        throw frameIssue(path, frame, 'degenerate-ring', Number.isFinite(v.Q) ? 'has collinear ring atoms' : 'has non-finite ring atom coordinates');
      }
      const form = table.classify(v.Q, v.q2, v.thetaDeg, v.phaseDeg, kernel.displacements);
      const planar = form === PLANAR_FORM;
      if (planar) planarFrames++;
      const shape = table.shapeOf(form);
      const phi = !planar && n > 4 && v.q2 >= PHASE_THRESHOLD ? v.phaseDeg : NaN;
      // the CSV row, written as bytes (no string per number: see TrajectoryRows)
      rows.number(idx, 0);
      if (timestep) {
        rows.comma();
        rows.number(start + (idx - 1) * timestep.value, 6);
      }
      rows.comma();
      rows.number(v.Q, 4);
      rows.comma();
      if (!planar && n === 6) rows.number(v.thetaDeg, 2);
      rows.comma();
      if (!Number.isNaN(phi)) rows.number(phi, 2);
      if (n === 5) {
        rows.comma();
        if (!planar && !Number.isNaN(v.pDeg)) rows.number(v.pDeg, 2);
        rows.comma();
        if (!planar && !Number.isNaN(v.pDeg)) rows.number(v.tauMDeg, 2);
      }
      rows.comma();
      rows.text(shape);
      rows.comma();
      if (form >= 0) rows.text(csvDescriptor[form]!);
      for (let k = 0; k < torsions.length; k++) {
        const [a, b, cc, d] = torsions[k]!;
        const t = torsionAt(c, a, b, cc, d);
        rows.comma();
        if (!Number.isNaN(t)) rows.number(t, 2);
      }
      rows.newline();
      stats.add(shape);
      formStats.add(table.descriptorOf(form) ?? shape);
      plots.add(idx, v, phi, planar, form >= 0 ? formCat[form]! : planar ? planarCat : puckeredCat);
      if (analysed++ === 0) firstAnalysed = idx;
      lastAnalysed = idx;
    }
    options.onProgress?.(read, analysed);
    if (analysed === 0) {
      const range = Number.isFinite(to) ? `from frame ${from} to ${to}` : `from frame ${from}`;
      throw usageError('no-frames', `no frames to analyse ${range}: the file has ${read} frame${read === 1 ? '' : 's'}`, path);
    }
    rows.flush();
    csv.finish();
  } catch (err) {
    csv.abort();
    throw err;
  }
  // 4. Summary and figures.
  const warnings: Warning[] = [];
  if (planarFrames > 0) warnings.push({ code: 'ring-nearly-planar', message: `${planarFrames} frames have a nearly planar ring (shape planar, no θ or φ)` });
  if (plots.clamped > 0) warnings.push({ code: 'amplitude-beyond-wheel', message: `${plots.clamped} frames have τm beyond ${options.maxAmplitudeDeg ?? 60}°: drawn at the rim of the wheel` });
  const st = stats.summary();
  const fs = formStats.summary();
  const summary: Omit<TrajectorySummary, 'files'> = {
    schema: 'conformark/trajectory@1',
    source: { path, format: source.binary ?? first.source.format, topology: options.topology ?? null },
    ring: { atoms: Array.from(ring, (a) => a + 1), size: n, locants: setup.locants, referenceRule: setup.referenceRule },
    frames: { read, analysed, first: firstAnalysed, last: lastAnalysed, from, to: Number.isFinite(to) ? to : null, stride },
    timestep,
    startTime: timestep ? start : null,
    box: optionBox ? 'option' : boxedFrames > 0 ? 'file' : null,
    occupancy: st.occupancy,
    counts: st.counts,
    transitions: st.transitions,
    dwell: st.dwell,
    forms: { occupancy: fs.occupancy, transitions: fs.transitions, dwell: fs.dwell },
    torsions: setup.torsionColumns,
    warnings,
  };
  const files = await writeTrajectoryFiles(folder, summary, plots, setup, { formats: options.formats ?? ['svg'], theme: options.theme, timestep, dpi: options.dpi, maxPixels: options.maxPixels });
  return { ...summary, files: ['puckering.csv', ...files] };
}
