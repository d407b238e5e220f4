/**
 * One ring followed through a trajectory run: its per-frame measurement (one Cremer–Pople kernel call, one
 * shape lookup), its CSV fields, its statistics and its figure data. A run holds one per selected ring.
 */
import { ConformarkError } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import { PHASE_THRESHOLD } from '../../geometry/cremerPople.js';
import { PuckerValues } from '../../geometry/puckerKernel.js';
import { longRingBond } from '../../geometry/periodicBox.js';
import { PLANAR_FORM, PUCKERED_FORM } from '../../analysis/shapeTable.js';
import { TrajectoryStats } from '../../analysis/trajectoryStats.js';
import { TrajectoryPlots } from './trajectoryPlots.js';
import { SHAPE_ORDER } from './trajectoryTheme.js';
import { ringBondLimits } from './trajectoryBox.js';
import type { RingSetup } from './trajectorySetup.js';
import type { TrajectoryRows } from './trajectoryRows.js';

/** Where a frame is, for messages. */
export interface FrameRef {
  readonly index: number;
  readonly line: number;
}

/** Options of a `RingTrack`. */
export interface RingTrackOptions {
  readonly stride: number;
  readonly timestep: number | undefined;
  readonly maxAmplitudeDeg: number;
  readonly toleranceA?: number;
}

/** The error for a ring bond longer than the bond cut-off (after the minimum image when there is a box). */
function brokenRing(path: string, frame: FrameRef, c: Float64Array, ring: Int32Array, k: number, boxed: boolean): ConformarkError {
  const i = ring[k]!, j = ring[(k + 1) % ring.length]!;
  const d = Math.hypot(c[3 * j]! - c[3 * i]!, c[3 * j + 1]! - c[3 * i + 1]!, c[3 * j + 2]! - c[3 * i + 2]!);
  const bond = `ring bond ${i + 1}-${j + 1} is ${d.toFixed(2)} Å`;
  const message = boxed
    ? `ring broken at frame ${frame.index}: ${bond} even at its nearest periodic image (wrong box?)`
    : `ring broken across the periodic box at frame ${frame.index} (${bond}): give the box (--box "a b c") or unwrap the trajectory`;
  return new ConformarkError({ code: 'ring-broken', file: path, line: frame.line || null, message });
}

export class RingTrack {
  readonly stats: TrajectoryStats;
  readonly formStats: TrajectoryStats;
  readonly plots: TrajectoryPlots;
  planarFrames = 0;
  private readonly limits: Float64Array;
  private readonly formCat: number[];
  private readonly planarCat: number;
  private readonly puckeredCat: number;
  private readonly csvDescriptor: string[];
  private readonly v = new PuckerValues();

  constructor(
    readonly setup: RingSetup,
    first: Molecule,
    options: RingTrackOptions,
  ) {
    const { table } = setup;
    this.stats = new TrajectoryStats({ stride: options.stride, timestep: options.timestep });
    this.formStats = new TrajectoryStats({ stride: options.stride, timestep: options.timestep });
    this.plots = new TrajectoryPlots(setup.ring.length, options.maxAmplitudeDeg);
    const catOf = (form: number) => SHAPE_ORDER.indexOf(table.shapeOf(form) as (typeof SHAPE_ORDER)[number]);
    this.formCat = table.shapes.map((_, i) => catOf(i));
    this.planarCat = catOf(PLANAR_FORM);
    this.puckeredCat = catOf(PUCKERED_FORM);
    this.csvDescriptor = table.descriptors.map((d) => (d === null ? '' : /[",]/.test(d) ? `"${d.replace(/"/g, '""')}"` : d));
    this.limits = ringBondLimits(first, setup.ring, options.toleranceA);
  }

  /** CSV column names of this ring, with `prefix` (`CHX2_`, or '' for a single ring). */
  columns(prefix: string): string[] {
    const five = this.setup.ring.length === 5 ? ['P', 'tauM'] : [];
    return ['Q', 'thetaDeg', 'phiDeg', ...five, 'shape', 'descriptor'].map((c) => prefix + c);
  }

  /** Throws when a ring bond is longer than the bond cut-off in this frame. */
  check(path: string, frame: FrameRef, c: Float64Array, boxed: boolean): void {
    const broken = longRingBond(c, this.setup.ring, this.limits);
    if (broken >= 0) throw brokenRing(path, frame, c, this.setup.ring, broken, boxed);
  }

  /** Measures the ring in frame `c`, writes its fields (each preceded by a comma) and counts the frame. */
  measure(path: string, frame: FrameRef, c: Float64Array, rows: TrajectoryRows): void {
    const { kernel, table, ring } = this.setup;
    const v = this.v;
    const n = ring.length;
    if (!kernel.measure(c, ring, v) || !Number.isFinite(v.Q)) {
      const what = Number.isFinite(v.Q) ? 'has collinear ring atoms' : 'has non-finite ring atom coordinates';
      throw new ConformarkError({ code: 'degenerate-ring', file: path, line: frame.line || null, message: `frame ${frame.index} ${what}` });
    }
    const form = table.classify(v.Q, v.q2, v.thetaDeg, v.phaseDeg, kernel.displacements);
    const planar = form === PLANAR_FORM;
    if (planar) this.planarFrames++;
    const shape = table.shapeOf(form);
    const phi = !planar && n > 4 && v.q2 >= PHASE_THRESHOLD ? v.phaseDeg : NaN;
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
    if (form >= 0) rows.text(this.csvDescriptor[form]!);
    this.stats.add(shape);
    this.formStats.add(table.descriptorOf(form) ?? shape);
    this.plots.add(frame.index, v, phi, planar, form >= 0 ? this.formCat[form]! : planar ? this.planarCat : this.puckeredCat);
  }
}
