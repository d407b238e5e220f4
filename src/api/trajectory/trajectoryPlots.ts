/**
 * The figure data of a trajectory run, gathered frame by frame in fixed memory: equal-area histograms of
 * the puckering sphere (or the pseudorotation wheel) and min/max buckets of the plotted series.
 */
import { PolarGrid } from '../../analysis/polarGrid.js';
import { SeriesBuckets } from '../../analysis/seriesBuckets.js';
import type { PuckerValues } from '../../geometry/puckerKernel.js';
import { equalAreaRadius } from '../../layout/plots/puckerMapLayout.js';
import { SHAPE_ORDER } from './trajectoryTheme.js';

/** Rings of the map histograms (6K² cells per disc). */
const MAP_RINGS = 14;
/** Buckets kept for the time series (between half and all of them are drawn). */
const SERIES_BUCKETS = 1024;

export class TrajectoryPlots {
  /** Six-rings: θ ≤ 90 (north) and θ > 90 (south); five-rings: the wheel in `north`. */
  readonly north = new PolarGrid(MAP_RINGS);
  readonly south = new PolarGrid(MAP_RINGS);
  readonly series = new SeriesBuckets(2, SERIES_BUCKETS, SHAPE_ORDER.length);
  private readonly values = new Float64Array(2);

  constructor(readonly size: number, readonly maxAmplitudeDeg: number) {}

  /** Frames drawn at the rim of the wheel because their amplitude is beyond it. */
  get clamped(): number {
    return this.north.clamped;
  }

  /** Adds one analysed frame (`phi` NaN where withheld; `category` an index into SHAPE_ORDER). */
  add(frame: number, v: PuckerValues, phi: number, planar: boolean, category: number): void {
    const out = this.values;
    if (this.size === 6) {
      if (!planar) {
        if (v.thetaDeg <= 90) this.north.add(equalAreaRadius(v.thetaDeg), v.phaseDeg);
        else this.south.add(equalAreaRadius(180 - v.thetaDeg), v.phaseDeg);
      }
      out[0] = planar ? NaN : v.thetaDeg;
      out[1] = phi;
    } else if (this.size === 5) {
      if (!planar && Number.isFinite(v.pDeg)) this.north.add(v.tauMDeg / this.maxAmplitudeDeg, v.pDeg);
      out[0] = planar ? NaN : v.pDeg;
      out[1] = planar ? NaN : v.tauMDeg;
    } else {
      out[0] = v.Q;
      out[1] = phi;
    }
    this.series.add(frame, out, category);
  }
}
