/** `explore`: every record of a file → the explorer page's model and its HTML. */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import type { StreamOptions } from '../../io/readRecords.js';
import type { HoldOptions } from '../holdLimits.js';
import { goodRecords, type RecordError } from '../recordStream.js';
import { exploreModel, type ExploreModel, type ExploreModelOptions } from './exploreModel.js';
import { explorePage } from './explorePage.js';

/** Options of {@link exploreFile}. */
export interface ExploreOptions extends Omit<ExploreModelOptions, 'file'> {
  /** The input as it should appear in the copied commands. Default: `path` as given. */
  readonly file?: string;
  /** Page title. Default `conformark explorer: FILE`. */
  readonly title?: string;
  readonly read?: StreamOptions;
  /** Caps on the records held at once (defaults as `ensemble`). */
  readonly hold?: HoldOptions;
}

/** What {@link exploreFile} returns. */
export interface ExploreResult {
  readonly html: string;
  readonly model: ExploreModel;
  /** Records that could not be read (the page lists the others). */
  readonly errors: readonly RecordError[];
}

/**
 * Reads every record of `path` and makes the explorer page.
 * @example writeAtomic('w2.html', (await exploreFile('w2.sdf')).html)
 */
export async function exploreFile(path: string, options: ExploreOptions = {}): Promise<ExploreResult> {
  const errors: RecordError[] = [];
  const molecules: Molecule[] = [];
  for await (const mol of goodRecords(path, options, errors)) molecules.push(mol);
  if (molecules.length === 0) {
    const why = errors[0] ? `: ${errors[0].message}` : '';
    throw usageError('no-records', `no record to explore${why}`, path);
  }
  const model = await exploreModel(molecules, { ...options, file: options.file ?? path });
  return { html: explorePage(model, { title: options.title }), model, errors };
}
