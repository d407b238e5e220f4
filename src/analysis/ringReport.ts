/** The README.md `rings[]` JSON entry of a ring analysis: 1-based atoms, the documented field names first. */
import type { RingAnalysis } from './ringAnalysis.js';

/** JSON-ready ring entry (`inspect --json` → `records[].rings[]`). */
export interface ReportRing {
  readonly id: number | null;
  readonly atoms: number[];
  readonly size: number;
  readonly puckering: RingAnalysis['puckering'];
  readonly shape: RingAnalysis['shape'];
  readonly descriptor: string | null;
  readonly torsions: { atoms: number[]; angleDeg: number | null }[];
  readonly substituents: {
    ringAtom: number;
    atom: number;
    element: string;
    position: string | null;
    face: 'top' | 'bottom' | null;
    angleToNormalDeg: number;
  }[];
  readonly referenceRule: string;
  readonly locants: readonly string[];
  readonly descriptorParts: RingAnalysis['descriptorParts'];
  readonly pseudorotation: RingAnalysis['pseudorotation'];
  readonly fit: RingAnalysis['fit'];
  readonly warnings: RingAnalysis['warnings'];
}

/**
 * Converts a `RingAnalysis` to its report form with 1-based atom numbers (no rounding: the writer rounds).
 * @example toReportRing(analyzeRing(mol, graph, [0, 1, 2, 3, 4, 5])).atoms // [1, 2, 3, 4, 5, 6]
 */
export function toReportRing(ring: RingAnalysis): ReportRing {
  const one = (a: number) => a + 1;
  return {
    id: ring.id ?? null,
    atoms: ring.atoms.map(one),
    size: ring.size,
    puckering: ring.puckering,
    shape: ring.shape,
    descriptor: ring.descriptor,
    torsions: ring.torsions.map((t) => ({ atoms: t.atoms.map(one), angleDeg: t.angleDeg })),
    substituents: ring.substituents.map((s) => ({
      ringAtom: one(s.ringAtom),
      atom: one(s.atom),
      element: s.element,
      position: s.position,
      face: s.face,
      angleToNormalDeg: s.angleToNormalDeg,
    })),
    referenceRule: ring.referenceRule,
    locants: ring.locants,
    descriptorParts: ring.descriptorParts,
    pseudorotation: ring.pseudorotation,
    fit: ring.fit,
    warnings: ring.warnings,
  };
}
