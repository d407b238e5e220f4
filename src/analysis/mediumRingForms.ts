/**
 * Named forms of seven- and eight-membered rings on the Cremer–Pople hypersphere (docs/methods.md#medium-rings).
 * Names and symmetries after Hendrickson 1967 (J. Am. Chem. Soc. 89, 7036 for cycloheptane, 7047 for cyclooctane;
 * from memory). Each form is stored as its unit displacement pattern z/Q in ring order (Σz² = Q², so the pattern
 * is a point on the unit sphere of Cremer–Pople space); a measured ring is compared with every renumbering
 * (start, direction) and the mirror image of each form, and the angle between the two unit vectors is its
 * distance, the analogue of the six-ring great-circle distance.
 *
 * Seven-rings (derived, scripts/fixtures/medium-ring-forms.mjs): rings with every bond 1.54 Å and every angle
 * 115° with the form's symmetry imposed through atom 1 — chair and boat a mirror plane, twist-chair and
 * twist-boat a two-fold axis. The chair family mixes q2 and q3 (q2/Q ≈ 0.65); the boat family is nearly pure q2.
 * Eight-rings: crown (D4d) is the pure q4 mode, boat-boat and twist-boat (D2d) pure q2 modes (fixed by
 * symmetry, derived); boat-chair (Cs), twist-boat-chair (C2) and twist-chair-chair (D2) are the MMFF94s minima
 * of cyclooctane from conformark's own build, printed by the same script.
 */

/** Shape words of the named seven- and eight-ring forms. */
export type MediumRingShape =
  | 'chair'
  | 'twist-chair'
  | 'boat'
  | 'twist-boat'
  | 'crown'
  | 'boat-chair'
  | 'twist-boat-chair'
  | 'twist-chair-chair'
  | 'boat-boat';

/** One named form: ring size and unit displacement pattern z/Q, atoms 1…N. */
export interface MediumRingForm {
  readonly size: 7 | 8;
  readonly shape: MediumRingShape;
  readonly z: readonly number[];
}

const S8 = Math.SQRT1_2 / 2; // 1/√8
const pureMode = (m: number, phaseDeg: number): number[] => {
  const z = Array.from({ length: 8 }, (_, j) => Math.cos(((phaseDeg + (360 * m * j) / 8) * Math.PI) / 180));
  const q = Math.hypot(...z);
  return z.map((v) => v / q);
};

const RAW: readonly MediumRingForm[] = [
  { size: 7, shape: 'chair', z: [-0.0567, 0.2875, -0.5667, 0.3075, 0.3075, -0.5667, 0.2875] },
  { size: 7, shape: 'twist-chair', z: [0, 0.5175, -0.4673, 0.1175, -0.1175, 0.4673, -0.5175] },
  { size: 7, shape: 'boat', z: [-0.5284, 0.1134, 0.4854, -0.3346, -0.3346, 0.4854, 0.1134] },
  { size: 7, shape: 'twist-boat', z: [0, 0.5183, -0.2269, -0.4241, 0.4241, 0.2269, -0.5183] },
  { size: 8, shape: 'crown', z: [S8, -S8, S8, -S8, S8, -S8, S8, -S8] },
  { size: 8, shape: 'boat-boat', z: pureMode(2, 45) },
  { size: 8, shape: 'twist-boat', z: pureMode(2, 0) },
  { size: 8, shape: 'boat-chair', z: [0.0749, 0.5106, -0.2764, -0.0608, -0.2764, 0.5106, 0.0749, -0.5575] },
  { size: 8, shape: 'twist-boat-chair', z: [-0.1524, -0.4872, 0.4872, 0.1524, -0.4415, 0.2108, -0.2108, 0.4415] },
  { size: 8, shape: 'twist-chair-chair', z: [0.462, -0.1912, 0.1912, -0.462, 0.462, -0.1912, 0.1912, -0.462] },
];

/** The named forms, each pattern normalised to unit length. */
export const MEDIUM_RING_FORMS: readonly MediumRingForm[] = RAW.map((f) => {
  const q = Math.hypot(...f.z);
  return { ...f, z: f.z.map((v) => v / q) };
});

/** A named form and its angular distance (deg) from the measured ring. */
export interface MediumFormDistance {
  readonly form: MediumRingForm;
  readonly distanceDeg: number;
}

/** Largest cos of the angle between `u` and any renumbering or mirror image of `z`. */
function bestCos(u: readonly number[], z: readonly number[]): number {
  const n = z.length;
  let best = -1;
  for (let s = 0; s < n; s++) {
    for (const dir of [1, -1]) {
      let d = 0;
      for (let j = 0; j < n; j++) d += u[j]! * z[(((s + dir * j) % n) + n) % n]!;
      best = Math.max(best, Math.abs(d)); // |d|: the mirror image (z → −z) of the same form
    }
  }
  return best;
}

/**
 * The named forms of a ring's size, nearest first, from its Cremer–Pople displacements `z` (ring order, Å).
 * Empty for other sizes or a flat ring.
 * @example mediumRingForms(cremerPople(cycloheptane)!.z)[0]!.form.shape // 'twist-chair'
 */
export function mediumRingForms(z: readonly number[]): MediumFormDistance[] {
  const q = Math.hypot(...z);
  if (!(q > 0)) return [];
  const u = z.map((v) => v / q);
  return MEDIUM_RING_FORMS.filter((f) => f.size === z.length)
    .map((form) => ({ form, distanceDeg: (Math.acos(Math.min(1, bestCos(u, form.z))) * 180) / Math.PI }))
    .sort((a, b) => a.distanceDeg - b.distanceDeg);
}
