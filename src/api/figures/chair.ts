/** One call from a molecule to a themed ring figure: pick the ring, analyse it, place it, lay it out, render. */
import type { Molecule } from '../../model/molecule.js';
import { ConformarkError, usageError, type Warning } from '../../model/errors.js';
import { buildGraph, type Graph } from '../../perceive/graph.js';
import { withBonds } from '../../perceive/withBonds.js';
import { findRings } from '../../perceive/findRings.js';
import type { AnalyzeRingOptions, RingAnalysis } from '../../analysis/ringAnalysis.js';
import { chemicalNumbering } from '../../analysis/chemicalNumbering.js';
import { analyzeDrawnRing } from './drawnRingForms.js';
import { legibilityWarnings } from './legibilityWarnings.js';
import { chairTemplate } from '../../layout/ring/chairTemplate.js';
import { fusedChairTemplate, fusedSystem } from '../../layout/ring/fusedChairTemplate.js';
import { ringProjection } from '../../layout/ring/ringProjection.js';
import { layoutRing } from '../../layout/ring/ringLayout.js';
import type { RingLabels } from '../../layout/ring/ringLabels.js';
import type { RingHydrogens, RingPlacement, RingView } from '../../layout/ring/ringPlacement.js';
import type { Scene } from '../../layout/scene.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';

/** Options of {@link chairFigure}. Atom indices are 0-based. */
export interface ChairFigureOptions {
  /**
   * The ring: its number among `rings` as `inspect` lists it (counted from 1), or its atoms (0-based, in bonded
   * order). Default: the first six-membered ring, else the first ring.
   */
  readonly ring?: readonly number[] | number;
  /**
   * Fused chairs: the ring numbers (from 1, as `inspect` lists them; edge-fused six-ring chairs) drawn together,
   * or `false` for one ring. Default: with no `ring` given and the template view, the picked ring's edge-fused
   * system of six-ring chairs (trans- and cis-decalin, a steroid's A/B/C rings), else the one ring.
   */
  readonly fused?: readonly number[] | false;
  /** Use an atom-list `ring` in exactly its order (it fixes the Cremer–Pople numbering). Default false: reference order. */
  readonly ordered?: boolean;
  /** `template` (trade chair, chairs only) or `projected` (true view, any ring). Default: template for chairs, else projected. */
  readonly view?: RingView;
  /** Viewer elevation above the ring's mean plane, degrees (projected view only; giving it picks that view). Default 20. */
  readonly elevationDeg?: number;
  /** Ring hydrogens drawn: `all`, `stereo` (only where they show a configuration) or `none`. Default `stereo`. */
  readonly hydrogens?: RingHydrogens;
  /** Label text: `element` (condensed groups and ring locants), `id` (element + number) or `name`. Default `element`. */
  readonly labels?: RingLabels;
  /** Caption with shape, descriptor and Q/θ/φ. Default true. */
  readonly caption?: boolean;
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Id prefix for the SVG. Default `chair-`. */
  readonly idPrefix?: string;
  /** Bond graph. Default: from `mol.bonds`, perceived from coordinates when the file has none. */
  readonly graph?: Graph;
  /** Rings of the record (0-based cyclic atom lists). Default: `findRings(graph)`. */
  readonly rings?: readonly (readonly number[])[];
  /** Ring analysis options (thresholds), passed to `analyzeRing`. */
  readonly analysis?: Omit<AnalyzeRingOptions, 'id' | 'ordered'>;
}

/** What {@link chairFigure} returns. */
export interface ChairFigure {
  readonly svg: string;
  readonly ring: RingAnalysis;
  /** Fused chairs: every ring drawn, `ring` first. Absent for one ring. */
  readonly rings?: readonly RingAnalysis[];
  readonly scene: Scene;
  readonly view: RingView;
  /** Screen placement of every drawn atom and bond (Å), before styling. */
  readonly placement: RingPlacement;
  readonly warnings: readonly Warning[];
}

/**
 * Ring figure as semantic SVG with the analysis behind it: the trade chair for chairs, else the true view.
 * @example const { svg, ring } = chairFigure(mol, { ring: 1, theme: 'projector' })
 * @throws ConformarkError `no-ring`, `unknown-ring`, `not-a-chair` (template view of another shape).
 */
export function chairFigure(mol: Molecule, options: ChairFigureOptions = {}): ChairFigure {
  // 1. Graph, rings, and the ring to draw.
  const graph = options.graph ?? graphOf(mol);
  const rings = options.rings ?? findRings(graph);
  const { atoms, id } = options.fused ? { atoms: ringAt(mol, rings, options.fused[0]!), id: options.fused[0]! } : pickRing(mol, rings, options.ring);
  // chemical numbering (carbohydrate convention, lowest locants) names the drawn atoms; a ring that is not a
  // sugar ring is analysed in that numbering too, so the caption's descriptor uses the locants on the drawing
  const numbering = chemicalNumbering(mol, graph, rings);
  const chemical = !(options.ordered || options.labels === 'id' || options.labels === 'name');
  const analyse = (ringAtoms: readonly number[], ringId: number | undefined): RingAnalysis =>
    analyzeDrawnRing(mol, graph, numbering, ringAtoms, { chemical, ordered: options.ordered, id: ringId, analysis: options.analysis });
  const ring = analyse(atoms, id);
  // 2. View and placement.
  const view = options.view ?? (ring.shape === 'chair' && ring.size === 6 && options.elevationDeg === undefined ? 'template' : 'projected');
  if (view === 'template' && options.elevationDeg !== undefined) {
    throw usageError('bad-option', 'the chair template is a fixed outline: an elevation applies to the projected view only');
  }
  const fused = view === 'template' ? fusedRings(mol, rings, ring, id, options, analyse) : null;
  if (options.fused && view !== 'template') throw usageError('bad-option', 'fused chairs are drawn on the chair template: leave out --view projected');
  const placement = fused
    ? inFile(mol, () => fusedChairTemplate(fused, mol, { hydrogens: options.hydrogens }))
    : view === 'template'
    ? inFile(mol, () => chairTemplate(ring, mol, { hydrogens: options.hydrogens }))
    : ringProjection(ring, mol, { elevationDeg: options.elevationDeg, hydrogens: options.hydrogens });
  // 3. Layout and rendering with the theme (a background-coloured halo role added when the theme has none).
  const theme = withHalo(loadTheme(options.theme));
  const scene = layoutRing(placement, ring, mol, graph, { labels: options.labels, caption: options.caption, metrics: sceneMetrics(theme), measure: measureText, names: numbering.names, rings });
  const svg = renderSvg(scene, theme, { idPrefix: options.idPrefix ?? 'chair-' });
  const ringWarnings = (fused ?? [ring]).flatMap((r) => r.warnings);
  return { svg, ring, ...(fused ? { rings: fused } : {}), scene, view, placement, warnings: [...ringWarnings, ...legibilityWarnings(scene)] };
}

/**
 * The rings of a fused figure, analysed, `ring` first; null for one ring. Given numbers must be edge-fused
 * chairs (each refusal names the ring); by default the chairs of the ring's edge-fused system join.
 */
function fusedRings(
  mol: Molecule,
  rings: readonly (readonly number[])[],
  ring: RingAnalysis,
  id: number | undefined,
  options: ChairFigureOptions,
  analyse: (atoms: readonly number[], id: number) => RingAnalysis,
): RingAnalysis[] | null {
  if (options.fused === false || id === undefined) return null;
  if (options.fused) {
    const asked = [...new Set(options.fused)];
    if (asked.length < 2) return null;
    const system = fusedSystem(rings, id - 1);
    const apart = asked.find((n) => !system.includes(n - 1));
    for (const n of asked) ringAt(mol, rings, n);
    if (apart !== undefined) throw usageError('not-fused', `ring ${apart} is not edge-fused to ring ${id} through six-membered rings`, mol.source.file);
    // in breadth-first order from the first ring, so each joins on a bond already drawn
    const chosen = system.filter((i) => asked.includes(i + 1));
    const analysed = chosen.map((i) => (i === id - 1 ? ring : analyse(rings[i]!, i + 1)));
    if (fusedSystem(chosen.map((i) => rings[i]!), 0).length !== chosen.length) {
      throw usageError('not-fused', `rings ${asked.join(', ')} are not one edge-fused system`, mol.source.file);
    }
    return analysed;
  }
  if (options.ring !== undefined || ring.shape !== 'chair' || ring.size !== 6) return null;
  // the default: the chairs of the system that join on a chair already taken
  const system = fusedSystem(rings, id - 1);
  const byIndex = new Map(system.map((i) => [i, i === id - 1 ? ring : analyse(rings[i]!, i + 1)]));
  const chairs = system.filter((i) => byIndex.get(i)!.shape === 'chair');
  const joined = fusedSystem(chairs.map((i) => rings[i]!), 0).map((k) => chairs[k]!);
  return joined.length > 1 ? joined.map((i) => byIndex.get(i)!) : null;
}

function ringAt(mol: Molecule, rings: readonly (readonly number[])[], n: number): readonly number[] {
  const atoms = rings[n - 1];
  if (!Number.isInteger(n) || !atoms) throw usageError('unknown-ring', `ring ${n} does not exist (the record has ${rings.length} ring${rings.length === 1 ? '' : 's'})`, mol.source.file);
  return atoms;
}

/** Runs `f`; a user error without a file (the layout's chair refusal) gets the record's file and line. */
function inFile<T>(mol: Molecule, f: () => T): T {
  try {
    return f();
  } catch (err) {
    if (!(err instanceof ConformarkError) || err.issues.some((i) => i.file)) throw err;
    throw new ConformarkError(err.issues.map((i) => ({ ...i, file: mol.source.file, line: i.line ?? mol.source.line })));
  }
}

function graphOf(mol: Molecule): Graph {
  const bonded = mol.bonds ? mol : withBonds(mol);
  return buildGraph(bonded.atoms.length, bonded.bonds ?? []);
}

function pickRing(mol: Molecule, rings: readonly (readonly number[])[], ring: ChairFigureOptions['ring']): { atoms: readonly number[]; id?: number } {
  if (Array.isArray(ring)) {
    const found = rings.findIndex((r) => r.length === ring.length && r.every((a) => ring.includes(a)));
    return found < 0 ? { atoms: ring } : { atoms: ring, id: found + 1 };
  }
  if (rings.length === 0) throw usageError('no-ring', `no ring to draw in record ${mol.source.index}`, mol.source.file);
  if (typeof ring === 'number') {
    const atoms = rings[ring - 1];
    if (!Number.isInteger(ring) || !atoms) throw usageError('unknown-ring', `ring ${ring} does not exist (the record has ${rings.length} ring${rings.length === 1 ? '' : 's'})`, mol.source.file);
    return { atoms, id: ring };
  }
  const six = rings.findIndex((r) => r.length === 6);
  const k = six < 0 ? 0 : six;
  return { atoms: rings[k]!, id: k + 1 };
}

/** The theme with a `bond-halo` role (background colour, three ring-bond widths) unless it styles one itself. */
function withHalo(theme: Theme): Theme {
  if (theme.roles['bond-halo']) return theme;
  const width = Math.max(theme.defaults.line.strokeWidth ?? 1, theme.roles['ring-bond']?.strokeWidth ?? 0);
  const stroke = theme.background === 'none' ? '#ffffff' : theme.background;
  return { ...theme, roles: { ...theme.roles, 'bond-halo': { stroke, strokeWidth: 3 * width, strokeLinecap: 'butt' } } };
}

