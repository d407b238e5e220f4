/**
 * Everything a batch reports about one record: ring analyses, the Newman view of every drawn bond, ring
 * ³J(H,H) and the energy in kcal/mol. Feeds the figure list, the contact-sheet captions and the tables.
 */
import type { Molecule } from '../model/molecule.js';
import type { Warning } from '../model/errors.js';
import { findEnergy, type EnergyOptions } from '../io/energy.js';
import { toKcalPerMol, type EnergyUnit } from '../model/energyUnits.js';
import { bondListSelection } from '../perceive/bondSelection.js';
import { analyzeRing, type RingAnalysis } from '../analysis/ringAnalysis.js';
import { newmanView, type NewmanView } from '../analysis/newman.js';
import { isSkippedCoupling, ringCouplings, type Coupling, type CouplingOptions } from '../analysis/coupling.js';
import { BOND_SETS, figureBonds, type BondSet } from '../analysis/figureBonds.js';
import type { PreparedRecord } from './prepare.js';

/** Options of {@link analyseRecord}. */
export interface RecordAnalysisOptions {
  /** Bonds to draw: a named set or a list such as `1-2,3-4` (1-based numbers or atom names). Default `ring`. */
  readonly bonds?: BondSet | string;
  /** Also draw ring bonds between two sp² (trigonal, aromatic) atoms with the named sets. Default false. */
  readonly sp2Bonds?: boolean;
  /** Coupling equation (default Haasnoot–de Leeuw–Altona 1980). */
  readonly coupling?: CouplingOptions;
  /** Energy field and unit (default: the first field whose name contains "energy"). */
  readonly energy?: EnergyOptions;
}

/** One record, analysed (0-based atoms). */
export interface RecordAnalysis {
  /** Record number in the file, from 1. */
  readonly record: number;
  readonly title: string;
  /** Energy converted to kcal/mol, with the field it came from and its unit; `null` when the record has none. */
  readonly energy: { readonly kcal: number; readonly field: string; readonly unit: EnergyUnit } | null;
  /** Field of an energy whose unit is unknown (it is then not in `energy`), else `null`. */
  readonly energyWithoutUnit: string | null;
  readonly rings: readonly RingAnalysis[];
  /** Drawn bonds with their Newman views, in drawing order. */
  readonly bonds: readonly { readonly bond: readonly [number, number]; readonly view: NewmanView }[];
  /** Ring H–H couplings; `ring` is the ring's number (from 1). */
  readonly couplings: readonly { readonly ring: number; readonly coupling: Coupling }[];
  readonly warnings: readonly Warning[];
}

/**
 * Analyses a prepared record for batch output.
 * @example analyseRecord(prepareRecord(mol), { bonds: 'rotatable' }).bonds.length
 */
export function analyseRecord(prepared: PreparedRecord, options: RecordAnalysisOptions = {}): RecordAnalysis {
  const { molecule: mol, graph, rings: found } = prepared;
  const rings = found.map((ring, i) => analyzeRing(mol, graph, ring, { id: i + 1 }));
  const ordered = rings.map((r) => r.atoms);
  const which = options.bonds ?? 'ring';
  const pairs = BOND_SETS.has(which as BondSet) ? figureBonds(mol, graph, ordered, which as BondSet, { trigonal: options.sp2Bonds ?? false }) : bondListSelection(mol, graph, which);
  const bonds = pairs.map((bond) => ({ bond, view: newmanView(mol, graph, bond[0], bond[1], { rings: ordered }) }));
  const couplings = rings.flatMap((r) =>
    ringCouplings(mol, graph, r.atoms, options.coupling)
      .filter((c): c is Coupling => !isSkippedCoupling(c))
      .map((coupling) => ({ ring: r.id!, coupling })),
  );
  const found_ = findEnergy(mol, options.energy);
  const warnings: Warning[] = [...rings.flatMap((r) => r.warnings), ...bonds.flatMap((b) => b.view.warnings)];
  return {
    record: mol.source.index,
    title: mol.title,
    energy: found_?.unit ? { kcal: toKcalPerMol(found_.value, found_.unit), field: found_.field, unit: found_.unit } : null,
    energyWithoutUnit: found_ && found_.unit === null ? found_.field : null,
    rings,
    bonds,
    couplings,
    warnings,
  };
}

/** Record label used in file names and captions: `r` + the record number zero-padded to `width` digits. */
export function recordLabel(record: number, width: number): string {
  return `r${String(record).padStart(width, '0')}`;
}
