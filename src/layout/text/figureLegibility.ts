/**
 * A legibility check of a finished Scene: the ways a correct drawing still makes a reader see another molecule.
 * It reads only the Scene (bond lines carry their atoms, labels their atom), so every figure kind is checked
 * the same way, before rendering. Counts (common practice, no source; distances in theme units):
 * - `labelNearerOther`: an atom label whose box is nearer a bond end of another atom than its own bond end;
 * - `labelFarFromBond`: an atom label more than `maxLabelGap` from its own bond end (half the label's size: 4 pt
 *   at the default 8 pt; ring locants, which sit beside their vertex between its bonds, are not held to it);
 * - `bondEndOnBond`: a bond end stopping within `endTolerance` (1.2) of a bond it is not part of;
 * - `uncutCrossings`: two bonds crossing with no drawn gap (`bond-halo`) at the crossing;
 * - `textOverlaps`: text over a drawn line, circle outline, or other text.
 */
import { approximateMeasure, type Scene, type SceneItem, type SceneLine, type SceneText, type TextMeasure } from '../scene.js';
import { boxesOverlap, ringHitsBox, segmentCrossing, segmentHitsBox, type Box, type Segment } from './labelPlacement.js';
import { runsExtent, runsWidth } from './textRuns.js';

/** The counts of {@link figureLegibility}. */
export interface LegibilityCounts {
  readonly labelNearerOther: number;
  readonly labelFarFromBond: number;
  readonly bondEndOnBond: number;
  readonly uncutCrossings: number;
  readonly textOverlaps: number;
}

/** One thing the check found, in words (1-based atoms), with the kind it counts under. */
export interface LegibilityProblem {
  readonly kind: keyof LegibilityCounts;
  readonly message: string;
}

/** What {@link figureLegibility} found. */
export interface Legibility {
  readonly counts: LegibilityCounts;
  /** Sum of the counts: 0 for a figure that passes. */
  readonly total: number;
  readonly problems: readonly LegibilityProblem[];
}

/** Options of {@link figureLegibility}. */
export interface LegibilityOptions {
  /** Text width function (the renderer's font measure). Default: 0.6 em per character. */
  readonly measure?: TextMeasure;
  /** Largest distance from a label to its own bond end, theme units. Default: half the label's font size (4 at 8 pt). */
  readonly maxLabelGap?: number;
  /** A bond end nearer than this to another bond stops on it, theme units. Default 1.2. */
  readonly endTolerance?: number;
}

/** Lines that are not bonds, though they may carry atoms. */
const NOT_BONDS = new Set(['bond-halo', 'torsion-guide']);
const isBond = (it: SceneItem): it is SceneLine => it.type === 'line' && it.atoms?.length === 2 && !NOT_BONDS.has(it.role);

/** Ink box of a text item as drawn (anchor, runs, cap height and descenders). */
export function textItemBox(t: SceneText, measure: TextMeasure = approximateMeasure): Box {
  const style = { fontSize: t.fontSize, fontWeight: t.fontWeight };
  const runs = t.runs ?? [{ text: t.text }];
  const width = runsWidth(runs, style, measure);
  const { up, down } = runsExtent(runs, style);
  const x0 = t.anchor === 'start' ? t.x : t.anchor === 'end' ? t.x - width : t.x - width / 2;
  return { x0, y0: t.y - up, x1: x0 + width, y1: t.y + down };
}

const boxPointDistance = (b: Box, x: number, y: number) => Math.hypot(Math.max(b.x0 - x, 0, x - b.x1), Math.max(b.y0 - y, 0, y - b.y1));

function pointSegmentDistance(x: number, y: number, s: Segment): number {
  const [dx, dy] = [s.x2 - s.x1, s.y2 - s.y1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((x - s.x1) * dx + (y - s.y1) * dy) / len2));
  return Math.hypot(x - (s.x1 + t * dx), y - (s.y1 + t * dy));
}

const shrink = (b: Box, d: number): Box => ({ x0: b.x0 + d, y0: b.y0 + d, x1: b.x1 - d, y1: b.y1 - d });
const atomName = (a: number) => `atom ${a + 1}`;

/**
 * Legibility counts of a Scene (rules in the file comment); zero everywhere for a figure that reads right.
 * @example figureLegibility(newmanFigure(mol, { bond: [0, 1] }).scene).total // 0
 */
export function figureLegibility(scene: Scene, options: LegibilityOptions = {}): Legibility {
  const { measure = approximateMeasure, endTolerance = 1.2 } = options;
  const bonds = scene.items.filter(isBond);
  const halos = scene.items.filter((it): it is SceneLine => it.type === 'line' && it.role === 'bond-halo');
  const lines = scene.items.filter((it): it is SceneLine => it.type === 'line' && it.role !== 'bond-halo');
  const circles = scene.items.filter((it) => it.type === 'circle');
  const texts = scene.items.filter((it): it is SceneText => it.type === 'text' && it.text.trim() !== '');
  const problems: LegibilityProblem[] = [];
  const add = (kind: keyof LegibilityCounts, message: string) => problems.push({ kind, message });

  // Bond ends per atom: (x1, y1) belongs to atoms[0], (x2, y2) to atoms[1].
  const ends: { atom: number; x: number; y: number; bond: SceneLine }[] = [];
  for (const b of bonds) {
    ends.push({ atom: b.atoms![0]!, x: b.x1, y: b.y1, bond: b }, { atom: b.atoms![1]!, x: b.x2, y: b.y2, bond: b });
  }

  // 1. Labels and their own bond ends.
  const boxes = texts.map((t) => textItemBox(t, measure));
  texts.forEach((t, k) => {
    if (t.atom === undefined) return;
    const own = ends.filter((e) => e.atom === t.atom);
    if (own.length === 0) return;
    const box = boxes[k]!;
    const dOwn = Math.min(...own.map((e) => boxPointDistance(box, e.x, e.y)));
    const other = ends.filter((e) => e.atom !== t.atom);
    const nearest = other.reduce<{ d: number; atom: number } | null>((best, e) => {
      const d = boxPointDistance(box, e.x, e.y);
      return best === null || d < best.d ? { d, atom: e.atom } : best;
    }, null);
    if (nearest && nearest.d < dOwn) add('labelNearerOther', `label '${t.text}' of ${atomName(t.atom)} is nearer a bond end of ${atomName(nearest.atom)} (${nearest.d.toFixed(1)}) than its own (${dOwn.toFixed(1)})`);
    const maxGap = options.maxLabelGap ?? t.fontSize / 2;
    if (t.role !== 'ring-locant' && dOwn > maxGap) add('labelFarFromBond', `label '${t.text}' of ${atomName(t.atom)} is ${dOwn.toFixed(1)} from its bond end`);
  });

  // 2. Bond ends stopping on bonds they are not part of.
  for (const e of ends) {
    for (const b of bonds) {
      if (b.atoms!.includes(e.atom) || b === e.bond) continue;
      if (pointSegmentDistance(e.x, e.y, b) < endTolerance) {
        add('bondEndOnBond', `the bond end of ${atomName(e.atom)} stops on bond ${b.atoms!.map((a) => a + 1).join('–')}`);
      }
    }
  }

  // 3. Crossing bonds without a gap.
  for (let i = 0; i < bonds.length; i++) {
    for (let j = i + 1; j < bonds.length; j++) {
      const [a, b] = [bonds[i]!, bonds[j]!];
      if (a.atoms!.some((x) => b.atoms!.includes(x))) continue;
      const t = segmentCrossing(a, b);
      if (t === null) continue;
      const p = { x: a.x1 + t * (a.x2 - a.x1), y: a.y1 + t * (a.y2 - a.y1) };
      const gap = halos.some((h) => pointSegmentDistance(p.x, p.y, h) < 0.5);
      if (!gap) add('uncutCrossings', `bonds ${a.atoms!.map((x) => x + 1).join('–')} and ${b.atoms!.map((x) => x + 1).join('–')} cross without a gap`);
    }
  }

  // 4. Text over lines, circle outlines and other text (boxes shrunk a hair so touching is not overlapping).
  texts.forEach((t, k) => {
    const box = shrink(boxes[k]!, 0.05);
    const line = lines.find((l) => segmentHitsBox(l, box));
    if (line) add('textOverlaps', `text '${t.text}' lies over a ${line.role} line`);
    const circle = circles.find((c) => c.type === 'circle' && ringHitsBox(c, box));
    if (circle) add('textOverlaps', `text '${t.text}' lies over the ${circle.role} circle`);
    for (let m = k + 1; m < texts.length; m++) {
      if (boxesOverlap(box, shrink(boxes[m]!, 0.05))) add('textOverlaps', `texts '${t.text}' and '${texts[m]!.text}' overlap`);
    }
  });

  const count = (kind: keyof LegibilityCounts) => problems.filter((p) => p.kind === kind).length;
  const counts: LegibilityCounts = {
    labelNearerOther: count('labelNearerOther'),
    labelFarFromBond: count('labelFarFromBond'),
    bondEndOnBond: count('bondEndOnBond'),
    uncutCrossings: count('uncutCrossings'),
    textOverlaps: count('textOverlaps'),
  };
  return { counts, total: problems.length, problems };
}
