/**
 * Private to `build`: the symmetry permutations of a molecule's heavy-atom graph, so that two conformers can be
 * compared whatever numbering symmetry-equivalent atoms got (the flipped chair of cyclohexane is the same
 * conformer as the first chair with its atoms renumbered). Area E writes the project's general RMSD module;
 * this one exists only for conformer de-duplication in `buildConformers` and may be swapped for it.
 */
import type { Atom, Bond } from '../../model/molecule.js';

/** Stop collecting permutations beyond this many (highly symmetric molecules); the identity always comes first. */
export const MAX_PERMUTATIONS = 1000;

/**
 * Heavy-atom indices and every permutation of them (as positions into that index list) that keeps elements,
 * charges, hydrogen counts and bond orders. The identity is first.
 */
export function heavyAtomPermutations(
  atoms: readonly Atom[],
  bonds: readonly Bond[],
  limit = MAX_PERMUTATIONS,
): { heavy: number[]; permutations: Int32Array[] } {
  const heavy = atoms.flatMap((a, i) => (a.element === 'H' ? [] : [i]));
  const local = new Map(heavy.map((atom, k) => [atom, k]));
  const n = heavy.length;
  const adj: Map<number, number>[] = Array.from({ length: n }, () => new Map());
  const hydrogens = new Array<number>(n).fill(0);
  for (const { a, b, order } of bonds) {
    const ka = local.get(a);
    const kb = local.get(b);
    if (ka !== undefined && kb !== undefined) {
      adj[ka]!.set(kb, order);
      adj[kb]!.set(ka, order);
    } else if (ka !== undefined) hydrogens[ka]!++;
    else if (kb !== undefined) hydrogens[kb]!++;
  }
  const cls = refineClasses(
    heavy.map((atom, k) => `${atoms[atom]!.element}/${atoms[atom]!.charge ?? 0}/${hydrogens[k]}/${adj[k]!.size}`),
    adj,
  );
  const order = searchOrder(n, adj);
  const permutations: Int32Array[] = [];
  const map = new Int32Array(n).fill(-1);
  const used = new Uint8Array(n);
  const extend = (depth: number): void => {
    if (permutations.length >= limit) return;
    if (depth === n) {
      permutations.push(map.slice());
      return;
    }
    const i = order[depth]!;
    // try the atom itself first so that the identity is found first
    const candidates = [i, ...cls.flatMap((c, j) => (c === cls[i] && j !== i ? [j] : []))];
    for (const j of candidates) {
      if (used[j] || cls[j] !== cls[i] || !consistent(i, j, map, adj)) continue;
      map[i] = j;
      used[j] = 1;
      extend(depth + 1);
      map[i] = -1;
      used[j] = 0;
    }
  };
  extend(0);
  return { heavy, permutations };
}

/** Every already-mapped neighbour k of i must map to a neighbour of j with the same bond order. */
function consistent(i: number, j: number, map: Int32Array, adj: readonly Map<number, number>[]): boolean {
  for (const [k, order] of adj[i]!) {
    const mk = map[k]!;
    if (mk >= 0 && adj[j]!.get(mk) !== order) return false;
  }
  return true;
}

/** Iterated neighbour-multiset refinement of atom labels into class numbers (Morgan-style). */
function refineClasses(labels: readonly string[], adj: readonly Map<number, number>[]): number[] {
  let cls = numberLabels(labels);
  for (let round = 0; round < labels.length; round++) {
    const next = numberLabels(
      cls.map((c, i) => `${c}|${[...adj[i]!].map(([k, o]) => `${cls[k]}:${o}`).sort().join(',')}`),
    );
    const before = new Set(cls).size;
    cls = next;
    if (new Set(next).size === before) break;
  }
  return cls;
}

function numberLabels(labels: readonly string[]): number[] {
  const ids = new Map<string, number>();
  for (const l of [...labels].sort()) if (!ids.has(l)) ids.set(l, ids.size);
  return labels.map((l) => ids.get(l)!);
}

/** Breadth-first order, component by component, so each atom after the first meets mapped neighbours early. */
function searchOrder(n: number, adj: readonly Map<number, number>[]): number[] {
  const seen = new Uint8Array(n);
  const order: number[] = [];
  for (let s = 0; s < n; s++) {
    if (seen[s]) continue;
    seen[s] = 1;
    const queue = [s];
    while (queue.length > 0) {
      const i = queue.shift()!;
      order.push(i);
      for (const k of [...adj[i]!.keys()].sort((x, y) => x - y)) {
        if (!seen[k]) {
          seen[k] = 1;
          queue.push(k);
        }
      }
    }
  }
  return order;
}
