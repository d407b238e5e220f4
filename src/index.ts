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
// build (area F): SD writer and 3D conformers from SMILES
export { formatSdf } from './io/writeSdf.js';
export type { SdfOptions } from './io/writeSdf.js';
export { buildConformers, BUILD_ENERGY_FIELD } from './api/build.js';
export type { BuildOptions, BuildResult } from './api/build.js';
