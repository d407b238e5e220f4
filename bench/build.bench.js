// Times `buildConformers` (compiled dist/) against a baseline measured in the same run: openchemlib's
// conformer generator plus one MMFF94s minimisation of the same molecule, done directly.
import { performance } from 'node:perf_hooks';
import { ConformerGenerator, ForceFieldMMFF94, Molecule, Resources } from 'openchemlib';
import { buildConformers } from '../dist/index.js';

Resources.registerFromNodejs();
const cases = [
  ['cyclohexane', 'C1CCCCC1', { ringForms: true }],
  ['beta-D-glucose', 'OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O', {}],
  ['beta-D-glucose', 'OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O', { ringForms: true }],
];

function baseline(smiles) {
  const t = performance.now();
  const mol = Molecule.fromSmiles(smiles);
  const generator = new ConformerGenerator(1);
  generator.initializeConformers(mol);
  new ForceFieldMMFF94(generator.getNextConformerAsMolecule(), 'MMFF94s').minimise();
  return performance.now() - t;
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
for (const [name, smiles, options] of cases) {
  // openchemlib's first call on a structure is much slower (code warm-up, caches): warm both paths first
  baseline(smiles);
  await buildConformers(smiles, options);
  const base = median([0, 1, 2].map(() => baseline(smiles)));
  const times = [];
  let molecules = [];
  for (let k = 0; k < 3; k++) {
    const t = performance.now();
    ({ molecules } = await buildConformers(smiles, options));
    times.push(performance.now() - t);
  }
  const ms = median(times);
  const label = `${name}${options.ringForms ? ' --ring-forms' : ''}`;
  console.log(`build ${label}: ${ms.toFixed(0)} ms for ${molecules.length} conformers; ` +
    `baseline (one conformer, one minimisation) ${base.toFixed(0)} ms; ratio ${(ms / base).toFixed(1)}`);
}
