/**
 * The canonical ring forms on the Cremer–Pople sphere (six-rings) and circle (five-rings), with the reference
 * planes that name them (docs/methods.md#six-ring-forms, docs/methods.md#five-ring-forms, derived).
 *
 * Six-rings: 2 C + 6 B + 6 S + 12 H + 12 E (the 38 IUPAC forms) plus the 12 screw-boats. Each form's ideal
 * displacements come from the inverse Cremer–Pople formula on a regular-hexagon projection; its reference planes
 * are found by testing every 5- and 4-atom subset for coplanarity, and each plane is typed by the exoplanar
 * atoms (docs/methods.md#six-ring-forms): 5 in plane → E; two 1,4-related atoms on opposite sides → C, same side → B; 1,3-related →
 * S; adjacent pair on opposite sides → H, same side → screw-boat.
 * Five-rings: envelopes at φ2 = 36k (flap j = k mod 5 + 1, above for even k) and twists at 18 + 36k taking the
 * flaps of the two neighbouring envelopes (docs/methods.md#five-ring-forms).
 */
import { displacementsFromModes, ringFromDisplacements, sixRingModes } from '../geometry/cremerPople.js';
import { cross, dot, sub, unit, DEG } from '../geometry/vec3.js';
import type { Vec3 } from '../model/molecule.js';
import type { MediumRingShape } from './mediumRingForms.js';

/** Ring shape words (README.md "JSON documents", `shape`). */
export type RingShape =
  | 'chair'
  | 'boat'
  | 'twist-boat'
  | 'half-chair'
  | 'envelope'
  | 'screw-boat'
  | 'twist'
  | 'planar'
  | 'puckered'
  | Exclude<MediumRingShape, 'chair' | 'boat' | 'twist-boat'>;

/** IUPAC ring-form letters (JCBN 1980); screw-boats have none. */
export type FormLetter = 'C' | 'B' | 'S' | 'H' | 'E' | 'T';

/** One choice of reference plane: the exoplanar ring positions (0-based j) above and below it (+n side). */
export interface ReferencePlane {
  readonly above: readonly number[];
  readonly below: readonly number[];
}

/** A canonical ring form. */
export interface CanonicalForm {
  readonly size: 5 | 6;
  readonly shape: RingShape;
  readonly letter: FormLetter | null;
  /** Polar angle θ (deg) for six-rings; null for five-rings. */
  readonly thetaDeg: number | null;
  /** φ (six-rings) or φ2 (five-rings), deg; 0 at the chair poles. */
  readonly phiDeg: number;
  /** Every valid reference plane (two or three for chairs and skews, one otherwise). */
  readonly planes: readonly ReferencePlane[];
  /** Ideal displacements z_j for unit amplitude. */
  readonly z: readonly number[];
}

/** Ideal polar angles (deg) of half-chairs, envelopes and screw-boats (docs/methods.md#six-ring-forms, derived). */
export const THETA_HALF_CHAIR = Math.atan(Math.sqrt(6) / 2) * DEG;
export const THETA_ENVELOPE = Math.atan(Math.SQRT2) * DEG;
export const THETA_SCREW_BOAT = Math.atan(Math.sqrt(6)) * DEG;

const COPLANAR_EPS = 1e-9;

/** Signed distances of `others` from the plane through `pts` (assumed coplanar), normal oriented toward +z. */
function planeSides(pts: Vec3[], others: Vec3[]): number[] | null {
  const [a, b, c] = pts;
  let nrm: Vec3 | null = null;
  for (const c2 of pts.slice(2)) {
    nrm = unit(cross(sub(b!, a!), sub(c2, a!)));
    if (nrm) break;
  }
  if (!nrm || !c) return null;
  if (nrm[2] < 0) nrm = [-nrm[0], -nrm[1], -nrm[2]];
  const n = nrm;
  if (pts.some((p) => Math.abs(dot(sub(p, a!), n)) > COPLANAR_EPS)) return null;
  return others.map((p) => dot(sub(p, a!), n));
}

/** Every k-element subset of 0…n−1, each ascending, in lexicographic order. */
function subsets(n: number, k: number, from = 0): number[][] {
  if (k === 0) return [[]];
  const out: number[][] = [];
  for (let i = from; i <= n - k; i++) for (const rest of subsets(n, k - 1, i + 1)) out.push([i, ...rest]);
  return out;
}

/** The letter that a two-atom exoplanar pair gives (six-ring), or null for an unusable plane. */
function pairLetter(i: number, k: number, sameSide: boolean): FormLetter | 'screw' | null {
  const d = Math.min(Math.abs(i - k), 6 - Math.abs(i - k));
  if (d === 3) return sameSide ? 'B' : 'C';
  if (d === 2) return sameSide ? null : 'S';
  return sameSide ? 'screw' : 'H';
}

/** Reference planes of the requested type for ideal six-ring displacements `z`. */
function sixRingPlanes(z: readonly number[], want: FormLetter | 'screw'): ReferencePlane[] {
  const pts = ringFromDisplacements(z, 1);
  const planes: ReferencePlane[] = [];
  const split = (out: number[], d: number[]) => ({
    above: out.filter((_, i) => d[i]! > COPLANAR_EPS),
    below: out.filter((_, i) => d[i]! < -COPLANAR_EPS),
  });
  const size = want === 'E' ? 5 : 4;
  for (const inPlane of subsets(6, size)) {
    const out = [0, 1, 2, 3, 4, 5].filter((j) => !inPlane.includes(j));
    const d = planeSides(inPlane.map((j) => pts[j]!), out.map((j) => pts[j]!));
    if (!d || d.some((v) => Math.abs(v) <= COPLANAR_EPS)) continue;
    if (want !== 'E') {
      const letter = pairLetter(out[0]!, out[1]!, Math.sign(d[0]!) === Math.sign(d[1]!));
      if (letter !== want) continue;
    }
    planes.push(split(out, d));
  }
  return planes;
}

function sixRingForm(shape: RingShape, letter: FormLetter | null, thetaDeg: number, phiDeg: number): CanonicalForm {
  const z = displacementsFromModes(6, sixRingModes(1, thetaDeg, phiDeg));
  const planes = letter === null && shape === 'screw-boat' ? sixRingPlanes(z, 'screw') : sixRingPlanes(z, letter!);
  return { size: 6, shape, letter, thetaDeg, phiDeg, planes, z };
}

function buildSixRingForms(): CanonicalForm[] {
  const forms = [sixRingForm('chair', 'C', 0, 0), sixRingForm('chair', 'C', 180, 0)];
  for (let k = 0; k < 12; k++) {
    const phi = 30 * k;
    if (k % 2 === 0) {
      forms.push(sixRingForm('envelope', 'E', THETA_ENVELOPE, phi));
      forms.push(sixRingForm('boat', 'B', 90, phi));
      forms.push(sixRingForm('envelope', 'E', 180 - THETA_ENVELOPE, phi));
    } else {
      forms.push(sixRingForm('half-chair', 'H', THETA_HALF_CHAIR, phi));
      forms.push(sixRingForm('screw-boat', null, THETA_SCREW_BOAT, phi));
      forms.push(sixRingForm('twist-boat', 'S', 90, phi));
      forms.push(sixRingForm('screw-boat', null, 180 - THETA_SCREW_BOAT, phi));
      forms.push(sixRingForm('half-chair', 'H', 180 - THETA_HALF_CHAIR, phi));
    }
  }
  return forms;
}

function buildFiveRingForms(): CanonicalForm[] {
  const flap = (k: number): ReferencePlane =>
    k % 2 === 0 ? { above: [k % 5], below: [] } : { above: [], below: [k % 5] };
  return Array.from({ length: 20 }, (_, i) => {
    const phiDeg = 18 * i;
    const z = displacementsFromModes(5, [{ m: 2, q: 1, phaseDeg: phiDeg }]);
    if (i % 2 === 0) {
      return { size: 5, shape: 'envelope', letter: 'E', thetaDeg: null, phiDeg, planes: [flap(i / 2)], z };
    }
    const a = flap((i - 1) / 2);
    const b = flap(((i + 1) / 2) % 10);
    const plane = { above: [...a.above, ...b.above], below: [...a.below, ...b.below] };
    return { size: 5, shape: 'twist', letter: 'T', thetaDeg: null, phiDeg, planes: [plane], z };
  });
}

/** The 50 canonical six-ring points (38 IUPAC forms + 12 screw-boats). */
export const SIX_RING_FORMS: readonly CanonicalForm[] = buildSixRingForms();
/** The 20 canonical five-ring points (10 E + 10 T). */
export const FIVE_RING_FORMS: readonly CanonicalForm[] = buildFiveRingForms();
