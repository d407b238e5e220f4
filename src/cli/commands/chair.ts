/** `conformark chair FILE`: a ring drawn as the trade's chair (template) or as its true view (projected). */
import type { Command } from 'commander';
import {
  chairFigure,
  prepareRecord,
  protectInput,
  readRecord,
  ringSelection,
  ringTokenKind,
  toPlacementJson,
  toReportRing,
  writeAtomic,
  writeFigure,
  ringHydrogenMode,
  usageError,
  type RingLabels,
  type RingView,
  jsonText,
} from '../../index.js';
import { finiteNumber, limitsOf, ringScopeOf, oneOf, printWarnings, wholeNumber, DPI_HELP, dpiOption } from '../options.js';

interface ChairFlags {
  ring?: string;
  record?: string;
  view?: string;
  elevation?: string;
  hydrogens?: string;
  labels?: string;
  caption?: boolean;
  theme?: string;
  idPrefix?: string;
  json?: boolean;
  output?: string;
  dpi?: string;
}

/** Adds the `chair` command to the program. */
export function registerChair(program: Command): void {
  program
    .command('chair')
    .description('draw a ring: the trade chair (template) for chairs, the true orthographic view (projected) for any ring')
    .argument('<file>', 'coordinate file (XYZ, SDF/molfile, PDB; .gz read transparently; - for standard input)')
    .option('--ring <R>', 'ring number as inspect lists it, an ordered atom list such as 1-2-3-4-5-6 or O5-C1-C2-C3-C4-C5, or a residue such as A/NAG501/; several ring numbers such as 1,2 draw fused chairs (default: the first six-ring, with the chairs edge-fused to it, else the first ring)')
    .option('--record <n>', 'record (frame) to draw, counted from 1 (default 1)')
    .option('--view <mode>', 'template (trade chair; chairs only) or projected (true view of any ring) (default: template for chairs, else projected)')
    .option('--elevation <deg>', 'viewer elevation above the ring plane in degrees, -90 to 90, for the projected view (giving it picks that view) (default 20)')
    .option('--hydrogens <mode>', 'ring hydrogens drawn: all, stereo (only an H that shows a configuration: at a ring atom with one heavy substituent) or none (default stereo)')
    .option('--labels <mode>', 'element (groups such as OH, CH₂OH, and ring locants), id (element + number) or name (atom names from the file) (default element)')
    .option('--no-caption', 'leave out the caption (shape, descriptor, Q/θ/φ)')
    .option('--theme <name|path>', 'column (print), projector (slides), contrast (colour-blind-safe), or a theme .json file (default column)')
    .option('--id-prefix <p>', 'prefix for ids inside the SVG, to keep several figures on one page apart (default chair-)')
    .option('--json', 'print the ring analysis and the 2D placement (conformark/chair@1) instead of a figure')
    .option('--dpi <n>', DPI_HELP)
    .option('-o, --output <file>', 'write to FILE (.svg, .png or .pdf; .json with --json) instead of standard output')
    .action(async (file: string, flags: ChairFlags, command: Command) => {
      const { read, maxPixels } = limitsOf(command);
      if (flags.output) protectInput(file);
      const recordNumber = wholeNumber('--record', flags.record ?? '1');
      const { molecule, graph, rings } = prepareRecord(await readRecord(file, recordNumber, read), ringScopeOf(command));
      // `--ring 1,2`: fused chairs of those rings
      const fused = flags.ring !== undefined && /^\s*\d+(\s*,\s*\d+)+\s*$/.test(flags.ring) ? flags.ring.split(',').map((n) => Number(n)) : undefined;
      const ordered = flags.ring !== undefined && !fused && ringTokenKind(flags.ring) === 'atoms';
      const ring = flags.ring === undefined || fused ? undefined : ringNumberOrAtoms(ringSelection(molecule, graph, rings, flags.ring), rings, ordered);
      const figure = chairFigure(molecule, {
        graph, rings, ring, ordered, fused,
        view: flags.view === undefined ? undefined : oneOf<RingView>('--view', flags.view, ['template', 'projected'], 'template'),
        elevationDeg: flags.elevation === undefined ? undefined : finiteNumber('--elevation', flags.elevation, -90, 90),
        hydrogens: hydrogensFlag(flags.hydrogens),
        labels: oneOf<RingLabels>('--labels', flags.labels, ['element', 'id', 'name'], 'element'),
        caption: flags.caption !== false,
        theme: flags.theme,
        idPrefix: flags.idPrefix,
      });
      printWarnings(figure.warnings, `${file}: record ${recordNumber}`);
      if (flags.json) {
        const fusedRings = figure.rings ? { rings: figure.rings.map(toReportRing) } : {};
        const report = { schema: 'conformark/chair@1', record: recordNumber, ring: toReportRing(figure.ring), ...fusedRings, placement: toPlacementJson(figure.placement) };
        const text = jsonText(report);
        if (flags.output) writeAtomic(flags.output, text);
        else process.stdout.write(text);
        return;
      }
      if (flags.output) await writeFigure(flags.output, figure.svg, { dpi: dpiOption(flags.dpi), maxPixels });
      else process.stdout.write(`${figure.svg}\n`);
    });
}

/** A selected ring as its number among `rings` (so reports carry the ring id), or its atoms when ordered by hand. */
function ringNumberOrAtoms(picked: number[], rings: readonly (readonly number[])[], ordered: boolean): number[] | number {
  if (ordered) return picked;
  const k = rings.findIndex((r) => r.length === picked.length && r.every((a, i) => a === picked[i]));
  return k < 0 ? picked : k + 1;
}

/** `--hydrogens all|stereo|none` (the earlier `show` and `hide` still read as `all` and `none`). */
function hydrogensFlag(word: string | undefined) {
  const mode = ringHydrogenMode(word);
  if (!mode) throw usageError('bad-option', `--hydrogens expects one of all, stereo, none, got "${word}"`);
  return mode;
}
