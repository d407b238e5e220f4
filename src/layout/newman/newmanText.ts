/** Words of a Newman figure: torsion values, caption lines and the SVG description. */
import type { Molecule } from '../../model/molecule.js';
import type { NewmanView } from '../../analysis/newman.js';
import { COUPLING_METHOD_SHORT_NAMES, type CouplingMethod } from '../../analysis/coupling.js';
import type { NewmanAngles } from './newmanAngles.js';
import { atomLabelText, type NewmanLabels } from '../text/atomLabelText.js';

const MINUS = '\u2212';

/** Chemical names of atoms (0-based index → `C1`, `O5`, `H2`), from `chemicalNumbering`. */
export type AtomNames = ReadonlyMap<number, string>;

/** A signed whole-degree torsion as printed (`+65°`, `−65°`, `180°`, `0°`); `n/a` when undefined. */
export function torsionText(deg: number | null): string {
  if (deg === null) return 'n/a';
  const r = Math.round(deg);
  if (r === 0 || r === 180 || r === -180) return `${Math.abs(r)}°`;
  return `${r < 0 ? MINUS : '+'}${Math.abs(r)}°`;
}

/**
 * How an atom is named in captions: its chemical name (`element` labels, when known), its file name (`name`
 * labels), else element + file number (`id` labels, and atoms without a chemical name).
 */
const namer = (mol: Molecule, labels: NewmanLabels, names: AtomNames | undefined) => (i: number) =>
  (labels === 'element' ? names?.get(i) : undefined) ?? atomLabelText(mol, i, labels === 'name' ? 'name' : 'id');

/** One-line statement of a marked pair: `C1/C4 +65° (+sc, gauche)`. */
function pairLine(view: NewmanView, id: (i: number) => string, x: number, y: number): string {
  const p = view.pairs.find((q) => q.front === x && q.back === y);
  if (!p || p.torsionDeg === null) return `${id(x)}/${id(y)} undefined`;
  return `${id(x)}/${id(y)} ${torsionText(p.torsionDeg)} (${p.klynePrelog!.replace('-', MINUS)}, ${p.relation})`;
}

/** Caption lines: the bond with its conformation, then one line per marked pair. */
export function newmanCaption(view: NewmanView, mol: Molecule, marks: readonly (readonly [number, number])[], angles: NewmanAngles, labels: NewmanLabels = 'id', names?: AtomNames): string[] {
  const id = namer(mol, labels, names);
  const head = `${id(view.front)}–${id(view.back)}${view.conformation ? `, ${view.conformation}` : ''}${angles === 'ideal' ? ' (ideal spacing)' : ''}`;
  return [head, ...marks.map(([x, y]) => pairLine(view, id, x, y))];
}

/** The `<desc>` text: viewing direction, drawing mode, conformation and marked torsions. */
export function newmanDescription(view: NewmanView, mol: Molecule, marks: readonly (readonly [number, number])[], angles: NewmanAngles, labels: NewmanLabels = 'id', names?: AtomNames): string {
  const id = namer(mol, labels, names);
  const mode = angles === 'ideal' ? 'bonds at ideal even spacing, measured torsions printed' : 'bonds at their measured projected azimuths';
  const parts = [
    `Viewed from ${id(view.front)} (front) towards ${id(view.back)} (back); ${mode}.`,
    view.conformation ? `Conformation: ${view.conformation} (smallest offset ${Math.round(view.minOffsetDeg!)}°).` : 'Conformation undefined.',
    ...marks.map(([x, y]) => `${pairLine(view, id, x, y)}.`),
  ];
  return parts.join(' ');
}

/** Lines `³J(H1,H2) 7.7 Hz (+174°)` for each predicted coupling, in the order given, plus the method. */
export function couplingLines(
  view: NewmanView,
  mol: Molecule,
  couplings: readonly { front: number; back: number; jHz: number; method: string }[],
  labels: NewmanLabels = 'id',
  names?: AtomNames,
): string[] {
  if (couplings.length === 0) return [];
  const id = namer(mol, labels, names);
  const lines = couplings.map((c) => {
    const p = view.pairs.find((q) => q.front === c.front && q.back === c.back);
    return `³J(${id(c.front)},${id(c.back)}) ${c.jHz.toFixed(1)} Hz (${torsionText(p?.torsionDeg ?? null)})`;
  });
  const method = couplings[0]!.method;
  return [...lines, `³J estimates: ${COUPLING_METHOD_SHORT_NAMES.get(method as CouplingMethod) ?? method}`];
}
