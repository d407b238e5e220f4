/**
 * The label a chemist writes for a substituent, in both reading directions, so that the atom the bond comes
 * from sits at the bond end: `OH` to the right of its bond and `HO` to the left, `CH₂OH` / `HOH₂C`,
 * `CO₂Me` / `MeO₂C`. Common groups get their usual abbreviations (Me in OMe, Ac, Et, iPr, tBu, Ph, Bn); anything
 * else becomes a condensed formula written from the bonded atom outward (branches in parentheses). Text
 * direction, abbreviations and subscripted counts follow IUPAC Recommendations 2008, Graphical representation
 * standards for chemical structure diagrams (Brecher, Pure Appl. Chem. 80, 277). A ring atom that shares a ring
 * with the atom it is bonded from (fused or spiro systems) is named by its chemical locant, never a formula.
 */
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { TextRun } from '../scene.js';
import { textRuns } from './textRuns.js';

/** A substituent label in both directions (markup runs), and the bonded atom's symbol. */
export interface GroupLabel {
  /** Bonded atom first, reading away from the bond: `CH_2OH`. */
  readonly forward: readonly TextRun[];
  /** Bonded atom last, reading toward the bond: `HOH_2C`. */
  readonly reversed: readonly TextRun[];
  /** The bonded atom's symbol as it starts `forward` and ends `reversed` (`C`, `O`, `Ph`, `C4a`). */
  readonly anchor: string;
}

/** Context for {@link groupLabel}: rings (cyclic 0-based lists) and chemical names of atoms. */
export interface GroupContext {
  readonly rings?: readonly (readonly number[])[];
  readonly names?: ReadonlyMap<number, string>;
}

const both = (f: string, r: string, anchor: string): GroupLabel => ({ forward: textRuns(f), reversed: textRuns(r), anchor });
const same = (t: string, anchor = t): GroupLabel => both(t, t, anchor);
const sub = (n: number) => (n > 1 ? `_{${n}}` : '');
/** `H`, `H_{2}`… for n hydrogens, nothing for none. */
const hText = (n: number) => (n > 0 ? `H${sub(n)}` : '');

/** Whether the bond a–b is a double bond to a terminal O or S (file order 2, or a perceived O/S with no H). */
export function isTerminalDouble(mol: Pick<Molecule, 'atoms'>, graph: Graph, a: number, b: number): boolean {
  const e = mol.atoms[b]!.element;
  if ((e !== 'O' && e !== 'S') || graph.neighbors[b]!.length !== 1) return false;
  const order = graph.order(a, b);
  if (order === 2) return true;
  if (order !== 1) return false;
  // perceived bonds come as single: a lone terminal O or S on C, S, P or N is a double bond (no H, no charge read)
  const centre = mol.atoms[a]!.element;
  return ['C', 'S', 'P', 'N'].includes(centre) && graph.neighbors[a]!.length < (centre === 'C' ? 4 : 5);
}

/**
 * Label of the group starting at `atom`, bonded from `from`.
 * @example runsText(groupLabel(mol, graph, o6, c6).reversed) // 'HO'
 */
export function groupLabel(mol: Pick<Molecule, 'atoms'>, graph: Graph, atom: number, from: number, context: GroupContext = {}): GroupLabel {
  const el = (a: number) => mol.atoms[a]!.element;
  const kids = (a: number, parent: number) => graph.neighbors[a]!.filter((b) => b !== parent && el(b) !== 'H');
  const hs = (a: number) => graph.neighbors[a]!.filter((b) => el(b) === 'H').length;
  const e = el(atom);
  if (e === 'H') return same('H');
  const rings = context.rings ?? [];
  if (rings.some((r) => r.includes(atom) && r.includes(from))) {
    // a locant is written on the line (C3, O5, C4a): a subscript would read as an atom count
    const name = context.names?.get(atom) ?? e;
    return { forward: [{ text: name }], reversed: [{ text: name }], anchor: name };
  }
  const k = kids(atom, from);
  const isMethyl = (a: number, p: number) => el(a) === 'C' && kids(a, p).length === 0 && hs(a) === 3;
  const isPhenyl = (a: number) => rings.some((r) => r.length === 6 && r.includes(a) && r.every((x) => el(x) === 'C' && graph.neighbors[x]!.length === 3));
  const terminalO = (a: number, p: number) => kids(a, p).filter((b) => el(b) === 'O' && kids(b, a).length === 0 && hs(b) === 0);
  const isAcetyl = (a: number, p: number) => el(a) === 'C' && terminalO(a, p).length === 1 && kids(a, p).length === 2 && kids(a, p).some((b) => isMethyl(b, a));
  const isBenzyl = (a: number, p: number) => el(a) === 'C' && hs(a) === 2 && kids(a, p).length === 1 && isPhenyl(kids(a, p)[0]!);
  const isEthyl = (a: number, p: number) => el(a) === 'C' && hs(a) === 2 && kids(a, p).length === 1 && isMethyl(kids(a, p)[0]!, a);

  if (isPhenyl(atom)) return same('Ph');
  if (['F', 'Cl', 'Br', 'I'].includes(e) && k.length === 0) return same(e);
  if (e === 'O' || e === 'S') {
    if (k.length === 0) return hs(atom) > 0 ? both(`${e}H`, `H${e}`, e) : same(e);
    if (k.length === 1) {
      const c = k[0]!;
      const tail = isMethyl(c, atom) ? 'Me' : isAcetyl(c, atom) ? 'Ac' : isEthyl(c, atom) ? 'Et' : isBenzyl(c, atom) ? 'Bn' : isPhenyl(c) ? 'Ph' : null;
      if (tail) return both(`${e}${tail}`, `${tail}${e}`, e);
    }
  }
  if (e === 'N') {
    const h = hs(atom);
    if (k.length === 0) return both(`N${hText(h)}`, `${hText(h)}N`, 'N');
    if (k.length === 1 && h === 1 && isAcetyl(k[0]!, atom)) return both('NHAc', 'AcHN', 'N');
    if (k.length === 1 && h === 1 && isMethyl(k[0]!, atom)) return both('NHMe', 'MeHN', 'N');
    if (k.length === 2 && h === 0 && k.every((b) => isMethyl(b, atom))) return both('NMe_2', 'Me_2N', 'N');
    if (k.length === 2 && k.every((b) => el(b) === 'O' && kids(b, atom).length === 0 && hs(b) === 0)) return both('NO_2', 'O_2N', 'N');
  }
  if (e === 'C') {
    const h = hs(atom);
    const oxo = terminalO(atom, from);
    const others = k.filter((b) => !oxo.includes(b));
    if (k.length === 0) return both(`C${hText(h)}`, `${hText(h)}C`, 'C');
    if (oxo.length === 1 && others.length === 1) {
      const x = others[0]!;
      if (el(x) === 'O' && kids(x, atom).length === 0) return both('CO_2H', 'HO_2C', 'C');
      if (el(x) === 'O' && kids(x, atom).length === 1 && isMethyl(kids(x, atom)[0]!, x)) return both('CO_2Me', 'MeO_2C', 'C');
      if (el(x) === 'O' && kids(x, atom).length === 1 && isEthyl(kids(x, atom)[0]!, x)) return both('CO_2Et', 'EtO_2C', 'C');
      if (isMethyl(x, atom)) return same('Ac', 'Ac');
      if (el(x) === 'N' && kids(x, atom).length === 0) return both(`CON${hText(hs(x))}`, `${hText(hs(x))}NOC`, 'C');
    }
    if (oxo.length === 1 && others.length === 0 && h === 1) return both('CHO', 'OHC', 'C');
    if (k.length === 1 && el(k[0]!) === 'N' && kids(k[0]!, atom).length === 0 && hs(k[0]!) === 0 && h === 0) return both('CN', 'NC', 'C');
    if (k.length === 3 && k.every((b) => isMethyl(b, atom))) return same('tBu', 'tBu');
    if (k.length === 2 && h === 1 && k.every((b) => isMethyl(b, atom))) return same('iPr', 'iPr');
    if (isEthyl(atom, from)) return same('Et', 'Et');
    if (isBenzyl(atom, from)) return same('Bn', 'Bn');
    if (k.length === 3 && h === 0 && k.every((b) => el(b) === 'F' && kids(b, atom).length === 0)) return both('CF_3', 'F_3C', 'C');
  }
  return condensed(mol, graph, atom, from, context);
}

/** Condensed formula from the bonded atom outward, and its mirror; branches in parentheses, like ones counted. */
function condensed(mol: Pick<Molecule, 'atoms'>, graph: Graph, atom: number, from: number, context: GroupContext): GroupLabel {
  const el = (a: number) => mol.atoms[a]!.element;
  const seen = new Set<number>([from]);
  // a hydrogen-free file: `CO` would read as a carbonyl, so the chain is written with bond dashes (C–O)
  const dash = mol.atoms.some((a) => a.element === 'H') ? '' : '–';
  const head = (a: number, reversed: boolean) => {
    const h = hText(graph.neighbors[a]!.filter((b) => el(b) === 'H').length);
    return reversed ? `${h}${el(a)}` : `${el(a)}${h}`;
  };
  const write = (a: number, parent: number, reversed: boolean, depth: number): string => {
    seen.add(a);
    const children = graph.neighbors[a]!.filter((b) => b !== parent && el(b) !== 'H' && !seen.has(b));
    if (depth > 6) return head(a, reversed);
    const inRing = (context.rings ?? []).some((r) => r.includes(a) && r.length >= 3 && children.some((c) => r.includes(c)));
    if (inRing) return head(a, reversed);
    const parts = children.map((c) => write(c, a, reversed, depth + 1));
    // identical leaf branches are counted: C(CH3)3
    const counted: string[] = [];
    const uniq = [...new Set(parts)];
    for (const p of uniq) {
      const n = parts.filter((q) => q === p).length;
      counted.push(n > 1 ? `(${p})${sub(n)}` : p);
    }
    const last = counted.length > 0 && !counted[counted.length - 1]!.startsWith('(') ? counted.pop()! : '';
    const branches = counted.map((p) => (p.startsWith('(') ? p : `(${p})`)).join('');
    const d = last ? dash : '';
    return reversed ? `${last}${d}${branches}${head(a, true)}` : `${head(a, false)}${branches}${d}${last}`;
  };
  const forward = write(atom, from, false, 0);
  seen.clear();
  seen.add(from);
  return both(forward, write(atom, from, true, 0), el(atom));
}
