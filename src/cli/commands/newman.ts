/** `conformark newman FILE --bond A-B`: Newman projection as SVG/PNG/PDF, or its analysis as JSON. */
import { join } from 'node:path';
import type { Command } from 'commander';
import {
  atomIndex,
  bondListSelection,
  COUPLING_METHODS,
  couplingsAcrossBond,
  isSkippedCoupling,
  noHydrogenWarning,
  type Coupling,
  type CouplingMethod,
  newmanFigure,
  newmanView,
  prepareRecord,
  protectInput,
  readRecord,
  toNewmanJson,
  usageError,
  writeAtomic,
  writeFigure,
  type Molecule,
  type NewmanAngles,
  type NewmanHydrogens,
  type NewmanLabels,
  jsonText,
} from '../../index.js';
import { limitsOf, ringScopeOf, oneOf, printWarnings, wholeNumber, DPI_HELP, dpiOption } from '../options.js';

interface NewmanFlags {
  bond: string[];
  record?: string;
  up?: string;
  angles?: string;
  mark?: string[];
  hydrogens?: string;
  labels?: string;
  theme?: string;
  idPrefix?: string;
  caption?: boolean;
  json?: boolean;
  couplings?: boolean;
  karplus?: string;
  output?: string;
  dpi?: string;
  dir?: string;
}

const collect = (value: string, list: string[] | undefined) => [...(list ?? []), value];

/** Where figure `k` of several goes: `DIR/newman-A-B.svg`, or the `-o` pattern with `{bond}` replaced. */
function figurePath(flags: NewmanFlags, bond: [number, number]): string {
  const name = `${bond[0] + 1}-${bond[1] + 1}`;
  if (flags.dir) return join(flags.dir, `newman-${name}.svg`);
  return flags.output!.replaceAll('{bond}', name);
}

/** Adds the `newman` command to the program. */
export function registerNewman(program: Command): void {
  program
    .command('newman')
    .description('Newman projection along a bond, looking from its first atom (front) to its second (back)')
    .argument('<file>', 'coordinate file (XYZ, SDF/molfile, PDB; .gz read transparently; - for standard input)')
    .requiredOption('--bond <A-B>', 'the bond, front atom first: positions from 1, atom names, #serials or chain/residue/atom, e.g. 2-3, C2-C3, A/PRO42/CA-A/PRO42/CB; repeat it or give a list 1-2,3-4 for several (one figure each, or one JSON array)', collect)
    .option('--record <n>', 'record (frame) to draw, counted from 1 (default 1)')
    .option('--up <atom>', 'front substituent drawn at 12 o\'clock (default: ring neighbour for ring bonds, else the heaviest)')
    .option('--angles <mode>', 'true: measured projected azimuths; ideal: even 120° spacing with measured torsions printed (default true)')
    .option('--mark <X:Y...>', 'front:back pairs to mark with a torsion arc (default: the heaviest pair)')
    .option('--hydrogens <mode>', 'show, hide, or collapse (short unlabelled stubs) (default show)')
    .option('--labels <mode>', 'element, id (element + number, e.g. C3) or name (atom name from the file) (default element)')
    .option('--theme <name|path>', 'column (print), projector (slides), contrast (colour-blind-safe), or a theme .json file (default column)')
    .option('--id-prefix <p>', 'prefix for ids inside the SVG, to keep several figures on one page apart (default newman-)')
    .option('--no-caption', 'leave out the caption under the drawing')
    .option('--couplings', 'print predicted ³J(H,H) for each H/H pair (estimates; Haasnoot–de Leeuw–Altona 1980 by default)')
    .option('--karplus <form>', `coupling equation: ${COUPLING_METHODS.join(', ')} (implies --couplings)`)
    .option('--json', 'print the analysis (conformark/newman@1) instead of a figure')
    .option('--dpi <n>', DPI_HELP)
    .option('-o, --output <file>', 'write to FILE (.svg, .png or .pdf; .json with --json) instead of standard output; with several bonds a pattern with {bond}, e.g. fig-{bond}.png')
    .option('-d, --dir <dir>', 'with several bonds: write DIR/newman-A-B.svg for each')
    .action(async (file: string, flags: NewmanFlags, command: Command) => {
      if (flags.output || flags.dir) protectInput(file);
      const { read, maxPixels } = limitsOf(command);
      const { molecule: mol, graph, rings } = prepareRecord(await readRecord(file, wholeNumber('--record', flags.record ?? '1'), read), ringScopeOf(command));
      const bonds = flags.bond.flatMap((text) => bondListSelection(mol, graph, text));
      const several = bonds.length > 1;
      if (several && (flags.up !== undefined || flags.mark !== undefined)) {
        throw usageError('bad-option', '--up and --mark name atoms of one bond: give them with a single --bond');
      }
      if (flags.dir && flags.json) throw usageError('bad-option', '-d writes figures; with --json, several bonds give one JSON array (use -o FILE)');
      if (several && !flags.json && !flags.dir && !flags.output?.includes('{bond}')) {
        throw usageError('bad-option', `${bonds.length} bonds give ${bonds.length} figures: write them with -d DIR or -o with {bond} in the name, e.g. -o newman-{bond}.svg`);
      }
      const up = flags.up === undefined ? undefined : atomIndex(mol, flags.up);
      const method = oneOf<CouplingMethod>('--karplus', flags.karplus, COUPLING_METHODS, 'haasnoot-1980');
      const couplings = flags.couplings || flags.karplus !== undefined ? { method } : false;
      if (flags.json) {
        const docs = bonds.map(([front, back]) => {
          const view = newmanView(mol, graph, front, back, { up, rings });
          const predicted = couplingsAcrossBond(mol, graph, front, back, { method }).filter((c): c is Coupling => !isSkippedCoupling(c));
          printWarnings([...view.warnings, ...predicted.flatMap((c) => c.warnings)]);
          return toNewmanJson(view, mol, { couplings: predicted });
        });
        const noH = couplings ? noHydrogenWarning(mol) : null;
        if (noH) printWarnings([noH]);
        const text = jsonText(several ? docs : docs[0]);
        if (flags.output) writeAtomic(flags.output, text);
        else process.stdout.write(text);
        return;
      }
      for (const [front, back] of bonds) {
        const { svg, warnings } = newmanFigure(mol, {
          bond: [front, back], graph, rings, up,
          angles: oneOf<NewmanAngles>('--angles', flags.angles, ['true', 'ideal'], 'true'),
          hydrogens: oneOf<NewmanHydrogens>('--hydrogens', flags.hydrogens, ['show', 'hide', 'collapse'], 'show'),
          labels: oneOf<NewmanLabels>('--labels', flags.labels, ['element', 'id', 'name'], 'element'),
          mark: flags.mark?.map((pair) => markPair(mol, pair)),
          caption: flags.caption !== false,
          couplings,
          theme: flags.theme,
          // several figures may share a page: each gets its own id prefix
          idPrefix: several ? `${flags.idPrefix ?? 'newman-'}${front + 1}-${back + 1}-` : flags.idPrefix,
        });
        printWarnings(warnings, several ? `bond ${front + 1}-${back + 1}` : '');
        if (several) await writeFigure(figurePath(flags, [front, back]), svg, { dpi: dpiOption(flags.dpi), maxPixels });
        else if (flags.output) await writeFigure(flags.output, svg, { dpi: dpiOption(flags.dpi), maxPixels });
        else process.stdout.write(`${svg}\n`);
      }
      if (several) process.stderr.write(`conformark: wrote ${bonds.length} figures${flags.dir ? ` into ${flags.dir}` : ''}\n`);
    });
}

function markPair(mol: Molecule, pair: string): [number, number] {
  const parts = pair.split(':');
  if (parts.length !== 2 || parts.some((p) => p.trim() === '')) throw usageError('bad-option', `--mark expects front:back atom pairs such as 1:4, got "${pair}"`);
  return [atomIndex(mol, parts[0]!), atomIndex(mol, parts[1]!)];
}
