/**
 * Where a trajectory's frames come from: a text file read whole per frame (XYZ, PDB, SDF; frame 1 is its first
 * record), or a coordinate-only binary file (DCD) with a topology (`--topology`: a PDB, SDF, MOL or XYZ giving
 * elements and names in the same atom order) whose frame 1 coordinates are replaced by the trajectory's.
 */
import { ConformarkError, usageError } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import { readFrames, type Frame } from '../../io/readFrames.js';
import { dcdFrames, dcdHeader } from '../../io/dcd.js';
import type { ReadOptions } from '../../io/limits.js';
import { boxFromLengths, type PeriodicBox } from '../../geometry/periodicBox.js';
import { readRecord } from '../prepare.js';

/** A frame with the periodic cell its file gives (binary formats), if any. */
export interface SourceFrame extends Frame {
  readonly cell?: PeriodicBox | null;
}

/** The frames and frame 1 of a run. */
export interface TrajectorySource {
  readonly first: Molecule;
  readonly frames: AsyncIterator<SourceFrame>;
  /** `dcd`, or null for the text formats (then `first.source.format` names it). */
  readonly binary: 'dcd' | null;
  /** Time between frames and of frame 1 from the file, ps, where it carries them. */
  readonly timestepPs: number | null;
  readonly startPs: number | null;
}

/** True for a file name the binary readers take. */
export function isDcd(path: string): boolean {
  return /\.dcd$/i.test(path);
}

async function* dcdSource(path: string): AsyncGenerator<SourceFrame> {
  let text = '';
  let box: PeriodicBox | null = null;
  for await (const f of dcdFrames(path)) {
    const key = f.cell ? f.cell.join(' ') : '';
    if (key !== text) {
      text = key;
      box = f.cell ? boxFromLengths(...f.cell) : null;
    }
    yield { index: f.index, line: 0, coords: f.coords, title: '', properties: {}, cell: box };
  }
}

/**
 * Opens the frames of `path`; `topology` is required for DCD and refused for the text formats.
 * @example const { first, frames } = await openTrajectory('md.dcd', 'top.pdb', {})
 */
export async function openTrajectory(path: string, topology: string | undefined, read: ReadOptions | undefined): Promise<TrajectorySource> {
  if (!isDcd(path)) {
    if (topology !== undefined) throw usageError('bad-option', `--topology is for coordinate-only trajectories (DCD); ${path} carries its own atoms`);
    const first = await readRecord(path, 1, read);
    const frames = readFrames(path, { ...read, reuse: true })[Symbol.asyncIterator]();
    return { first, frames, binary: null, timestepPs: null, startPs: null };
  }
  if (topology === undefined) throw usageError('no-topology', `${path} holds coordinates only: give the atoms with --topology FILE (a PDB of the same system)`);
  const header = await dcdHeader(path);
  const top = await readRecord(topology, 1, read);
  if (top.atoms.length !== header.atomCount) {
    throw new ConformarkError({ code: 'topology-mismatch', file: topology, line: null, message: `topology has ${top.atoms.length} atoms, ${path} has ${header.atomCount}` });
  }
  const frames = dcdSource(path);
  const one = await frames.next();
  if (one.done) throw usageError('no-frames', `${path} has no frames`, path);
  const first: Molecule = { ...top, coords: Float64Array.from(one.value.coords), source: { ...top.source, file: path, format: top.source.format } };
  // frame 1 again first, then the rest
  async function* all(): AsyncGenerator<SourceFrame> {
    yield one.value!;
    yield* frames;
  }
  return { first, frames: all(), binary: 'dcd', timestepPs: header.timestepPs, startPs: header.startPs };
}
