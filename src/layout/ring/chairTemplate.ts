/**
 * The trade's chair drawing: the fixed stylised outline of `chairOutline` (equal ring bonds, three parallel
 * pairs, a peak and a valley tip, axial bonds vertical, equatorial bonds parallel to the ring bonds once
 * removed), with everything that says which molecule it is measured from the geometry:
 * - ring atom j goes to an up vertex when its Cremer–Pople displacement z_j > 0, else to a down vertex;
 * - the numbering runs clockwise on screen exactly as it runs clockwise seen from +n (the outline is turned,
 *   never mirrored: reference atom 2, C1 of a pyranose, is the right-hand tip, and the outline whose right tip
 *   is a peak or a valley is the one that fits that atom);
 * - each substituent takes the slot its measured position names (axial or equatorial), an axial bond pointing
 *   to its measured face (top = up on the page).
 * Depth: front vertices are nearer than back ones, so bonds in front open gaps in the bonds they cross; the
 * inner axial bonds (up from a front vertex, down from a back one) cross the far ring bond and are flagged
 * `front`, so that ring bond gets the gap.
 */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import type { RingSubstituent } from '../../analysis/substituents.js';
import type { ViewPoint } from './ringView.js';
import { type PlacedBond, type RingPlacement } from './ringPlacement.js';
import { chairOutline, equatorialDirection, outlineFor, SUBSTITUENT_FRACTION, type ChairOutlineKind, type OutlineVertex } from './chairOutline.js';
import { drawnSubstituents, type RingHydrogenMode } from './ringHydrogens.js';

/** Options of {@link chairTemplate}. */
export interface ChairTemplateOptions {
  /** Ring hydrogens drawn: `all`, `stereo` (only where they show a configuration) or `none`. Default `stereo`. */
  readonly hydrogens?: RingHydrogenMode;
}

/**
 * Drawn ring bond as a fraction of the theme's `bondLength` (14.5 pt of the `column` theme's 20 pt), so a
 * chair with its labels fits a journal column [common practice, no source].
 */
export const TEMPLATE_BOND_FRACTION = 0.725;

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

/** Vertices of a ring on an outline: atom j at vertex (j − 1) mod 6, so reference atom 2 is the right tip. */
export function ringOnOutline(ring: Pick<RingAnalysis, 'z'>): { kind: ChairOutlineKind; vertices: OutlineVertex[] } {
  const kind = outlineFor(ring.z[1]! > 0);
  const outline = chairOutline(kind);
  return { kind, vertices: [0, 1, 2, 3, 4, 5].map((j) => outline[(j + 5) % 6]!) };
}

/**
 * Template placement of a chair ring and its substituents (atoms 0-based, screen in ring-bond units).
 * @throws ConformarkError `not-a-chair` when `ring.shape` is not `chair`.
 * @example chairTemplate(analyzeRing(mol, graph, ring), mol).points.get(ring[0])
 */
export function chairTemplate(ring: RingAnalysis, mol: Pick<Molecule, 'atoms'>, options: ChairTemplateOptions = {}): RingPlacement {
  assertChair(ring);
  const { kind, vertices } = ringOnOutline(ring);
  const points = new Map<number, ViewPoint>();
  ring.atoms.forEach((atom, j) => points.set(atom, { x: vertices[j]!.x, y: vertices[j]!.y, near: vertices[j]!.near }));
  const bonds: PlacedBond[] = ring.atoms.map((a, j) => ({ atoms: [a, ring.atoms[(j + 1) % 6]!], role: 'ring-bond' }));
  const drawn = drawnSubstituents(ring.substituents, mol, options.hydrogens ?? 'stereo');
  ring.atoms.forEach((atom, j) => {
    const v = vertices[j]!;
    const slots = assignSlots(ring.substituents.filter((x) => x.ringAtom === atom));
    for (const x of drawn.filter((s) => s.ringAtom === atom)) {
      const slot = slots.get(x.atom)!;
      const d = slotDirection(slot, x, vertices, j);
      points.set(x.atom, { x: v.x + SUBSTITUENT_FRACTION * d.x, y: v.y + SUBSTITUENT_FRACTION * d.y, near: v.near });
      // an axial bond pointing across the ring (up from a front vertex, down from a back one) crosses the far
      // ring bond: it is drawn in front, so the gap opens in the ring bond, not in the substituent
      const inner = slot === 'axial' && ((v.near > 0 && d.y < 0) || (v.near < 0 && d.y > 0));
      bonds.push({ atoms: [atom, x.atom], role: x.position ?? 'substituent-bond', ...(inner ? { front: true } : {}) });
    }
  });
  return { view: 'template', ring: ring.atoms, points, bonds, unitLength: 1 / TEMPLATE_BOND_FRACTION, elevationDeg: null, outline: kind };
}

/** Screen direction (unit, y down) of a substituent in its slot at vertex j. */
export function slotDirection(slot: Slot, x: Pick<RingSubstituent, 'face'>, vertices: readonly OutlineVertex[], j: number): { x: number; y: number } {
  const v = vertices[j]!;
  if (slot === 'axial') return { x: 0, y: (x.face ?? (v.up ? 'top' : 'bottom')) === 'top' ? -1 : 1 };
  if (slot === 'equatorial') return equatorialDirection(vertices, j);
  const cx = vertices.reduce((t, p) => t + p.x, 0) / 6, cy = vertices.reduce((t, p) => t + p.y, 0) / 6;
  const len = Math.hypot(v.x - cx, v.y - cy) || 1;
  return { x: (v.x - cx) / len, y: (v.y - cy) / len };
}

/** Slot of a substituent on a template vertex. */
export type Slot = 'axial' | 'equatorial' | 'outward';

/** Slot of each substituent of one ring atom: its measured word, then the free slot, then outward. */
export function assignSlots(subs: readonly RingSubstituent[]): Map<number, Slot> {
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
