/** One call from a molecule to a themed Newman figure: analyse → lay out → render. */
import type { Molecule } from '../../model/molecule.js';
import { usageError, type Warning } from '../../model/errors.js';
import { buildGraph, type Graph } from '../../perceive/graph.js';
import { newmanView, type NewmanView } from '../../analysis/newman.js';
import { couplingsAcrossBond, isSkippedCoupling, noHydrogenWarning, type Coupling, type CouplingOptions } from '../../analysis/coupling.js';
import { layoutNewman, type NewmanLayoutOptions } from '../../layout/newman/newmanLayout.js';
import type { Scene } from '../../layout/scene.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';
import { sceneTextWarnings } from '../../layout/text/safeText.js';
import { findRings } from '../../perceive/findRings.js';
import { chemicalNumbering } from '../../analysis/chemicalNumbering.js';
import { hydroxymethylRotamer } from '../../analysis/hydroxymethylRotamer.js';
import { torsionText } from '../../layout/newman/newmanText.js';
import { legibilityWarnings } from './legibilityWarnings.js';

/** Options of {@link newmanFigure}. Atom indices are 0-based. */
export interface NewmanFigureOptions extends Omit<NewmanLayoutOptions, 'metrics' | 'measure' | 'couplings'> {
  /**
   * Print predicted ³J(H,H) for every H/H pair across the bond: `true` for the default equation
   * (Haasnoot–de Leeuw–Altona 1980), or coupling options. Default false.
   */
  readonly couplings?: boolean | CouplingOptions;
  /** The bond, [front, back]: the viewer looks from front to back. Required. */
  readonly bond: readonly [number, number];
  /** Front substituent pointing up. Default: the ring neighbour for ring bonds, else the heaviest. */
  readonly up?: number;
  /** Rings (cyclic 0-based atom lists) for ring bonds and ring substituents. Default none. */
  readonly rings?: readonly (readonly number[])[];
  /** Bond graph. Default: built from `mol.bonds` (perceive bonds first when the file has none). */
  readonly graph?: Graph;
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Id prefix for the SVG. Default `newman-`. */
  readonly idPrefix?: string;
}

/** What {@link newmanFigure} returns. */
export interface NewmanFigure {
  readonly svg: string;
  readonly view: NewmanView;
  readonly scene: Scene;
  readonly warnings: readonly Warning[];
  /** Predicted couplings across the bond (empty unless asked for). */
  readonly couplings: readonly Coupling[];
}

/**
 * Newman projection of a bond as semantic SVG, with the analysis behind it.
 * @example const { svg, view } = newmanFigure(mol, { bond: [1, 2], theme: 'projector' })
 */
export function newmanFigure(mol: Molecule, options: NewmanFigureOptions): NewmanFigure {
  const graph = options.graph ?? graphOf(mol);
  const [front, back] = options.bond;
  const view = newmanView(mol, graph, front, back, { up: options.up, rings: options.rings });
  const theme = loadTheme(options.theme);
  const couplings = options.couplings
    ? couplingsAcrossBond(mol, graph, front, back, options.couplings === true ? {} : options.couplings).filter(
        (c): c is Coupling => !isSkippedCoupling(c),
      )
    : [];
  // chemical numbering names ring neighbours and captions (C1–C2, ³J(H1,H2)); a pyranose C5–C6 bond also
  // gets its hydroxymethyl rotamer (gg/gt/tg)
  const rings = options.rings ?? findRings(graph);
  const { names } = chemicalNumbering(mol, graph, rings);
  const bondNames = [names.get(front), names.get(back)].sort().join('–');
  const rotamer = bondNames === 'C5–C6' ? hydroxymethylRotamer(mol, names) : null;
  const notes = rotamer ? [`hydroxymethyl ${rotamer.rotamer} (O5–C5–C6–O6 ${torsionText(rotamer.o5Deg)}, C4–C5–C6–O6 ${torsionText(rotamer.c4Deg)})`] : [];
  const scene = layoutNewman(view, mol, { ...options, couplings, metrics: sceneMetrics(theme), measure: measureText, graph, names, rings, notes });
  const svg = renderSvg(scene, theme, { idPrefix: options.idPrefix });
  const noH = options.couplings ? noHydrogenWarning(mol) : null;
  const warnings = [...view.warnings, ...couplings.flatMap((c) => c.warnings), ...(noH ? [noH] : []), ...sceneTextWarnings(scene), ...legibilityWarnings(scene)];
  return { svg, view, scene, warnings, couplings };
}

function graphOf(mol: Molecule): Graph {
  if (!mol.bonds) throw usageError('no-bonds', `record ${mol.source.index} of ${mol.source.file} has no bonds: perceive them first (withBonds)`, mol.source.file);
  return buildGraph(mol.atoms.length, mol.bonds);
}
