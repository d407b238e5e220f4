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
import { torsionAt } from '../../geometry/torsionAt.js';
import { makeWhole, type PeriodicBox } from '../../geometry/periodicBox.js';
import type { DwellStats } from '../../analysis/trajectoryStats.js';
import type { RingShapeOptions } from '../../analysis/ringShape.js';
import type { FigureFormat } from '../figures/writeFigure.js';
import type { Theme } from '../../render/theme.js';
import { openTrajectory, type BinaryFormat, type SourceFrame, type TrajectorySource } from './trajectorySource.js';
import { TextStream } from './csvStream.js';
import { TrajectoryRows } from './trajectoryRows.js';
import { convertTime, parseStartTime, parseTimestep, type Timestep } from './timestep.js';
import { trajectorySetup, type RingResidue, type TrajectorySetup } from './trajectorySetup.js';
import { FrameBoxes, parseBox } from './trajectoryBox.js';
import { RingTrack } from './ringTrack.js';
import { writeTrajectoryFiles } from './trajectoryOutput.js';

/** Options of `analyzeTrajectory`. */
export interface TrajectoryOptions extends RingShapeOptions {
  /** Output folder (created). Required. */
  readonly dir: string;
  /**
   * Ring: its number as `inspect` lists it, an ordered atom list `1-2-3-4-5-6` (atom tokens as in
   * `selectAtom`), the ring(s) of a residue `A/PRO42/`, or every ring of the residues with given names
   * `name:BGC,NAG` (each followed and reported separately). Default `1`.
   */
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
   * file's own cell (DCD/XTC/TRR box, GRO box line, PDB CRYST1) where it has one. With a box, the ring (and each torsion) is made whole by
   * the minimum image along its bonds in every frame; without one, a ring bond longer than the bond cut-off
   * stops the run.
   */
  readonly box?: PeriodicBox | string;
  /** Topology for a coordinate-only trajectory (DCD): a PDB (or SDF/MOL/XYZ) of the same atoms in the same order. */
  readonly topology?: string;
  /**
   * How transitions and dwell times are counted: `core` (default) counts a transition only when the ring
   * enters the core of another form (transition-based assignment); `frame` counts every change between
   * consecutive analysed frames. Occupancy and counts are per frame either way.
   */
  readonly transitions?: 'core' | 'frame';
  /** Core radius, degrees on the Cremer–Pople sphere (five-rings: of phase). Default 10 (five-rings 6). */
  readonly coreRadiusDeg?: number;
  /** Reader options (format, limits). */
  readonly read?: ReadOptions;
  /** Called every few thousand frames and at the end with frames read and frames analysed. */
  readonly onProgress?: (framesRead: number, framesAnalysed: number) => void;
}

/** Occupancy, transitions and dwell of one ring, by shape and by form. */
export interface RingStatistics {
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
  readonly assignment: Assignment;
  readonly inversions: Inversions | null;
}

/** The statistics of one followed ring. */
export interface RingSummary extends RingStatistics {
  /** `CHX2`, `A_PRO42`, `ring1`: the prefix of its CSV columns and figure names when several rings are followed. */
  readonly tag: string;
  readonly label: string;
  readonly residue: RingResidue | null;
  readonly atoms: readonly number[];
  readonly size: number;
  readonly locants: readonly string[];
  readonly referenceRule: string;
}

/** How frames were assigned to states for `transitions` and `dwell`. */
export interface Assignment {
  /** `core`: a transition is the entry into the core of another form; `frame`: any change between frames. */
  readonly rule: 'core' | 'frame';
  /** Core radius, degrees (null under `frame`). */
  readonly coreRadiusDeg: number | null;
  /** Analysed frames before the first core was entered (not counted in transitions and dwell). */
  readonly unassignedFrames: number;
}

/** Six-ring inversions: changes of committed chair (e.g. 4C1 ↔ 1C4). */
export interface Inversions {
  readonly count: number;
  /** Inversions per ns of analysed time (null without a timestep). */
  readonly perNs: number | null;
}

/** What `analyzeTrajectory` returns (the content of `summary.json` plus the files written); the statistics are the first ring's. */
export interface TrajectorySummary extends RingStatistics {
  readonly schema: 'conformark/trajectory@1';
  readonly source: { readonly path: string; readonly format: FormatName | BinaryFormat | null; readonly topology: string | null };
  readonly ring: { readonly atoms: readonly number[]; readonly size: number; readonly locants: readonly string[]; readonly referenceRule: string };
  readonly frames: { readonly read: number; readonly analysed: number; readonly first: number; readonly last: number; readonly from: number; readonly to: number | null; readonly stride: number };
  readonly timestep: Timestep | null;
  /** Time of frame 1 in the timestep's unit (0 unless given or read from the file); null without a timestep. */
  readonly startTime: number | null;
  /** Where the periodic box came from: `option` (`--box`), `file` (at least one frame's own cell) or null. */
  readonly box: 'option' | 'file' | null;
  /** Every followed ring (the top-level `ring`, `occupancy` … `inversions` repeat the first). */
  readonly rings: readonly RingSummary[];
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
  const { torsions } = setup;
  const rule = options.transitions ?? 'core';
  if (rule !== 'core' && rule !== 'frame') throw usageError('bad-option', `--transitions expects core or frame, got "${String(rule)}"`);
  const radius = options.coreRadiusDeg;
  if (radius !== undefined && !(radius > 0 && radius < 90)) throw usageError('bad-option', `--core-radius expects degrees between 0 and 90, got ${radius}`);
  const trackOptions = { stride, timestep: timestep?.value, maxAmplitudeDeg: options.maxAmplitudeDeg ?? 60, toleranceA: options.toleranceA, assignment: rule, coreRadiusDeg: radius };
  const tracks = setup.rings.map((r) => new RingTrack(r, first, trackOptions));
  const several = tracks.length > 1;
  const startGiven = typeof options.startTime === 'string' ? parseStartTime(options.startTime) : options.startTime ?? null;
  const start = !timestep ? 0 : startGiven ? convertTime(startGiven.value, startGiven.unit, timestep.unit) : source.startPs !== null ? convertTime(source.startPs, 'ps', timestep.unit) : 0;
  const maxRingAtom = Math.max(...setup.rings.flatMap((r) => Array.from(r.ring)), ...torsions.flat());
  const csv = new TextStream(folder.path('puckering.csv'));
  folder.adopt('puckering.csv', csv.temporary);
  const timeColumn = timestep ? [`time_${timestep.unit}`] : [];
  const ringColumns = tracks.flatMap((t) => t.columns(several ? `${t.setup.tag}_` : ''));
  csv.write(`${['frame', ...timeColumn, ...ringColumns, ...setup.torsionColumns].join(',')}\n`);
  const rows = new TrajectoryRows(csv);
  const optionBox = typeof options.box === 'string' ? parseBox(options.box) : options.box ?? null;
  const fileBoxes = !optionBox && !source.binary && (first.source.format === 'pdb' || first.source.format === 'gro') ? new FrameBoxes() : null;
  let boxedFrames = 0;
  let read = 0;
  let analysed = 0;
  let firstAnalysed = 0;
  let lastAnalysed = 0;
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
        for (const t of tracks) makeWhole(c, t.setup.ring, box);
        for (const t of torsions) makeWhole(c, t, box);
      }
      for (const t of tracks) t.check(path, frame, c, box !== null);
      // the CSV row, written as bytes (no string per number: see TrajectoryRows)
      rows.number(idx, 0);
      if (timestep) {
        rows.comma();
        rows.number(start + (idx - 1) * timestep.value, 6);
      }
      for (const t of tracks) t.measure(path, frame, c, rows);
      for (let k = 0; k < torsions.length; k++) {
        const [a, b, cc, d] = torsions[k]!;
        const t = torsionAt(c, a, b, cc, d);
        rows.comma();
        if (!Number.isNaN(t)) rows.number(t, 2);
      }
      rows.newline();
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
  const rings: RingSummary[] = tracks.map((t) => {
    const of = several ? ` of ${t.setup.tag}` : '';
    if (t.planarFrames > 0) warnings.push({ code: 'ring-nearly-planar', message: `${t.planarFrames} frames have a nearly planar ring${of} (shape planar, no θ or φ)` });
    if (t.plots.clamped > 0) warnings.push({ code: 'amplitude-beyond-wheel', message: `${t.plots.clamped} frames have τm${of} beyond ${options.maxAmplitudeDeg ?? 60}°: drawn at the rim of the wheel` });
    const st = t.stats.summary();
    const fs = t.formStats.summary();
    const ct = t.coreStats?.summary() ?? st;
    const cf = t.coreFormStats?.summary() ?? fs;
    const r = t.setup;
    const spanNs = timestep ? convertTime(analysed * stride * timestep.value, timestep.unit, 'ns') : 0;
    return {
      tag: r.tag,
      label: r.label,
      residue: r.residue,
      atoms: Array.from(r.ring, (a) => a + 1),
      size: r.ring.length,
      locants: r.locants,
      referenceRule: r.referenceRule,
      occupancy: st.occupancy,
      counts: st.counts,
      transitions: ct.transitions,
      dwell: ct.dwell,
      forms: { occupancy: fs.occupancy, transitions: cf.transitions, dwell: cf.dwell },
      assignment: { rule, coreRadiusDeg: t.coreRadiusDeg, unassignedFrames: t.coreStats ? t.assignment.unassigned : 0 },
      inversions: r.ring.length === 6 ? { count: t.assignment.inversions, perNs: spanNs > 0 ? t.assignment.inversions / spanNs : null } : null,
    };
  });
  const one = rings[0]!;
  const summary: Omit<TrajectorySummary, 'files'> = {
    schema: 'conformark/trajectory@1',
    source: { path, format: source.binary ?? first.source.format, topology: options.topology ?? null },
    ring: { atoms: one.atoms, size: one.size, locants: one.locants, referenceRule: one.referenceRule },
    frames: { read, analysed, first: firstAnalysed, last: lastAnalysed, from, to: Number.isFinite(to) ? to : null, stride },
    timestep,
    startTime: timestep ? start : null,
    box: optionBox ? 'option' : boxedFrames > 0 ? 'file' : null,
    occupancy: one.occupancy,
    counts: one.counts,
    transitions: one.transitions,
    dwell: one.dwell,
    forms: one.forms,
    assignment: one.assignment,
    inversions: one.inversions,
    rings,
    torsions: setup.torsionColumns,
    warnings,
  };
  const figures = tracks.map((t, k) => ({ summary: { occupancy: { ...rings[k]!.occupancy }, frames: { analysed } }, plots: t.plots, setup: t.setup, suffix: several ? `-${t.setup.tag}` : '' }));
  const files = await writeTrajectoryFiles(folder, summary, figures, { formats: options.formats ?? ['svg'], theme: options.theme, timestep, dpi: options.dpi, maxPixels: options.maxPixels });
  return { ...summary, files: ['puckering.csv', ...files] };
}
