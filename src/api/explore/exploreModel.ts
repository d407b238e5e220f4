/**
 * The explorer page's data: one row per record (energy, ΔE, population and ring shapes from the ensemble when
 * every record has an energy; file order otherwise), each with its bonds and rings and their figures, and one 2D
 * picture per distinct compound. Records are given their figures in list order until the page's size limit
 * is reached; the rest keep their row and are summarised with a note.
 */
import type { Molecule } from '../../model/molecule.js';
import { ConformarkError, type Warning } from '../../model/errors.js';
import { findEnergy, type EnergyOptions } from '../../io/energy.js';
import { analyzeRing } from '../../analysis/ringAnalysis.js';
import { chemicalNumbering } from '../../analysis/chemicalNumbering.js';
import { ensembleOf } from '../ensemble/ensemble.js';
import { prepareRecord, type PreparedRecord } from '../prepare.js';
import { depiction, topologyKey, type Depiction } from './depiction.js';
import { depictionSvg } from './depictionSvg.js';
import { scriptJson } from './escapeHtml.js';
import { packDetail } from './packDetail.js';
import { descriptorText } from './descriptorText.js';
import { exploreRecord, type ExploreBond, type ExploreFigureOptions, type ExploreRing } from './exploreRecord.js';
import { loadTheme } from '../../render/themes.js';

/** Default size limit of the page, bytes. */
export const EXPLORE_MAX_BYTES = 5_000_000;

/** Bytes kept for the page's own markup, style and script (they measure about 30 kB). */
const PAGE_RESERVE_BYTES = 64_000;

/** Options of {@link exploreModel}. */
export interface ExploreModelOptions {
  /** The input file as the user names it on a command line (goes into every copied command). Required. */
  readonly file: string;
  /** Size limit of the whole page, bytes: records get figures in list order while the page stays under it. Default {@link EXPLORE_MAX_BYTES}. */
  readonly maxBytes?: number;
  /** Temperature for populations, K. Default 298.15. */
  readonly temperatureK?: number;
  /** Energy field and unit (default as `ensemble`). */
  readonly energy?: EnergyOptions;
  /** Theme, Newman angles and hydrogens for every figure (and its command). Defaults as `newman` and `chair`. */
  readonly figures?: ExploreFigureOptions;
}

/** One record's row, with its bonds and rings when it is embedded. */
export interface ExploreRow {
  readonly record: number;
  readonly title: string;
  /** kcal/mol, or `null` without an ensemble. */
  readonly energy: number | null;
  readonly relativeEnergy: number | null;
  readonly population: number | null;
  readonly duplicateOf: number | null;
  /** Each ring's shape and descriptor, joined by a no-break space, e.g. `chair ⁴C₁`. */
  readonly shapes: readonly string[];
  /** Index into `depictions`. */
  readonly depiction: number;
  /** False when the size limit left this record's figures out. */
  readonly embedded: boolean;
  readonly bonds: readonly ExploreBond[];
  readonly rings: readonly ExploreRing[];
}

/** The page model (`conformark/explore@1`). */
export interface ExploreModel {
  readonly schema: 'conformark/explore@1';
  readonly file: string;
  readonly ensemble: boolean;
  readonly temperatureK: number | null;
  readonly rows: readonly ExploreRow[];
  readonly depictions: readonly Depiction[];
  /** What the numbers mean (from the ensemble), then the size-limit note when it applied. */
  readonly notes: readonly string[];
  /** The size-limit note, or `null` when every record is embedded. */
  readonly limitNote: string | null;
  readonly warnings: readonly { readonly record: number; readonly warning: Warning }[];
}

/**
 * The page model of some records (at least one), in the order the page lists them.
 * @example (await exploreModel(mols, { file: 'w3.sdf' })).rows[0]?.bonds.length
 */
export async function exploreModel(molecules: readonly Molecule[], options: ExploreModelOptions): Promise<ExploreModel> {
  const maxBytes = options.maxBytes ?? EXPLORE_MAX_BYTES;
  // a bad theme is one usage error, not an error on every figure
  if (options.figures?.theme !== undefined) loadTheme(options.figures.theme);
  // 1. Rank by energy when every record has one with a known unit; else keep file order.
  const ranked = rankable(molecules, options.energy);
  const ensemble = ranked ? ensembleOf(molecules, { temperatureK: options.temperatureK, energy: options.energy }) : null;
  const prepared: readonly PreparedRecord[] = ensemble ? ensemble.prepared : molecules.map((m) => prepareRecord(m));
  const notes = ensemble ? [...ensemble.report.notes] : ['no energies to rank by (every record needs one with a known unit): records in file order'];
  // 2. One 2D picture per compound (same atoms and bonds).
  const depictions: Depiction[] = [];
  const pictureOf = new Map<string, number>();
  // 3. Rows, with figures until the size limit is reached (the first record always gets its figures).
  const rows: ExploreRow[] = [];
  let used = PAGE_RESERVE_BYTES;
  let full = false;
  for (const [i, p] of prepared.entries()) {
    const key = topologyKey(p.molecule);
    if (!pictureOf.has(key)) {
      pictureOf.set(key, depictions.length);
      const picture = await depiction(p.molecule, p.graph, p.rings, chemicalNumbering(p.molecule, p.graph, p.rings).names);
      depictions.push(picture);
      used += bytes(depictionSvg(picture));
    }
    const c = ensemble?.report.conformers[i];
    const record = p.molecule.source.index;
    const base = {
      record,
      title: p.molecule.title,
      energy: c ? round(c.energy, 4) : null,
      relativeEnergy: c ? round(c.relativeEnergy, 4) : null,
      population: c ? round(c.population, 6) : null,
      duplicateOf: c?.duplicateOf ?? null,
      shapes: (c?.rings ?? ringShapes(p)).map((r) => (r.descriptor ? `${r.shape}\u00a0${descriptorText(r.descriptor)}` : r.shape)),
      depiction: pictureOf.get(key)!,
    };
    // every row is on the page; a record's figures and tables are added while the page stays under the limit
    used += bytes(scriptJson({ ...base, embedded: false, bonds: [], rings: [] }));
    const detail = full ? null : exploreRecord(p, { file: options.file, record, figures: options.figures });
    // measured as the page carries it (packed); a JSON string of base64 needs no escaping
    const size = detail ? bytes(packDetail(detail)) + 12 : 0;
    if (detail && (rows.length === 0 || used + size <= maxBytes)) {
      used += size;
      rows.push({ ...base, embedded: true, ...detail });
    } else {
      full = true;
      rows.push({ ...base, embedded: false, bonds: [], rings: [] });
    }
  }
  const left = rows.filter((r) => !r.embedded).length;
  const limitNote = left === 0 ? null : `${left} of ${rows.length} records are listed without figures: the page stays under ${Number((maxBytes / 1e6).toPrecision(3))} MB (raise it with --max-size, or copy a shown record's command and change --record)`;
  return {
    schema: 'conformark/explore@1',
    file: options.file,
    ensemble: ensemble !== null,
    temperatureK: ensemble ? ensemble.report.temperatureK : null,
    rows,
    depictions,
    notes: limitNote ? [...notes, limitNote] : notes,
    limitNote,
    warnings: ensemble ? ensemble.warnings : [],
  };
}

/** True when every record has an energy with a known unit (a bad energy option is still the user's error). */
function rankable(molecules: readonly Molecule[], energy: EnergyOptions | undefined): boolean {
  return molecules.every((m) => {
    try {
      const e = findEnergy(m, energy);
      return e !== null && e.unit !== null;
    } catch (err) {
      if (err instanceof ConformarkError && energy?.field === undefined && energy?.unit === undefined) return false;
      throw err;
    }
  });
}

function ringShapes(p: PreparedRecord): { shape: string; descriptor: string | null }[] {
  return p.rings.map((ring) => analyzeRing(p.molecule, p.graph, ring));
}

const round = (x: number, digits: number) => Number(x.toFixed(digits));
const bytes = (text: string) => Buffer.byteLength(text, 'utf8');
