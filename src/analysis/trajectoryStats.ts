/**
 * Shape statistics over a stream of frames: occupancy, shape-to-shape transitions and dwell (runs of
 * consecutive analysed frames in one shape). Feed shapes in frame order with `add`; read `summary()` at any
 * time. Memory grows with the number of distinct shapes only.
 */

/** Dwell statistics of one shape. */
export interface DwellStats {
  /** Number of runs (maximal stretches of consecutive analysed frames in this shape). */
  readonly runs: number;
  /** Mean run length, in analysed frames. */
  readonly meanFrames: number;
  /** Longest run, in analysed frames. */
  readonly longestFrames: number;
  /** Mean run length in time (analysed frames × stride × timestep), when a timestep is known. */
  readonly meanTime?: number;
  /** Longest run in time, when a timestep is known. */
  readonly longestTime?: number;
}

/** What `TrajectoryStats.summary` returns. */
export interface ShapeStatistics {
  /** Frames analysed. */
  readonly frames: number;
  /** Shape → fraction of analysed frames, in order of first appearance. */
  readonly occupancy: Readonly<Record<string, number>>;
  /** Shape → frame counts. */
  readonly counts: Readonly<Record<string, number>>;
  /** From shape → to shape → number of changes between consecutive analysed frames. */
  readonly transitions: Readonly<Record<string, Readonly<Record<string, number>>>>;
  readonly dwell: Readonly<Record<string, DwellStats>>;
}

/** Options of `TrajectoryStats`. */
export interface TrajectoryStatsOptions {
  /** File frames between analysed frames. Default 1. */
  readonly stride?: number;
  /** Time between file frames, in the caller's unit; dwell times are reported when given. Default none. */
  readonly timestep?: number;
}

interface ShapeEntry {
  count: number;
  runs: number;
  longest: number;
  readonly to: Map<string, number>;
}

/**
 * Accumulates shape statistics.
 * @example const s = new TrajectoryStats(); for (const sh of ['chair','chair','boat']) s.add(sh); s.summary().transitions // { chair: { boat: 1 } }
 */
export class TrajectoryStats {
  private readonly entries = new Map<string, ShapeEntry>();
  private frames = 0;
  private current: ShapeEntry | null = null;
  private currentShape = '';
  private run = 0;
  private readonly stride: number;
  private readonly timestep: number | undefined;

  constructor(options: TrajectoryStatsOptions = {}) {
    this.stride = options.stride ?? 1;
    this.timestep = options.timestep;
  }

  /** Adds the shape of the next analysed frame. */
  add(shape: string): void {
    this.frames++;
    if (this.current !== null && shape === this.currentShape) {
      this.current.count++;
      this.run++;
      return;
    }
    let entry = this.entries.get(shape);
    if (!entry) {
      entry = { count: 0, runs: 0, longest: 0, to: new Map() };
      this.entries.set(shape, entry);
    }
    if (this.current !== null) {
      this.closeRun();
      this.current.to.set(shape, (this.current.to.get(shape) ?? 0) + 1);
    }
    this.current = entry;
    this.currentShape = shape;
    entry.count++;
    entry.runs++;
    this.run = 1;
  }

  private closeRun(): void {
    if (this.current && this.run > this.current.longest) this.current.longest = this.run;
  }

  /** The statistics of the frames added so far (the open run counts as ended here). */
  summary(): ShapeStatistics {
    const occupancy: Record<string, number> = {};
    const counts: Record<string, number> = {};
    const transitions: Record<string, Record<string, number>> = {};
    const dwell: Record<string, DwellStats> = {};
    const unitTime = this.timestep === undefined ? undefined : this.stride * this.timestep;
    for (const [shape, e] of this.entries) {
      const longest = e === this.current ? Math.max(e.longest, this.run) : e.longest;
      occupancy[shape] = e.count / this.frames;
      counts[shape] = e.count;
      if (e.to.size > 0) transitions[shape] = Object.fromEntries(e.to);
      const meanFrames = e.count / e.runs;
      dwell[shape] = {
        runs: e.runs,
        meanFrames,
        longestFrames: longest,
        ...(unitTime === undefined ? {} : { meanTime: meanFrames * unitTime, longestTime: longest * unitTime }),
      };
    }
    return { frames: this.frames, occupancy, counts, transitions, dwell };
  }
}
