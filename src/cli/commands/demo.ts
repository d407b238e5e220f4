/** `conformark demo [-d DIR]`: renders the bundled demo scenario into a gallery folder with index.html. */
import type { Command } from 'commander';
import { renderDemo } from '../../index.js';

/** Adds the `demo` command to the program. */
export function registerDemo(program: Command): void {
  program
    .command('demo')
    .description('render the bundled demo scenario (examples/) into a gallery folder with an index.html page')
    .option('-d, --dir <dir>', 'folder to render into; an earlier demo there is replaced (default gallery)', 'gallery')
    .option('--examples <dir>', 'folder with the scenario files (default: the examples shipped with conformark)')
    .action(async (flags: { dir: string; examples?: string }) => {
      const result = await renderDemo({ outDir: flags.dir, examplesDir: flags.examples });
      process.stderr.write(`conformark: wrote ${result.files.length} files into ${result.outDir}; open ${result.outDir}/index.html\n`);
    });
}
