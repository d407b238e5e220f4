/**
 * What a trajectory run fixes once, from frame 1: bonds (perceived once), the ring and its reference
 * numbering (so φ keeps its meaning over the run), the torsions to follow, and the per-frame kernels.
 */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { atomIndex } from '../../perceive/atomIndex.js';
import { ringSelection } from '../../perceive/ringSelection.js';
import { ringTokenKind, splitAtomList } from '../../perceive/atomSelection.js';
import { ringReference } from '../../analysis/ringReference.js';
import { ShapeTable } from '../../analysis/shapeTable.js';
import type { RingShapeOptions } from '../../analysis/ringShape.js';
import { PuckerKernel } from '../../geometry/puckerKernel.js';
import { prepareRecord } from '../prepare.js';

/** The fixed frame of reference of a run. */
export interface TrajectorySetup {
  readonly atomCount: number;
  /** Ring atoms (0-based) in reference order. */
  readonly ring: Int32Array;
  readonly locants: readonly string[];
  readonly referenceRule: string;
  /** Torsions (0-based quadruples) and their CSV column names (`torsion_1_2_3_4`). */
  readonly torsions: readonly (readonly [number, number, number, number])[];
  readonly torsionColumns: readonly string[];
  readonly kernel: PuckerKernel;
  readonly table: ShapeTable;
  /** e.g. `ring 1-2-3-4-5-6`. */
  readonly label: string;
}

/** Options used by `trajectorySetup`. */
export interface SetupOptions extends RingShapeOptions {
  readonly ring: string;
  readonly torsions: readonly string[];
  readonly toleranceA?: number;
}

function torsionAtoms(mol: Molecule, text: string): [number, number, number, number] {
  const parts = splitAtomList(text);
  if (parts.length !== 4 || parts.some((p) => p.trim() === '')) {
    throw usageError('bad-selection', `--torsion expects four atoms joined by '-', e.g. 1-2-3-4, got "${text}"`);
  }
  const atoms = parts.map((p) => atomIndex(mol, p)) as [number, number, number, number];
  if (new Set(atoms).size !== 4) throw usageError('bad-selection', `torsion ${text} names an atom twice`);
  return atoms;
}

/**
 * Fixes ring, numbering and torsions from the first frame.
 * @example trajectorySetup(firstFrame, { ring: '1', torsions: [] }).locants // ['1','2','3','4','5','6']
 */
export function trajectorySetup(first: Molecule, options: SetupOptions): TrajectorySetup {
  const { molecule, graph, rings } = prepareRecord(first, { toleranceA: options.toleranceA });
  const picked = ringSelection(molecule, graph, rings, options.ring);
  const ordered = ringTokenKind(options.ring) === 'atoms';
  const ref = ringReference(molecule, graph, picked, { ordered });
  if (ref.atoms.length < 4) throw usageError('bad-ring', `ring ${ref.atoms.map((a) => a + 1).join('-')} has ${ref.atoms.length} atoms: puckering needs at least 4`);
  const torsions = options.torsions.map((t) => torsionAtoms(molecule, t));
  return {
    atomCount: first.atoms.length,
    ring: Int32Array.from(ref.atoms),
    locants: ref.locants,
    referenceRule: ref.rule,
    torsions,
    torsionColumns: torsions.map((q) => `torsion_${q.map((a) => a + 1).join('_')}`),
    kernel: new PuckerKernel(ref.atoms.length),
    table: new ShapeTable(ref.locants, options),
    label: `ring ${ref.atoms.map((a) => a + 1).join('-')}`,
  };
}
