/**
 * The figure data of a trajectory run, gathered frame by frame in fixed memory: equal-area histograms of
 * the puckering sphere (or the pseudorotation wheel) and bucketed series with per-bucket histograms.
 */
import { PolarGrid } from '../../analysis/polarGrid.js';
import { SeriesBuckets, type SeriesBinning } from '../../analysis/seriesBuckets.js';
import type { PuckerValues } from '../../geometry/puckerKernel.js';
import { equalAreaRadius } from '../../layout/plots/puckerMapLayout.js';
import { SHAPE_ORDER } from './trajectoryTheme.js';

/** Rings of the map histograms (6K² cells per disc). */
const MAP_RINGS = 14;
/** Buckets kept for the time series (between half and all of them are drawn). */
const SERIES_BUCKETS = 1024;

/**
 * φ of a six-ring is plotted as meaningful only for θ within [PHI_THETA_MIN, 180 − PHI_THETA_MIN]. Near a pole
 * the φ-carrying amplitude q₂ = Q sin θ shrinks (sin 15° = 0.26: q₂ ≈ 0.14 Å for a 0.55 Å chair) until thermal
 * noise in q₂ of a few hundredths of an ångström turns φ by tens of degrees, so φ of a chair is noise (common
 * practice, no source; the 15° cut is the one our issue tracker asked for). Those values are drawn in grey.
 */
export const PHI_THETA_MIN = 15;

/** Bins of the series histograms: 5° for angles, 0.025 Å for Q. */
const deg = (max: number): SeriesBinning => ({ min: 0, max, bins: Math.max(1, Math.round(max / 5)) });
export const SERIES_BINNING = {
  6: [deg(180), deg(360), deg(360)],
  5: (maxAmplitudeDeg: number) => [deg(360), { min: 0, max: maxAmplitudeDeg, bins: Math.max(10, Math.round(maxAmplitudeDeg / 2)) }],
  other: [{ min: 0, max: 1.5, bins: 60 }, deg(360)],
} as const;

export class TrajectoryPlots {
  /** Six-rings: θ ≤ 90 (north) and θ > 90 (south); five-rings: the wheel in `north`. */
  readonly north = new PolarGrid(MAP_RINGS);
  readonly south = new PolarGrid(MAP_RINGS);
  /** Six-rings: θ, φ where defined, φ near the poles; five-rings: P, τm; larger rings: Q, φ₂. */
  readonly series: SeriesBuckets;
  private readonly values: Float64Array;

  constructor(readonly size: number, readonly maxAmplitudeDeg: number) {
    const binning = size === 6 ? SERIES_BINNING[6] : size === 5 ? SERIES_BINNING[5](maxAmplitudeDeg) : SERIES_BINNING.other;
    this.series = new SeriesBuckets(binning.length, SERIES_BUCKETS, SHAPE_ORDER.length, binning);
    this.values = new Float64Array(binning.length);
  }

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
      const defined = v.thetaDeg >= PHI_THETA_MIN && v.thetaDeg <= 180 - PHI_THETA_MIN;
      out[0] = planar ? NaN : v.thetaDeg;
      out[1] = defined ? phi : NaN;
      out[2] = defined ? NaN : phi;
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
