/**
 * Chemical locants of one ring system (one ring, or two ortho-fused rings), chosen among every start and
 * direction by the rules chemists number by:
 * - pyranoses and furanoses (one ring O, two or more ring carbons carrying O or N): the carbohydrate convention,
 *   C1 the anomeric carbon (C2 in ketoses), numbering away from the ring O, which takes the locant of the last
 *   ring carbon (O5 in pyranoses, O4 in aldofuranoses) — IUPAC-IUBMB Nomenclature of Carbohydrates 1996,
 *   2-Carb-2 (McNaught, Pure Appl. Chem. 68, 1919);
 * - other rings, IUPAC 2013 Recommendations P-31.1.4 (Favre & Powell, RSC 2014), in order: heteroatoms together
 *   lowest, then O before S before N; the principal characteristic group (suffix) lowest; all substituents
 *   lowest; the substituent cited first in alphabetical order lowest; last, the lower file index first
 *   (determinism only).
 * - two ortho-fused rings: 1…, then the first fusion atom `(n)a`, the second ring, the second fusion atom —
 *   P-25.3.3 (naphthalene and decalin numbering), with the same criteria choosing among the four orientations.
 */
import type { Molecule } from '../model/molecule.js';
import type { Graph } from '../perceive/graph.js';
import { ringSubstitution, SUFFIX_CLASSES, type RingSubstituentGroup } from './ringSubstitution.js';

/** Locants of a ring system. */
export interface SystemLocants {
  /** Ring atom → locant text (`1`, `4a`). */
  readonly locants: ReadonlyMap<number, string>;
  /** Exocyclic chain carbons numbered with the ring (C6 of a pyranose), atom → locant. */
  readonly chain: ReadonlyMap<number, string>;
  /** True when the carbohydrate convention was applied. */
  readonly carbohydrate: boolean;
  readonly rule: string;
}

const HETERO_ORDER = ['O', 'S', 'Se', 'Te', 'N', 'P', 'As', 'Si', 'B'];

type Ordering = { atoms: number[]; values: number[]; texts: string[] };

/** Compares two ascending number lists: the first point of difference decides (IUPAC "lowest locants"). */
function compareLists(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

/** Every rotation and direction of a cycle. */
function orientations(cycle: readonly number[]): number[][] {
  const n = cycle.length;
  const out: number[][] = [];
  for (let s = 0; s < n; s++) {
    out.push(Array.from({ length: n }, (_, k) => cycle[(s + k) % n]!));
    out.push(Array.from({ length: n }, (_, k) => cycle[(s - k + n) % n]!));
  }
  return out;
}

/** The four fused-bicycle orderings (atoms in locant order, with the number each locant sorts as). */
function fusedOrderings(a: readonly number[], b: readonly number[]): Ordering[] {
  const shared = a.filter((x) => b.includes(x));
  const out: Ordering[] = [];
  for (const [first, second] of [[a, b], [b, a]] as const) {
    for (const [f1, f2] of [[shared[0]!, shared[1]!], [shared[1]!, shared[0]!]] as const) {
      // walk the first ring from f2's other neighbour round to f1, then the second ring from f1 round to f2
      const walk = (ring: readonly number[], from: number, to: number): number[] => {
        const n = ring.length;
        const i = ring.indexOf(from);
        const dir = ring[(i + 1) % n] === to ? -1 : 1;
        return Array.from({ length: n - 2 }, (_, k) => ring[(i + dir * (k + 1) + 2 * n) % n]!);
      };
      const partA = walk(first, f2, f1);
      const partB = walk(second, f1, f2);
      const atoms: number[] = [];
      const values: number[] = [];
      const texts: string[] = [];
      let n = 0;
      for (const x of partA) { atoms.push(x); values.push(++n); texts.push(String(n)); }
      atoms.push(f1); values.push(n + 0.5); texts.push(`${n}a`);
      for (const x of partB) { atoms.push(x); values.push(++n); texts.push(String(n)); }
      atoms.push(f2); values.push(n + 0.5); texts.push(`${n}a`);
      out.push({ atoms, values, texts });
    }
  }
  return out;
}

/** Sort key of an ordering by the P-31.1.4 criteria (file comment). */
function score(o: Ordering, element: (a: number) => string, groups: ReadonlyMap<number, RingSubstituentGroup[]>): number[][] {
  const at = (pred: (a: number) => boolean) => o.atoms.flatMap((a, k) => (pred(a) ? [o.values[k]!] : [])).sort((x, y) => x - y);
  const hetero = (a: number) => element(a) !== 'C';
  const keys: number[][] = [at(hetero), ...HETERO_ORDER.map((e) => at((a) => element(a) === e))];
  const all = o.atoms.flatMap((a, k) => (groups.get(a) ?? []).map((g) => ({ g, v: o.values[k]! })));
  const senior = SUFFIX_CLASSES.find((c) => all.some((x) => x.g.suffix === c));
  keys.push(all.filter((x) => senior && x.g.suffix === senior).map((x) => x.v).sort((x, y) => x - y));
  keys.push(all.map((x) => x.v).sort((x, y) => x - y));
  keys.push([...all].sort((x, y) => (x.g.prefix < y.g.prefix ? -1 : x.g.prefix > y.g.prefix ? 1 : x.v - y.v)).map((x) => x.v));
  keys.push(o.atoms);
  return keys;
}

function best(orderings: Ordering[], element: (a: number) => string, groups: ReadonlyMap<number, RingSubstituentGroup[]>): Ordering {
  const scored = orderings.map((o) => ({ o, s: score(o, element, groups) }));
  scored.sort((p, q) => {
    for (let i = 0; i < p.s.length; i++) {
      const c = compareLists(p.s[i]!, q.s[i]!);
      if (c !== 0) return c;
    }
    return 0;
  });
  return scored[0]!.o;
}

/** The carbohydrate numbering of a one-oxygen five- or six-ring, or null when the ring is not a sugar ring. */
function carbohydrate(mol: Pick<Molecule, 'atoms'>, graph: Graph, ring: readonly number[], groups: ReadonlyMap<number, RingSubstituentGroup[]>): SystemLocants | null {
  const element = (a: number) => mol.atoms[a]!.element;
  const n = ring.length;
  const oxygens = ring.filter((a) => element(a) === 'O');
  if ((n !== 5 && n !== 6) || oxygens.length !== 1 || ring.some((a) => element(a) !== 'C' && element(a) !== 'O')) return null;
  const hetero = (a: number) => (groups.get(a) ?? []).some((g) => ['O', 'N', 'S'].includes(element(g.atom)));
  const carbon = (a: number) => (groups.get(a) ?? []).filter((g) => element(g.atom) === 'C');
  if (ring.filter(hetero).length < 2) return null;
  const o = oxygens[0]!;
  const i = ring.indexOf(o);
  const [p, q] = [ring[(i + 1) % n]!, ring[(i + n - 1) % n]!];
  // anomeric: bears a heteroatom; of two, the one without a carbon chain (aldose C1), else a ketose C2
  const rank = (a: number) => (hetero(a) ? 2 : 0) + (carbon(a).length === 0 ? 1 : 0);
  const anomeric = rank(p) !== rank(q) ? (rank(p) > rank(q) ? p : q) : Math.min(p, q);
  const ketose = carbon(anomeric).length > 0 && hetero(anomeric);
  const dir = ring[(i + 1) % n] === anomeric ? 1 : -1;
  const carbons = Array.from({ length: n - 1 }, (_, k) => ring[(i + dir * (k + 1) + 2 * n) % n]!);
  const first = ketose ? 2 : 1;
  const locants = new Map<number, string>();
  carbons.forEach((c, k) => locants.set(c, String(first + k)));
  const last = first + n - 2;
  locants.set(o, String(last));
  // the chain: C1 of a ketose, and the carbons after the last ring carbon (C6 of a hexopyranose …)
  const chain = new Map<number, string>();
  if (ketose) chain.set(carbon(anomeric)[0]!.atom, '1');
  let prev = carbons[carbons.length - 1]!;
  let next = carbon(prev)[0]?.atom;
  let k = last + 1;
  const seen = new Set(ring);
  while (next !== undefined && !seen.has(next)) {
    chain.set(next, String(k++));
    seen.add(next);
    const cur: number = next;
    next = graph.neighbors[cur]!.find((b) => b !== prev && !seen.has(b) && element(b) === 'C' && graph.neighbors[b]!.some((c) => element(c) === 'O'));
    prev = cur;
  }
  return {
    locants, chain, carbohydrate: true,
    rule: `carbohydrate numbering: C${first} the anomeric carbon, ring O as O${last} (IUPAC-IUBMB 1996, 2-Carb-2)`,
  };
}

/**
 * Locants of a ring system made of `rings` (one ring, or two sharing one bond; other systems number the first
 * ring as a monocycle and say so).
 * @example ringLocants(mol, graph, [[0, 1, 2, 3, 4, 5]]).locants.get(0) // '1'
 */
export function ringLocants(mol: Pick<Molecule, 'atoms'>, graph: Graph, rings: readonly (readonly number[])[]): SystemLocants {
  const element = (a: number) => mol.atoms[a]!.element;
  const inSystem = new Set(rings.flat());
  const groups = new Map<number, RingSubstituentGroup[]>();
  for (const a of inSystem) groups.set(a, ringSubstitution(mol, graph, a, inSystem));
  const fused = rings.length === 2 && rings[0]!.filter((x) => rings[1]!.includes(x)).length === 2;
  if (rings.length === 1) {
    const sugar = carbohydrate(mol, graph, rings[0]!, groups);
    if (sugar) return sugar;
  }
  if (rings.length === 1 || fused) {
    const orderings = fused ? fusedOrderings(rings[0]!, rings[1]!) : orientations(rings[0]!).map((atoms) => ({ atoms, values: atoms.map((_, k) => k + 1), texts: atoms.map((_, k) => String(k + 1)) }));
    const o = best(orderings, element, groups);
    const hetero = o.atoms.some((a) => element(a) !== 'C');
    const what = fused ? 'fused bicycle numbered 1…, fusion atoms with letter locants (P-25.3.3)' : hetero ? 'heteroatoms lowest (O, S, N)' : 'carbocycle';
    return {
      locants: new Map(o.atoms.map((a, k) => [a, o.texts[k]!])), chain: new Map(), carbohydrate: false,
      rule: `${what}; then the principal characteristic group, then all substituents lowest (IUPAC 2013, P-31.1.4)`,
    };
  }
  // larger systems: the first ring as a monocycle, the other ring atoms continue the numbers
  const first = ringLocants(mol, graph, [rings[0]!]);
  const locants = new Map(first.locants);
  let k = rings[0]!.length;
  const rest = [...inSystem].filter((a) => !locants.has(a));
  const queue = [...rings[0]!].sort((x, y) => Number.parseInt(first.locants.get(x)!, 10) - Number.parseInt(first.locants.get(y)!, 10));
  while (rest.some((a) => !locants.has(a))) {
    const from = queue.shift();
    if (from === undefined) break;
    for (const b of graph.neighbors[from]!) {
      if (inSystem.has(b) && !locants.has(b)) {
        locants.set(b, String(++k));
        queue.push(b);
      }
    }
  }
  return {
    locants, chain: new Map(), carbohydrate: false,
    rule: `ring system of ${rings.length} rings: the first ring numbered as a monocycle (IUPAC 2013, P-31.1.4), the other ring atoms continue the numbers (no fusion nomenclature)`,
  };
}
