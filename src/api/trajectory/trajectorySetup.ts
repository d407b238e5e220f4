/**
 * What a trajectory run fixes once, from frame 1: bonds (perceived once, or the topology's), the rings and
 * their reference numbering (so φ keeps its meaning over the run), the torsions to follow. A ring token may
 * select several rings (`name:BGC`, a residue with two rings): each is followed and reported separately.
 */
import type { Atom, Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import { atomIndex } from '../../perceive/atomIndex.js';
import { ringTokenKind, selectRings, splitAtomList } from '../../perceive/atomSelection.js';
import { ringReference } from '../../analysis/ringReference.js';
import { ShapeTable } from '../../analysis/shapeTable.js';
import type { RingShapeOptions } from '../../analysis/ringShape.js';
import { PuckerKernel } from '../../geometry/puckerKernel.js';
import { prepareRecord } from '../prepare.js';

/** The residue a ring lies in, as `summary.json` reports it. */
export interface RingResidue {
  readonly name: string;
  readonly number: number | null;
  readonly insertion: string;
  readonly chain: string;
}

/** One followed ring. */
export interface RingSetup {
  /** Ring atoms (0-based) in reference order. */
  readonly ring: Int32Array;
  readonly locants: readonly string[];
  readonly referenceRule: string;
  readonly kernel: PuckerKernel;
  readonly table: ShapeTable;
  /** e.g. `ring 1-2-3-4-5-6`; `CHX2 ring 19-20-21-22-23-24` for a ring chosen by residue or one of several. */
  readonly label: string;
  /** Short name for CSV columns and figure files when several rings are followed: `CHX2`, `A_PRO42`, `ring3`. */
  readonly tag: string;
  readonly residue: RingResidue | null;
}

/** The fixed frame of reference of a run. */
export interface TrajectorySetup {
  readonly atomCount: number;
  /** The followed rings, in selection order (one unless the token selects several). */
  readonly rings: readonly RingSetup[];
  /** Torsions (0-based quadruples) and their CSV column names (`torsion_1_2_3_4`). */
  readonly torsions: readonly (readonly [number, number, number, number])[];
  readonly torsionColumns: readonly string[];
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

/** The residue all of `ring` lies in, or null. */
function residueOf(atoms: readonly Atom[], ring: readonly number[]): RingResidue | null {
  const a = atoms[ring[0]!]!;
  if (a.residue === undefined) return null;
  const same = (b: Atom) => b.residue === a.residue && b.residueNumber === a.residueNumber && (b.insertionCode ?? '') === (a.insertionCode ?? '') && (b.chain ?? '') === (a.chain ?? '');
  if (!ring.every((i) => same(atoms[i]!))) return null;
  return { name: a.residue, number: a.residueNumber ?? null, insertion: a.insertionCode ?? '', chain: a.chain ?? '' };
}

/** `CHX2`, `A_PRO42B`; `ring3` without a residue; `_1`, `_2` for several rings of one residue. */
function tags(residues: readonly (RingResidue | null)[]): string[] {
  const base = residues.map((r, k) => (r === null ? `ring${k + 1}` : `${r.chain === '' ? '' : `${r.chain}_`}${r.name}${r.number ?? ''}${r.insertion}`.replace(/[^A-Za-z0-9_+-]/g, '_')));
  const total = new Map<string, number>();
  for (const b of base) total.set(b, (total.get(b) ?? 0) + 1);
  const seen = new Map<string, number>();
  return base.map((b) => {
    if (total.get(b) === 1) return b;
    const k = (seen.get(b) ?? 0) + 1;
    seen.set(b, k);
    return `${b}_${k}`;
  });
}

/**
 * Fixes rings, numbering and torsions from the first frame.
 * @example trajectorySetup(firstFrame, { ring: '1', torsions: [] }).rings[0].locants // ['1','2','3','4','5','6']
 * @example trajectorySetup(glycan, { ring: 'name:BGC', torsions: [] }).rings.length // one per BGC residue
 */
export function trajectorySetup(first: Molecule, options: SetupOptions): TrajectorySetup {
  const { molecule, graph, rings } = prepareRecord(first, { toleranceA: options.toleranceA });
  const picked = selectRings(molecule, options.ring, rings, graph);
  const kind = ringTokenKind(options.ring);
  const ordered = kind === 'atoms';
  const byResidue = kind === 'residue' || kind === 'name';
  const refs = picked.map((ring) => ringReference(molecule, graph, ring, { ordered }));
  for (const ref of refs) {
    if (ref.atoms.length < 4) throw usageError('bad-ring', `ring ${ref.atoms.map((a) => a + 1).join('-')} has ${ref.atoms.length} atoms: puckering needs at least 4`);
  }
  const residues = refs.map((ref) => residueOf(molecule.atoms, ref.atoms));
  const names = tags(residues);
  const torsions = options.torsions.map((t) => torsionAtoms(molecule, t));
  return {
    atomCount: first.atoms.length,
    rings: refs.map((ref, k) => {
      const r = residues[k]!;
      const atoms = `ring ${ref.atoms.map((a) => a + 1).join('-')}`;
      return {
        ring: Int32Array.from(ref.atoms),
        locants: ref.locants,
        referenceRule: ref.rule,
        kernel: new PuckerKernel(ref.atoms.length),
        table: new ShapeTable(ref.locants, options),
        label: r === null || (refs.length === 1 && !byResidue) ? atoms : `${names[k]} ${atoms}`,
        tag: names[k]!,
        residue: r,
      };
    }),
    torsions,
    torsionColumns: torsions.map((q) => `torsion_${q.map((a) => a + 1).join('_')}`),
  };
}
