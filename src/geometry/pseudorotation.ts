/**
 * Altona–Sundaralingam pseudorotation of five-membered rings (Altona & Sundaralingam 1972, J. Am. Chem. Soc. 94,
 * 8205; phase formula as the mmCIF dictionary `_struct_mon_nucl.P` gives it), and the Fourier rearrangement of
 * the same model (derived; see docs/methods.md#pseudorotation).
 *
 * Input: the five endocyclic torsions ν0…ν4 in degrees, where for a furanose ν0 = C4′–O4′–C1′–C2′,
 * ν1 = O4′–C1′–C2′–C3′, ν2 = C1′–C2′–C3′–C4′, ν3 = C2′–C3′–C4′–O4′, ν4 = C3′–C4′–O4′–C1′. For a ring in
 * reference order r1…r5 that is ν0 = (r5 r1 r2 r3), ν1 = (r1 r2 r3 r4), … ν4 = (r4 r5 r1 r2).
 * Model: ν_j = ν_max cos(P + 144°(j − 2)).
 */
import { DEG, RAD, wrap360 } from './vec3.js';

/** Pseudorotation phase P (deg, [0, 360)) and amplitude (deg). */
export interface Pseudorotation {
  readonly phaseDeg: number;
  /** τ_m (AS formula) or ν_max (Fourier form), degrees. */
  readonly amplitudeDeg: number;
}

/** How τm was obtained: ν2 / cos P, a least-squares fit of all five torsions at that P, or a blend of the two. */
export type AmplitudeMethod = 'closed-form' | 'least-squares' | 'blended';

/** The Altona–Sundaralingam phase with its amplitude and how the amplitude was found. */
export interface AltonaSundaralingamFit extends Pseudorotation {
  readonly amplitudeMethod: AmplitudeMethod;
}

/**
 * |cos P| at and above which τm = ν2 / cos P is used, and at and below which the least-squares τm is used; in
 * between the two are blended linearly in |cos P| so τm has no jump (common practice, no source).
 */
export const CLOSED_FORM_MIN_COS = 0.3;
export const LEAST_SQUARES_MAX_COS = 0.2;

const SIN_SUM = Math.sin(36 * RAD) + Math.sin(72 * RAD);

function checkFive(nuDeg: readonly number[]): void {
  if (nuDeg.length !== 5 || nuDeg.some((v) => !Number.isFinite(v))) {
    throw new RangeError('pseudorotation needs five finite torsions ν0…ν4');
  }
}

/**
 * The Altona–Sundaralingam formula: tan P = [(ν4 + ν1) − (ν3 + ν0)] / [2 ν2 (sin 36° + sin 72°)], taken with
 * atan2 (which adds 180 when ν2 < 0), and τ_m = ν2 / cos P. Returns `null` when the ring is flat (all ν ≈ 0)
 * or when cos P ≈ 0 makes τ_m undefined (use `fourierPseudorotation` there).
 * @example altonaSundaralingam([-26.7, 46.3, -47.1, 33.4, -4.4]) // { phaseDeg ≈ 166.35, amplitudeDeg ≈ 48.47 }
 */
export function altonaSundaralingam(nuDeg: readonly number[]): Pseudorotation | null {
  checkFive(nuDeg);
  const [n0, n1, n2, n3, n4] = nuDeg as [number, number, number, number, number];
  const y = n4 + n1 - (n3 + n0);
  const x = 2 * n2 * SIN_SUM;
  if (Math.hypot(x, y) < 1e-9) return null;
  const p = Math.atan2(y, x);
  const c = Math.cos(p);
  if (Math.abs(c) < 1e-9) return null;
  return { phaseDeg: wrap360(p * DEG), amplitudeDeg: n2 / c };
}

/**
 * Fourier (least-squares) form of the same model, stable for every P:
 * A = Σ ν_j cos(144°(j−2)), B = −Σ ν_j sin(144°(j−2)), P = atan2(B, A), ν_max = (2/5)·√(A² + B²).
 * Returns `null` for a flat ring (all ν ≈ 0).
 * @example fourierPseudorotation([-26.7, 46.3, -47.1, 33.4, -4.4]) // { phaseDeg ≈ 166.64, amplitudeDeg ≈ 49.83 }
 */
export function fourierPseudorotation(nuDeg: readonly number[]): Pseudorotation | null {
  checkFive(nuDeg);
  let a = 0;
  let b = 0;
  nuDeg.forEach((v, j) => {
    const t = 144 * (j - 2) * RAD;
    a += v * Math.cos(t);
    b -= v * Math.sin(t);
  });
  const amp = 0.4 * Math.hypot(a, b);
  if (amp < 1e-9) return null;
  return { phaseDeg: wrap360(Math.atan2(b, a) * DEG), amplitudeDeg: amp };
}

/**
 * The least-squares amplitude at a given phase: the τm minimising Σ (ν_j − τm cos(P + 144°(j − 2)))², which is
 * (2/5) Σ ν_j cos(P + 144°(j − 2)) because the five cosines' squares always sum to 5/2.
 * @example leastSquaresAmplitude([-26.7, 46.3, -47.1, 33.4, -4.4], 166.35) // ≈ 49.8
 */
export function leastSquaresAmplitude(nuDeg: readonly number[], phaseDeg: number): number {
  checkFive(nuDeg);
  let sum = 0;
  nuDeg.forEach((v, j) => {
    sum += v * Math.cos((phaseDeg + 144 * (j - 2)) * RAD);
  });
  return 0.4 * sum;
}

/**
 * Weight of the closed-form τm for a phase with cosine `cosP` (1 where |cos P| ≥ 0.3, 0 where ≤ 0.2, linear
 * between).
 */
export function closedFormWeight(cosP: number): number {
  const c = Math.abs(cosP);
  if (c >= CLOSED_FORM_MIN_COS) return 1;
  if (c <= LEAST_SQUARES_MAX_COS) return 0;
  return (c - LEAST_SQUARES_MAX_COS) / (CLOSED_FORM_MIN_COS - LEAST_SQUARES_MAX_COS);
}

/**
 * P from the Altona–Sundaralingam closed form at every phase; τm from the closed form ν2 / cos P where |cos P| is
 * large, from the least-squares fit of all five torsions near P = 90° and 270° (where ν2 / cos P is 0 / 0), and a
 * linear blend between, so both P and τm are continuous. Returns `null` for a flat ring.
 * @example altonaSundaralingamFit([-26.7, 46.3, -47.1, 33.4, -4.4]) // { phaseDeg ≈ 166.35, amplitudeDeg ≈ 48.47, amplitudeMethod: 'closed-form' }
 */
export function altonaSundaralingamFit(nuDeg: readonly number[]): AltonaSundaralingamFit | null {
  checkFive(nuDeg);
  const [n0, n1, n2, n3, n4] = nuDeg as [number, number, number, number, number];
  const y = n4 + n1 - (n3 + n0);
  const x = 2 * n2 * SIN_SUM;
  if (Math.hypot(x, y) < 1e-9) return null;
  const p = Math.atan2(y, x);
  const phaseDeg = wrap360(p * DEG);
  const w = closedFormWeight(Math.cos(p));
  const fit = w < 1 ? leastSquaresAmplitude(nuDeg, phaseDeg) : 0;
  const closed = w > 0 ? n2 / Math.cos(p) : 0;
  const amplitudeMethod: AmplitudeMethod = w === 1 ? 'closed-form' : w === 0 ? 'least-squares' : 'blended';
  return { phaseDeg, amplitudeDeg: w * closed + (1 - w) * fit, amplitudeMethod };
}
