/**
 * Streaming reader: a file, `-` (standard input) or a `.gz` file → an async stream of records, read in
 * chunks of about 1 MiB and split into lines by hand, so a large file is never held in memory.
 */
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ParseError } from '../model/errors.js';
import type { FormatName, Molecule } from '../model/molecule.js';
import { detectFormat, SNIFF_LINES } from './detectFormat.js';
import { emptyInputIssue } from './emptyInput.js';
import { FORMATS, type ConsumerExtras } from './formats.js';
import { resolveLimits, type ReadLimits, type ReadOptions } from './limits.js';
import { feedBlock, LineSplitter, type LineBlock } from './lines.js';
import { openInput } from './openInput.js';
import { scanConect } from './scanConect.js';
import { TempFile } from './tempFile.js';
import type { Settled } from './sink.js';

/** Options of the streaming readers. */
export interface StreamOptions extends ReadOptions {
  /**
   * Called with each bad record's error; reading then goes on with the next record. Without it the first
   * bad record throws. Problems that stop reading altogether (binary data, an over-long line) always throw.
   */
  readonly onError?: (error: ParseError) => void;
}

/** Internal knobs for `readFrames`. */
export interface StreamExtras {
  /** Coordinate buffers the caller is done with; XYZ frames of the same size reuse them. */
  readonly pool?: Float64Array[];
  /** Where the bytes are read from when it is not `path` (standard input spooled to a private file). */
  readonly readFrom?: string;
}

/**
 * Yields each record's outcome, continuing after a bad record where the format allows (XYZ at the next
 * count line, SDF after `$$$$`, PDB at the next MODEL). A fatal problem is yielded last.
 * @example for await (const r of readRecordsSettled('big.sdf.gz')) if (!r.ok) console.error(r.error.message)
 */
export async function* readRecordsSettled(path: string, options: ReadOptions = {}): AsyncGenerator<Settled> {
  for await (const batch of settledBatches(path, options)) yield* batch;
}

/** Most outcomes queued between two yields: the batch is short-lived garbage, so memory stays flat. */
const BATCH = 256;
/**
 * Bytes decoded into one string at a time: a 1 MiB string is a large object that only a full collection
 * frees, while 64 KiB strings die young; peak memory of a 500 MB trajectory fell from ~180 to ~100 MB.
 */
const PIECE_BYTES = 1 << 16;

/**
 * The engine behind the streaming readers: outcomes in batches of at most `BATCH` (so the per-record cost
 * of async iteration is paid once per batch, and few records are alive at a time). A yielded array is not
 * reused.
 */
export async function* settledBatches(
  path: string,
  options: ReadOptions = {},
  extras: StreamExtras = {},
): AsyncGenerator<Settled[]> {
  const limits = resolveLimits(options);
  const spoolable = path === '-' && extras.readFrom === undefined;
  const source = openInput(extras.readFrom ?? path);
  // standard input's first chunks are kept until the format is known, in case it has to be spooled (PDB)
  const seen: { chunks: Uint8Array[] | null } = { chunks: spoolable ? [] : null };
  const chunks = spoolable ? recording(source, seen) : source;
  const queue: Settled[] = [];
  let fatal = false;
  let spooled = false;
  let count = 0;
  let blank = true;
  const emit = (r: Settled): void => {
    queue.push(r);
    if (!r.ok && r.fatal) fatal = true;
  };
  const splitter = new LineSplitter(path, limits.maxLineLength);
  const stopped = (): boolean => fatal || queue.length >= BATCH;
  try {
    const head = await readHead(chunks, splitter);
    const format = options.format ?? detectFormat(path, head.lines.join('\n'));
    if (seen.chunks && (format === 'pdb' || format === 'pdbqt')) {
      // a PDB's CONECT records follow its models: spool standard input to a private file and stream that
      // (as a file is streamed), instead of holding every model until the end of the input
      const spool = await spoolInput(seen.chunks, source);
      spooled = true;
      try {
        yield* settledBatches(path, { ...options, format }, { ...extras, readFrom: spool.tmp });
      } finally {
        spool.remove();
      }
      return;
    }
    seen.chunks = null;
    const consumer = FORMATS.get(format)!.consumer(path, limits, emit, await consumerExtras(path, format, limits, extras));
    let blocks = head.blocks;
    let chunk: Uint8Array | null = null;
    let at = 0;
    for (let done = head.done; ; ) {
      for (const block of blocks) {
        if (blank && /\S/.test(block.text)) blank = false;
        for (let k = 0; k < block.count && !fatal; ) {
          k = feedBlock(consumer, block, stopped, k);
          if (queue.length >= BATCH && !fatal) {
            count += queue.length;
            yield queue.splice(0);
          }
        }
        if (fatal) break;
      }
      splitter.recycle(blocks);
      if (queue.length > 0 && !fatal) {
        count += queue.length;
        yield queue.splice(0);
      }
      if (fatal || done) break;
      if (chunk === null || at >= chunk.length) {
        const next = await chunks.next();
        if (next.done) {
          blocks = splitter.endBlocks();
          done = true;
          continue;
        }
        chunk = next.value;
        at = 0;
      }
      blocks = splitter.pushBytesBlocks(chunk.subarray(at, (at += PIECE_BYTES)));
    }
    if (!fatal) consumer.end(splitter.lastLine);
  } catch (err) {
    if (!(err instanceof ParseError)) throw err;
    emit({ ok: false, error: err, fatal: true });
  } finally {
    await chunks.return(undefined);
  }
  if (spooled) return;
  count += queue.length;
  if (queue.length > 0) yield queue.splice(0);
  if (count === 0) yield [{ ok: false, error: new ParseError(emptyInputIssue(path, blank)), fatal: true }];
}

/**
 * Yields the records of `path` (`-` = standard input; gzip transparent; format from the extension or the
 * content). Throws `ParseError` at the first bad record unless `options.onError` is given.
 * @example for await (const mol of readRecords('conformers.sdf')) console.log(mol.title)
 */
export async function* readRecords(path: string, options: StreamOptions = {}): AsyncGenerator<Molecule> {
  for await (const batch of settledBatches(path, options)) {
    for (const r of batch) {
      if (r.ok) yield r.molecule;
      else if (r.fatal || !options.onError) throw r.error;
      else options.onError(r.error);
    }
  }
}

/** Reads chunks until at least `SNIFF_LINES` lines (or the end) are there, for format detection. */
async function readHead(
  chunks: AsyncGenerator<Uint8Array>,
  splitter: LineSplitter,
): Promise<{ lines: string[]; blocks: LineBlock[]; done: boolean }> {
  const blocks: LineBlock[] = [];
  let count = 0;
  let done = false;
  while (count < SNIFF_LINES && !done) {
    const next = await chunks.next();
    done = next.done === true;
    for (const block of next.done ? splitter.endBlocks() : splitter.pushBytesBlocks(next.value)) {
      blocks.push(block);
      count += block.count;
    }
  }
  const lines: string[] = [];
  for (const { text, count: n, starts, ends } of blocks) {
    for (let k = 0; k < n && lines.length < SNIFF_LINES; k++) lines.push(text.slice(starts[k], ends[k]));
  }
  return { lines, blocks, done };
}

/** PDB files (and standard input spooled to one) get their CONECT records scanned first, so models can be streamed. */
async function consumerExtras(path: string, format: FormatName, limits: ReadLimits, extras: StreamExtras): Promise<ConsumerExtras> {
  const file = extras.readFrom ?? path;
  if ((format !== 'pdb' && format !== 'pdbqt') || file === '-') return { pool: extras.pool };
  return { pool: extras.pool, conect: await scanConect(file, limits, path) };
}

/** Passes chunks through, keeping each in `seen.chunks` until the caller sets it to null. */
async function* recording(source: AsyncGenerator<Uint8Array>, seen: { chunks: Uint8Array[] | null }): AsyncGenerator<Uint8Array> {
  for await (const chunk of source) {
    seen.chunks?.push(chunk);
    yield chunk;
  }
}

/** Standard input (the chunks read so far, then the rest) in a private temporary file (mode 0600, removed after). */
async function spoolInput(seen: readonly Uint8Array[], rest: AsyncGenerator<Uint8Array>): Promise<TempFile> {
  const spool = new TempFile(join(tmpdir(), 'conformark-stdin.pdb'), 'a temporary copy of standard input');
  try {
    for (const chunk of seen) spool.write(chunk);
    for await (const chunk of rest) spool.write(chunk);
    spool.finish();
  } catch (err) {
    spool.remove();
    throw err;
  }
  return spool;
}
