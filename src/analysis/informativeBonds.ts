/**
 * The Newman projections worth a place on a sheet, most informative first. Pure; atoms 0-based.
 *
 * In a ring every ring bond of one form looks alike (a chair's six ring Newmans are all gauche, ±55°), so one
 * ring bond per ring is enough: the one carrying most heavy substituents (it shows their relative positions,
 * e.g. the 1,2-diequatorial gauche pair), lowest chemical locants on a tie. What a ring figure cannot show is
 * the rotation about exocyclic bonds: a bond from a ring atom to a heavy substituent that carries more heavy
 * atoms (CH₂OH, OMe, an isopropyl) comes next, then one to a group whose only other neighbour is a single
 * hydrogen (OH, SH). Symmetric rotors (CH₃, CF₃, NH₃⁺: two or more identical terminal atoms and nothing else)
 * and lone atoms (F, =O) are left out: turning them only permutes identical atoms. Common practice, no source.
 * Exocyclic bonds are oriented ring atom first (front).
 */
import type { Molecule } from '../model/molecule.js';
import type { Graph } from '../perceive/graph.js';

/** One chosen bond and why. */
export interface InformativeBond {
  readonly bond: readonly [number, number];
  /** `ring`: the ring's representative bond; `branch`: to a heavy group with more heavy atoms; `hydroxyl-like`: to a heavy atom with one H. */
  readonly reason: 'ring' | 'branch' | 'hydroxyl-like';
}

const key = (a: number, b: number) => (a < b ? `${a}-${b}` : `${b}-${a}`);

/**
 * Informative bonds of a molecule with rings, in the order a sheet shows them.
 * @example informativeBonds(glucoside, graph, rings).map((b) => b.reason) // ['ring', 'branch', 'branch', 'hydroxyl-like', …]
 */
export function informativeBonds(
  mol: Pick<Molecule, 'atoms'>,
  graph: Graph,
  rings: readonly (readonly number[])[],
  locants: ReadonlyMap<number, string> = new Map(),
): InformativeBond[] {
  const heavy = (i: number) => mol.atoms[i]!.element !== 'H';
  const inRing = new Set(rings.flat());
  const ringBondKeys = new Set(rings.flatMap((r) => r.map((a, i) => key(a, r[(i + 1) % r.length]!))));
  const heavySubstituents = (a: number) => graph.neighbors[a]!.filter((j) => heavy(j) && !ringBondKeys.has(key(a, j))).length;
  const locantOf = (a: number) => Number.parseFloat(locants.get(a) ?? '') || 1e6 + a;
  const out: InformativeBond[] = [];
  const seen = new Set<string>();

  // 1. One ring bond per ring: most heavy substituents, then both ends substituted, then lowest locants.
  for (const ring of rings) {
    const candidates = ring.map((a, i) => {
      const b = ring[(i + 1) % ring.length]!;
      const [sa, sb] = [heavySubstituents(a), heavySubstituents(b)];
      return { bond: (locantOf(a) <= locantOf(b) ? [a, b] : [b, a]) as [number, number], score: [sa + sb, Math.min(sa, sb), -(locantOf(a) + locantOf(b))] };
    });
    const best = candidates.reduce((x, y) => (lexicographic(y.score, x.score) > 0 ? y : x));
    if (seen.has(key(...best.bond))) continue;
    seen.add(key(...best.bond));
    out.push({ bond: best.bond, reason: 'ring' });
  }

  // 2. Exocyclic bonds to heavy groups: branches first, then hydroxyl-like groups; each in locant order.
  const exocyclic: { bond: [number, number]; reason: 'branch' | 'hydroxyl-like' }[] = [];
  for (const a of [...inRing].sort((x, y) => locantOf(x) - locantOf(y) || x - y)) {
    for (const s of graph.neighbors[a]!) {
      if (!heavy(s) || inRing.has(s) || seen.has(key(a, s))) continue;
      const beyond = graph.neighbors[s]!.filter((j) => j !== a);
      if (beyond.length === 0) continue;
      if (beyond.some(heavy) && !symmetricRotor(mol, graph, beyond)) exocyclic.push({ bond: [a, s], reason: 'branch' });
      else if (beyond.length === 1) exocyclic.push({ bond: [a, s], reason: 'hydroxyl-like' });
    }
  }
  for (const reason of ['branch', 'hydroxyl-like'] as const) {
    for (const e of exocyclic) if (e.reason === reason) out.push(e);
  }
  return out;
}

/** Two or more terminal atoms of one element and nothing else (CH₃, CF₃, CCl₃). */
function symmetricRotor(mol: Pick<Molecule, 'atoms'>, graph: Graph, beyond: readonly number[]): boolean {
  if (beyond.length < 2) return false;
  const element = mol.atoms[beyond[0]!]!.element;
  return beyond.every((j) => mol.atoms[j]!.element === element && graph.neighbors[j]!.length === 1);
}

/** Sign of the first difference of two equal-length score lists. */
function lexicographic(a: readonly number[], b: readonly number[]): number {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return Math.sign(a[k]! - b[k]!);
  return 0;
}
