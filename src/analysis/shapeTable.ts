/**
 * Ring shape lookup for many frames of one ring: the canonical points of `SIX_RING_FORMS` / `FIVE_RING_FORMS`
 * as unit vectors and their descriptors in the ring's locants are computed once; each frame then costs one
 * dot product per form. Seven- and eight-rings use the named forms of `MEDIUM_RING_FORMS` with every
 * renumbering unrolled once, so a frame costs one short dot product per form and renumbering. Same rules and
 * defaults as `classifyRing` (nearest form by great-circle distance, `planar` below the amplitude threshold,
 * `puckered` beyond `distortedDeg`).
 */
import { formDescriptor, type DescriptorParts } from './ringDescriptor.js';
import { FIVE_RING_FORMS, SIX_RING_FORMS, type CanonicalForm, type RingShape } from './ringForms.js';
import { MEDIUM_RING_FORMS } from './mediumRingForms.js';
import type { RingShapeOptions } from './ringShape.js';

const RAD = Math.PI / 180;

/** Index returned by `ShapeTable.classify` for a planar ring. */
export const PLANAR_FORM = -1;
/** Index returned by `ShapeTable.classify` for a ring far from every named form (or of a size without names). */
export const PUCKERED_FORM = -2;

/**
 * Canonical forms of one ring size in one ring's locants.
 * @example const t = new ShapeTable(['1','2','3','4','5','6']); t.shapeOf(t.classify(0.55, 0.02, 3, 40)) // 'chair'
 */
export class ShapeTable {
  /** Canonical forms of five- and six-rings (empty for other sizes). */
  readonly forms: readonly CanonicalForm[];
  /** Shape word of every index `classify` can return (the five/six-ring forms, or the medium-ring forms). */
  readonly shapes: readonly RingShape[];
  /** Descriptor of each index in these locants (null for screw-boats and medium rings). */
  readonly descriptors: readonly (string | null)[];
  /** Descriptor parts of each form, for typesetting (null for screw-boats). */
  readonly parts: readonly (DescriptorParts | null)[];
  private readonly ux: Float64Array;
  private readonly uy: Float64Array;
  private readonly uz: Float64Array;
  private readonly planarA: number;
  private readonly minCos: number;
  /** Medium rings: per form, its unit pattern under every start and direction, `2n` rows of `n`. */
  private readonly unrolled: readonly Float64Array[];

  constructor(readonly locants: readonly string[], options: RingShapeOptions = {}) {
    const n = locants.length;
    this.forms = n === 6 ? SIX_RING_FORMS : n === 5 ? FIVE_RING_FORMS : [];
    const medium = MEDIUM_RING_FORMS.filter((f) => f.size === n);
    this.unrolled = medium.map((f) => {
      const rows = new Float64Array(2 * n * n);
      let o = 0;
      for (let s = 0; s < n; s++) {
        for (const dir of [1, -1]) for (let j = 0; j < n; j++) rows[o++] = f.z[(((s + dir * j) % n) + n) % n]!;
      }
      return rows;
    });
    this.shapes = this.forms.length > 0 ? this.forms.map((f) => f.shape) : medium.map((f) => f.shape);
    const described = this.forms.map((f) => formDescriptor(f, locants));
    this.descriptors = this.forms.length > 0 ? described.map((d) => d?.text ?? null) : medium.map(() => null);
    this.parts = this.forms.length > 0 ? described.map((d) => d?.parts ?? null) : medium.map(() => null);
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
   * Index into `shapes` of the nearest named form, or `PLANAR_FORM` / `PUCKERED_FORM`. `thetaDeg` is
   * ignored for five-rings; `phaseDeg` is the raw φ2 (used even where it is withheld from reports). Seven- and
   * eight-rings are named from `displacements`, the Cremer–Pople displacements in ring order (PuckerKernel.displacements);
   * without it they are `PUCKERED_FORM`.
   */
  classify(Q: number, q2: number, thetaDeg: number, phaseDeg: number, displacements?: ArrayLike<number>): number {
    const n = this.locants.length;
    const amplitude = n === 5 ? q2 : Q;
    if (!(amplitude >= this.planarA)) return PLANAR_FORM;
    if (this.unrolled.length > 0) return displacements ? this.classifyMedium(Q, displacements) : PUCKERED_FORM;
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

  /** Largest |cos| between the ring's unit pattern and any renumbering or mirror image of each form. */
  private classifyMedium(Q: number, z: ArrayLike<number>): number {
    const n = this.locants.length;
    let best = -1;
    let at = 0;
    this.unrolled.forEach((rows, f) => {
      for (let o = 0; o < rows.length; o += n) {
        let d = 0;
        for (let j = 0; j < n; j++) d += z[j]! * rows[o + j]!;
        d = Math.abs(d);
        if (d > best) {
          best = d;
          at = f;
        }
      }
    });
    return best / Q < this.minCos ? PUCKERED_FORM : at;
  }

  /** Shape word of a `classify` result. */
  shapeOf(index: number): RingShape {
    if (index === PLANAR_FORM) return 'planar';
    if (index === PUCKERED_FORM) return 'puckered';
    return this.shapes[index]!;
  }

  /** Descriptor of a `classify` result, or null. */
  descriptorOf(index: number): string | null {
    return index >= 0 ? this.descriptors[index]! : null;
  }
}
