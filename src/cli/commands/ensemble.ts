/** `conformark ensemble FILE`: conformers ranked by energy with Boltzmann populations; sheet and energy ladder. */
import type { Command } from 'commander';
import { ensembleFile, ensembleText, formatIssue, jsonText, protectInput, writeEnsembleFigures, LADDER_UNITS, SHEET_LAYOUTS } from '../../index.js';
import { finiteNumber, limitsOf, oneOf, printWarnings } from '../options.js';

interface EnsembleFlags {
  temperature?: string;
  energyField?: string;
  energyUnit?: string;
  degeneracyField?: string;
  rmsd?: string;
  json?: boolean;
  dir?: string;
  theme?: string;
  idPrefix?: string;
  ladderUnit?: string;
  sheetLayout?: string;
}

/** Adds the `ensemble` command to the program. */
export function registerEnsemble(program: Command): void {
  program
    .command('ensemble')
    .description('conformers ranked by energy: relative energies, Boltzmann populations, duplicates merged, ring shapes')
    .argument('<file>', 'coordinate file with an energy per record (SD field or XYZ comment)')
    .option('--temperature <K>', 'temperature for the populations, K (default 298.15)')
    .option('--energy-field <name>', 'SD field or XYZ key holding the energy (default: the first whose name contains "energy")')
    .option('--energy-unit <unit>', 'unit of the energies: kcal/mol, kJ/mol, hartree, eV (default: from the value, the field name or the file\'s convention; never guessed)')
    .option('--degeneracy-field <name>', 'SD field or XYZ key holding each record\'s degeneracy (default: 1 for every record)')
    .option('--rmsd <A>', 'heavy-atom RMSD at or below which two records are duplicates, Å (default 0.125)')
    .option('--json', 'print the report (conformark/ensemble@1) instead of the table')
    .option('-d, --dir <dir>', 'also write the conformer sheet and the energy ladder (SVG) into this folder')
    .option('--theme <name|path>', 'figure theme: column, projector, contrast, or a .json file (default column)')
    .option('--id-prefix <p>', 'put before every id in the figures')
    .option('--sheet-layout <layout>', 'conformer sheets as a page 17 cm wide (page) or a 16:9 slide (slide; use --theme projector); default page')
    .option('--ladder-unit <unit>', 'energy unit of the ladder\'s axis and labels: kcal/mol or kJ/mol (default kcal/mol)')
    .action(async (file: string, flags: EnsembleFlags, command: Command) => {
      const { read, hold } = limitsOf(command);
      const sheetLayout = oneOf('--sheet-layout', flags.sheetLayout, [...SHEET_LAYOUTS.keys()], 'page');
      const ladderUnit = oneOf('--ladder-unit', flags.ladderUnit, [...LADDER_UNITS.keys()], 'kcal/mol');
      protectInput(file);
      const result = await ensembleFile(file, {
        temperatureK: flags.temperature === undefined ? undefined : finiteNumber('--temperature', flags.temperature, 1e-6),
        energy: { field: flags.energyField, unit: flags.energyUnit },
        degeneracyField: flags.degeneracyField,
        rmsdThresholdA: flags.rmsd === undefined ? undefined : finiteNumber('--rmsd', flags.rmsd, 0),
        read,
        hold,
      });
      for (const e of result.errors) process.stderr.write(`conformark: ${formatIssue(e)}\n`);
      for (const { record, warning } of result.warnings) printWarnings([warning], `${file}: record ${record}`);
      process.stdout.write(flags.json ? jsonText(result.report) : ensembleText(result.report));
      if (flags.dir) {
        const written = writeEnsembleFigures(result, flags.dir, { theme: flags.theme, idPrefix: flags.idPrefix, ladderUnit, sheetLayout });
        process.stderr.write(`conformark: wrote ${written.join(', ')} into ${flags.dir}\n`);
      }
      if (result.errors.length > 0) process.exitCode = 1;
    });
}
