/**
 * The first steps every command shares: pick a record from a file, make sure it has bonds (file bonds kept,
 * else perceived from coordinates), build its graph and find its rings.
 */
import type { Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import type { StreamOptions } from '../io/readRecords.js';
import { ConformarkError } from '../model/errors.js';
import { recordOutcomes } from './recordStream.js';
import { withBonds } from '../perceive/withBonds.js';
import { buildGraph, type Graph } from '../perceive/graph.js';
import { findRings } from '../perceive/findRings.js';
import type { PerceiveBondsOptions } from '../perceive/perceiveBonds.js';
import { isCoordinationBond, ringClosingBonds, scopeRings, type RingScopeOptions, type SetAsideRing } from '../perceive/ringScope.js';

/** A record ready for analysis: bonds known, graph built, rings found (0-based, cyclic order). */
export interface PreparedRecord {
  readonly molecule: Molecule;
  /** Every bond, coordination bonds to metals included. */
  readonly graph: Graph;
  /** The rings analysed (see {@link RingScopeOptions}). */
  readonly rings: readonly (readonly number[])[];
  /** Rings found but not analysed (disulfide loops, rings over the size limit), with the reason. */
  readonly setAside: readonly SetAsideRing[];
  /** Bonds with a metal atom at one end; unless `metalRings`, they close no rings. */
  readonly coordinationBonds: number;
}

/** Options of {@link prepareRecord}: bond perception and which rings are analysed. */
export type PrepareOptions = PerceiveBondsOptions & RingScopeOptions;

/**
 * Bonds (kept from the file, else perceived), graph and smallest set of smallest rings of a molecule. Rings
 * are found without the coordination bonds (unless `metalRings`); rings through an S–S bond or larger than
 * `maxRingSize` (default 12) are set aside, not analysed (`setAside` says why).
 * @example prepareRecord(mol).rings.length // 1 for cyclohexane
 */
export function prepareRecord(mol: Molecule, options: PrepareOptions = {}): PreparedRecord {
  const molecule = withBonds(mol, options);
  const bonds = molecule.bonds ?? [];
  const graph = buildGraph(molecule.atoms.length, bonds);
  const closing = ringClosingBonds(molecule, bonds, options);
  const found = findRings(closing === bonds ? graph : buildGraph(molecule.atoms.length, closing));
  const { rings, setAside } = scopeRings(molecule, found, options);
  const coordinationBonds = closing === bonds && !options.metalRings ? 0 : bonds.filter((b) => isCoordinationBond(molecule, b)).length;
  return { molecule, graph, rings, setAside, coordinationBonds };
}

/**
 * Record `n` (counted from 1) of a file, read lazily so a long file is not parsed past it. A bad record
 * before `n` is read past (bad records count in the numbering); only record `n` itself being bad, or a
 * problem that stops reading the file, throws.
 * @example const mol = await readRecord('conformers.sdf', 3)
 */
export async function readRecord(path: string, n = 1, options: StreamOptions = {}): Promise<Molecule> {
  let count = 0;
  const bad: { code: string; file: string; line: number | null; message: string }[] = [];
  for await (const outcome of recordOutcomes(path, options)) {
    if ('molecule' in outcome) {
      if (bad.length > 0) break;
      count = outcome.molecule.source.index;
      if (count === n) return outcome.molecule;
      continue;
    }
    const { record, code, file, line, message } = outcome.error;
    if (record === null || record === n) bad.push({ code, file, line, message });
    else if (bad.length > 0) break;
    if (record === null) break;
    count = record;
  }
  if (bad.length > 0) throw new ConformarkError(bad);
  const what = `record ${n} does not exist (the file has ${count} record${count === 1 ? '' : 's'})`;
  throw usageError('no-record', what, path);
}
