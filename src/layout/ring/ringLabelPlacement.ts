/**
 * Substituent labels and ring locants of a ring figure, placed so each reads as its own atom's: a substituent
 * label sits beyond its bond end with the bonded atom's symbol on the bond's line (bondLabel), nearer its own
 * bond end than any other and clear of every line and label; a ring locant sits beside its vertex, nearer it
 * than any other bond end. Long labels are placed first and H last (a lone H fits where a group does not).
 * When no position fits, a label tries the other reading direction on a steep bond (`OH` or `HO` both meet
 * the bond at the O when it comes from below or above) and then shortens its own bond (0.85, 0.7, 0.55 of
 * its length), never so far that the bond would stop on another; a bond that as placed stops on another (a
 * true projection) is shortened clear of it when it can be [common practice, no source].
 */
import { grow, isFree, segmentCrossing, segmentHitsBox, type Box, type Obstacles } from '../text/labelPlacement.js';
import { boxAt, runsBox, textBox, type TextBox } from '../text/textBox.js';
import { runsText } from '../text/textRuns.js';
import { bondLabelCandidates, boxDistance, pickBondLabel, type Point } from '../text/bondLabel.js';
import type { SceneLine, SceneText, TextMeasure, TextRun, TextStyle } from '../scene.js';
import { bondLines, type BondSpec } from './ringBonds.js';

/** A substituent label to place: the bond it ends (by `BondSpec.order`) and its text both ways. */
export interface SubstituentJob {
  readonly bond: number;
  readonly atom: number;
  readonly forward: readonly TextRun[];
  readonly reversed: readonly TextRun[];
  /** The bonded atom's symbol (the glyph the bond points at). */
  readonly anchor: string;
  /**
   * For a CH₂–Z group (`CH₂OH`, `CH₂OAc`): the skeletal form, the carbon drawn as a vertex and Z's label at the
   * end of a second bond, used when the condensed label finds no room.
   */
  readonly expand?: { readonly atom: number; readonly forward: readonly TextRun[]; readonly reversed: readonly TextRun[]; readonly anchor: string; readonly double: boolean };
}

/** A ring locant to place beside its vertex, preferring the outward azimuth (degrees clockwise from up). */
export interface LocantJob {
  readonly atom: number;
  readonly text: string;
  readonly at: Point;
  readonly azDeg: number;
  /** Distance from the vertex the locant keeps (past a heteroatom symbol and a gap). */
  readonly from: number;
}

/** Sizes the placement works with, theme units. */
export interface LabelSizes {
  readonly gap: number;
  readonly lineWidth: number;
  readonly label: TextStyle;
  readonly locant: TextStyle;
  readonly measure: TextMeasure;
}

/** What {@link placeRingLabels} decides: bond lengths it shortened (by bond order), bonds it added, the text items. */
export interface PlacedLabels {
  readonly factors: Map<number, number>;
  /** Second bonds of groups drawn in skeletal form (`SubstituentJob.expand`). */
  readonly extra: BondSpec[];
  readonly texts: SceneText[];
  readonly boxes: Box[];
}

/** Drawn lengths a label may give its own bond, longest first. */
export const BOND_FACTORS = [1, 0.85, 0.7, 0.55];

const AZ = (dx: number, dy: number) => (Math.atan2(dx, -dy) * 180) / Math.PI;

function pointSegmentDistance(p: Point, s: SceneLine): number {
  const [dx, dy] = [s.x2 - s.x1, s.y2 - s.y1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - s.x1) * dx + (p.y - s.y1) * dy) / len2));
  return Math.hypot(p.x - (s.x1 + t * dx), p.y - (s.y1 + t * dy));
}

/** Order of placement: locants before or after the substituent labels; widest labels first or H first. */
export interface PlacementOrder {
  readonly locantsFirst: boolean;
  readonly narrowFirst: boolean;
}

/** The orders a caller tries, the usual one first. */
export const PLACEMENT_ORDERS: readonly PlacementOrder[] = [
  { locantsFirst: false, narrowFirst: false },
  { locantsFirst: true, narrowFirst: false },
  { locantsFirst: false, narrowFirst: true },
  { locantsFirst: true, narrowFirst: true },
];

/**
 * Places every substituent label and locant in `order`; `fixed` are boxes already taken (ring heteroatom
 * symbols). The caller tries each of {@link PLACEMENT_ORDERS} and keeps the best.
 */
export function placeRingLabels(specs: readonly BondSpec[], subs: readonly SubstituentJob[], locants: readonly LocantJob[], fixed: readonly Box[], sizes: LabelSizes, order: PlacementOrder = PLACEMENT_ORDERS[0]!): PlacedLabels {
  const { gap, lineWidth, label, measure } = sizes;
  const factors = new Map<number, number>();
  const boxes: Box[] = [...fixed];
  const texts: SceneText[] = [];
  // clear of lines by `clearance`, of other text by the smaller `textClearance` (boxes are ink boxes)
  const clearance = gap * 0.6 + lineWidth / 2;
  const textClearance = gap * 0.5;
  const shrink = (b: Box, d: number): Box => ({ x0: b.x0 + d, y0: b.y0 + d, x1: b.x1 - d, y1: b.y1 - d });
  const textObstacles = (cl: number) => boxes.map((b) => shrink(b, cl - textClearance));
  const step = Math.max(gap, label.fontSize * 0.25);
  const maxGap = label.fontSize / 2;
  const extra: BondSpec[] = [];
  const linesOf = (s: BondSpec) => bondLines(s, factors.get(s.order) ?? 1, lineWidth);
  const allLines = () => [...specs, ...extra].flatMap(linesOf);
  const endsBut = (lines: readonly SceneLine[], atom: number): Point[] =>
    lines.flatMap((l) => [l.atoms![0] === atom ? null : { x: l.x1, y: l.y1 }, l.atoms![1] === atom ? null : { x: l.x2, y: l.y2 }]).filter((p): p is Point => p !== null);
  const add = (role: string, runs: readonly TextRun[], box: Box, t: TextBox, style: TextStyle, atom: number) => {
    boxes.push(box);
    const typeset = runs.some((r) => r.shift) ? { runs } : {};
    texts.push({ type: 'text', role, x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 + t.baseline, text: runsText(runs), ...typeset, anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight, atom });
  };

  type Try = { miss: number; box: Box; runs: readonly TextRun[]; t: TextBox; clean: boolean };
  /** Best position of a label at `end` of a bond in direction (dx, dy), reading either way on a steep bond. */
  const tryLabel = (forward: readonly TextRun[], reversedRuns: readonly TextRun[], anchor: string, end: Point, dx: number, dy: number, atom: number, lines: readonly SceneLine[]): Try => {
    const len = Math.hypot(dx, dy) || 1;
    const leftward = dx / len < -0.25;
    // a steep bond meets the anchor glyph from below or above, so the label may read either way
    const directions = Math.abs(dx / len) < 0.5 ? [leftward, !leftward] : [leftward];
    const obstacles: Obstacles = { boxes: textObstacles(clearance), segments: [...lines], rings: [] };
    const others = endsBut(lines, atom);
    let best: Try | undefined;
    for (const reversed of directions) {
      const runs = reversed ? reversedRuns : forward;
      const t = runsBox(runs, label, measure);
      const anchorWidth = Math.min(t.width, measure(anchor, label));
      const candidates = bondLabelCandidates(end, AZ(dx, dy), gap + lineWidth / 2, { box: t, anchorWidth, reversed }, step);
      const picked = pickBondLabel(candidates, obstacles, clearance, end, others, maxGap);
      if (picked.clean) return { miss: 0, box: picked.box, runs, t, clean: true };
      if (!best || picked.miss < best.miss) best = { miss: picked.miss, box: picked.box, runs, t, clean: false };
    }
    return best!;
  };
  const stopsOnBond = (end: Point, lines: readonly SceneLine[], atoms: readonly number[]) =>
    lines.some((l) => !l.atoms!.some((a) => atoms.includes(a)) && pointSegmentDistance(end, l) < gap + 1.2);

  const placeSubstituent = (job: SubstituentJob) => {
    const spec = specs.find((s) => s.order === job.bond)!;
    const [dx, dy] = [spec.x2 - spec.px, spec.y2 - spec.py];
    let best: (Try & { factor: number }) | undefined;
    for (const factor of BOND_FACTORS) {
      factors.set(spec.order, factor);
      const lines = allLines();
      const end = { x: spec.px + factor * dx, y: spec.py + factor * dy };
      // a shortened bond must not stop on another bond; a full one that does gives way to a shorter one
      if (stopsOnBond(end, lines, spec.atoms) && (factor < 1 || BOND_FACTORS.some((f) => f < 1 && !stopsOnBond({ x: spec.px + f * dx, y: spec.py + f * dy }, lines, spec.atoms)))) continue;
      const got = tryLabel(job.forward, job.reversed, job.anchor, end, dx, dy, job.atom, lines);
      if (got.clean) {
        add('atom-label', got.runs, got.box, got.t, label, job.atom);
        return;
      }
      // a shorter bond costs a little, so a full-length bond that misses by a hair is preferred to it
      const miss = got.miss + (1 - factor) * 0.5;
      if (!best || miss < best.miss) best = { ...got, miss, factor };
    }
    factors.set(spec.order, 1);
    if (job.expand && expandGroup(job, spec)) return;
    factors.set(spec.order, best!.factor);
    add('atom-label', best!.runs, best!.box, best!.t, label, job.atom);
  };

  /** The skeletal form of a CH₂–Z group: a second bond from the vertex, zigzag first, with Z's label; false if none fits. */
  const expandGroup = (job: SubstituentJob, spec: BondSpec): boolean => {
    const x = job.expand!;
    const [dx, dy] = [spec.x2 - spec.px, spec.y2 - spec.py];
    const len = Math.hypot(dx, dy);
    const az = AZ(dx, dy);
    const start = { x: spec.x2, y: spec.y2 };
    for (const turn of [-60, 60, 0, -90, 90]) {
      const a = ((az + turn) * Math.PI) / 180;
      const [ux, uy] = [Math.sin(a), -Math.cos(a)];
      const bond: BondSpec = { atoms: [job.atom, x.atom], role: 'substituent-bond', x1: start.x, y1: start.y, x2: start.x + len * ux, y2: start.y + len * uy, px: start.x, py: start.y, near: spec.near, front: false, double: x.double, order: specs.length + extra.length + 1000 };
      const lines = allLines();
      const mine = bondLines(bond, 1, lineWidth);
      // the new bond crosses nothing, touches no label and stops on no bond
      if (mine.some((m) => lines.some((l) => !l.atoms!.includes(job.atom) && segmentCrossing(m, l) !== null))) continue;
      if (mine.some((m) => boxes.some((b) => segmentHitsBox(m, grow(b, clearance))))) continue;
      const end = { x: bond.x2, y: bond.y2 };
      if (stopsOnBond(end, lines, bond.atoms)) continue;
      const got = tryLabel(x.forward, x.reversed, x.anchor, end, len * ux, len * uy, x.atom, [...lines, ...mine]);
      if (!got.clean) continue;
      extra.push(bond);
      add('atom-label', got.runs, got.box, got.t, label, x.atom);
      return true;
    }
    return false;
  };

  const placeLocant = (job: LocantJob) => {
    const t = textBox(job.text, sizes.locant, measure);
    const lines = allLines();
    // a locant may sit closer to its own vertex's bonds than to anything else: it reads as that vertex's
    const own = lines.filter((l) => l.atoms!.includes(job.atom));
    const obstacles: Obstacles = { boxes: textObstacles(clearance * 0.8), segments: lines.filter((l) => !own.includes(l)), rings: [] };
    const others = endsBut(lines, job.atom);
    const free = (b: Box) => isFree(grow(b, clearance * 0.8), obstacles) && !own.some((l) => segmentHitsBox(l, grow(b, gap * 0.55)));
    let box: Box | undefined;
    let fallback: { box: Box; miss: number } | undefined;
    for (const b of aroundCandidates(job.at.x, job.at.y, job.azDeg, job.from, t, step)) {
      if (!free(b)) continue;
      const d = boxDistance(b, job.at);
      const nearest = others.reduce((m, p) => Math.min(m, boxDistance(b, p)), Infinity);
      if (nearest > d) {
        box = b;
        break;
      }
      if (!fallback || d - nearest < fallback.miss) fallback = { box: b, miss: d - nearest };
    }
    add('ring-locant', [{ text: job.text }], box ?? fallback?.box ?? boxAt(job.at.x, job.at.y, t), t, sizes.locant, job.atom);
  };

  const width = (j: SubstituentJob) => runsBox(j.forward, label, measure).width;
  const sorted = [...subs].sort((a, b) => (order.narrowFirst ? width(a) - width(b) : width(b) - width(a)));
  if (order.locantsFirst) locants.forEach(placeLocant);
  sorted.forEach(placeSubstituent);
  if (!order.locantsFirst) locants.forEach(placeLocant);
  return { factors, extra, texts, boxes: boxes.slice(fixed.length) };
}

/**
 * Candidate boxes round a point at distance `from` and beyond, best first: the preferred azimuth, then turning
 * away from it by up to `maxDevDeg`, then farther out.
 */
export function aroundCandidates(x: number, y: number, azDeg: number, from: number, t: TextBox, step: number, maxDevDeg = 180): Box[] {
  const scored: { cost: number; box: Box }[] = [];
  for (let r = 0; r <= 16; r++) {
    for (let dev = 0; dev <= maxDevDeg; dev += 15) {
      for (const sign of dev === 0 || dev === 180 ? [1] : [1, -1]) {
        const a = ((azDeg + sign * dev) * Math.PI) / 180;
        const [ux, uy] = [Math.sin(a), -Math.cos(a)];
        const reach = Math.min(Math.abs(ux) < 1e-12 ? Infinity : t.width / 2 / Math.abs(ux), Math.abs(uy) < 1e-12 ? Infinity : t.height / 2 / Math.abs(uy));
        const d = from + reach + r * step * 0.6;
        scored.push({ cost: r + dev / 25, box: boxAt(x + d * ux, y + d * uy, t) });
      }
    }
  }
  return scored.sort((p, q) => p.cost - q.cost).map((s) => s.box);
}
