/**
 * Where a trajectory's frames come from: a text file read whole per frame (XYZ, PDB, SDF, GRO; frame 1 is its
 * first record), or a coordinate-only binary file (DCD, XTC, TRR) with a topology (`--topology`: a PDB, GRO,
 * mmCIF, MOL2, SDF or XYZ giving elements, names and residues in the same atom order) whose frame 1
 * coordinates are replaced by the trajectory's.
 */
import { ConformarkError, usageError } from '../../model/errors.js';
import type { Molecule } from '../../model/molecule.js';
import { readFrames, type Frame } from '../../io/readFrames.js';
import { dcdFrames, dcdHeader } from '../../io/dcd.js';
import { xtcAtomCount, xtcFrames, type XdrFrame } from '../../io/xtc.js';
import { trrAtomCount, trrFrames } from '../../io/trr.js';
import type { ReadOptions } from '../../io/limits.js';
import { boxFromLengths, boxFromVectors, type PeriodicBox } from '../../geometry/periodicBox.js';
import { readRecord } from '../prepare.js';

/** A frame with the periodic cell its file gives (binary formats), if any. */
export interface SourceFrame extends Frame {
  readonly cell?: PeriodicBox | null;
  /** Time of the frame from the file (XTC, TRR), ps. */
  readonly timePs?: number;
}

/** The coordinate-only formats. */
export type BinaryFormat = 'dcd' | 'xtc' | 'trr';

/** The frames and frame 1 of a run. */
export interface TrajectorySource {
  readonly first: Molecule;
  readonly frames: AsyncIterator<SourceFrame>;
  /** The binary format, or null for the text formats (then `first.source.format` names it). */
  readonly binary: BinaryFormat | null;
  /** Time between frames and of frame 1 from the file, ps, where it carries them. */
  readonly timestepPs: number | null;
  readonly startPs: number | null;
}

/** The binary format a file name says, or null. */
export function binaryFormat(path: string): BinaryFormat | null {
  const m = /\.(dcd|xtc|trr)$/i.exec(path);
  return m ? (m[1]!.toLowerCase() as BinaryFormat) : null;
}

/** True for a file name the binary readers take. */
export function isDcd(path: string): boolean {
  return binaryFormat(path) !== null;
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

/** XTC and TRR frames; the box is rebuilt only when it changes (constant-pressure runs change it). */
async function* xdrSource(frames: AsyncGenerator<XdrFrame>): AsyncGenerator<SourceFrame> {
  const last = new Float64Array(9);
  let box: PeriodicBox | null = null;
  let have = false;
  for await (const f of frames) {
    if (f.box === null) box = null;
    else if (!have || box === null || f.box.some((v, k) => v !== last[k])) {
      last.set(f.box);
      box = boxFromVectors(f.box);
    }
    have = true;
    yield { index: f.index, line: 0, coords: f.coords, title: '', properties: {}, cell: box, timePs: f.timePs };
  }
}

/** Frame times of the first two records of a GRO file (`t=` in the titles), ps. */
async function groTimes(path: string, first: Molecule, read: ReadOptions | undefined): Promise<[number | null, number | null]> {
  const t1 = first.properties.TIME_PS !== undefined ? Number(first.properties.TIME_PS) : null;
  if (t1 === null) return [null, null];
  const second = await readRecord(path, 2, read).catch(() => null);
  const t2 = second?.properties.TIME_PS !== undefined ? Number(second.properties.TIME_PS) : null;
  return [t1, t2 !== null && t2 > t1 ? t2 - t1 : null];
}

/**
 * Opens the frames of `path`; `topology` is required for the binary formats and refused for the text formats.
 * @example const { first, frames } = await openTrajectory('md.xtc', 'top.gro', {})
 */
export async function openTrajectory(path: string, topology: string | undefined, read: ReadOptions | undefined): Promise<TrajectorySource> {
  const binary = binaryFormat(path);
  if (binary === null) {
    if (topology !== undefined) throw usageError('bad-option', `--topology is for coordinate-only trajectories (DCD, XTC, TRR); ${path} carries its own atoms`);
    const first = await readRecord(path, 1, read);
    const frames = readFrames(path, { ...read, reuse: true })[Symbol.asyncIterator]();
    const [startPs, timestepPs] = first.source.format === 'gro' ? await groTimes(path, first, read) : [null, null];
    return { first, frames, binary: null, timestepPs, startPs };
  }
  if (topology === undefined) throw usageError('no-topology', `${path} holds coordinates only: give the atoms with --topology FILE (a PDB or GRO of the same system)`);
  const atomCount = binary === 'dcd' ? (await dcdHeader(path)).atomCount : binary === 'xtc' ? await xtcAtomCount(path) : await trrAtomCount(path);
  const top = await readRecord(topology, 1, read);
  if (top.atoms.length !== atomCount) {
    throw new ConformarkError({ code: 'topology-mismatch', file: topology, line: null, message: `topology has ${top.atoms.length} atoms, ${path} has ${atomCount}` });
  }
  const frames = binary === 'dcd' ? dcdSource(path) : xdrSource(binary === 'xtc' ? xtcFrames(path) : trrFrames(path));
  const one = await frames.next();
  if (one.done) throw usageError('no-frames', `${path} has no frames`, path);
  const first: Molecule = { ...top, coords: Float64Array.from(one.value.coords), source: { ...top.source, file: path, format: top.source.format } };
  let timestepPs: number | null = null;
  let startPs: number | null = null;
  let two: IteratorResult<SourceFrame> | null = null;
  if (binary === 'dcd') {
    const header = await dcdHeader(path);
    [timestepPs, startPs] = [header.timestepPs, header.startPs];
  } else {
    startPs = one.value.timePs ?? null;
    const t1 = startPs;
    // frame 1's buffer is reused by frame 2: keep a copy for the replay
    const copy = { ...one.value, coords: Float64Array.from(one.value.coords) };
    one.value = copy;
    two = await frames.next();
    const t2 = two.done ? null : two.value.timePs ?? null;
    if (t1 !== null && t2 !== null && t2 > t1) timestepPs = +(t2 - t1).toPrecision(7);
  }
  // frame 1 again first, then the rest
  async function* all(): AsyncGenerator<SourceFrame> {
    yield one.value!;
    if (two && !two.done) yield two.value;
    yield* frames;
  }
  return { first, frames: all(), binary, timestepPs, startPs };
}
