/** `conformark trajectory FILE --ring R -d DIR`: ring puckering over every frame, tables and figures. */
import type { Command } from 'commander';
import { cliProgress } from '../progressBar.js';
import { analyzeTrajectory, FIGURE_FORMATS, parseTimestep, protectInput, usageError, type FigureFormat } from '../../index.js';
import { limitsOf, oneOf, printWarnings, wholeNumber, DPI_HELP, dpiOption } from '../options.js';

interface TrajectoryFlags {
  ring?: string;
  dir: string;
  stride?: string;
  from?: string;
  to?: string;
  timestep?: string[];
  box?: string;
  startTime?: string[];
  topology?: string;
  transitions?: string;
  coreRadius?: string;
  torsion?: string[];
  formats?: string;
  theme?: string;
  dpi?: string;
}

function formats(text: string | undefined): FigureFormat[] {
  if (text === undefined) return ['svg'];
  const words = text.split(',').map((w) => w.trim()).filter((w) => w !== '');
  if (words.length === 0) throw usageError('bad-option', '--formats expects a list such as svg,png,pdf');
  return [...new Set(words.map((w) => oneOf<FigureFormat>('--formats', w, [...FIGURE_FORMATS.keys()], 'svg')))];
}

/** A progress line on stderr (frames read, frames per second), only when stderr is a terminal. */
function progress(): { update: (framesRead: number) => void; stop: () => void } {
  if (!process.stderr.isTTY) return { update: () => {}, stop: () => {} };
  const start = Date.now();
  const bar = new (cliProgress().SingleBar)(
    { format: 'conformark: {value} frames read | {fps} frames/s', stream: process.stderr, hideCursor: true, fps: 5 },
    cliProgress().Presets.shades_classic,
  );
  bar.start(0, 0, { fps: 0 });
  return {
    update: (n) => bar.update(n, { fps: Math.round(n / Math.max(1e-3, (Date.now() - start) / 1000)) }),
    stop: () => bar.stop(),
  };
}

/** Adds the `trajectory` command to the program. */
export function registerTrajectory(program: Command): void {
  program
    .command('trajectory')
    .description('ring puckering over every frame of a trajectory: puckering.csv, summary.json and figures in a folder')
    .argument('<file>', 'multi-frame XYZ, GRO, multi-MODEL PDB or multi-record SDF (.gz read transparently), or DCD, XTC or TRR with --topology')
    .option('--ring <R>', 'ring number as inspect lists it, an ordered atom list such as 1-2-3-4-5-6, a residue\'s ring(s) A/PRO42/, or name:BGC,NAG for every ring of those residues, each reported separately (default 1)')
    .requiredOption('-d, --dir <dir>', 'output folder (created)')
    .option('--stride <n>', 'analyse every nth frame (default 1)')
    .option('--from <n>', 'first frame to analyse, counted from 1 (default 1)')
    .option('--to <n>', 'last frame to analyse (default: the last)')
    .option('--timestep <value...>', 'time between frames with a unit, e.g. "2 ps" or 2ps (fs, ps, ns, us, ms, s)')
    .option('--start-time <value...>', 'time of frame 1 with a unit, e.g. "10 ns" (default: from the file where it has it, else 0)')
    .option('--topology <file>', 'atoms of a coordinate-only trajectory (DCD, XTC, TRR): a PDB or GRO of the same system, same atom order')
    .option('--box <cell>', 'periodic box "a b c" or "a b c alpha beta gamma" (Å, degrees); default the file\'s cell (DCD/XTC/TRR box, GRO box line, PDB CRYST1)')
    .option('--transitions <rule>', 'core: a transition is the entry into the core of another form (default); frame: every change between frames')
    .option('--core-radius <deg>', 'core radius around each canonical form, degrees on the Cremer–Pople sphere (default 10; five-rings 6)')
    .option('--torsion <A-B-C-D...>', 'torsions to add as CSV columns (numbers from 1 or atom names); repeatable')
    .option('--formats <list>', 'figure formats, comma-separated: svg, png, pdf (default svg)')
    .option('--dpi <n>', DPI_HELP)
    .option('--theme <name|path>', 'column (print), projector (slides), contrast (colour-blind-safe), or a theme .json file (default column)')
    .action(async (file: string, flags: TrajectoryFlags, command: Command) => {
      protectInput(file);
      const { read, maxPixels } = limitsOf(command);
      const bar = progress();
      try {
        const summary = await analyzeTrajectory(file, {
          dir: flags.dir,
          ring: flags.ring ?? '1',
          stride: flags.stride === undefined ? 1 : wholeNumber('--stride', flags.stride),
          from: flags.from === undefined ? 1 : wholeNumber('--from', flags.from),
          to: flags.to === undefined ? undefined : wholeNumber('--to', flags.to),
          timestep: flags.timestep === undefined ? undefined : parseTimestep(flags.timestep.join(' ')),
          torsions: flags.torsion ?? [],
          box: flags.box,
          startTime: flags.startTime?.join(' '),
          topology: flags.topology,
          transitions: oneOf('--transitions', flags.transitions, ['core', 'frame'] as const, 'core'),
          coreRadiusDeg: flags.coreRadius === undefined ? undefined : Number(flags.coreRadius),
          formats: formats(flags.formats),
          theme: flags.theme,
          dpi: dpiOption(flags.dpi),
          read,
          maxPixels,
          onProgress: (read) => bar.update(read),
        });
        bar.stop();
        printWarnings(summary.warnings, file);
        const top = (occupancy: Record<string, number>) => Object.entries(occupancy).sort((a, b) => b[1] - a[1]).map(([s, f]) => `${s} ${(f * 100).toFixed(1)}%`).join(', ');
        if (summary.rings.length === 1) process.stdout.write(`${summary.frames.analysed} frames analysed (${summary.ring.atoms.join('-')}): ${top(summary.occupancy)}\n`);
        else {
          process.stdout.write(`${summary.frames.analysed} frames analysed, ${summary.rings.length} rings:\n`);
          for (const r of summary.rings) process.stdout.write(`  ${r.tag} (${r.atoms.join('-')}): ${top(r.occupancy)}\n`);
        }
        process.stdout.write(`wrote ${summary.files.map((f) => `${flags.dir.replace(/\/$/, '')}/${f}`).join(', ')}\n`);
      } finally {
        bar.stop();
      }
    });
}
