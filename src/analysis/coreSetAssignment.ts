/**
 * Transition-based (core-set) assignment of a stream of ring forms: a frame inside the core of a form (within
 * the core radius of its canonical point) commits the ring to that form; a frame outside every core keeps the
 * form last committed to (Buchete & Hummer 2008, J. Phys. Chem. B 112, 6057). A transition is then a change
 * of committed form, so thermal flicker across a boundary between cores is not counted. Ring inversions are
 * the changes of committed chair: the ring, last in the core of one chair, enters the core of the other,
 * whatever it visited between.
 */

/** Default core radii, degrees on the Cremer–Pople sphere (five-rings: of phase on the wheel). */
export const CORE_RADIUS_DEG: Readonly<Record<number, number>> = {
  // half the closest spacing of canonical forms, less a margin, so that cores never touch: six-rings 24°
  // (envelope to half-chair), five-rings 18° (envelope to twist); common practice, no source
  5: 6,
  6: 10,
  7: 10,
  8: 10,
};

/**
 * Follows the committed form of one ring.
 * @example const a = new CoreSetAssignment(Math.cos(10 * Math.PI / 180), new Set([0, 1])); a.next(0, 1); a.next(1, 0.5) // 0: outside the core of 1
 */
export class CoreSetAssignment {
  /** Committed form index, or -1 before the first core was entered. */
  committed = -1;
  /** Frames seen before the first core was entered. */
  unassigned = 0;
  /** Changes of committed chair. */
  inversions = 0;
  private lastChair = -1;

  /**
   * @param coreCos cosine of the core radius
   * @param chairs form indices of the chairs (empty where there are none)
   */
  constructor(
    private readonly coreCos: number,
    private readonly chairs: ReadonlySet<number>,
  ) {}

  /** The committed form after a frame whose nearest form is `form` (negative: none) at cosine `cos`. */
  next(form: number, cos: number): number {
    if (form >= 0 && cos >= this.coreCos && form !== this.committed) {
      this.committed = form;
      if (this.chairs.has(form)) {
        if (this.lastChair >= 0 && this.lastChair !== form) this.inversions++;
        this.lastChair = form;
      }
    }
    if (this.committed < 0) this.unassigned++;
    return this.committed;
  }
}
