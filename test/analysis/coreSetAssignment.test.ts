/**
 * Core-set assignment of trajectory frames (Buchete & Hummer 2008, J. Phys. Chem. B 112, 6057): a frame inside a
 * form's core commits the ring to it, a frame outside every core keeps the last committed form. The 10° core radius
 * is common practice, no source; the expected sequences below are derived by hand from that rule.
 */
import { describe, expect, it } from 'vitest';
import { CoreSetAssignment } from '../../src/analysis/coreSetAssignment.js';

const IN = 1, OUT = 0.5, CORE = Math.cos((10 * Math.PI) / 180);

describe('CoreSetAssignment', () => {
  it('next keeps the committed form while the frame is outside every core, and before any core is unassigned', () => {
    const a = new CoreSetAssignment(CORE, new Set());
    expect([a.next(2, OUT), a.next(2, IN), a.next(3, OUT), a.next(3, OUT), a.next(-2, -1), a.next(3, IN)]).toEqual([-1, 2, 2, 2, 2, 3]);
    expect(a.unassigned).toBe(1);
  });

  it('next counts an inversion only when the other chair core is entered, whatever lies between', () => {
    const a = new CoreSetAssignment(CORE, new Set([0, 1]));
    // chair 0, flicker out and back, a skew core, chair 1, back to chair 0 through a boat core
    for (const [f, c] of [[0, IN], [5, OUT], [0, IN], [7, IN], [1, OUT], [1, IN], [9, IN], [0, IN]] as const) a.next(f, c);
    expect(a.inversions).toBe(2);
  });
});
