/**
 * Haasnoot, de Leeuw & Altona 1980 (Tetrahedron 36, 2783) generalised Karplus equation (docs/methods.md#haasnoot):
 *
 *   ³J = P1 cos²φ + P2 cos φ + P3 + Σ_i Δχ_i [P4 + P5 cos²(ξ_i φ + P6 |Δχ_i|)]
 *
 * φ is the H–C–C–H torsion; the sum runs over the non-hydrogen substituents of both coupled carbons (not the
 * coupled carbons themselves); Δχ_i is the Huggins electronegativity difference to H, reduced by the
 * β correction Δχ_i = Δχ_α − P7 Σ_β Δχ_β; ξ_i = ±1 is the orientation of the substituent (see
 * `substituentOrientation`). The equation's form is from memory; the parameter sets A–E are the paper's
 * (not re-checked against its printed table).
 */
import type { Vec3 } from '../model/molecule.js';
import { cross, dot, sub, RAD } from '../geometry/vec3.js';

/** One parameter set of the generalised equation (Hz, except P6 in degrees and P7 dimensionless). */
export interface HaasnootParameters {
  /** What the set is meant for. */
  readonly use: string;
  readonly p1: number;
  readonly p2: number;
  readonly p3: number;
  readonly p4: number;
  readonly p5: number;
  /** Degrees. */
  readonly p6: number;
  /** β-substituent factor; 0 for set A, which has no β correction. */
  readonly p7: number;
}

/** Parameter sets A–E (docs/methods.md#haasnoot table). */
export const HAASNOOT_SETS = new Map([
  ['a', { use: 'general, 6 parameters, no β correction', p1: 13.86, p2: -0.81, p3: 0, p4: 0.56, p5: -2.32, p6: 17.9, p7: 0 }],
  ['b', { use: 'general, with β correction', p1: 13.7, p2: -0.73, p3: 0, p4: 0.56, p5: -2.47, p6: 16.9, p7: 0.14 }],
  ['c', { use: 'fragments with 2 non-H substituents', p1: 13.89, p2: -0.98, p3: 0, p4: 1.02, p5: -3.4, p6: 14.9, p7: 0.24 }],
  ['d', { use: 'fragments with 3 non-H substituents', p1: 13.22, p2: -0.99, p3: 0, p4: 0.87, p5: -2.46, p6: 19.9, p7: 0 }],
  ['e', { use: 'fragments with 4 non-H substituents', p1: 13.24, p2: -0.91, p3: 0, p4: 0.53, p5: -2.41, p6: 15.5, p7: 0.19 }],
] as const satisfies readonly (readonly [string, HaasnootParameters])[]);

/** Names of the parameter sets: `a` … `e`. */
export type HaasnootSet = typeof HAASNOOT_SETS extends Map<infer K, unknown> ? K : never;

/** True when `name` is a parameter-set name. */
export function isHaasnootSet(name: string): name is HaasnootSet {
  return HAASNOOT_SETS.has(name as HaasnootSet);
}

/**
 * The set for a fragment with `count` non-H substituents: 2 → C, 3 → D, 4 or more → E (mapping from
 * memory of the paper; docs/methods.md#haasnoot). For 0 or 1 substituents we use set B,
 * the general set with the β correction, so that every automatic choice applies the β term the way sets C–E
 * do (our choice, common practice, no source). Set A stays available as an explicit choice.
 */
export function haasnootSetFor(count: number): HaasnootSet {
  if (count <= 1) return 'b';
  if (count === 2) return 'c';
  if (count === 3) return 'd';
  return 'e';
}

/** Huggins electronegativity of F used unless the caller says otherwise: 4.00 (from memory; F is not settled). */
export const FLUORINE_CHI_DEFAULT = 4.0;
/** The alternative value for F from memory of Huggins 1953: 3.90 (docs/methods.md#haasnoot; F is not settled). */
export const FLUORINE_CHI_ALTERNATIVE = 3.9;

/**
 * Huggins 1953 (J. Am. Chem. Soc. 75, 4123) electronegativities as docs/methods.md#haasnoot lists them (values from
 * memory; P 2.15).
 */
const HUGGINS: ReadonlyMap<string, number> = new Map([
  ['H', 2.2], ['C', 2.6], ['N', 3.05], ['O', 3.5], ['Si', 1.9], ['P', 2.15], ['S', 2.6], ['Cl', 3.15],
  ['Br', 2.95], ['I', 2.65],
]);

/**
 * Huggins electronegativity of an element symbol, or `undefined` when the table has no value.
 * @param fluorine χ(F) to use (Huggins scale); default `FLUORINE_CHI_DEFAULT` (4.00).
 * @example hugginsElectronegativity('O') // 3.5
 */
export function hugginsElectronegativity(element: string, fluorine = FLUORINE_CHI_DEFAULT): number | undefined {
  if (element === 'F') return fluorine;
  return HUGGINS.get(element);
}

/**
 * Orientation sign ξ of substituent `s` on carbon `carrier`, for the coupling of `h` (the proton on the same
 * carrier) with a proton on `partner` (docs/methods.md#haasnoot, rule pinned by physical behaviour [D]):
 * ξ = sign{[(h − carrier) × (s − carrier)] · (partner − carrier)}, i.e. +1 when, looking from the carrier
 * along the C–C bond, S lies clockwise (about +120°) from H. For a substituent on the other carbon pass that
 * carbon as `carrier`, its own proton as `h` and the first carbon as `partner`. Returns `null` when S, H and
 * the bond are coplanar (degenerate).
 */
export function substituentOrientation(h: Vec3, carrier: Vec3, partner: Vec3, s: Vec3): 1 | -1 | null {
  const v = dot(cross(sub(h, carrier), sub(s, carrier)), sub(partner, carrier));
  if (!Number.isFinite(v) || Math.abs(v) < 1e-9) return null;
  return v > 0 ? 1 : -1;
}

/** One substituent term of the generalised equation. */
export interface HaasnootTerm {
  /** Δχ after any β correction (Huggins scale, dimensionless). */
  readonly deltaChi: number;
  /** Orientation sign ξ. */
  readonly orientation: 1 | -1;
}

/**
 * ³J(H,H) in Hz from the generalised equation with parameter set `set`.
 * @example haasnootJ(180, [], 'a') // 14.67
 */
export function haasnootJ(torsionDeg: number, terms: readonly HaasnootTerm[], set: HaasnootSet): number {
  const p = HAASNOOT_SETS.get(set);
  if (!p) throw new RangeError(`unknown Haasnoot parameter set ${String(set)}`);
  const c = Math.cos(torsionDeg * RAD);
  let j = p.p1 * c * c + p.p2 * c + p.p3;
  for (const { deltaChi, orientation } of terms) {
    const k = Math.cos((orientation * torsionDeg + p.p6 * Math.abs(deltaChi)) * RAD);
    j += deltaChi * (p.p4 + p.p5 * k * k);
  }
  return j;
}
