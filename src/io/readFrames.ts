/**
 * The cheap path for trajectories: coordinates, title and properties of each frame, without the rest of a
 * `Molecule`. With `reuse`, XYZ frames recycle the coordinate buffers of frames already consumed: each
 * yielded `coords` is valid only until the next frame is requested (copy it to keep it).
 */
import type { Molecule } from '../model/molecule.js';
import { settledBatches, type StreamOptions } from './readRecords.js';

/** One frame. */
export interface Frame {
  /** Frame number in the file, from 1. */
  readonly index: number;
  /** First line of the frame in the file, from 1. */
  readonly line: number;
  /** x, y, z of atom i at 3i..3i+2, Å. Reused between frames when `reuse` is set. */
  readonly coords: Float64Array;
  readonly title: string;
  readonly properties: Readonly<Record<string, string>>;
}

const PROPERTIES: PropertyDescriptor = { enumerable: true, configurable: true };

/**
 * A frame over its record. `properties` is an own enumerable accessor with one shared getter (a getter in
 * an object literal costs a closure and a hidden class per frame), reading the record's lazily parsed ones.
 */
class FrameView implements Frame {
  readonly index: number;
  readonly line: number;
  readonly coords: Float64Array;
  readonly title: string;
  declare readonly properties: Readonly<Record<string, string>>;
  readonly #molecule: Molecule;

  static {
    PROPERTIES.get = function (this: FrameView) {
      return this.#molecule.properties;
    };
  }

  constructor(m: Molecule) {
    this.index = m.source.index;
    this.line = m.source.line;
    this.coords = m.coords;
    this.title = m.title;
    Object.defineProperty(this, 'properties', PROPERTIES);
    this.#molecule = m;
  }
}

/** Options of `readFrames`. */
export interface FrameOptions extends StreamOptions {
  /** Reuse one coordinate buffer across frames (XYZ). Default false. */
  readonly reuse?: boolean;
}

/**
 * Yields the frames of a trajectory (any format; XYZ is the fast one). Throws `ParseError` at the first
 * bad frame unless `options.onError` is given.
 * @example for await (const f of readFrames('md.xyz.gz', { reuse: true })) puckerOf(f.coords)
 */
export async function* readFrames(path: string, options: FrameOptions = {}): AsyncGenerator<Frame> {
  const pool: Float64Array[] | undefined = options.reuse === true ? [] : undefined;
  for await (const batch of settledBatches(path, options, { pool })) {
    for (const r of batch) {
      if (r.ok) {
        const m = r.molecule;
        yield new FrameView(m);
        // the caller asked for the next frame: this one's buffer is free again
        if (pool && pool.length < 100_000) pool.push(m.coords);
      } else if (r.fatal || !options.onError) throw r.error;
      else options.onError(r.error);
    }
  }
}
