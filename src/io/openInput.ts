/**
 * Raw input as a stream of byte chunks of about 1 MiB: a file or standard input (`-`), gunzipped
 * transparently when it starts with the gzip magic bytes (whatever its name).
 */
import { createReadStream, statSync } from 'node:fs';
import { Readable, pipeline } from 'node:stream';
import { createGunzip } from 'node:zlib';
import { ParseError } from '../model/errors.js';
import { issue } from './sink.js';

/** Chunk size for reading and inflating, bytes. */
export const CHUNK_BYTES = 1 << 20;

/** True when the bytes start with the gzip magic number (RFC 1952). */
export function isGzip(bytes: Uint8Array): boolean {
  return bytes.length >= 2 && bytes[0] === 0x1f && bytes[1] === 0x8b;
}

/**
 * Yields the (decompressed) bytes of `path`; `-` is standard input.
 * File-system errors (ENOENT, EACCES) are thrown as they are; a folder (`not-a-file`) or a corrupt gzip stream is a `ParseError`.
 */
export async function* openInput(path: string): AsyncGenerator<Uint8Array> {
  // a folder opens fine and fails on the first read with an EISDIR that names no path: say it here
  if (path !== '-' && isFolder(path)) throw new ParseError(issue('not-a-file', path, null, 'is a folder, not a file'));
  const raw = path === '-' ? process.stdin : createReadStream(path, { highWaterMark: CHUNK_BYTES });
  const it = (raw as AsyncIterable<Uint8Array>)[Symbol.asyncIterator]();
  try {
    const first = await it.next();
    if (first.done) return;
    if (isGzip(first.value)) yield* inflate(path, first.value, it);
    else {
      yield first.value;
      for (let r = await it.next(); !r.done; r = await it.next()) yield r.value;
    }
  } finally {
    await it.return?.();
  }
}

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false; // a missing file is reported by the read itself (ENOENT)
  }
}

async function* inflate(path: string, head: Uint8Array, it: AsyncIterator<Uint8Array>): AsyncGenerator<Uint8Array> {
  const source = Readable.from(
    (async function* () {
      yield head;
      for (let r = await it.next(); !r.done; r = await it.next()) yield r.value;
    })(),
  );
  const gunzip = createGunzip({ chunkSize: CHUNK_BYTES });
  pipeline(source, gunzip, () => {});
  try {
    for await (const chunk of gunzip) yield chunk as Uint8Array;
  } catch (err) {
    const e = err as NodeJS.ErrnoException;
    if (typeof e?.code === 'string' && e.code.startsWith('Z_')) {
      throw new ParseError(issue('bad-gzip', path, null, `the gzip data is damaged or cut short (${e.message})`));
    }
    throw err;
  } finally {
    source.destroy();
  }
}
