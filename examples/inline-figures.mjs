// Builds one HTML page that inlines several conformark figures as SVG, each with its own id prefix so that
// ids never clash on the page. Run after `npm run build`:
//   node examples/inline-figures.mjs [out.html]      (default: inline-figures.html in the current folder)
import { buildConformers, canDraw, figureBonds, figureSvg, prepareRecord, writeAtomic } from '../dist/index.js';

const out = process.argv[2] ?? 'inline-figures.html';
// Methylcyclohexane: the conformer search plus the flipped chair and twist-boats (openchemlib + MMFF94s).
const { molecules } = await buildConformers('CC1CCCCC1', { conformers: 1, ringForms: true, seed: 1 });
const escape = (s) => s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);

const cards = molecules.slice(0, 3).flatMap((mol, k) => {
  const { molecule, graph, rings } = prepareRecord(mol);
  const [bond] = figureBonds(molecule, graph, rings, 'ring'); // first ring bond, along the ring
  const energy = mol.properties['MMFF94s energy (kcal/mol)'];
  const figures = [{ what: `Newman projection along ${bond[0] + 1}–${bond[1] + 1}`, svg: figureSvg(mol, { bond, idPrefix: `c${k + 1}-newman-` }) }];
  if (canDraw('ring')) figures.push({ what: 'ring', svg: figureSvg(mol, { ring: 0, idPrefix: `c${k + 1}-ring-` }) });
  return figures.map((f) => `<figure>${f.svg}<figcaption>${escape(mol.title)}: ${escape(f.what)} (MMFF94s ${escape(energy ?? '?')} kcal/mol)</figcaption></figure>`);
});

const html = `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>conformark figures inlined in a page</title>
<style>
  body { font-family: sans-serif; margin: 2rem; }
  .grid { display: flex; flex-wrap: wrap; gap: 1.5rem; }
  figure { margin: 0; text-align: center; }
  figcaption { font-size: 0.85rem; max-width: 16rem; }
  /* the SVG is semantic: restyle roles by class */
  .back-atom { stroke: #0072b2; }
</style>
</head>
<body>
<h1>Methylcyclohexane conformers</h1>
<div class="grid">
${cards.join('\n')}
</div>
</body>
</html>
`;
writeAtomic(out, html);
console.log(`wrote ${out} with ${cards.length} inline figures`);
