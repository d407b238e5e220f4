/**
 * What each ring atom carries, in the terms numbering rules compare: exocyclic heavy substituents with a prefix
 * name (for the alphabetical tie-break) and the principal characteristic group that would be the suffix.
 * Seniority of suffix classes after IUPAC 2013 Recommendations P-41 (Favre & Powell, RSC 2014), shortened to the
 * classes met on rings here: acid > ester > amide > nitrile > aldehyde > ketone > alcohol > thiol > amine.
 */
import type { Molecule } from '../model/molecule.js';
import type { Graph } from '../perceive/graph.js';

/** Suffix classes, most senior first. */
export const SUFFIX_CLASSES = ['acid', 'ester', 'amide', 'nitrile', 'aldehyde', 'ketone', 'alcohol', 'thiol', 'amine'] as const;
export type SuffixClass = (typeof SUFFIX_CLASSES)[number];

/** One exocyclic heavy substituent of a ring atom. */
export interface RingSubstituentGroup {
  readonly ringAtom: number;
  readonly atom: number;
  /** Prefix name used for the alphabetical rule (`hydroxy`, `methyl`, `oxo`…). */
  readonly prefix: string;
  /** Suffix class when the group can be the principal characteristic group. */
  readonly suffix: SuffixClass | null;
}

const HALO: Record<string, string> = { F: 'fluoro', Cl: 'chloro', Br: 'bromo', I: 'iodo' };

/**
 * Heavy substituents of `ringAtom` that lie outside `inSystem`, classified.
 * @example ringSubstitution(mol, graph, 0, new Set([0, 1, 2, 3, 4, 5])) // [{ prefix: 'hydroxy', suffix: 'alcohol', … }]
 */
export function ringSubstitution(mol: Pick<Molecule, 'atoms'>, graph: Graph, ringAtom: number, inSystem: ReadonlySet<number>): RingSubstituentGroup[] {
  const el = (a: number) => mol.atoms[a]!.element;
  const nbrs = (a: number) => graph.neighbors[a]!;
  const hCount = (a: number) => nbrs(a).filter((b) => el(b) === 'H').length;
  const heavy = (a: number, except: number) => nbrs(a).filter((b) => b !== except && el(b) !== 'H');
  const out: RingSubstituentGroup[] = [];
  for (const x of nbrs(ringAtom)) {
    if (inSystem.has(x) || el(x) === 'H') continue;
    const e = el(x);
    const rest = heavy(x, ringAtom);
    let prefix = e.toLowerCase();
    let suffix: SuffixClass | null = null;
    if (HALO[e]) prefix = HALO[e]!;
    else if (e === 'O') {
      if (rest.length === 0 && hCount(x) > 0) [prefix, suffix] = ['hydroxy', 'alcohol'];
      else if (rest.length === 0) [prefix, suffix] = ['oxo', 'ketone'];
      else prefix = rest.some((c) => heavy(c, x).some((d) => el(d) === 'O' && heavy(d, c).length === 0)) ? 'acyloxy' : 'alkoxy';
    } else if (e === 'S') {
      if (rest.length === 0 && hCount(x) > 0) [prefix, suffix] = ['sulfanyl', 'thiol'];
      else prefix = 'alkylsulfanyl';
    } else if (e === 'N') {
      const acyl = rest.some((c) => heavy(c, x).some((d) => el(d) === 'O' && heavy(d, c).length === 0));
      if (acyl) prefix = 'acylamino';
      else [prefix, suffix] = ['amino', 'amine'];
    } else if (e === 'C') {
      const terminalO = rest.filter((b) => el(b) === 'O' && heavy(b, x).length === 0 && hCount(b) === 0);
      const hydroxyO = rest.filter((b) => el(b) === 'O' && heavy(b, x).length === 0 && hCount(b) > 0);
      const etherO = rest.filter((b) => el(b) === 'O' && heavy(b, x).length > 0);
      const nitrogen = rest.filter((b) => el(b) === 'N');
      if (terminalO.length === 1 && hydroxyO.length === 1) [prefix, suffix] = ['carboxy', 'acid'];
      else if (terminalO.length === 1 && etherO.length === 1) [prefix, suffix] = ['alkoxycarbonyl', 'ester'];
      else if (terminalO.length === 1 && nitrogen.length === 1) [prefix, suffix] = ['carbamoyl', 'amide'];
      else if (rest.length === 1 && el(rest[0]!) === 'N' && heavy(rest[0]!, x).length === 0 && hCount(rest[0]!) === 0) [prefix, suffix] = ['cyano', 'nitrile'];
      else if (terminalO.length === 1 && rest.length === 1) [prefix, suffix] = ['formyl', 'aldehyde'];
      else if (rest.length === 0) prefix = 'methyl';
      else if (rest.every((b) => el(b) === 'O') && rest.length === 1 && heavy(rest[0]!, x).length === 0) prefix = 'hydroxymethyl';
      else prefix = 'alkyl';
    }
    out.push({ ringAtom, atom: x, prefix, suffix });
  }
  return out;
}
