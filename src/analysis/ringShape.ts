/**
 * Ring shape and IUPAC ring-form descriptor from Cremer–Pople coordinates (docs/methods.md#shape-assignment, docs/methods.md#five-ring-forms; acceptance
 * windows and planarity thresholds are common practice, no source).
 *
 * Six-rings: nearest canonical point (SIX_RING_FORMS) by great-circle distance on the unit sphere,
 * cos d = cos θ cos θc + sin θ sin θc cos(φ − φc). Five-rings: nearest point on the φ2 circle. Then
 * d ≤ 20° → the form (`quality: 'close'`); 20° < d ≤ 30° → still the nearest form, flagged `distorted` with the
 * two nearest named; d > 30° → `puckered`, no descriptor. Q (six-rings) or q2 (five-rings) below
 * `planarThresholdA` → `planar`. Seven- and eight-rings: the nearest named form of `mediumRingForms`, same windows,
 * no descriptor. Other ring sizes are `planar` or `puckered`.
 */
import type { Puckering } from '../geometry/cremerPople.js';
import { DEG, RAD, wrap180 } from '../geometry/vec3.js';
import { formDescriptor, type DescriptorParts } from './ringDescriptor.js';
import { FIVE_RING_FORMS, SIX_RING_FORMS, type CanonicalForm, type RingShape } from './ringForms.js';
import { mediumRingForms } from './mediumRingForms.js';

/** Options of `classifyRing`. */
export interface RingShapeOptions {
  /** Amplitude (Å) below which a ring is `planar`: Q for six- and other rings, q2 for five-rings. Default 0.1. */
  readonly planarThresholdA?: number;
  /** Distance (deg) up to which the nearest form is reported plainly. Default 20. */
  readonly closeDeg?: number;
  /** Distance (deg) up to which the nearest form is reported as distorted; beyond it, `puckered`. Default 30. */
  readonly distortedDeg?: number;
}

/** A canonical form near the measured ring. */
export interface NearForm {
  readonly shape: RingShape;
  /** Descriptor in the ring's locants, or null (screw-boat). */
  readonly descriptor: string | null;
  readonly distanceDeg: number;
}

/** How well the ring matches its nearest canonical form. */
export interface FormFit {
  readonly quality: 'close' | 'distorted';
  readonly distanceDeg: number;
  /** The two nearest canonical forms, nearest first. */
  readonly nearest: readonly NearForm[];
}

/** Shape classification of one ring. */
export interface RingClassification {
  readonly shape: RingShape;
  readonly descriptor: string | null;
  readonly descriptorParts: DescriptorParts | null;
  readonly descriptorHtml: string | null;
  /** The canonical form assigned (null for planar, puckered and other sizes). */
  readonly form: CanonicalForm | null;
  readonly fit: FormFit | null;
}

const NONE = { descriptor: null, descriptorParts: null, descriptorHtml: null, form: null, fit: null };

/** Angular distance (deg) between the measured ring and a canonical form. */
function formDistance(form: CanonicalForm, thetaDeg: number | null, phiDeg: number): number {
  if (form.size === 5) return Math.abs(wrap180(phiDeg - form.phiDeg));
  const t = thetaDeg! * RAD;
  const tc = form.thetaDeg! * RAD;
  const c = Math.cos(t) * Math.cos(tc) + Math.sin(t) * Math.sin(tc) * Math.cos((phiDeg - form.phiDeg) * RAD);
  return Math.acos(Math.min(1, Math.max(-1, c))) * DEG;
}

/**
 * Classifies a ring from its puckering; `locants` are the ring's reference locants (ringReference).
 * @example classifyRing(cremerPople(chair)!, ['O','1','2','3','4','5']).descriptor // '4C1'
 */
export function classifyRing(
  puckering: Puckering,
  locants: readonly string[],
  options: RingShapeOptions = {},
): RingClassification {
  const { planarThresholdA = 0.1, closeDeg = 20, distortedDeg = 30 } = options;
  const n = locants.length;
  const q2 = puckering.amplitudes[0]?.q ?? 0;
  const amplitude = n === 5 ? q2 : puckering.Q;
  if (amplitude < planarThresholdA) return { shape: 'planar', ...NONE };
  if (n === 7 || n === 8) return classifyMedium(puckering.z, closeDeg, distortedDeg);
  if (n !== 5 && n !== 6) return { shape: 'puckered', ...NONE };
  const forms = n === 6 ? SIX_RING_FORMS : FIVE_RING_FORMS;
  // The raw phase is used even where phiDeg is withheld (near the poles sin θ makes it irrelevant).
  const phase = puckering.amplitudes[0]?.phaseDeg ?? 0;
  const ranked = forms
    .map((form) => ({ form, d: formDistance(form, puckering.thetaDeg, phase) }))
    .sort((a, b) => a.d - b.d);
  const best = ranked[0]!;
  if (best.d > distortedDeg) return { shape: 'puckered', ...NONE };
  const nearest = ranked.slice(0, 2).map(({ form, d }) => ({
    shape: form.shape,
    descriptor: formDescriptor(form, locants)?.text ?? null,
    distanceDeg: d,
  }));
  const descriptor = formDescriptor(best.form, locants);
  return {
    shape: best.form.shape,
    descriptor: descriptor?.text ?? null,
    descriptorParts: descriptor?.parts ?? null,
    descriptorHtml: descriptor?.html ?? null,
    form: best.form,
    fit: { quality: best.d <= closeDeg ? 'close' : 'distorted', distanceDeg: best.d, nearest },
  };
}

/** Seven- and eight-rings: the nearest named form on the Cremer–Pople hypersphere, same windows (no descriptor). */
function classifyMedium(z: readonly number[], closeDeg: number, distortedDeg: number): RingClassification {
  const ranked = mediumRingForms(z);
  const best = ranked[0];
  if (!best || best.distanceDeg > distortedDeg) return { shape: 'puckered', ...NONE };
  const nearest = ranked.slice(0, 2).map(({ form, distanceDeg }) => ({ shape: form.shape, descriptor: null, distanceDeg }));
  return {
    shape: best.form.shape,
    ...NONE,
    fit: { quality: best.distanceDeg <= closeDeg ? 'close' : 'distorted', distanceDeg: best.distanceDeg, nearest },
  };
}
