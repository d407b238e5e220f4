/**
 * Ring shape lookup for many frames of one ring: the canonical points of `SIX_RING_FORMS` / `FIVE_RING_FORMS`
 * as unit vectors and their descriptors in the ring's locants are computed once; each frame then costs one
 * dot product per form. Same rules and defaults as `classifyRing` (nearest form by great-circle distance,
 * `planar` below the amplitude threshold, `puckered` beyond `distortedDeg`).
 */
import { formDescriptor, type DescriptorParts } from './ringDescriptor.js';
import { FIVE_RING_FORMS, SIX_RING_FORMS, type CanonicalForm, type RingShape } from './ringForms.js';
import type { RingShapeOptions } from './ringShape.js';

const RAD = Math.PI / 180;

/** Index returned by `ShapeTable.classify` for a planar ring. */
export const PLANAR_FORM = -1;
/** Index returned by `ShapeTable.classify` for a ring far from every canonical form (or of another size). */
export const PUCKERED_FORM = -2;

/**
 * Canonical forms of one ring size in one ring's locants.
 * @example const t = new ShapeTable(['1','2','3','4','5','6']); t.shapeOf(t.classify(0.55, 0.02, 3, 40)) // 'chair'
 */
export class ShapeTable {
  readonly forms: readonly CanonicalForm[];
  /** Descriptor of each form in these locants (null for screw-boats). */
  readonly descriptors: readonly (string | null)[];
  /** Descriptor parts of each form, for typesetting (null for screw-boats). */
  readonly parts: readonly (DescriptorParts | null)[];
  private readonly ux: Float64Array;
  private readonly uy: Float64Array;
  private readonly uz: Float64Array;
  private readonly planarA: number;
  private readonly minCos: number;

  constructor(readonly locants: readonly string[], options: RingShapeOptions = {}) {
    const n = locants.length;
    this.forms = n === 6 ? SIX_RING_FORMS : n === 5 ? FIVE_RING_FORMS : [];
    const described = this.forms.map((f) => formDescriptor(f, locants));
    this.descriptors = described.map((d) => d?.text ?? null);
    this.parts = described.map((d) => d?.parts ?? null);
    const k = this.forms.length;
    this.ux = new Float64Array(k);
    this.uy = new Float64Array(k);
    this.uz = new Float64Array(k);
    this.forms.forEach((f, i) => {
      const t = (f.thetaDeg ?? 90) * RAD;
      const p = f.phiDeg * RAD;
      this.ux[i] = Math.sin(t) * Math.cos(p);
      this.uy[i] = Math.sin(t) * Math.sin(p);
      this.uz[i] = Math.cos(t);
    });
    this.planarA = options.planarThresholdA ?? 0.1;
    this.minCos = Math.cos((options.distortedDeg ?? 30) * RAD);
  }

  /**
   * Index into `forms` of the nearest canonical form, or `PLANAR_FORM` / `PUCKERED_FORM`. `thetaDeg` is
   * ignored for five-rings; `phaseDeg` is the raw φ2 (used even where it is withheld from reports).
   */
  classify(Q: number, q2: number, thetaDeg: number, phaseDeg: number): number {
    const n = this.locants.length;
    const amplitude = n === 5 ? q2 : Q;
    if (!(amplitude >= this.planarA)) return PLANAR_FORM;
    const k = this.forms.length;
    if (k === 0) return PUCKERED_FORM;
    const p = phaseDeg * RAD;
    const t = n === 5 ? Math.PI / 2 : thetaDeg * RAD;
    const st = Math.sin(t);
    const x = st * Math.cos(p), y = st * Math.sin(p), z = Math.cos(t);
    let best = -2;
    let at = 0;
    for (let i = 0; i < k; i++) {
      const d = x * this.ux[i]! + y * this.uy[i]! + z * this.uz[i]!;
      if (d > best) {
        best = d;
        at = i;
      }
    }
    return best < this.minCos ? PUCKERED_FORM : at;
  }

  /** Shape word of a `classify` result. */
  shapeOf(index: number): RingShape {
    if (index === PLANAR_FORM) return 'planar';
    if (index === PUCKERED_FORM) return 'puckered';
    return this.forms[index]!.shape;
  }

  /** Descriptor of a `classify` result, or null. */
  descriptorOf(index: number): string | null {
    return index >= 0 ? this.descriptors[index]! : null;
  }
}
