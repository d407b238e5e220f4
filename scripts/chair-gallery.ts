/**
 * Writes the ring-figure examples in gallery/ from molecules made here (openchemlib MMFF94s structures and
 * internal-coordinate rings from test/helpers): `npx tsx scripts/chair-gallery.ts`. Nothing is drawn by hand.
 */
import { chairFigure } from '../src/api/chair.js';
import { writeFigure } from '../src/api/writeFigure.js';
import { minimisedConformers } from '../test/helpers/fromOpenchemlib.js';
import { RING_CASES, ringCaseSvg } from '../test/helpers/chairCases.js';

const glucose = minimisedConformers('OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O', 1)[0]!;
const methyl = minimisedConformers('CC1CCCCC1', 1)[0]!;
const twist = RING_CASES.find((c) => c.name === 'twist-boat-projected')!;
const figures: [string, string][] = [
  ['gallery/chair-glucose-template.svg', chairFigure(glucose.mol, { rings: glucose.rings, theme: 'column', idPrefix: 'glucose-' }).svg],
  ['gallery/chair-methylcyclohexane-template.svg', chairFigure(methyl.mol, { rings: methyl.rings, theme: 'contrast', idPrefix: 'methylcyclohexane-' }).svg],
  ['gallery/ring-twist-boat-projected.svg', ringCaseSvg(twist, 'projector')],
];
for (const [path, svg] of figures) {
  await writeFigure(path, svg);
  process.stdout.write(`wrote ${path}\n`);
}
