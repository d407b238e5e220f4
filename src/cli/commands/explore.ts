/** `conformark explore FILE -o page.html`: one self-contained page to pick bonds and rings by pointing. */
import type { Command } from 'commander';
import { exploreFile, formatIssue, protectInput, writeAtomic, type NewmanAngles, type NewmanHydrogens } from '../../index.js';
import { finiteNumber, limitsOf, oneOf, printWarnings } from '../options.js';

interface ExploreFlags {
  output?: string;
  title?: string;
  maxSize?: string;
  temperature?: string;
  energyField?: string;
  energyUnit?: string;
  theme?: string;
  angles?: string;
  hydrogens?: string;
}

/** Adds the `explore` command to the program. */
export function registerExplore(program: Command): void {
  program
    .command('explore')
    .description('one self-contained HTML page: point at a bond or ring of any record to see its Newman projection or chair, with tables and the command that makes the figure')
    .argument('<file>', 'coordinate file (XYZ, SDF/molfile, PDB, …; .gz read transparently)')
    .option('-o, --output <file>', 'write the page to FILE (.html) instead of standard output')
    .option('--title <text>', 'page title (default "conformark explorer: FILE")')
    .option('--max-size <MB>', 'most megabytes of figures and tables on the page; later records are listed without figures (default 5)')
    .option('--temperature <K>', 'temperature for the populations, K (default 298.15)')
    .option('--energy-field <name>', 'SD field or XYZ key holding the energy (default: the first whose name contains "energy")')
    .option('--energy-unit <unit>', 'unit of the energies: kcal/mol, kJ/mol, hartree, eV (default: from the file; records without a known unit are listed in file order)')
    .option('--theme <name|path>', 'theme of every figure: column, projector, contrast, or a theme .json file (default column)')
    .option('--angles <mode>', 'Newman bond angles: true (measured) or ideal (120° spacing, measured torsions printed) (default true)')
    .option('--hydrogens <mode>', 'Newman hydrogens: show, hide or collapse (default show)')
    .action(async (file: string, flags: ExploreFlags, command: Command) => {
      const { read, hold } = limitsOf(command);
      if (flags.output) protectInput(file);
      const result = await exploreFile(file, {
        title: flags.title,
        maxBytes: flags.maxSize === undefined ? undefined : finiteNumber('--max-size', flags.maxSize, 0.01, 1000) * 1e6,
        temperatureK: flags.temperature === undefined ? undefined : finiteNumber('--temperature', flags.temperature, 1e-6),
        energy: { field: flags.energyField, unit: flags.energyUnit },
        figures: {
          theme: flags.theme,
          angles: flags.angles === undefined ? undefined : oneOf<NewmanAngles>('--angles', flags.angles, ['true', 'ideal'], 'true'),
          hydrogens: flags.hydrogens === undefined ? undefined : oneOf<NewmanHydrogens>('--hydrogens', flags.hydrogens, ['show', 'hide', 'collapse'], 'show'),
        },
        read,
        hold,
      });
      for (const e of result.errors) process.stderr.write(`conformark: ${formatIssue(e)}\n`);
      for (const { record, warning } of result.model.warnings) printWarnings([warning], `${file}: record ${record}`);
      if (result.model.limitNote) process.stderr.write(`conformark: ${result.model.limitNote}\n`);
      if (flags.output) writeAtomic(flags.output, result.html);
      else process.stdout.write(result.html);
      if (result.errors.length > 0) process.exitCode = 1;
    });
}
