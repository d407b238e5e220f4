/**
 * Plain Karplus equations for vicinal ³J(H,H) from the H–C–C–H torsion (docs/methods.md#karplus). Both forms are even
 * in the torsion, so its sign does not matter. Used when the caller asks for them instead of the default
 * Haasnoot–de Leeuw–Altona equation (haasnoot.ts).
 */
import { RAD } from '../geometry/vec3.js';

/** One named Karplus form. */
export interface KarplusForm {
  /** Citation of the form, for reports. */
  readonly source: string;
  /** ³J in Hz from the H–C–C–H torsion in degrees. */
  readonly jHz: (torsionDeg: number) => number;
}

/**
 * Karplus 1959 (J. Chem. Phys. 30, 11), two branches: 8.5 cos²φ − 0.28 Hz for |φ| ≤ 90, 9.5 cos²φ − 0.28 Hz
 * above (docs/methods.md#karplus).
 */
function karplus1959(torsionDeg: number): number {
  const c = Math.cos(torsionDeg * RAD);
  const a = Math.abs(torsionDeg % 360);
  const near = a <= 90 || a >= 270;
  return (near ? 8.5 : 9.5) * c * c - 0.28;
}

/**
 * Karplus 1963 (J. Am. Chem. Soc. 85, 2870): A + B cos φ + C cos 2φ with A = 7, B = −1, C = 5 Hz.
 * The coefficients are from memory (docs/methods.md#karplus).
 */
function karplus1963(torsionDeg: number): number {
  const t = torsionDeg * RAD;
  return 7 - Math.cos(t) + 5 * Math.cos(2 * t);
}

/** Registry of the plain Karplus forms; the key is the `method` string reported with each coupling. */
export const KARPLUS_FORMS = new Map([
  ['karplus-1959', { source: 'Karplus 1959, J. Chem. Phys. 30, 11', jHz: karplus1959 }],
  ['karplus-1963', { source: 'Karplus 1963, J. Am. Chem. Soc. 85, 2870 (coefficients from memory)', jHz: karplus1963 }],
] as const satisfies readonly (readonly [string, KarplusForm])[]);

/** Names of the plain Karplus forms (`karplus-1959`, `karplus-1963`). */
export type KarplusMethod = typeof KARPLUS_FORMS extends Map<infer K, unknown> ? K : never;

/**
 * ³J(H,H) in Hz from a plain Karplus form.
 * @example karplusJ(180, 'karplus-1959') // 9.22
 */
export function karplusJ(torsionDeg: number, method: KarplusMethod): number {
  const form = KARPLUS_FORMS.get(method);
  if (!form) throw new RangeError(`unknown Karplus form ${String(method)}`);
  return form.jHz(torsionDeg);
}
