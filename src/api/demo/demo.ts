/**
 * `conformark demo`: renders the bundled demo scenario (examples/, the invented "Wren route") into a gallery
 * folder with an index page. Every step is an ordinary library call, so the gallery doubles as a tour of the
 * API; the same inputs give the same bytes, and the committed gallery/ is exactly what this produces.
 */
import { existsSync } from 'node:fs';
import { relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { usageError } from '../../model/errors.js';
import { OutputFolder, type ManifestKind } from '../../io/outputFolder.js';
import { readRecord, prepareRecord } from '../prepare.js';
import { newmanFigure } from '../figures/newman.js';
import { chairFigure } from '../figures/chair.js';
import { ensembleFile } from '../ensemble/ensemble.js';
import { ensembleText } from '../ensemble/ensembleText.js';
import { writeEnsembleFigures } from '../ensemble/ensembleFigures.js';
import { batchFile } from '../batch/batch.js';
import { exploreFile } from '../explore/exploreFile.js';
import { jsonText } from '../jsonText.js';
import { inspectFile } from '../inspect/inspect.js';
import { inspectText } from '../inspect/inspectText.js';
import { galleryPage, type GallerySection } from './galleryPage.js';
import { svgSizePt } from '../../render/renderPdf.js';
import { DEMO_TRAJECTORY, demoTrajectory } from './demoTrajectory.js';

/** Options of {@link renderDemo}. */
export interface DemoOptions {
  /** Folder to render into (its previous demo files are replaced). Default `gallery`. */
  readonly outDir?: string;
  /** Folder with the scenario's input files. Default: the `examples/` folder shipped with conformark. */
  readonly examplesDir?: string;
  /** Worker threads for the batch step. Default 1 (the demo is small; threads would only add start-up time). */
  readonly jobs?: number;
}

/** What {@link renderDemo} wrote. */
export interface DemoResult {
  readonly outDir: string;
  /** Every file written, relative to `outDir`, sorted. */
  readonly files: readonly string[];
}

/** The scenario's input files, relative to the examples folder. */
export const DEMO_INPUTS = {
  w2: 'w2-methylcyclohexanol.sdf',
  w3: 'w3-methyl-glucoside.sdf',
  w4: 'w4-methyloxolanol.sdf',
  walk: DEMO_TRAJECTORY,
} as const;

const shippedExamples = (): string => fileURLToPath(new URL('../../../examples/', import.meta.url));

/**
 * Renders the demo scenario into `outDir` with `index.html`.
 * @example await renderDemo({ outDir: 'gallery' })
 */
export async function renderDemo(options: DemoOptions = {}): Promise<DemoResult> {
  const outDir = options.outDir ?? 'gallery';
  const examples = options.examplesDir ?? shippedExamples();
  // Inputs are named relative to the working folder: that name appears in titles and reports, so the gallery
  // made from the project folder (npm run demo) is the same wherever the project is checked out.
  const input = (name: string) => {
    const path = relative(process.cwd(), resolve(examples, name)) || name;
    if (!existsSync(path)) throw usageError('missing-example', `demo input ${path} is missing`, path);
    return path;
  };
  const folder = OutputFolder.open(outDir, DEMO_MANIFEST);
  try {
    return await demoInto(folder, outDir, input, options);
  } catch (err) {
    folder.abort();
    throw err;
  }
}

async function demoInto(folder: OutputFolder, outDir: string, input: (name: string) => string, options: DemoOptions): Promise<DemoResult> {
  const out = (name: string) => `${outDir}/${name}`;
  const write = (name: string, data: string) => folder.write(name, data);
  const nested: string[] = [];
  const sections: GallerySection[] = [];

  // 1. W2: the ring-flip ensemble of trans-2-methylcyclohexan-1-ol.
  const w2 = input(DEMO_INPUTS.w2);
  const w2Low = prepareRecord(await readRecord(w2, 1));
  const w2Flip = await readRecord(w2, 3);
  const w2Boat = await readRecord(w2, 5);
  write('w2-newman-c7-c2.svg', newmanFigure(w2Low.molecule, { bond: [6, 1], graph: w2Low.graph, rings: w2Low.rings, couplings: true, idPrefix: 'w2n-' }).svg);
  write('w2-chair-diequatorial.svg', chairFigure(w2Low.molecule, { idPrefix: 'w2c1-' }).svg);
  write('w2-chair-diaxial.svg', chairFigure(w2Flip, { idPrefix: 'w2c3-' }).svg);
  write('w2-twist-boat-projected.svg', chairFigure(w2Boat, { elevationDeg: 35, idPrefix: 'w2tb-' }).svg);
  const ensemble = await ensembleFile(w2);
  write('w2-ensemble.txt', ensembleText(ensemble.report));
  write('w2-ensemble.json', jsonText(ensemble.report));
  const [sheet, ladder] = writeEnsembleFigures(ensemble, outDir, { idPrefix: 'w2e-', write: folder.writer });
  write('w2-explore.html', (await exploreFile(w2)).html);
  sections.push({
    id: 'w2',
    title: 'W2 · trans-2-methylcyclohexan-1-ol',
    text: 'Ten MMFF94s conformers from conformark build --ring-forms: both chairs with their hydroxyl rotamers, and the twist-boats a plain conformer search misses.',
    figures: [
      { file: 'w2-newman-c7-c2.svg', caption: 'Newman projection along C7–C2 of the lowest conformer (front: the carbinol carbon), true azimuths, with predicted ³J(H,H).' },
      { file: 'w2-chair-diequatorial.svg', caption: 'Lowest conformer: chair with OH and CH₃ both equatorial (template drawing placed from the measured displacements).' },
      { file: 'w2-chair-diaxial.svg', caption: 'The flipped chair (record 3): the same two groups now axial.' },
      { file: 'w2-twist-boat-projected.svg', caption: 'A twist-boat (record 5), drawn as the true orthographic view of its coordinates.' },
      { file: sheet!, caption: 'Ensemble sheet: every conformer in energy order with ΔE and Boltzmann population (298.15 K, from energies).' },
      { file: ladder!, caption: 'Energy ladder of the ensemble, kcal/mol relative to the lowest conformer.' },
    ],
    links: [
      { file: 'w2-ensemble.txt', label: 'ranked table (text)' },
      { file: 'w2-ensemble.json', label: 'ensemble report (conformark/ensemble@1)' },
      { file: 'w2-explore.html', label: 'explorer page (conformark explore): point at any bond or ring of any conformer' },
    ],
  });

  // 2. W3: methyl β-D-glucopyranoside, with the supporting-information tables of all its conformers.
  const w3 = input(DEMO_INPUTS.w3);
  const w3Low = prepareRecord(await readRecord(w3, 1));
  write('w3-chair.svg', chairFigure(w3Low.molecule, { idPrefix: 'w3c-' }).svg);
  write('w3-newman-c1-c2.svg', newmanFigure(w3Low.molecule, { bond: [2, 11], graph: w3Low.graph, rings: w3Low.rings, angles: 'ideal', couplings: true, idPrefix: 'w3n-' }).svg);
  write('w3-inspect.txt', inspectText(await inspectFile(w3, { couplings: true })));
  const batch = await batchFile(w3, out('w3-si'), { jobs: options.jobs ?? 1, idPrefix: 'w3b-' });
  nested.push('w3-si/manifest.json', ...[...batch.manifest.figures, ...batch.manifest.tables].map((f) => `w3-si/${f.path}`));
  const tables = batch.manifest.tables.map((t) => ({ file: `w3-si/${t.path}`, label: `${t.kind} (${t.format})` }));
  sections.push({
    id: 'w3',
    title: 'W3 · methyl β-D-glucopyranoside',
    text: 'Four conformers, all ⁴C₁ chairs differing in their exocyclic rotamers; every ring bond of every conformer is drawn and tabulated for the supporting information.',
    figures: [
      { file: 'w3-chair.svg', caption: '⁴C₁ chair of the lowest conformer: every exocyclic heavy atom equatorial, every ring hydrogen axial.' },
      { file: 'w3-newman-c1-c2.svg', caption: 'Newman projection along C1–C2 in ideal 120° spacing, labelled with the measured torsions and the predicted H1–H2 coupling.' },
      ...batch.manifest.figures.filter((f) => f.kind === 'sheet').map((f) => ({ file: `w3-si/${f.path}`, caption: 'Contact sheet of the batch: a Newman projection for every ring bond and a ring drawing for every conformer.' })),
    ],
    links: [{ file: 'w3-inspect.txt', label: 'inspect summary with couplings' }, { file: 'w3-si/manifest.json', label: 'batch manifest' }, ...tables],
  });

  // 3. W4: a five-membered ring.
  const w4 = input(DEMO_INPUTS.w4);
  const w4Low = prepareRecord(await readRecord(w4, 1));
  write('w4-ring-projected.svg', chairFigure(w4Low.molecule, { elevationDeg: 30, idPrefix: 'w4r-' }).svg);
  write('w4-newman-c2-c6.svg', newmanFigure(w4Low.molecule, { bond: [1, 5], graph: w4Low.graph, rings: w4Low.rings, idPrefix: 'w4n-' }).svg);
  sections.push({
    id: 'w4',
    title: 'W4 · 2-methyloxolan-3-ol',
    text: 'A five-membered ring: Cremer–Pople φ₂ with the Altona–Sundaralingam phase, twist and envelope descriptors, pseudo-axial and pseudo-equatorial positions.',
    figures: [
      { file: 'w4-ring-projected.svg', caption: 'Lowest conformer, true projected view: a twist, with its descriptor and puckering amplitude.' },
      { file: 'w4-newman-c2-c6.svg', caption: 'Newman projection along the ring bond C2–C6 (ring neighbour up).' },
    ],
    links: [],
  });

  // 4. The ring walk: puckering along a (synthetic) trajectory.
  const walk = await demoTrajectory(input(DEMO_INPUTS.walk), outDir);
  nested.push(...walk.files.map((f) => `walk/${f}`));
  sections.push(walk.section);

  // 5. The page.
  const sized = sections.map((s) => ({
    ...s,
    figures: s.figures.map((f) => ({ ...f, widthPt: svgSizePt(folder.read(f.file)).width })),
  }));
  write('index.html', galleryPage(sized));
  const files = [...folder.written, ...nested].sort();
  folder.commit(jsonText({ schema: 'conformark/demo@1', files }), nested);
  return { outDir, files };
}

/** Marker a demo run leaves in its folder: the files it wrote, so the next run replaces exactly those. */
const MARKER = '.conformark-demo.json';

/** How the demo's marker lists what it wrote (a non-empty folder without one is refused). */
export const DEMO_MANIFEST: ManifestKind = {
  name: MARKER,
  schema: 'conformark/demo@1',
  files: (doc) => (Array.isArray(doc.files) ? doc.files : [null]),
  ownsWholeFolder: 'conformark demo',
};
