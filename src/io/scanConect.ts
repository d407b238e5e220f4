/** A first pass over a PDB file that keeps only its CONECT records (see `PdbConsumer`). */
import { ParseError } from '../model/errors.js';
import type { ReadLimits } from './limits.js';
import { LineSplitter } from './lines.js';
import { openInput } from './openInput.js';
import { parseConect, type Conect } from './pdbLine.js';
import { issue } from './sink.js';

/** Reads the CONECT records of the PDB file at `path` (messages name it `shownAs`). Throws `ParseError` on a malformed one. */
export async function scanConect(path: string, limits: ReadLimits, shownAs: string = path): Promise<Conect[]> {
  const splitter = new LineSplitter(shownAs, limits.maxLineLength);
  const out: Conect[] = [];
  const take = (lines: string[]): void => {
    const first = splitter.lastLine - lines.length + 1;
    lines.forEach((line, k) => {
      if (!line.startsWith('CONECT')) return;
      const c = parseConect(line, first + k);
      if (typeof c === 'string') throw new ParseError(issue('bad-conect', shownAs, first + k, c));
      out.push(c);
    });
  };
  for await (const chunk of openInput(path)) take(splitter.pushBytes(chunk));
  take(splitter.end());
  return out;
}
