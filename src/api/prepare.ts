/**
 * The first steps every command shares: pick a record from a file, make sure it has bonds (file bonds kept,
 * else perceived from coordinates), build its graph and find its rings.
 */
import type { Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { readRecords, type StreamOptions } from '../io/readRecords.js';
import { withBonds } from '../perceive/withBonds.js';
import { buildGraph, type Graph } from '../perceive/graph.js';
import { findRings } from '../perceive/findRings.js';
import type { PerceiveBondsOptions } from '../perceive/perceiveBonds.js';

/** A record ready for analysis: bonds known, graph built, rings found (0-based, cyclic order). */
export interface PreparedRecord {
  readonly molecule: Molecule;
  readonly graph: Graph;
  readonly rings: readonly (readonly number[])[];
}

/**
 * Bonds (kept from the file, else perceived), graph and smallest set of smallest rings of a molecule.
 * @example prepareRecord(mol).rings.length // 1 for cyclohexane
 */
export function prepareRecord(mol: Molecule, options: PerceiveBondsOptions = {}): PreparedRecord {
  const molecule = withBonds(mol, options);
  const graph = buildGraph(molecule.atoms.length, molecule.bonds ?? []);
  return { molecule, graph, rings: findRings(graph) };
}

/**
 * Record `n` (counted from 1) of a file, read lazily so a long file is not parsed past it.
 * @example const mol = await readRecord('conformers.sdf', 3)
 */
export async function readRecord(path: string, n = 1, options: StreamOptions = {}): Promise<Molecule> {
  let count = 0;
  for await (const mol of readRecords(path, options)) {
    if (++count === n) return mol;
  }
  const what = `record ${n} does not exist (the file has ${count} record${count === 1 ? '' : 's'})`;
  throw usageError('no-record', what, path);
}
