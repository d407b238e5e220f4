/**
 * The per-record part of the `inspect` report (README.md `conformark/report@1`): atoms, bonds, every ring
 * analysed and, on request, ring ³J(H,H). Pure: the caller supplies a molecule whose bonds are known and the
 * rings found on its graph; the energy and source come from the api layer.
 */
import type { Molecule } from '../model/molecule.js';
import type { Warning } from '../model/errors.js';
import type { Graph } from '../perceive/graph.js';
import { isCoordinationBond, type SetAsideReason, type SetAsideRing } from '../perceive/ringScope.js';
import { analyzeRing, type AnalyzeRingOptions } from './ringAnalysis.js';
import { toReportRing, type ReportRing } from './ringReport.js';
import {
  isSkippedCoupling,
  noHydrogenWarning,
  ringCouplings,
  toCouplingJson,
  type CouplingJson,
  type CouplingOptions,
} from './coupling.js';

/** Options of `recordReport`. */
export interface RecordReportOptions {
  /** Add ring ³J(H,H) couplings (`couplings` field). Default false. */
  readonly couplings?: boolean;
  /** Coupling equation and parameters (see `CouplingOptions`). */
  readonly coupling?: CouplingOptions;
  /** Ring analysis options (thresholds). */
  readonly ring?: AnalyzeRingOptions;
}

/** One record of the report (atoms 1-based). */
export interface RecordReport {
  index: number;
  title: string;
  /** The energy as found; `unit` null when nothing says it (`unitFrom` tells how it was known). */
  energy: { value: number; unit: string | null; unitFrom: string | null; field: string } | null;
  atoms: {
    id: number;
    element: string;
    name: string | null;
    /** The atom's residue when the file has residues (PDB, mmCIF, MOL2), else null. */
    residue: { name: string; number: number; insertion: string; chain: string } | null;
    /** The atom's serial in the file (PDB/mmCIF/MOL2 atom id), else null; select it with `#serial`. */
    serial: number | null;
    xyz: [number, number, number];
  }[];
  /** `coordination` is true for a bond to a metal atom (it closes no ring unless asked). */
  bonds: { atoms: [number, number]; order: number; perceived: boolean; coordination: boolean }[];
  rings: ReportRing[];
  /** Rings found but not analysed (a disulfide loop, a ring over the size limit), atoms 1-based. */
  setAsideRings: { atoms: number[]; size: number; reason: SetAsideReason; message: string }[];
  couplings?: (CouplingJson & { ring: number })[];
  warnings: Warning[];
}

/**
 * Builds the report of one record. `rings` are 0-based atom lists in bonded order (from `findRings`);
 * `setAside` are rings found but not analysed (listed in `setAsideRings`).
 * @example recordReport(mol, graph, findRings(graph)).rings[0]?.shape // 'chair'
 */
export function recordReport(
  mol: Molecule,
  graph: Graph,
  rings: readonly (readonly number[])[],
  options: RecordReportOptions = {},
  setAside: readonly SetAsideRing[] = [],
): RecordReport {
  const c = mol.coords;
  const analysed = rings.map((ring, i) => analyzeRing(mol, graph, ring, { ...options.ring, id: i + 1 }));
  const report: RecordReport = {
    index: mol.source.index,
    title: mol.title,
    energy: null,
    atoms: mol.atoms.map((a, i) => ({
      id: i + 1,
      element: a.element,
      name: a.name,
      residue: a.residue === undefined || a.residueNumber === undefined
        ? null
        : { name: a.residue, number: a.residueNumber, insertion: a.insertionCode ?? '', chain: a.chain ?? '' },
      serial: a.serial ?? null,
      xyz: [c[3 * i]!, c[3 * i + 1]!, c[3 * i + 2]!],
    })),
    bonds: (mol.bonds ?? []).map((b) => ({ atoms: [b.a + 1, b.b + 1], order: b.order, perceived: b.perceived, coordination: isCoordinationBond(mol, b) })),
    rings: analysed.map(toReportRing),
    setAsideRings: setAside.map((r) => ({ atoms: r.atoms.map((a) => a + 1), size: r.atoms.length, reason: r.reason, message: r.message })),
    // aromatic and other sp²-only rings carry no nearly-planar warning (analyzeRing leaves it out)
    // what the reader read past (close contacts between residues, CONECT not applied) comes first
    warnings: [
      ...(mol.warnings ?? []),
      ...analysed.flatMap((r) => r.warnings.map((w) => ({ ...w, message: `ring ${r.id}: ${w.message}` }))),
    ],
  };
  if (options.couplings) {
    const noH = noHydrogenWarning(mol);
    if (noH) report.warnings.push(noH);
    report.couplings = analysed.flatMap((r) =>
      ringCouplings(mol, graph, r.atoms, options.coupling)
        .filter((x) => !isSkippedCoupling(x))
        .map((x) => ({ ring: r.id ?? 0, ...toCouplingJson(x as Exclude<typeof x, { skipped: string }>) })),
    );
  }
  return report;
}
