/**
 * Which bonds get a Newman figure in a batch (`--bonds ring|rotatable|all`). Pure; atoms 0-based.
 *
 * - `ring`: every bond of every ring, oriented along the ring as given (front = the earlier atom of the
 *   ring's order), in ring order; a bond shared by two rings appears once, with its first ring.
 * - `rotatable`: acyclic single bonds between two non-terminal heavy atoms, i.e. atoms other than hydrogen
 *   that each have at least one other heavy-atom neighbour. A bond to a terminal group (CH3, OH, F) is not
 *   rotatable in this sense: turning it only permutes hydrogens or moves a lone atom.
 * - `all`: ring bonds as above, then every other bond whose two atoms each have at least one other neighbour
 *   (so both ends of the projection show something); bonds to hydrogen and to other terminal atoms are left out.
 * Bonds outside rings are written lower atom first and sorted by (front, back).
 * Ring bonds between two trigonal atoms (inside aromatic rings, or between sp² ring atoms; trigonalAtoms.ts) are
 * left out of `ring` and `all` unless `trigonal` is true: their Newman projections only show a flat ring.
 */
import type { Molecule } from '../model/molecule.js';
import type { Graph } from '../perceive/graph.js';
import { isTrigonalAtom } from '../perceive/trigonalAtoms.js';

/** Options of {@link figureBonds}. */
export interface FigureBondOptions {
  /** Draw ring bonds between two trigonal (sp², aromatic) atoms too. Default false. */
  readonly trigonal?: boolean;
}

/** Named bond sets for batch Newman figures. */
export const BOND_SETS = new Map([
  ['ring', 'every ring bond, along the ring'],
  ['rotatable', 'acyclic single bonds between non-terminal heavy atoms'],
  ['all', 'ring bonds, then every bond whose two atoms each have another neighbour'],
] as const);
export type BondSet = typeof BOND_SETS extends Map<infer K, unknown> ? K : never;

const key = (a: number, b: number) => (a < b ? `${a}-${b}` : `${b}-${a}`);

/** Ring bonds in ring order, each once. */
export function ringBonds(rings: readonly (readonly number[])[]): [number, number][] {
  const seen = new Set<string>();
  const out: [number, number][] = [];
  for (const ring of rings) {
    ring.forEach((a, i) => {
      const b = ring[(i + 1) % ring.length]!;
      if (seen.has(key(a, b))) return;
      seen.add(key(a, b));
      out.push([a, b]);
    });
  }
  return out;
}

/**
 * Bonds of a set, as [front, back] pairs (0-based).
 * @example figureBonds(butane, graph, [], 'rotatable') // [[1, 2]]
 */
export function figureBonds(
  mol: Pick<Molecule, 'atoms' | 'bonds' | 'coords'>,
  graph: Graph,
  rings: readonly (readonly number[])[],
  set: BondSet,
  options: FigureBondOptions = {},
): [number, number][] {
  const flat = new Map<number, boolean>();
  const trig = (i: number) => flat.get(i) ?? flat.set(i, isTrigonalAtom(mol, graph, i)).get(i)!;
  const ringSet = (): [number, number][] =>
    options.trigonal ? ringBonds(rings) : ringBonds(rings).filter(([a, b]) => !(trig(a) && trig(b)));
  const inRing = new Set(ringBonds(rings).map(([a, b]) => key(a, b)));
  const heavy = (i: number) => mol.atoms[i]!.element !== 'H';
  const otherHeavy = (i: number, not: number) => graph.neighbors[i]!.some((j) => j !== not && heavy(j));
  const other = (i: number, not: number) => graph.neighbors[i]!.some((j) => j !== not);
  const acyclic = [...(mol.bonds ?? [])]
    .filter((b) => !inRing.has(key(b.a, b.b)))
    .map((b) => ({ order: b.order, pair: (b.a < b.b ? [b.a, b.b] : [b.b, b.a]) as [number, number] }))
    .sort((x, y) => x.pair[0] - y.pair[0] || x.pair[1] - y.pair[1]);
  if (set === 'ring') return ringSet();
  if (set === 'rotatable') {
    return acyclic
      .filter(({ order, pair: [a, b] }) => order === 1 && heavy(a) && heavy(b) && otherHeavy(a, b) && otherHeavy(b, a))
      .map((x) => x.pair);
  }
  return [...ringSet(), ...acyclic.filter(({ pair: [a, b] }) => other(a, b) && other(b, a)).map((x) => x.pair)];
}
