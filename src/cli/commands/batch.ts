/** `conformark batch FILE -d DIR`: every figure of every record, contact sheets, SI tables and manifest.json. */
import type { Command } from 'commander';
import { cliProgress } from '../progressBar.js';
import {
  BOND_SETS,
  FIGURE_FORMATS,
  SHEET_LAYOUTS,
  SHEET_NEWMANS,
  TABLE_FORMATS,
  batchFile,
  formatIssue,
  protectInput,
  type FigureFormat,
  type TableFormat,
} from '../../index.js';
import { limitsOf, oneOf, printWarnings, wholeNumber, DPI_HELP, dpiOption } from '../options.js';

interface BatchFlags {
  dir: string;
  bonds?: string;
  sp2Bonds?: boolean;
  formats?: string;
  theme?: string;
  dpi?: string;
  idPrefix?: string;
  sheet?: boolean;
  sheetLayout?: string;
  sheetNewmans?: string;
  tables?: string;
  jobs?: string;
  energyField?: string;
  energyUnit?: string;
}

/** A comma-separated list of words from a fixed set. */
function wordList<T extends string>(flag: string, text: string, words: readonly T[]): T[] {
  return [...new Set(text.split(',').map((w) => oneOf<T>(flag, w.trim(), words, words[0]!)))];
}

/** Adds the `batch` command to the program. */
export function registerBatch(program: Command): void {
  program
    .command('batch')
    .description('every figure for every record: Newman projections, ring figures, contact sheets, SI tables and manifest.json')
    .argument('<file>', 'coordinate file (XYZ, SDF/molfile, PDB; .gz read transparently; - for standard input)')
    .requiredOption('-d, --dir <dir>', 'output folder (created if needed)')
    .option('--bonds <set>', `bonds drawn as Newman projections: ${[...BOND_SETS.keys()].join(', ')}, or a list such as 1-2,3-4 (default ring)`)
    .option('--sp2-bonds', 'also draw ring bonds between two sp² atoms (inside aromatic rings), left out by default')
    .option('--formats <list>', `figure formats, comma-separated: ${[...FIGURE_FORMATS.keys()].join(', ')} (default svg)`)
    .option('--dpi <n>', DPI_HELP)
    .option('--theme <name|path>', 'column (print), projector (slides), contrast (colour-blind-safe), or a theme .json file (default column)')
    .option('--id-prefix <p>', 'put before every figure\'s own id prefix, to keep figures of several batches apart on one page')
    .option('--no-sheet', 'write no conformer sheet')
    .option('--sheet-layout <layout>', 'conformer sheets as a page 17 cm wide (page) or a 16:9 slide (slide; use --theme projector); default page')
    .option('--sheet-newmans <which>', 'Newman projections on the sheets: informative (one ring bond per ring, exocyclic bonds to heavy groups) or drawn (every one written); default informative')
    .option('--tables <list>', `table formats, comma-separated: ${[...TABLE_FORMATS.keys()].join(', ')}, or none (default csv,md,tex)`)
    .option('--jobs <n>', 'worker threads for figures, used above 40 figures (default min(4, cores))')
    .option('--energy-field <name>', 'SD field or XYZ key holding the energy (default: the first whose name contains "energy")')
    .option('--energy-unit <unit>', 'unit of the energies: kcal/mol, kJ/mol, hartree, eV (default: from the value, the field name or the file\'s convention; never guessed)')
    .action(async (file: string, flags: BatchFlags, command: Command) => {
      const { read, hold, maxPixels } = limitsOf(command);
      protectInput(file);
      const formats = flags.formats === undefined ? undefined : wordList<FigureFormat>('--formats', flags.formats, [...FIGURE_FORMATS.keys()]);
      const tables = flags.tables === undefined ? undefined : flags.tables.trim() === 'none' ? [] : wordList<TableFormat>('--tables', flags.tables, [...TABLE_FORMATS.keys()]);
      const jobs = flags.jobs === undefined ? undefined : wholeNumber('--jobs', flags.jobs);
      const bar = process.stderr.isTTY ? new (cliProgress().SingleBar)({ format: 'figures {bar} {value}/{total}', stream: process.stderr }, cliProgress().Presets.shades_classic) : null;
      let started = false;
      const result = await batchFile(file, flags.dir, {
        bonds: flags.bonds, sp2Bonds: flags.sp2Bonds === true, formats, tables, jobs, theme: flags.theme, dpi: dpiOption(flags.dpi), idPrefix: flags.idPrefix, sheet: flags.sheet !== false,
        sheetLayout: oneOf('--sheet-layout', flags.sheetLayout, [...SHEET_LAYOUTS.keys()], 'page'),
        sheetNewmans: oneOf('--sheet-newmans', flags.sheetNewmans, SHEET_NEWMANS, 'informative'),
        energy: { field: flags.energyField, unit: flags.energyUnit },
        read, hold, maxPixels,
        onProgress: bar
          ? (done, total) => {
              if (!started) bar.start(total, done);
              else bar.update(done);
              started = true;
            }
          : undefined,
      });
      bar?.stop();
      for (const e of result.errors) process.stderr.write(`conformark: ${formatIssue(e)}\n`);
      for (const { record, warning } of result.warnings) printWarnings([warning], `${file}: record ${record}`);
      for (const note of result.notes) process.stderr.write(`conformark: note: ${note}\n`);
      const { figures, tables: written } = result.manifest;
      process.stderr.write(`conformark: wrote ${figures.length} figure file${figures.length === 1 ? '' : 's'} and ${written.length} table${written.length === 1 ? '' : 's'} into ${flags.dir}\n`);
      if (result.errors.length > 0) process.exitCode = 1;
    });
}
