/**
 * The trade's chair drawing (METHODS.md §10.2) as the orthographic view of an ideal tetrahedral D3d chair in the
 * ring's own frame: opposite ring bonds parallel (centre of inversion), axial bonds along n and so vertical,
 * equatorial bonds exactly parallel to the ring bonds once removed (exact in the tetrahedral model [D]).
 *
 * The drawn displacement is stretched 1.25 times along n (DEPTH), which keeps every rule above.
 *
 * Placement from the measured ring, never typed in: ring atom j goes to an "up" vertex when its Cremer–Pople
 * displacement z_j > 0, else to a "down" vertex; the numbering keeps its clockwise-from-+n sense on screen (the
 * view is a proper rotation); the template is turned about n (never mirrored) so that reference atom 2 (C1 of a
 * pyranose) is (nearly) the right-hand tip. Each substituent takes the slot its measured position names (axial or
 * equatorial), an axial bond pointing to its measured face (top = up).
 */
import type { Molecule, Vec3 } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { add, scale, sub, unit, dot, RAD } from '../../geometry/vec3.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import type { RingSubstituent } from '../../analysis/substituents.js';
import { checkElevation, projectPoint, ringViewFrame, type ViewPoint } from './ringView.js';
import { type PlacedBond, type RingHydrogens, type RingPlacement } from './ringPlacement.js';

/** Options of {@link chairTemplate}. */
export interface ChairTemplateOptions {
  /** Viewer elevation above the mean plane, degrees. Default 26. */
  readonly elevationDeg?: number;
  /** Draw hydrogens on ring atoms. Default `show`. */
  readonly hydrogens?: RingHydrogens;
}

/** Ideal ring bond (Å) of the template; a tetrahedral chair has z = ±b/6 and projected radius b·2√2/3 [D]. */
const BOND = 1.54;
/**
 * Up/down displacement drawn 1.25 times the tetrahedral value, so the zig-zag reads at a glance; a stretch along
 * n keeps every parallel (and the axial bonds vertical) [common practice, no source].
 */
const DEPTH = 1.25;
/**
 * Default elevation of the template, degrees. Below about 16° (with DEPTH) the back edge sinks to the height of
 * the front edge and the two cross; 26° keeps the back edge clearly above the front one while both tips still
 * read as a peak and a trough (chosen by eye on rendered figures; common practice, no source).
 */
export const TEMPLATE_ELEVATION_DEG = 26;
/**
 * Turn of the template about n, degrees: at 0 the back and front atoms of each side share a column and their
 * axial bonds overlap; −6 separates them and keeps reference atom 2 the right-hand tip [common practice, no source].
 */
const TURN_DEG = -6;
const HEAVY_LENGTH = 0.9 * BOND;
const H_LENGTH = 0.75 * BOND;
/** Smallest on-screen length of a substituent bond, as a fraction of its template length. */
const MIN_SCREEN = 0.8;

/** `ring 1`, or the 1-based atom list when the ring has no id. */
export function ringName(ring: Pick<RingAnalysis, 'id' | 'atoms'>): string {
  return ring.id === undefined ? `ring ${ring.atoms.map((a) => a + 1).join('-')}` : `ring ${ring.id}`;
}

/** Throws the refusal for anything but a chair, pointing to the projected view. */
export function assertChair(ring: RingAnalysis): void {
  if (ring.shape === 'chair' && ring.size === 6) return;
  if (ring.shape === 'chair') {
    throw usageError('not-a-chair', `${ringName(ring)} is a ${ring.size}-membered chair; the template draws six-ring chairs: use --view projected`);
  }
  const form = ring.descriptor ? ` (${ring.descriptor})` : '';
  // "is planar", "is puckered"; "is a twist-boat", "is an envelope"
  const adjective = ring.shape === 'planar' || ring.shape === 'puckered';
  const article = adjective ? '' : /^[aeiou]/.test(ring.shape) ? 'an ' : 'a ';
  throw usageError('not-a-chair', `${ringName(ring)} is ${article}${ring.shape}${form}, not a chair: use --view projected`);
}

/**
 * Template placement of a chair ring and its substituents (atoms 0-based, screen in Å).
 * @throws ConformarkError `not-a-chair` when `ring.shape` is not `chair`.
 * @example chairTemplate(analyzeRing(mol, graph, ring), mol).points.get(ring[0])
 */
export function chairTemplate(ring: RingAnalysis, mol: Pick<Molecule, 'atoms'>, options: ChairTemplateOptions = {}): RingPlacement {
  assertChair(ring);
  const { elevationDeg = TEMPLATE_ELEVATION_DEG, hydrogens = 'show' } = options;
  checkElevation(elevationDeg);
  // 1. Frame of the template: n = +z, h = +y; the right vector then fixes where atom index 1 goes.
  const n: Vec3 = [0, 0, 1];
  const frame = ringViewFrame([0, 0, 0], n, [0, 1, 0], elevationDeg)!;
  const rightAngle = Math.atan2(frame.right[1], frame.right[0]);
  // 2. Ideal vertices, clockwise seen from +z (angle decreasing), up/down from the measured z_j.
  const s = ring.z[0]! >= 0 ? 1 : -1;
  const radius = (BOND * 2 * Math.SQRT2) / 3;
  const lift = (BOND / 6) * DEPTH;
  const vertex: Vec3[] = ring.atoms.map((_, j) => {
    const a = rightAngle + (TURN_DEG + (1 - j) * 60) * RAD;
    return [radius * Math.cos(a), radius * Math.sin(a), s * (j % 2 === 0 ? lift : -lift)];
  });
  const points = new Map<number, ViewPoint>();
  ring.atoms.forEach((atom, j) => points.set(atom, projectPoint(frame, vertex[j]!)));
  const bonds: PlacedBond[] = ring.atoms.map((a, j) => ({ atoms: [a, ring.atoms[(j + 1) % 6]!], role: 'ring-bond' }));
  // 3. Substituent slots per ring atom.
  ring.atoms.forEach((atom, j) => {
    const up = vertex[j]![2] > 0;
    const axialDir = (face: RingSubstituent['face']): Vec3 => [0, 0, (face ?? (up ? 'top' : 'bottom')) === 'top' ? 1 : -1];
    let eq = unit(sub(vertex[(j + 1) % 6]!, vertex[(j + 2) % 6]!))!;
    if (dot(eq, vertex[j]!) < 0) eq = scale(eq, -1);
    const subs = ring.substituents.filter((x) => x.ringAtom === atom && !(hydrogens === 'hide' && mol.atoms[x.atom]!.element === 'H'));
    const all = ring.substituents.filter((x) => x.ringAtom === atom);
    const slots = assignSlots(all);
    for (const x of subs) {
      const slot = slots.get(x.atom)!;
      const dir = slot === 'axial' ? axialDir(x.face) : slot === 'equatorial' ? eq : unit(vertex[j]!)!;
      const length = mol.atoms[x.atom]!.element === 'H' ? H_LENGTH : HEAVY_LENGTH;
      // a bond pointing at the viewer looks short: lengthen it (same direction) to a readable screen length
      const tip = projectPoint(frame, add(vertex[j]!, dir));
      const base = points.get(atom)!;
      const onScreen = Math.hypot(tip.x - base.x, tip.y - base.y);
      const drawnLength = Math.max(length, (MIN_SCREEN * length) / Math.max(onScreen, 0.2));
      points.set(x.atom, projectPoint(frame, add(vertex[j]!, scale(dir, drawnLength))));
      bonds.push({ atoms: [atom, x.atom], role: x.position ?? 'substituent-bond' });
    }
  });
  return { view: 'template', ring: ring.atoms, points, bonds, unitLength: BOND, elevationDeg };
}

type Slot = 'axial' | 'equatorial' | 'outward';

/** Slot of each substituent of one ring atom: its measured word, then the free slot, then outward. */
function assignSlots(subs: readonly RingSubstituent[]): Map<number, Slot> {
  const slots = new Map<number, Slot>();
  const taken = new Set<Slot>();
  const take = (atom: number, slot: Slot) => {
    slots.set(atom, slot);
    if (slot !== 'outward') taken.add(slot);
  };
  for (const x of subs) {
    if ((x.position === 'axial' || x.position === 'equatorial') && !taken.has(x.position)) take(x.atom, x.position);
  }
  // unclassified or clashing bonds: the nearer free slot by their angle to the normal
  for (const x of [...subs].filter((y) => !slots.has(y.atom)).sort((a, b) => a.angleToNormalDeg - b.angleToNormalDeg)) {
    const wish: Slot = x.angleToNormalDeg <= 45 ? 'axial' : 'equatorial';
    const other: Slot = wish === 'axial' ? 'equatorial' : 'axial';
    take(x.atom, !taken.has(wish) ? wish : !taken.has(other) ? other : 'outward');
  }
  return slots;
}
