/**
 * Altona–Sundaralingam pseudorotation of five-membered rings (Altona & Sundaralingam 1972, J. Am. Chem. Soc. 94,
 * 8205; phase formula as the mmCIF dictionary `_struct_mon_nucl.P` gives it), and the stable Fourier
 * (least-squares) rearrangement of the same model (METHODS.md §4.2, derived).
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
