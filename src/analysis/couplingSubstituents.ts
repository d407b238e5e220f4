/**
 * The substituent terms of the Haasnoot–de Leeuw–Altona equation for one H–C–C–H fragment, read from the
 * molecular graph and coordinates (docs/methods.md#haasnoot): every non-H neighbour of either coupled carbon other than
 * the partner carbon, with its Huggins Δχ, the β correction and the orientation sign ξ from the vectors.
 */
import { atomPosition, type Molecule } from '../model/molecule.js';
import type { Warning } from '../model/errors.js';
import type { Graph } from '../perceive/graph.js';
import { hugginsElectronegativity, substituentOrientation, type HaasnootTerm } from './haasnoot.js';

const CHI_H = 2.2;

/** True for H and its isotopes as element symbols. */
export function isHydrogen(element: string): boolean {
  return element === 'H' || element === 'D' || element === 'T';
}

/** One substituent of the coupled fragment, with the atom it came from (0-based). */
export interface CouplingSubstituent extends HaasnootTerm {
  readonly atom: number;
  /** The coupled carbon carrying it (0-based). */
  readonly carrier: number;
}

/** The terms, or the reason they cannot be formed. */
export type SubstituentScan =
  | { readonly substituents: readonly CouplingSubstituent[]; readonly warnings: readonly Warning[] }
  | { readonly skipped: string };

/**
 * Substituent terms for the fragment hA–cA–cB–hB.
 * @param p7 β factor of the parameter set in use (0 turns the β correction off).
 * @param fluorine χ(F), Huggins scale.
 */
export function couplingSubstituents(
  mol: Molecule,
  graph: Graph,
  [hA, cA, cB, hB]: readonly [number, number, number, number],
  p7: number,
  fluorine: number,
): SubstituentScan {
  const substituents: CouplingSubstituent[] = [];
  const warnings: Warning[] = [];
  const sides: readonly (readonly [number, number, number])[] = [
    [hA, cA, cB],
    [hB, cB, cA],
  ];
  for (const [h, carrier, partner] of sides) {
    for (const s of graph.neighbors[carrier] ?? []) {
      const element = mol.atoms[s]!.element;
      if (s === partner || isHydrogen(element)) continue;
      const chi = hugginsElectronegativity(element, fluorine);
      if (chi === undefined) {
        return { skipped: `no Huggins electronegativity for ${element} (atom ${s + 1})` };
      }
      let beta = 0;
      for (const b of graph.neighbors[s] ?? []) {
        const el = mol.atoms[b]!.element;
        if (b === carrier || isHydrogen(el)) continue;
        const chiB = hugginsElectronegativity(el, fluorine);
        if (chiB === undefined) {
          warnings.push({
            code: 'no-electronegativity',
            message: `no Huggins electronegativity for ${el} (atom ${b + 1}); its β correction was left out`,
          });
          continue;
        }
        beta += chiB - CHI_H;
      }
      const orientation = substituentOrientation(
        atomPosition(mol, h),
        atomPosition(mol, carrier),
        atomPosition(mol, partner),
        atomPosition(mol, s),
      );
      if (orientation === null) {
        return { skipped: `substituent atom ${s + 1} is coplanar with H ${h + 1} and the C–C bond` };
      }
      substituents.push({ atom: s, carrier, deltaChi: chi - CHI_H - p7 * beta, orientation });
    }
  }
  return { substituents, warnings };
}

/** Number of non-H substituents on the two coupled carbons, not counting each other. */
export function countSubstituents(mol: Molecule, graph: Graph, cA: number, cB: number): number {
  let n = 0;
  for (const [carrier, partner] of [[cA, cB], [cB, cA]] as const) {
    for (const s of graph.neighbors[carrier] ?? []) {
      if (s !== partner && !isHydrogen(mol.atoms[s]!.element)) n++;
    }
  }
  return n;
}
