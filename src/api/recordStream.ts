/**
 * Records of a file for commands that go on after a bad record: each good record, or the error of a bad one
 * with its record number and line. A fatal problem (the rest of the file cannot be read) ends the stream.
 */
import type { Molecule } from '../model/molecule.js';
import { readRecordsSettled, type StreamOptions } from '../io/readRecords.js';
import { heldRecords, type HoldOptions } from './holdLimits.js';

/** A record problem as batch and ensemble report it (`manifest.json` `errors[]`). */
export interface RecordError {
  /** Record number (from 1), or `null` when the problem is not tied to one record. */
  readonly record: number | null;
  readonly code: string;
  /** File and line, for the one-line message on stderr. */
  readonly file: string;
  readonly line: number | null;
  readonly message: string;
}

export type RecordOutcome = { readonly molecule: Molecule } | { readonly error: RecordError };

/**
 * Yields every record of `path` or its error, numbering bad records in sequence with good ones.
 * @example for await (const r of recordOutcomes('big.sdf')) if ('error' in r) console.error(r.error.message)
 */
export async function* recordOutcomes(path: string, options: StreamOptions = {}): AsyncGenerator<RecordOutcome> {
  let count = 0;
  for await (const r of readRecordsSettled(path, options)) {
    if (r.ok) {
      count = r.molecule.source.index;
      yield { molecule: r.molecule };
      continue;
    }
    const issue = r.error.issues[0]!;
    const record = r.fatal ? null : ++count;
    for (const i of r.error.issues) yield { error: { record, code: i.code, file: i.file, line: i.line, message: i.message } };
    if (r.fatal || issue === undefined) return;
  }
}

/**
 * The good records of `path`, counted against the hold limits; each bad record's problems are appended to
 * `errors` and reading goes on.
 * @example for await (const mol of goodRecords('big.sdf', {}, errors)) analyse(mol)
 */
export async function* goodRecords(
  path: string,
  options: { readonly read?: StreamOptions; readonly hold?: HoldOptions },
  errors: RecordError[],
): AsyncGenerator<Molecule> {
  async function* molecules(): AsyncGenerator<Molecule> {
    for await (const outcome of recordOutcomes(path, options.read)) {
      if ('error' in outcome) errors.push(outcome.error);
      else yield outcome.molecule;
    }
  }
  yield* heldRecords(molecules(), path, options.hold);
}
