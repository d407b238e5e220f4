/**
 * How the page carries a record's bonds and rings: JSON, gzip-compressed (the figures of one compound share most
 * of their text, so this shrinks them several times over) and base64-encoded. The page's script unpacks a record
 * with the browser's own `DecompressionStream` when it is first shown.
 */
import { gzipSync } from 'node:zlib';

/**
 * A record's detail as base64 of gzip of its JSON (level 9; the same input gives the same text).
 * @example JSON.parse(gunzipSync(Buffer.from(packDetail(x), 'base64')).toString()) // x
 */
export function packDetail(detail: unknown): string {
  return gzipSync(JSON.stringify(detail), { level: 9 }).toString('base64');
}
