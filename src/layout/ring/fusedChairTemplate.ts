/**
 * Fused chairs: two or more edge-fused six-rings that are all chairs (decalins, perhydrophenanthrenes, the
 * A/B/C rings of a steroid) drawn as chair outlines sharing their bonds. Every ring keeps the rules of
 * `chairTemplate`, measured from its own geometry:
 * - the first ring is placed exactly as `chairTemplate` places it (so a fused figure starts from the same chair);
 * - every further ring is seen from the side the first ring is seen from (its reference order is reversed and
 *   its displacements negated when its normal points the other way), so up and down mean the same on the whole
 *   figure, and its atoms go to up or down vertices of an outline turned (never mirrored) onto the shared bond;
 * - of the outlines that fit its up/down pattern and the shared bond, the one that lies clear of the rings
 *   already drawn and is turned least wins: an all-trans fusion is a pure translation (the trade's drawing, axial
 *   bonds vertical on every ring); a cis fusion needs a turned ring, whose axial bonds stay parallel to its own
 *   outline's vertical;
 * - each substituent takes the slot its measured position names in the first ring that holds its ring atom,
 *   and the bonds of the other rings at a fusion atom count as its heavy neighbours (so the angular H is drawn).
 * [common practice, no source: the drawings follow the conventional hand-drawn fused chairs.]
 */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import type { RingSubstituent } from '../../analysis/substituents.js';
import type { ViewPoint } from './ringView.js';
import type { PlacedBond, RingPlacement } from './ringPlacement.js';
import { chairOutline, SUBSTITUENT_FRACTION, type ChairOutlineKind, type OutlineVertex } from './chairOutline.js';
import { assertChair, assignSlots, ringOnOutline, slotDirection, TEMPLATE_BOND_FRACTION, type ChairTemplateOptions, type Slot } from './chairTemplate.js';
import { drawnSubstituents } from './ringHydrogens.js';

/** One ring of a fused figure: its atoms in drawn (clockwise) order and its screen vertices. */
export interface FusedRing {
  /** The ring's analysis (reference order, its own normal). */
  readonly ring: RingAnalysis;
  /** Ring atoms clockwise on screen (the reference order, or its reverse for a ring seen from its −n side). */
  readonly atoms: readonly number[];
  /** Screen vertex of each of `atoms` (unit ring bond, y down). */
  readonly vertices: readonly OutlineVertex[];
  /** Turn of the outline, degrees (0: the trade's upright outline). */
  readonly turnDeg: number;
  /** The outline family member the ring sits on. */
  readonly outline: ChairOutlineKind;
  /** Whether the ring is seen from its −n side (faces and displacements read the other way). */
  readonly flipped: boolean;
}

/** A fused placement: the `RingPlacement` of the whole figure and how each ring sits in it. */
export interface FusedPlacement extends RingPlacement {
  readonly fused: readonly FusedRing[];
}

const RAD = Math.PI / 180;
const dotV = (a: readonly number[], b: readonly number[]) => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;

/** Two placed rings that share exactly one bond (two adjacent atoms), or null. */
function sharedBond(a: readonly number[], b: readonly number[]): [number, number] | null {
  const common = a.filter((x) => b.includes(x));
  if (common.length !== 2) return null;
  const [p, q] = common as [number, number];
  const i = a.indexOf(p), j = a.indexOf(q);
  return Math.abs(i - j) === 1 || Math.abs(i - j) === a.length - 1 ? [p, q] : null;
}

/**
 * Rings (0-based atom lists) of the edge-fused system that contains `start`, in breadth-first order from it;
 * only six-rings that share exactly one bond with a ring already in the system join (no spiro or bridged rings).
 * @example fusedSystem([[0,1,2,3,4,5],[4,5,6,7,8,9]], 0) // [0, 1]
 */
export function fusedSystem(rings: readonly (readonly number[])[], start: number): number[] {
  const order = [start];
  for (let k = 0; k < order.length; k++) {
    rings.forEach((r, i) => {
      if (order.includes(i) || r.length !== 6) return;
      if (order.some((o) => sharedBond(rings[o]!, r) !== null)) order.push(i);
    });
  }
  return order;
}

/** The ring's atoms clockwise on screen and whether it is up where z > 0, seen from the side of `normal`. */
function seenFrom(ring: RingAnalysis, normal: readonly number[]): { atoms: number[]; up: boolean[]; flipped: boolean } {
  const flipped = dotV(ring.normal, normal) < 0;
  const idx = flipped ? [0, 5, 4, 3, 2, 1] : [0, 1, 2, 3, 4, 5];
  return { atoms: idx.map((j) => ring.atoms[j]!), up: idx.map((j) => (flipped ? -ring.z[j]! : ring.z[j]!) > 0), flipped };
}

/** Every outline (kind and turn of the atom list round it) whose up/down vertices match `up`, atom k at vertex (r + k) mod 6. */
function fittingOutlines(up: readonly boolean[]): { kind: ChairOutlineKind; outline: readonly OutlineVertex[]; r: number }[] {
  const out: { kind: ChairOutlineKind; outline: readonly OutlineVertex[]; r: number }[] = [];
  for (const kind of ['right-peak', 'right-valley'] as const) {
    const outline = chairOutline(kind);
    for (let r = 0; r < 6; r++) if (up.every((u, k) => outline[(r + k) % 6]!.up === u)) out.push({ kind, outline, r });
  }
  return out;
}

const centreOf = (vs: readonly { x: number; y: number }[]) => ({ x: vs.reduce((t, v) => t + v.x, 0) / vs.length, y: vs.reduce((t, v) => t + v.y, 0) / vs.length });

/** Where a ring already drawn wants a bond from one of its atoms: the screen slot its measured position names. */
type SlotWish = (ringAtom: number, atom: number) => { x: number; y: number } | null;

/**
 * Places a further ring on the bond it shares with the figure so far (see the file comment). `cost`: at each
 * fusion atom the angle between the new ring's bond and the slot the drawn ring gives that bond (equatorial for
 * a trans fusion, axial for the cis bond), 0…1 per atom for 0…180°; a little for the turn; 100 when the new
 * ring's centre falls within 1.2 ring bonds of a ring already drawn.
 */
function placeOnBond(ring: RingAnalysis, normal: readonly number[], placed: ReadonlyMap<number, { x: number; y: number }>, centres: readonly { x: number; y: number }[], wish: SlotWish): { ring: FusedRing; cost: number } {
  const { atoms, up, flipped } = seenFrom(ring, normal);
  const shared = atoms.filter((a) => placed.has(a));
  if (shared.length !== 2) throw new RangeError('a fused ring must share exactly one placed bond');
  const [a, b] = shared as [number, number];
  const pa = placed.get(a)!, pb = placed.get(b)!;
  let best: { ring: FusedRing; cost: number } | null = null;
  for (const { kind, outline, r } of fittingOutlines(up)) {
    const va = outline[(r + atoms.indexOf(a)) % 6]!, vb = outline[(r + atoms.indexOf(b)) % 6]!;
    const turn = Math.atan2(pb.y - pa.y, pb.x - pa.x) - Math.atan2(vb.y - va.y, vb.x - va.x);
    const [c, s] = [Math.cos(turn), Math.sin(turn)];
    const vertices = atoms.map((_, k) => {
      const v = outline[(r + k) % 6]!;
      const [dx, dy] = [v.x - va.x, v.y - va.y];
      return { ...v, x: pa.x + c * dx - s * dy, y: pa.y + s * dx + c * dy };
    });
    const centre = centreOf(vertices);
    const crowded = centres.some((o) => Math.hypot(o.x - centre.x, o.y - centre.y) < 1.2) ? 100 : 0;
    const turnDeg = ((((turn / RAD) % 360) + 540) % 360) - 180;
    let slots = 0;
    for (const f of [a, b]) {
      // the new ring's other neighbour of the fusion atom, and where the drawn ring wants it
      const k = atoms.indexOf(f);
      const other = [atoms[(k + 1) % 6]!, atoms[(k + 5) % 6]!].find((x) => x !== a && x !== b)!;
      const want = wish(f, other);
      if (!want) continue;
      const v = vertices[k]!, w = vertices[atoms.indexOf(other)]!;
      const len = Math.hypot(w.x - v.x, w.y - v.y) || 1;
      slots += Math.acos(Math.max(-1, Math.min(1, ((w.x - v.x) * want.x + (w.y - v.y) * want.y) / len))) / Math.PI;
    }
    const cost = crowded + slots + Math.abs(turnDeg) / 1800;
    if (!best || cost < best.cost - 1e-9) best = { ring: { ring, atoms, vertices, turnDeg, outline: kind, flipped }, cost };
  }
  if (!best) throw new RangeError('no chair outline fits the fused ring');
  return best;
}

/** The whole figure from one placement of the first ring: every further ring placed on its shared bond. */
function layoutFrom(rings: readonly RingAnalysis[], first: FusedRing): { fused: FusedRing[]; cost: number } {
  const fused = [first];
  const at = new Map<number, { x: number; y: number }>();
  first.atoms.forEach((a, k) => at.set(a, first.vertices[k]!));
  const centres = [centreOf(first.vertices)];
  const wish: SlotWish = (ringAtom, atom) => {
    const owner = fused.find((f) => f.atoms.includes(ringAtom));
    const x = owner?.ring.substituents.find((y) => y.ringAtom === ringAtom && y.atom === atom);
    if (!owner || !x) return null;
    const slot = assignSlots(owner.ring.substituents.filter((y) => y.ringAtom === ringAtom)).get(atom)!;
    return screenSlot(owner, slot, x, owner.atoms.indexOf(ringAtom));
  };
  let cost = 0;
  for (const ring of rings.slice(1)) {
    const placed = placeOnBond(ring, first.ring.normal, at, centres, wish);
    fused.push(placed.ring);
    cost += placed.cost;
    placed.ring.atoms.forEach((a, k) => at.set(a, placed.ring.vertices[k]!));
    centres.push(centreOf(placed.ring.vertices));
  }
  return { fused, cost };
}

/** Screen direction of a slot at vertex k of a placed ring: read on its upright outline, turned with it. */
function screenSlot(f: FusedRing, slot: Slot, x: RingSubstituent, k: number): { x: number; y: number } {
  const turn = f.turnDeg * RAD;
  const [c, s] = [Math.cos(turn), Math.sin(turn)];
  const upright = f.vertices.map((v) => ({ ...v, x: v.x * c + v.y * s, y: -v.x * s + v.y * c }));
  const d = slotDirection(slot, facing(x, f.flipped), upright, k);
  return { x: c * d.x - s * d.y, y: s * d.x + c * d.y };
}

/** A substituent's face as seen on the figure (a flipped ring reads top and bottom the other way). */
function facing(x: RingSubstituent, flipped: boolean): Pick<RingSubstituent, 'face'> {
  if (!flipped || x.face === null) return x;
  return { face: x.face === 'top' ? 'bottom' : 'top' };
}

/**
 * Template placement of edge-fused chairs (`rings` in `fusedSystem` order, each a six-ring chair analysis).
 * @throws ConformarkError `not-a-chair` when one of the rings is not a chair.
 * @example fusedChairTemplate([ringA, ringB], mol).fused[1].turnDeg // 0 for trans-decalin
 */
export function fusedChairTemplate(rings: readonly RingAnalysis[], mol: Pick<Molecule, 'atoms'>, options: ChairTemplateOptions = {}): FusedPlacement {
  if (rings.length === 0) throw usageError('no-ring', 'no ring to draw');
  for (const r of rings) assertChair(r);
  const first = rings[0]!;
  // the first ring as chairTemplate places it, unless another turn of it lets the others join with less turning
  // (a ring fused on a long edge of the outline would be drawn over it)
  const start = ringOnOutline(first);
  const starts = [{ kind: start.kind, vertices: start.vertices }, ...fittingOutlines(first.z.map((z) => z > 0)).map(({ kind, outline, r }) => ({ kind, vertices: first.atoms.map((_, k) => outline[(r + k) % 6]!) }))];
  let best: { fused: FusedRing[]; cost: number } | null = null;
  for (const { kind, vertices } of starts) {
    const tried = layoutFrom(rings, { ring: first, atoms: first.atoms, vertices, turnDeg: 0, outline: kind, flipped: false });
    if (!best || tried.cost < best.cost - 1e-9) best = tried;
  }
  const fused = best!.fused;
  const outline = fused[0]!.outline;
  // ring atoms and ring bonds (each bond once), then substituents from the first ring that holds their atom
  const inRing = new Set(rings.flatMap((r) => r.atoms));
  const points = new Map<number, ViewPoint>();
  const bonds: PlacedBond[] = [];
  const seen = new Set<string>();
  for (const f of fused) {
    f.atoms.forEach((a, k) => points.set(a, { x: f.vertices[k]!.x, y: f.vertices[k]!.y, near: f.vertices[k]!.near }));
    f.ring.atoms.forEach((a, j) => {
      const b = f.ring.atoms[(j + 1) % 6]!;
      const key = a < b ? `${a}-${b}` : `${b}-${a}`;
      if (!seen.has(key)) bonds.push({ atoms: [a, b], role: 'ring-bond' });
      seen.add(key);
    });
  }
  const done = new Set<number>();
  const ringBonds = (atom: number) => rings.reduce((n, r) => n + (r.atoms.includes(atom) ? 1 : 0), 0);
  for (const f of fused) {
    const subs = f.ring.substituents.filter((x) => !inRing.has(x.atom));
    // a fusion atom's bonds into the other rings are heavy neighbours drawn as ring bonds
    const drawn = drawnSubstituents(subs, mol, options.hydrogens ?? 'stereo', (atom) => ringBonds(atom) - 1);
    f.atoms.forEach((atom, k) => {
      if (done.has(atom)) return;
      done.add(atom);
      const slots = assignSlots(f.ring.substituents.filter((x) => x.ringAtom === atom));
      const v = f.vertices[k]!;
      for (const x of drawn.filter((y) => y.ringAtom === atom)) {
        const { x: dx, y: dy } = screenSlot(f, slots.get(x.atom)!, x, k);
        points.set(x.atom, { x: v.x + SUBSTITUENT_FRACTION * dx, y: v.y + SUBSTITUENT_FRACTION * dy, near: v.near });
        bonds.push({ atoms: [atom, x.atom], role: x.position ?? 'substituent-bond' });
      }
    });
  }
  return { view: 'template', ring: first.atoms, points, bonds, unitLength: 1 / TEMPLATE_BOND_FRACTION, elevationDeg: null, outline, rings, fused };
}
