/**
 * Chemical numbering of a molecule's ring systems and what hangs on them, as a chemist names atoms in a paper:
 * ring atoms by their locants (`ringLocants`: carbohydrate convention for sugars, IUPAC lowest locants
 * otherwise), exocyclic heteroatoms after the atom they sit on (O2, O6, N2), further carbons continuing the
 * numbers (C6 of a pyranose by its chain; others C7, C8… in order of attachment), hydrogens after their heavy
 * atom (H1, H6, H6′; HO2 on O2 as in carbohydrate NMR practice). A second ring system gets primed locants
 * (C1′), as ring assemblies are numbered (IUPAC 2013, P-28.3). Atoms no ring reaches keep no chemical name.
 */
import type { Molecule } from '../model/molecule.js';
import type { Graph } from '../perceive/graph.js';
import { ringLocants } from './ringLocants.js';

/** Chemical numbering of a molecule (0-based atoms). */
export interface ChemicalNumbering {
  /** Chemical name of each named atom: `C1`, `O5`, `C4a`, `H2`, `HO6`, `C1′`. */
  readonly names: ReadonlyMap<number, string>;
  /** Ring atom → locant (`1`, `4a`, `5`; `O5` has locant `5`). */
  readonly locants: ReadonlyMap<number, string>;
  /** Each ring system: its atoms and the rule that numbered it, in words. */
  readonly systems: readonly { readonly atoms: readonly number[]; readonly rule: string; readonly carbohydrate: boolean }[];
}

/** Rings grouped into systems: rings sharing two or more atoms are one system (fused, bridged). */
function ringSystems(rings: readonly (readonly number[])[]): (readonly number[])[][] {
  const groups: (readonly number[])[][] = [];
  for (const r of rings) {
    const joined = groups.filter((g) => g.some((q) => q.filter((a) => r.includes(a)).length >= 2));
    const merged = [...joined.flat(), r];
    for (const g of joined) groups.splice(groups.indexOf(g), 1);
    groups.push(merged);
  }
  return groups;
}

const PRIMES = ['', '′', '″', '‴'];

/**
 * Chemical names of the atoms of `mol`, from its rings (cyclic 0-based atom lists, as `findRings` gives).
 * @example chemicalNumbering(glucoside, graph, rings).names.get(ringO) // 'O5'
 */
export function chemicalNumbering(mol: Pick<Molecule, 'atoms'>, graph: Graph, rings: readonly (readonly number[])[]): ChemicalNumbering {
  const element = (a: number) => mol.atoms[a]!.element;
  const names = new Map<number, string>();
  const locants = new Map<number, string>();
  const systems: { atoms: readonly number[]; rule: string; carbohydrate: boolean }[] = [];
  const taken = new Set<string>();
  const nameAs = (atom: number, base: string): void => {
    let k = 0;
    while (taken.has(`${base}${PRIMES[k] ?? `(${k})`}`)) k++;
    const name = `${base}${PRIMES[k] ?? `(${k})`}`;
    taken.add(name);
    names.set(atom, name);
  };
  const groups = ringSystems(rings);
  groups.forEach((system, s) => {
    const prime = PRIMES[s] ?? `(${s})`;
    const found = ringLocants(mol, graph, system);
    const inSystem = new Set(system.flat());
    systems.push({ atoms: [...inSystem].sort((a, b) => a - b), rule: found.rule, carbohydrate: found.carbohydrate });
    const numbered: number[] = [];
    const locantOf = new Map<number, string>();
    for (const [a, l] of [...found.locants, ...found.chain]) {
      if (names.has(a)) continue;
      locantOf.set(a, `${l}${prime}`);
      if (found.locants.has(a)) locants.set(a, `${l}${prime}`);
      nameAs(a, `${element(a)}${l}${prime}`);
      numbered.push(a);
    }
    const numericOf = (a: number) => Number.parseInt(found.locants.get(a) ?? found.chain.get(a) ?? '0', 10);
    let next = Math.max(0, ...numbered.map(numericOf));
    // heavy atoms reached from the numbered ones, nearest first, in locant order
    numbered.sort((a, b) => numericOf(a) - numericOf(b) || (found.locants.get(a) ?? '').localeCompare(found.locants.get(b) ?? ''));
    const queue = [...numbered];
    while (queue.length > 0) {
      const from = queue.shift()!;
      const heavy = graph.neighbors[from]!.filter((b) => element(b) !== 'H' && !names.has(b) && !rings.some((r) => r.includes(b)));
      for (const b of heavy) {
        const l = element(b) === 'C' ? `${++next}${prime}` : locantOf.get(from)!;
        locantOf.set(b, l);
        nameAs(b, `${element(b)}${l}`);
        queue.push(b);
      }
    }
  });
  // hydrogens after their heavy atom
  for (const [a, name] of [...names]) {
    const hs = graph.neighbors[a]!.filter((b) => element(b) === 'H' && !names.has(b));
    const base = element(a) === 'C' ? `H${name.slice(1)}` : `H${name}`;
    for (const h of hs) nameAs(h, base);
  }
  return { names, locants, systems };
}

/** Sort value of a locant: `4a` just after 4; primes ignored. */
const locantValue = (l: string) => {
  const m = /^(\d+)([a-z]?)/.exec(l);
  return m ? Number(m[1]) + (m[2] ? 0.5 : 0) : Infinity;
};

/**
 * A ring in its chemical order (lowest locant first, toward the next locant) with those locants, for analysing
 * it in the drawn numbering; null for carbohydrate rings (their reference order already is the chemical one)
 * and when the locants do not walk the ring.
 * @example chemicalRingOrder(numbering, graph, ring)?.locants // ['1', '2', '3', '4', '5', '6']
 */
export function chemicalRingOrder(numbering: ChemicalNumbering, graph: Graph, ring: readonly number[]): { atoms: number[]; locants: string[]; rule: string } | null {
  const system = numbering.systems.find((s) => ring.every((a) => s.atoms.includes(a)));
  if (!system || system.carbohydrate || ring.some((a) => !numbering.locants.has(a))) return null;
  const atoms = [...ring].sort((a, b) => locantValue(numbering.locants.get(a)!) - locantValue(numbering.locants.get(b)!));
  if (!atoms.every((a, j) => graph.bonded(a, atoms[(j + 1) % atoms.length]!))) return null;
  return { atoms, locants: atoms.map((a) => numbering.locants.get(a)!), rule: `chemical numbering: ${system.rule}` };
}
