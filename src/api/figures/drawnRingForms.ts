/**
 * The ring forms of a conformer as its ring figures name them: each ring analysed in the chemical numbering the
 * drawing uses (carbohydrate convention, else lowest locants), so a ladder label and the sheet's ring figure give
 * the same descriptor (⁴C₁ on both, not ¹C₄ from the file's atom order).
 */
import { analyzeRing, type AnalyzeRingOptions, type RingAnalysis } from '../../analysis/ringAnalysis.js';
import { chemicalNumbering, chemicalRingOrder, type ChemicalNumbering } from '../../analysis/chemicalNumbering.js';
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { DescriptorParts } from '../../analysis/ringDescriptor.js';
import type { PreparedRecord } from '../prepare.js';

/** Shape and descriptor of one ring as drawn. */
export interface DrawnRingForm {
  readonly shape: string;
  readonly descriptor: DescriptorParts | null;
}

/** Options of {@link analyzeDrawnRing}. */
export interface DrawnRingOptions {
  /** Analyse in the chemical numbering (default true); false keeps `atoms` as given. */
  readonly chemical?: boolean;
  /** Overrides whether the atom order is kept (default: kept when the chemical order is used). */
  readonly ordered?: boolean;
  readonly id?: number;
  readonly analysis?: Omit<AnalyzeRingOptions, 'id' | 'ordered' | 'locants' | 'numberingRule'>;
}

/**
 * One ring analysed as its figure draws it: in the chemical numbering (carbohydrate convention, lowest
 * locants), so the caption's descriptor uses the locants on the drawing.
 * @example analyzeDrawnRing(mol, graph, chemicalNumbering(mol, graph, rings), rings[0]).descriptor // '4C1'
 */
export function analyzeDrawnRing(mol: Molecule, graph: Graph, numbering: ChemicalNumbering, atoms: readonly number[], options: DrawnRingOptions = {}): RingAnalysis {
  const chemical = options.chemical === false ? null : chemicalRingOrder(numbering, graph, atoms);
  return analyzeRing(mol, graph, chemical?.atoms ?? atoms, {
    ...options.analysis,
    ...(options.id === undefined ? {} : { id: options.id }),
    ordered: options.ordered ?? chemical !== null,
    ...(chemical ? { locants: chemical.locants, numberingRule: chemical.rule } : {}),
  });
}

/**
 * Forms of every ring of a prepared record, in ring order.
 * @example drawnRingForms(prepareRecord(mol))[0].shape // 'chair'
 */
export function drawnRingForms(p: PreparedRecord): DrawnRingForm[] {
  const numbering = chemicalNumbering(p.molecule, p.graph, p.rings);
  return p.rings.map((atoms) => {
    const ring = analyzeDrawnRing(p.molecule, p.graph, numbering, atoms);
    return { shape: ring.shape, descriptor: ring.descriptorParts };
  });
}
