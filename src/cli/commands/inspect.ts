/** `conformark inspect FILE`: per-record summary of rings, shapes, positions and torsions; `--json` report. */
import type { Command } from 'commander';
import { COUPLING_METHODS, formatIssue, inspectFile, inspectText, jsonText, protectInput, safeText, writeAtomic, type CouplingMethod } from '../../index.js';
import { finiteNumber, limitsOf, ringScopeOf, oneOf, printWarnings } from '../options.js';

/** Warnings printed on stderr before the rest are only counted (a trajectory can raise thousands). */
const MAX_WARNINGS = 20;

interface InspectFlags {
  json?: boolean;
  couplings?: boolean;
  karplus?: string;
  energyField?: string;
  energyUnit?: string;
  tolerance?: string;
  output?: string;
}

/** Adds the `inspect` command to the program. */
export function registerInspect(program: Command): void {
  program
    .command('inspect')
    .description('summarise every record: rings with shape, descriptor and Q/θ/φ, substituent positions, ring torsions')
    .argument('<file>', 'coordinate file (XYZ, SDF/molfile, PDB; .gz read transparently; - for standard input)')
    .option('--json', 'print the full report (conformark/report@1)')
    .option('--couplings', 'add predicted ³J(H,H) for every ring H–C–C–H')
    .option('--karplus <form>', `coupling equation: ${COUPLING_METHODS.join(', ')} (default haasnoot-1980)`)
    .option('--energy-field <name>', 'SD field or XYZ key holding the energy (default: the first whose name contains "energy")')
    .option('--energy-unit <unit>', 'unit of the energies: kcal/mol, kJ/mol, hartree, eV (default: from the value, the field name or the file\'s convention; never guessed)')
    .option('--tolerance <A>', 'bond perception tolerance added to the covalent radii, Å (default 0.40)')
    .option('-o, --output <file>', 'write to FILE instead of standard output')
    .action(async (file: string, flags: InspectFlags, command: Command) => {
      const { read, hold } = limitsOf(command);
      if (flags.output) protectInput(file);
      const method = oneOf<CouplingMethod>('--karplus', flags.karplus, COUPLING_METHODS, 'haasnoot-1980');
      const report = await inspectFile(file, {
        couplings: flags.couplings === true || flags.karplus !== undefined,
        coupling: { method },
        energy: { field: flags.energyField, unit: flags.energyUnit },
        toleranceA: flags.tolerance === undefined ? undefined : finiteNumber('--tolerance', flags.tolerance, 0, 2),
        read,
        hold,
        ringScope: ringScopeOf(command),
      });
      if (flags.json) {
        const all = report.records.flatMap((r) => r.warnings.map((w) => ({ ...w, message: `record ${r.index}: ${w.message}` })));
        printWarnings(all.slice(0, MAX_WARNINGS), file);
        if (all.length > MAX_WARNINGS) {
          process.stderr.write(`conformark: warning: ${file}: ${all.length - MAX_WARNINGS} more warnings (the report lists each under its record)\n`);
        }
      }
      const text = flags.json ? jsonText(report) : inspectText(report);
      if (flags.output) writeAtomic(flags.output, text);
      else process.stdout.write(text);
      // bad records were read past: each is one line on stderr, and the run ends with exit 1
      for (const e of report.errors) process.stderr.write(`conformark: ${safeText(formatIssue(e), 1000).text}\n`);
      if (report.errors.length > 0) process.exitCode = 1;
    });
}
