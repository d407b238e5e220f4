/** Label texts of ring figures: substituent groups (`OH`, `CH₃`, `CH₂OH`), ring locants and ring heteroatoms. */
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import { atomLabelText, type NewmanLabels } from '../text/atomLabelText.js';

/** What labels show: element symbols and condensed groups, element + 1-based number, or file atom names. */
export type RingLabels = NewmanLabels;

const SUB = '₀₁₂₃₄₅₆₇₈₉';
const subscript = (n: number) => (n > 1 ? [...String(n)].map((d) => SUB[Number(d)]).join('') : '');

/** `C`, `CH₃`, `OH`: an atom with its hydrogens (those not drawn as bonds of their own). */
function withHydrogens(mol: Pick<Molecule, 'atoms'>, graph: Graph, atom: number): string {
  const h = graph.neighbors[atom]!.filter((b) => mol.atoms[b]!.element === 'H').length;
  const el = mol.atoms[atom]!.element;
  return el === 'H' ? 'H' : `${el}${h ? `H${subscript(h)}` : ''}`;
}

/**
 * Condensed text of the group that starts at `atom` (bonded to ring atom `from`): the atom with its hydrogens,
 * followed by each further heavy neighbour that carries nothing but hydrogens (`CH₂OH`, `OCH₃`, `COOH` is `CO` +
 * `OH`…); deeper groups are left at their first atom. In a file without hydrogens the parts are joined by a bond
 * dash (`C–O`), since `CO` would read as a carbonyl.
 */
export function groupText(mol: Pick<Molecule, 'atoms'>, graph: Graph, atom: number, from: number): string {
  let text = withHydrogens(mol, graph, atom);
  if (mol.atoms[atom]!.element === 'H') return text;
  const join = mol.atoms.some((a) => a.element === 'H') ? '' : '–';
  for (const b of graph.neighbors[atom]!) {
    if (b === from || mol.atoms[b]!.element === 'H') continue;
    const heavy = graph.neighbors[b]!.filter((c) => c !== atom && mol.atoms[c]!.element !== 'H');
    if (heavy.length === 0) text += join + withHydrogens(mol, graph, b);
  }
  return text;
}

/** Substituent label in a mode: condensed group for `element`, else the newman-style id or name. */
export function substituentLabel(mol: Molecule, graph: Graph, atom: number, from: number, mode: RingLabels): string {
  return mode === 'element' ? groupText(mol, graph, atom, from) : atomLabelText(mol, atom, mode);
}

/** Small label beside ring atom j: its locant (`element` mode, carbons only), else id or name. */
export function ringAtomLabel(mol: Molecule, ring: RingAnalysis, j: number, mode: RingLabels): string | null {
  const atom = ring.atoms[j]!;
  if (mode !== 'element') return atomLabelText(mol, atom, mode);
  const locant = ring.locants[j]!;
  return /^\d+$/.test(locant) ? locant : null;
}

/** Element symbol written at a ring vertex (heteroatoms only), or null for carbon. */
export function ringVertexLabel(mol: Pick<Molecule, 'atoms'>, atom: number): string | null {
  const el = mol.atoms[atom]!.element;
  return el === 'C' ? null : el;
}
