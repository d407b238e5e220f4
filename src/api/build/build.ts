/**
 * 3D conformers from a SMILES string: openchemlib parses it (stereo kept) and runs its conformer generator,
 * every conformer is minimised with MMFF94s, duplicates are merged, and with `ringForms` the flipped chairs and
 * twist-boats of saturated six-rings are built by reshaping the ring (see `buildRingForms.ts`).
 *
 * Duplicates: two minimised structures are one conformer when their six-ring shapes agree, their energies
 * differ by at most 0.01 kcal/mol (both from the conformer search) or 0.05 kcal/mol (a reshaped ring is
 * involved), and their heavy-atom RMSD over symmetry permutations and mirror images is at most 0.1 Å
 * (common practice, no source). Mirror-image conformers of an achiral molecule therefore count once.
 */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { buildError, loadOpenchemlib, minimiseMmff, oclMessage, topology, toFileFrame } from './buildOcl.js';
import type { Ocl } from './buildOcl.js';
import { heavyAtomPermutations } from './buildSymmetry.js';
import { symmetricRmsd } from './buildRmsd.js';
import { addRingForms, ringShapes, saturatedSixRings } from './buildRingSearch.js';
import type { Candidate, BuildContext } from './buildRingSearch.js';

/** Options for `buildConformers`. */
export interface BuildOptions {
  /** Distinct conformers to keep from the conformer search (ring forms come on top), integer 1–1000. Default 10. */
  readonly conformers?: number;
  /** Seed of openchemlib's conformer generator, integer. Same seed, same output. Default 1. */
  readonly seed?: number;
  /** Also build the other chair and the twist-boats of every saturated six-ring. Default false. */
  readonly ringForms?: boolean;
  /** Start of every record title (`<title> conformer 3`). Default: the SMILES. */
  readonly title?: string;
  /** Iteration limit of each MMFF94s minimisation. Default 10000. */
  readonly maxIterations?: number;
}

/** Result of `buildConformers`: conformers sorted by energy, and what happened on the way (for the user). */
export interface BuildResult {
  readonly molecules: Molecule[];
  readonly notes: string[];
}

/** Name of the SD data field that holds the energy (unit in the name, so readers find both). */
export const BUILD_ENERGY_FIELD = 'MMFF94s energy (kcal/mol)';

/** The search asks the generator for at most this many conformers per conformer wanted. */
const ATTEMPTS_PER_CONFORMER = 3;

/**
 * Builds 3D conformers with explicit hydrogens and MMFF94s energies from a SMILES string.
 * Errors: `bad-smiles`, `embedding-failed`, `mmff-unsupported`, `minimisation-failed` (ConformarkError).
 * @example const { molecules } = await buildConformers('C1CCCCC1', { ringForms: true }); // chair, twist-boat
 */
export async function buildConformers(smiles: string, options: BuildOptions = {}): Promise<BuildResult> {
  const opts = resolveOptions(smiles, options);
  const ocl = await loadOpenchemlib();
  const mol = parseSmiles(ocl, smiles);
  const generator = new ocl.ConformerGenerator(opts.seed);
  if (!generator.initializeConformers(mol)) {
    throw buildError('embedding-failed', `openchemlib cannot make 3D coordinates for "${smiles}"`);
  }
  const { atoms, bonds, neighbors } = topology(mol);
  const rings = saturatedSixRings(mol, neighbors);
  const { heavy, permutations } = heavyAtomPermutations(atoms, bonds);
  const notes: string[] = [];
  const ctx: BuildContext = {
    ocl, mol, neighbors, rings, notes, maxIterations: opts.maxIterations,
    isDuplicate: (a, b) => isDuplicate(a, b, heavy, permutations),
  };

  // 1. conformer search, each result minimised; stop at the wanted number of distinct conformers
  const kept: Candidate[] = [];
  let made = 0;
  let failed = 0;
  while (kept.length < opts.conformers && made < opts.conformers * ATTEMPTS_PER_CONFORMER) {
    const conformer = generator.getNextConformerAsMolecule();
    if (!conformer) break;
    made++;
    const result = minimiseMmff(ocl, conformer, opts.maxIterations);
    if (!result.ok) {
      failed++;
      continue;
    }
    const candidate: Candidate = {
      coords: result.coords, energy: result.energy, origin: 'conformer search', fromSearch: true,
      shapes: ringShapes(result.coords, rings),
    };
    if (!kept.some((k) => ctx.isDuplicate(k, candidate))) kept.push(candidate);
  }
  if (made === 0) throw buildError('embedding-failed', `openchemlib made no conformer for "${smiles}"`);
  if (kept.length === 0) {
    throw buildError('minimisation-failed', `MMFF94s minimisation did not converge for any of ${made} conformers`);
  }
  notes.push(`conformer search: ${made} generated, ${kept.length} distinct after MMFF94s minimisation`);
  if (failed > 0) notes.push(`${failed} conformers dropped: the MMFF94s minimisation did not converge`);

  // 2. ring forms, reshaped from the lowest-energy conformer of the search
  kept.sort((a, b) => a.energy - b.energy);
  if (opts.ringForms) addRingForms(ctx, kept);

  // 3. sort by energy and turn into records
  kept.sort((a, b) => a.energy - b.energy);
  const molecules = kept.map((c, k) => toMolecule(c, k, atoms, bonds, opts.title, smiles));
  return { molecules, notes };
}

interface ResolvedBuildOptions {
  conformers: number;
  seed: number;
  ringForms: boolean;
  title: string;
  maxIterations: number;
}

function resolveOptions(smiles: string, o: BuildOptions): ResolvedBuildOptions {
  const int = (name: string, value: number | undefined, fallback: number, min: number, max: number): number => {
    const v = value ?? fallback;
    if (!Number.isInteger(v) || v < min || v > max) {
      throw usageError('bad-option', `${name} must be an integer from ${min} to ${max}, got ${v}`);
    }
    return v;
  };
  return {
    conformers: int('conformers', o.conformers, 10, 1, 1000),
    seed: int('seed', o.seed, 1, -(2 ** 31), 2 ** 31 - 1),
    ringForms: o.ringForms ?? false,
    title: (o.title ?? smiles).trim() || smiles,
    maxIterations: int('maxIterations', o.maxIterations, 10000, 1, 1_000_000),
  };
}

function parseSmiles(ocl: Ocl, smiles: string): InstanceType<Ocl['Molecule']> {
  const text = smiles.trim();
  if (text === '') throw buildError('bad-smiles', 'empty SMILES');
  let mol: InstanceType<Ocl['Molecule']>;
  try {
    mol = ocl.Molecule.fromSmiles(text);
  } catch (err) {
    throw buildError('bad-smiles', `cannot read SMILES "${text}": ${oclMessage(err)}`);
  }
  if (mol.getAllAtoms() === 0) throw buildError('bad-smiles', `SMILES "${text}" has no atoms`);
  return mol;
}

function isDuplicate(a: Candidate, b: Candidate, heavy: readonly number[], perms: readonly Int32Array[]): boolean {
  const tolerance = a.fromSearch && b.fromSearch ? 0.01 : 0.05;
  if (Math.abs(a.energy - b.energy) > tolerance) return false;
  if (a.shapes.join() !== b.shapes.join()) return false;
  return symmetricRmsd(a.coords, b.coords, heavy, perms) <= 0.1;
}

function toMolecule(
  c: Candidate,
  k: number,
  atoms: Molecule['atoms'],
  bonds: Molecule['bonds'],
  title: string,
  smiles: string,
): Molecule {
  const properties: Record<string, string> = {
    [BUILD_ENERGY_FIELD]: c.energy.toFixed(4),
    SMILES: smiles.trim(),
    origin: c.origin,
  };
  if (c.shapes.length > 0) properties['six-ring shapes'] = c.shapes.join(', ');
  return {
    title: `${title} conformer ${k + 1}`,
    atoms,
    coords: toFileFrame(c.coords),
    bonds,
    properties,
    // built in memory: `file` is the SMILES and `line` 0 (no file line)
    source: { file: smiles.trim(), format: 'sdf', index: k + 1, line: 0 },
  };
}
