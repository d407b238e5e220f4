/**
 * The ring forms of a conformer as its ring figures name them: each ring analysed in the chemical numbering the
 * drawing uses (carbohydrate convention, else lowest locants), so a ladder label and the sheet's ring figure give
 * the same descriptor (⁴C₁ on both, not ¹C₄ from the file's atom order).
 */
import { analyzeRing } from '../../analysis/ringAnalysis.js';
import { chemicalNumbering, chemicalRingOrder } from '../../analysis/chemicalNumbering.js';
import type { DescriptorParts } from '../../analysis/ringDescriptor.js';
import type { PreparedRecord } from '../prepare.js';

/** Shape and descriptor of one ring as drawn. */
export interface DrawnRingForm {
  readonly shape: string;
  readonly descriptor: DescriptorParts | null;
}

/**
 * Forms of every ring of a prepared record, in ring order.
 * @example drawnRingForms(prepareRecord(mol))[0].shape // 'chair'
 */
export function drawnRingForms(p: PreparedRecord): DrawnRingForm[] {
  const numbering = chemicalNumbering(p.molecule, p.graph, p.rings);
  return p.rings.map((atoms) => {
    const chemical = chemicalRingOrder(numbering, p.graph, atoms);
    const ring = analyzeRing(p.molecule, p.graph, chemical?.atoms ?? atoms, {
      ordered: chemical !== null,
      ...(chemical ? { locants: chemical.locants, numberingRule: chemical.rule } : {}),
    });
    return { shape: ring.shape, descriptor: ring.descriptorParts };
  });
}
