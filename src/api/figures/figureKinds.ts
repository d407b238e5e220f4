/**
 * Figure kinds a batch, an ensemble sheet or `figureSvg` can draw: a registry from kind to renderer, so
 * shared code never branches on a kind's name. `newman` draws a bond; `ring` draws a ring (chair template or
 * true projection, area G's `chairFigure`).
 */
import type { Molecule } from '../../model/molecule.js';
import { usageError, type Warning } from '../../model/errors.js';
import type { Graph } from '../../perceive/graph.js';
import type { Theme } from '../../render/theme.js';
import { newmanFigure } from './newman.js';
import { chairFigure } from './chair.js';

/** What a figure shows: a bond [front, back] (0-based) or a ring (0-based index into `rings`). */
export interface FigureTarget {
  readonly bond?: readonly [number, number];
  readonly ring?: number;
}

/** A prepared record plus drawing settings, as every renderer receives it. */
export interface FigureContext {
  readonly molecule: Molecule;
  readonly graph: Graph;
  readonly rings: readonly (readonly number[])[];
  readonly theme: Theme;
  /** Id prefix of this figure (unique on a page). */
  readonly idPrefix: string;
  /** Hydrogens on ring atoms in ring figures: `all`, `stereo` (default) or `none` (small panels read better without). */
  readonly ringHydrogens?: 'all' | 'stereo' | 'none';
}

/** A drawn figure: SVG text and its size in the theme's unit. */
export interface DrawnFigure {
  readonly svg: string;
  readonly width: number;
  readonly height: number;
  readonly warnings: readonly Warning[];
}

export type FigureRenderer = (ctx: FigureContext, target: FigureTarget) => DrawnFigure;

/** Figure kinds conformark knows; `FIGURE_RENDERERS` holds the ones this build can draw. */
export type FigureKind = 'newman' | 'ring';

const newman: FigureRenderer = (ctx, target) => {
  if (!target.bond) throw new Error('newman figure without a bond');
  const { svg, scene, warnings } = newmanFigure(ctx.molecule, {
    bond: target.bond, graph: ctx.graph, rings: ctx.rings, theme: ctx.theme, idPrefix: ctx.idPrefix,
  });
  return { svg, width: scene.width, height: scene.height, warnings };
};

const ring: FigureRenderer = (ctx, target) => {
  if (target.ring === undefined) throw new Error('ring figure without a ring');
  // chairFigure numbers rings from 1 among `rings`; it picks the template view for chairs, else the projection
  const { svg, scene, warnings } = chairFigure(ctx.molecule, {
    ring: target.ring + 1, graph: ctx.graph, rings: ctx.rings, theme: ctx.theme, idPrefix: ctx.idPrefix, hydrogens: ctx.ringHydrogens,
  });
  return { svg, width: scene.width, height: scene.height, warnings };
};

/** Renderer per figure kind. A kind missing here is skipped by batch and reported in its notes. */
export const FIGURE_RENDERERS = new Map<FigureKind, FigureRenderer>([
  ['newman', newman],
  ['ring', ring],
]);

/** True when this build can draw `kind`. */
export function canDraw(kind: FigureKind): boolean {
  return FIGURE_RENDERERS.has(kind);
}

/** Draws one figure of a registered kind. */
export function drawFigure(kind: FigureKind, ctx: FigureContext, target: FigureTarget): DrawnFigure {
  const render = FIGURE_RENDERERS.get(kind);
  if (!render) throw usageError('kind-unavailable', `this build cannot draw ${kind} figures`);
  return render(ctx, target);
}
