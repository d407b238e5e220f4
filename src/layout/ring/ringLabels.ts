/** Label texts of ring figures: substituent groups (`OH`/`HO`, `CH₂OH`/`HOH₂C`), ring locants and ring heteroatoms. */
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import { atomLabelText, type NewmanLabels } from '../text/atomLabelText.js';
import { groupLabel, type GroupContext, type GroupLabel } from '../text/groupLabel.js';

/** What labels show: element symbols and condensed groups, element + 1-based number, or file atom names. */
export type RingLabels = NewmanLabels;

/**
 * Condensed text of the group that starts at `atom` (bonded to ring atom `from`), reading away from the ring:
 * `CH₂OH`, `OMe`, `NHAc`, `tBu` (see `groupLabel`), with Unicode subscripts for plain-text uses.
 */
export function groupText(mol: Pick<Molecule, 'atoms'>, graph: Graph, atom: number, from: number, context: GroupContext = {}): string {
  const SUB = '₀₁₂₃₄₅₆₇₈₉';
  return groupLabel(mol, graph, atom, from, context)
    .forward.map((r) => (r.shift === 'sub' && /^\d+$/.test(r.text) ? [...r.text].map((d) => SUB[Number(d)]).join('') : r.text))
    .join('');
}

/** Substituent label in a mode: the group in both directions for `element`, else the id or name (one text). */
export function substituentLabel(mol: Molecule, graph: Graph, atom: number, from: number, mode: RingLabels, context: GroupContext = {}): GroupLabel {
  if (mode === 'element') return groupLabel(mol, graph, atom, from, context);
  const text = atomLabelText(mol, atom, mode);
  return { forward: [{ text }], reversed: [{ text }], anchor: text };
}

/**
 * Small label beside ring atom j: its chemical locant (`element` mode, carbons only; from `names` when given,
 * else the ring's reference locant), else id or name.
 */
export function ringAtomLabel(mol: Molecule, ring: RingAnalysis, j: number, mode: RingLabels, names?: ReadonlyMap<number, string>): string | null {
  const atom = ring.atoms[j]!;
  if (mode !== 'element') return atomLabelText(mol, atom, mode);
  if (mol.atoms[atom]!.element !== 'C') return null;
  const name = names?.get(atom);
  if (name) return name.slice(1);
  const locant = ring.locants[j]!;
  return /^\d+$/.test(locant) ? locant : null;
}

/** Element symbol written at a ring vertex (heteroatoms only), or null for carbon. */
export function ringVertexLabel(mol: Pick<Molecule, 'atoms'>, atom: number): string | null {
  const el = mol.atoms[atom]!.element;
  return el === 'C' ? null : el;
}

