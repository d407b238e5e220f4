/** Chooses the input format from the file extension (`.gz` stripped), else from the first lines of content. */
import type { FormatName } from '../model/molecule.js';
import { ParseError } from '../model/errors.js';
import { FORMATS } from './formats.js';
import { issue } from './sink.js';

/** Lines of content looked at when sniffing. */
export const SNIFF_LINES = 40;

/** The format named by a path's extension (`x.sdf.gz` → `sdf`), or `null`. */
export function formatFromExtension(path: string): FormatName | null {
  const lower = path.toLowerCase().replace(/\.gz$/, '');
  for (const [name, spec] of FORMATS) {
    if (spec.extensions.some((ext) => lower.endsWith(ext))) return name;
  }
  return null;
}

/**
 * The format of `path`: from its extension, else (for `-` or an unknown extension) from `head`, the first
 * part of the text. Throws `ParseError` (`unknown-format`) when neither tells.
 * @example detectFormat('conformers.sdf.gz') // 'sdf'
 * @example detectFormat('-', '3\nwater\nO 0 0 0\n...') // 'xyz'
 */
export function detectFormat(path: string, head?: string): FormatName {
  const byName = path === '-' ? null : formatFromExtension(path);
  if (byName) return byName;
  const lines = (head ?? '').split(/\r?\n/, SNIFF_LINES);
  let best: FormatName | null = null;
  let bestScore = 0;
  for (const [name, spec] of FORMATS) {
    const score = spec.sniff(lines);
    if (score > bestScore) [best, bestScore] = [name, score];
  }
  if (best) return best;
  const known = [...FORMATS.values()].flatMap((s) => s.extensions).join(', ');
  const message = `cannot tell the format: not ${known} by name, and the content is not XYZ, SDF/molfile or PDB`;
  throw new ParseError(issue('unknown-format', path, null, message));
}
