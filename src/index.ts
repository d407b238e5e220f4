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
// io (area A): readers, format detection, energies, XYZ writer
export { parseText, parseTextSettled } from './io/parseText.js';
export type { ParseTextOptions } from './io/parseText.js';
export { readRecords, readRecordsSettled } from './io/readRecords.js';
export type { StreamOptions } from './io/readRecords.js';
export { readFrames } from './io/readFrames.js';
export type { Frame, FrameOptions } from './io/readFrames.js';
export type { Settled } from './io/sink.js';
export type { ReadOptions } from './io/limits.js';
export { DEFAULT_LIMITS } from './io/limits.js';
export { detectFormat, formatFromExtension } from './io/detectFormat.js';
export { findEnergy, toKcalPerMol, normalizeEnergyUnit } from './io/energy.js';
export type { Energy, EnergyUnit, EnergyOptions, FoundEnergy } from './io/energy.js';
export { formatXyz } from './io/formatXyz.js';
export type { FormatXyzOptions } from './io/formatXyz.js';
export { parseXyzComment } from './io/xyzComment.js';
