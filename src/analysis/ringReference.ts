/**
 * The reference numbering of a ring (j = 1…N): which atom is first and which way the walk goes. Cremer–Pople
 * (θ, φ), the ring-form descriptor and the torsion list all depend on it (docs/methods.md#ring-orientation).
 *
 * Rules, tried in this order:
 * 1. `ordered`: a user-given ordered ring (`1-2-3-4-5-6`) is used exactly as given.
 * 2. One ring heteroatom (sugars: pyranose O5, furanose O4′): the heteroatom is j = 1 and the walk goes toward
 *    the "anomeric-like" neighbour, the ring neighbour that itself carries an exocyclic heteroatom
 *    (O, N, S or a halogen), e.g. O5 → C1 → C2 …; when neither or both neighbours do, toward the lower-index
 *    neighbour. Locants: the heteroatom's symbol, then 1…N−1 (O, 1, 2, 3, 4, 5 for a pyranose).
 *    [common practice, no source; gives the standard sugar orders of docs/methods.md#ring-orientation]
 * 3. Otherwise (carbocycles, or several ring heteroatoms): j = 1 is the lowest-index ring atom and the walk goes
 *    toward its lower-index ring neighbour. Locants 1…N. [common practice, no source]
 * For rule 1 the locants follow rule 2's style when j = 1 is the ring's only heteroatom, else 1…N.
 */
import type { Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import type { Graph } from '../perceive/graph.js';

/** Elements that count as an exocyclic heteroatom for the direction rule. */
const EXO_HETERO = new Set(['O', 'N', 'S', 'F', 'Cl', 'Br', 'I']);

/** A ring in reference order. */
export interface RingReference {
  /** Ring atoms (0-based) in reference order j = 1…N. */
  readonly atoms: readonly number[];
  /** Locant of each ring position as it appears in descriptors (`O`, `1`, `2`… or `1`…`N`). */
  readonly locants: readonly string[];
  /** The rule that fixed the numbering, in words (reported as `referenceRule`). */
  readonly rule: string;
}

/** Options of `ringReference`. */
export interface RingReferenceOptions {
  /** Use the atoms exactly in the given order (a user-given ordered ring). Default false. */
  readonly ordered?: boolean;
  /** With `ordered`: the locant of each position (e.g. chemical locants `1`…`6`, `4a`) and the rule in words. */
  readonly locants?: readonly string[];
  readonly rule?: string;
}

const isCarbonOrHydrogen = (el: string) => el === 'C' || el === 'H';

/** Checks that `atoms` is a closed walk along bonds; else reorders a ring atom set into one, or throws. */
function closedWalk(graph: Graph, atoms: readonly number[], ordered: boolean): number[] {
  const n = atoms.length;
  if (n < 3 || new Set(atoms).size !== n || atoms.some((a) => a < 0 || a >= graph.size)) {
    throw usageError('bad-ring', `a ring needs at least 3 distinct atoms, got ${atoms.map((a) => a + 1).join('-')}`);
  }
  const isWalk = atoms.every((a, j) => graph.bonded(a, atoms[(j + 1) % n]!));
  if (isWalk) return [...atoms];
  const label = atoms.map((a) => a + 1).join('-');
  if (ordered) throw usageError('ring-not-closed', `ring ${label} is not a closed walk along bonds`);
  // An unordered ring atom set: walk it when every atom has exactly two neighbours inside the set.
  const inSet = new Set(atoms);
  const ringNeighbours = (a: number) => graph.neighbors[a]!.filter((b) => inSet.has(b));
  if (atoms.some((a) => ringNeighbours(a).length !== 2)) {
    throw usageError('ring-not-closed', `atoms ${label} do not form a simple ring`);
  }
  const walk = [atoms[0]!];
  let prev = -1;
  while (walk.length < n) {
    const cur = walk[walk.length - 1]!;
    const next = ringNeighbours(cur).find((b) => b !== prev && !walk.includes(b));
    if (next === undefined) throw usageError('ring-not-closed', `atoms ${label} do not form a simple ring`);
    prev = cur;
    walk.push(next);
  }
  return walk;
}

/** Rotates and orients a closed walk so that it starts at `start` and continues with `second`. */
function orient(walk: readonly number[], start: number, second: number): number[] {
  const n = walk.length;
  const i = walk.indexOf(start);
  const forward = walk[(i + 1) % n] === second;
  return Array.from({ length: n }, (_, k) => walk[(i + (forward ? k : n - k)) % n]!);
}

function sugarLocants(symbol: string, n: number): string[] {
  return [symbol, ...Array.from({ length: n - 1 }, (_, k) => String(k + 1))];
}

/**
 * Puts a ring into its reference order (rules in the file comment).
 * @example ringReference(glucose, graph, [2, 3, 4, 6, 8, 10]).locants // ['O', '1', '2', '3', '4', '5']
 */
export function ringReference(
  mol: Pick<Molecule, 'atoms'>,
  graph: Graph,
  ringAtoms: readonly number[],
  options: RingReferenceOptions = {},
): RingReference {
  const ordered = options.ordered ?? false;
  const walk = closedWalk(graph, ringAtoms, ordered);
  const n = walk.length;
  const element = (a: number) => mol.atoms[a]!.element;
  const hetero = walk.filter((a) => !isCarbonOrHydrogen(element(a)));
  const numeric = Array.from({ length: n }, (_, k) => String(k + 1));
  if (ordered) {
    const oneHetero = hetero.length === 1 && hetero[0] === walk[0];
    return {
      atoms: walk,
      locants: options.locants?.length === n ? [...options.locants] : oneHetero ? sugarLocants(element(walk[0]!), n) : numeric,
      rule: options.rule ?? 'user-given order, used exactly as given',
    };
  }
  if (hetero.length === 1) {
    const h = hetero[0]!;
    const i = walk.indexOf(h);
    const [p, q] = [walk[(i + n - 1) % n]!, walk[(i + 1) % n]!].sort((x, y) => x - y) as [number, number];
    const ringSet = new Set(walk);
    const carriesHetero = (a: number) =>
      graph.neighbors[a]!.some((b) => !ringSet.has(b) && EXO_HETERO.has(element(b)));
    const anomeric = carriesHetero(p) !== carriesHetero(q) ? (carriesHetero(p) ? p : q) : p;
    return {
      atoms: orient(walk, h, anomeric),
      locants: sugarLocants(element(h), n),
      rule:
        'ring heteroatom first (j = 1), then toward its neighbour that carries an exocyclic heteroatom ' +
        '(else its lower-index neighbour); locants heteroatom, 1…N−1',
    };
  }
  const start = Math.min(...walk);
  const i = walk.indexOf(start);
  const second = Math.min(walk[(i + 1) % n]!, walk[(i + n - 1) % n]!);
  return {
    atoms: orient(walk, start, second),
    locants: numeric,
    rule: 'lowest-index ring atom first (j = 1), then toward its lower-index ring neighbour; locants 1…N',
  };
}
