/**
 * True orthographic view of a ring of any size and shape with its substituent bonds, in the ring's own frame
 * (docs/methods.md#chair-drawing [D]): n = Cremer–Pople normal, h = from the centroid toward the midpoint of the bond between
 * reference atoms 1 and 2, viewer on the +n side at the given elevation. Nothing is idealised.
 */
import { atomPosition, type Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { add, distance, scale, sub } from '../../geometry/vec3.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import { checkElevation, projectPoint, ringViewFrame, type ViewPoint } from './ringView.js';
import { DEFAULT_ELEVATION_DEG, type PlacedBond, type RingHydrogens, type RingPlacement } from './ringPlacement.js';
import { drawnSubstituents } from './ringHydrogens.js';

/** Options of {@link ringProjection}. */
export interface RingProjectionOptions {
  /** Viewer elevation above the mean plane, degrees (0 = edge-on, 90 = straight down +n). Default 20. */
  readonly elevationDeg?: number;
  /** Ring hydrogens drawn: `all`, `stereo` or `none`. Default `stereo`. */
  readonly hydrogens?: RingHydrogens;
}

/**
 * Projected placement of `ring` (from `analyzeRing`) and its substituents (atoms 0-based, screen in Å).
 * @example ringProjection(analyzeRing(mol, graph, ring), mol, { elevationDeg: 30 })
 */
export function ringProjection(ring: RingAnalysis, mol: Pick<Molecule, 'atoms' | 'coords'>, options: RingProjectionOptions = {}): RingPlacement {
  const { elevationDeg = DEFAULT_ELEVATION_DEG, hydrogens = 'stereo' } = options;
  checkElevation(elevationDeg);
  const pos = (a: number) => atomPosition(mol, a);
  const [a1, a2] = [ring.atoms[0]!, ring.atoms[1]!];
  const mid = scale(add(pos(a1), pos(a2)), 0.5);
  const frame = ringViewFrame(ring.centre, ring.normal, sub(mid, ring.centre), elevationDeg);
  if (!frame) throw usageError('degenerate-ring', 'the ring has no in-plane direction to view it along');
  const points = new Map<number, ViewPoint>();
  for (const a of ring.atoms) points.set(a, projectPoint(frame, pos(a)));
  const n = ring.atoms.length;
  const bonds: PlacedBond[] = ring.atoms.map((a, j) => ({ atoms: [a, ring.atoms[(j + 1) % n]!], role: 'ring-bond' }));
  for (const x of drawnSubstituents(ring.substituents, mol, hydrogens)) {
    if (!points.has(x.atom)) points.set(x.atom, projectPoint(frame, pos(x.atom)));
    bonds.push({ atoms: [x.ringAtom, x.atom], role: x.position ?? 'substituent-bond' });
  }
  const unitLength = ring.atoms.reduce((s, a, j) => s + distance(pos(a), pos(ring.atoms[(j + 1) % n]!)), 0) / n;
  return { view: 'projected', ring: ring.atoms, points, bonds, unitLength, elevationDeg };
}
