/** The public API of conformark: explicit named exports only. The CLI uses nothing else. */
export const VERSION = '0.1.0';

export type { Atom, Bond, Molecule, RecordSource, FormatName, Vec3 } from './model/molecule.js';
export { atomPosition } from './model/molecule.js';
export { ConformarkError, ParseError, formatIssue, usageError } from './model/errors.js';
export type { Issue, Warning } from './model/errors.js';
export { elementInfo, elementByNumber, atomicMass } from './model/elements.js';
export type { ElementInfo } from './model/elements.js';
export { torsion, torsionRad } from './geometry/torsion.js';
export { klynePrelog, torsionRelation } from './geometry/klynePrelog.js';
export type { KlynePrelog, TorsionRelation } from './geometry/klynePrelog.js';
export { wrap180, wrap360 } from './geometry/vec3.js';
export { writeAtomic, protectInput } from './io/writeAtomic.js';
export { buildGraph } from './perceive/graph.js';
export type { Graph } from './perceive/graph.js';
export {
  cremerPople,
  meanPlane,
  displacementsFromModes,
  sixRingModes,
  ringFromDisplacements,
  PHASE_THRESHOLD,
} from './geometry/cremerPople.js';
export type { Puckering, PuckeringMode } from './geometry/cremerPople.js';
// perceive (area B): bonds from coordinates, rings, selections
export { perceiveBonds, BOND_TOLERANCE_A, MIN_BOND_LENGTH_A } from './perceive/perceiveBonds.js';
export type { PerceiveBondsOptions } from './perceive/perceiveBonds.js';
export { withBonds } from './perceive/withBonds.js';
export { findRings, canonicalRing } from './perceive/findRings.js';
export { ringSystems } from './perceive/ringSystems.js';
export type { RingSystem } from './perceive/ringSystems.js';
export { atomIndex } from './perceive/atomIndex.js';
export { bondSelection, bondListSelection } from './perceive/bondSelection.js';
export { ringSelection } from './perceive/ringSelection.js';
