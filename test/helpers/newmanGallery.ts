/** The Newman figures used as goldens and in gallery/: each built from internal coordinates, none hand-drawn. */
import { newmanFigure, type NewmanFigureOptions } from '../../src/api/figures/newman.js';
import type { Molecule } from '../../src/model/molecule.js';
import { butane, cyclohexaneChair, ethane } from './newmanMolecules.js';

export interface FigureCase {
  readonly name: string;
  readonly mol: Molecule;
  readonly options: NewmanFigureOptions;
}

const chair = cyclohexaneChair();

/** Named figure cases (theme and id prefix are added by the caller). */
export const NEWMAN_CASES: readonly FigureCase[] = [
  { name: 'butane-gauche', mol: butane(65), options: { bond: [1, 2] } },
  { name: 'butane-anti-ideal', mol: butane(180), options: { bond: [1, 2], angles: 'ideal', labels: 'id', mark: [[0, 3], [7, 9]] } },
  { name: 'ethane-eclipsed', mol: ethane(0), options: { bond: [0, 1] } },
  { name: 'chair-ring-bond', mol: chair.mol, options: { bond: [1, 2], rings: [chair.ring], hydrogens: 'collapse', labels: 'id' } },
];

/** SVG text of a case in a theme, with a per-figure id prefix. */
export function caseSvg(c: FigureCase, theme: string): string {
  return newmanFigure(c.mol, { ...c.options, theme, idPrefix: `${c.name}-${theme}-` }).svg;
}
