/**
 * Writes the Newman examples in gallery/ from molecules built from internal coordinates (test/helpers):
 * `npx tsx scripts/newman-gallery.ts`. Nothing here is drawn by hand.
 */
import { writeFigure } from '../src/api/writeFigure.js';
import { NEWMAN_CASES, caseSvg } from '../test/helpers/newmanGallery.js';

const picks: [string, string, string][] = [
  ['butane-gauche', 'column', 'gallery/newman-butane-gauche.svg'],
  ['butane-anti-ideal', 'contrast', 'gallery/newman-butane-anti-ideal.svg'],
  ['chair-ring-bond', 'projector', 'gallery/newman-cyclohexane-ring-bond.svg'],
];
for (const [name, theme, path] of picks) {
  const c = NEWMAN_CASES.find((k) => k.name === name)!;
  await writeFigure(path, caseSvg(c, theme));
  process.stdout.write(`wrote ${path}\n`);
}
