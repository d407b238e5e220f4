/** Ring figures used as goldens and in gallery/: every molecule built from internal coordinates, none hand-drawn. */
import { chairFigure, type ChairFigureOptions } from '../../src/api/figures/chair.js';
import type { Molecule } from '../../src/model/molecule.js';
import { d2TwistBoat, d3dChair, ringMolecule } from './ringBuilders.js';

export interface RingFigureCase {
  readonly name: string;
  readonly mol: Molecule;
  readonly options: ChairFigureOptions;
}

const chair = ringMolecule(d3dChair(1.536, 111.4).points, { hydrogens: true });
const twist = ringMolecule(d2TwistBoat(1.536, 111.4), { hydrogens: true });

/** GED-like cyclohexane chair as the trade template and in its true view; a D2 twist-boat in its true view. */
export const RING_CASES: readonly RingFigureCase[] = [
  { name: 'cyclohexane-template', mol: chair.mol, options: { rings: [chair.ring] } },
  { name: 'twist-boat-projected', mol: twist.mol, options: { rings: [twist.ring], elevationDeg: 45 } },
  { name: 'cyclohexane-projected-ids', mol: chair.mol, options: { rings: [chair.ring], view: 'projected', hydrogens: 'hide', labels: 'id' } },
];

/** SVG text of a case in a theme, with a per-figure id prefix. */
export function ringCaseSvg(c: RingFigureCase, theme: string): string {
  return chairFigure(c.mol, { ...c.options, theme, idPrefix: `${c.name}-${theme}-` }).svg;
}
