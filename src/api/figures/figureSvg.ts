/** One call from a molecule to the SVG text of a bond's Newman projection or a ring's drawing, for embedding. */
import type { Molecule } from '../../model/molecule.js';
import { usageError } from '../../model/errors.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme } from '../../render/themes.js';
import { prepareRecord } from '../prepare.js';
import { drawFigure, type FigureKind } from './figureKinds.js';

/** Options of {@link figureSvg}: give exactly one of `bond` and `ring`. Atoms and rings are 0-based. */
export interface FigureSvgOptions {
  /** Bond [front, back] for a Newman projection (viewer at front, looking at back). */
  readonly bond?: readonly [number, number];
  /**
   * Ring for a ring figure: its index in the rings found on the record (0-based, the order `inspect` numbers
   * them from 1), or its atoms in cyclic order (0-based).
   */
  readonly ring?: number | readonly number[];
  /** Theme object, built-in name (`column`, `projector`, `contrast`) or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Prefix of every id inside the SVG, unique per figure on a page. Default `fig-`. */
  readonly idPrefix?: string;
}

/**
 * SVG text of one figure of `mol` (bonds perceived when the file has none), ready to inline in HTML or a
 * slide. Bond → Newman projection; ring → ring figure.
 * @example document.body.innerHTML += figureSvg(mol, { bond: [1, 2], idPrefix: 'f1-' })
 */
export function figureSvg(mol: Molecule, options: FigureSvgOptions): string {
  const { bond, ring, idPrefix = 'fig-' } = options;
  if ((bond === undefined) === (ring === undefined)) {
    throw usageError('bad-figure', 'figureSvg needs exactly one of bond and ring');
  }
  const prepared = prepareRecord(mol);
  let rings = prepared.rings;
  let target: { bond?: readonly [number, number]; ring?: number } = { bond };
  let kind: FigureKind = 'newman';
  if (ring !== undefined) {
    kind = 'ring';
    if (typeof ring === 'number') {
      if (!Number.isInteger(ring) || ring < 0 || ring >= rings.length) {
        throw usageError('no-ring', `ring ${ring} does not exist (the record has ${rings.length} ring${rings.length === 1 ? '' : 's'}; indices from 0)`);
      }
      target = { ring };
    } else {
      rings = [ring, ...rings];
      target = { ring: 0 };
    }
  } else if (bond && !prepared.graph.bonded(bond[0], bond[1])) {
    throw usageError('not-bonded', `atoms ${bond[0] + 1} and ${bond[1] + 1} are not bonded`);
  }
  const theme = loadTheme(options.theme);
  return drawFigure(kind, { ...prepared, rings, theme, idPrefix }, target).svg;
}
