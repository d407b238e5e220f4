/** `conformark build SMILES -o FILE.sdf`: 3D conformers with MMFF94s energies, written as one SD file. */
import type { Command } from 'commander';
import { buildConformers, formatSdf, usageError, writeAtomic } from '../../index.js';

interface BuildFlags {
  output: string;
  conformers?: string;
  seed?: string;
  ringForms?: boolean;
  title?: string;
}

/** Adds the `build` command to the program. */
export function registerBuild(program: Command): void {
  program
    .command('build')
    .description('3D conformers from a SMILES string, minimised with MMFF94s, as an SD file')
    .argument('<smiles>', 'the structure, as SMILES (quote it in the shell); stereo marks are kept')
    .requiredOption('-o, --output <file>', 'SD file to write (- for standard output)')
    .option('--conformers <n>', 'distinct conformers to keep from the conformer search (default 10)')
    .option('--seed <s>', 'seed of the conformer generator; same seed, same file (default 1)')
    .option('--ring-forms', 'also build the other chair and the twist-boats of each saturated six-ring')
    .option('--title <text>', 'start of each record title (default: the SMILES)')
    .action(async (smiles: string, flags: BuildFlags) => {
      const { molecules, notes } = await buildConformers(smiles, {
        conformers: integer('--conformers', flags.conformers),
        seed: integer('--seed', flags.seed),
        ringForms: flags.ringForms ?? false,
        title: flags.title,
      });
      for (const note of notes) process.stderr.write(`conformark: ${note}\n`);
      const text = formatSdf(molecules);
      if (flags.output === '-') process.stdout.write(text);
      else {
        writeAtomic(flags.output, text);
        const count = `${molecules.length} conformer${molecules.length === 1 ? '' : 's'}`;
        process.stderr.write(`conformark: wrote ${count} to ${flags.output}\n`);
      }
    });
}

function integer(flag: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const value = Number(text);
  if (text.trim() === '' || !Number.isInteger(value)) {
    throw usageError('bad-option', `${flag} expects an integer, got "${text}"`);
  }
  return value;
}
