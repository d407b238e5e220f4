/**
 * Ring placement → Scene. Bonds are drawn far to near, so nearer bonds overpaint farther ones, and where a
 * nearer bond crosses a farther one a short `bond-halo` line (styled with the background by the theme) is drawn
 * under the nearer bond to open a gap in the farther. Ring heteroatoms are written at their vertex (bonds stop
 * short of the symbol); substituent labels sit beyond their bond ends and ring locants beside their vertex,
 * each measured and placed clear of every line and label (labelPlacement). The caption goes underneath.
 */
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import { firstFree, grow, segmentCrossing, type Box, type Obstacles, type Segment } from '../text/labelPlacement.js';
import { boxAt, textBox, type TextBox } from '../text/textBox.js';
import { approximateMeasure, DEFAULT_METRICS, shiftItem, textStyle, type Scene, type SceneItem, type SceneLine, type SceneMetrics, type TextMeasure, type TextRun, type TextStyle } from '../scene.js';
import { fusedCaption, fusedDescription, fusedTitle, ringCaption, ringDescription, ringTitle, type CaptionRun } from './ringCaption.js';
import { ringAtomLabel, ringVertexLabel, substituentLabel, type RingLabels } from './ringLabels.js';
import { isTerminalDouble, type GroupContext } from '../text/groupLabel.js';
import { runsBox } from '../text/textBox.js';
import { runsText } from '../text/textRuns.js';
import { bondLabelCandidates, pickBondLabel, type Point } from '../text/bondLabel.js';
import type { RingPlacement } from './ringPlacement.js';

/** Options of {@link layoutRing}. */
export interface RingLayoutOptions {
  /** Label text: `element` (condensed groups, ring locants), `id` (element + number) or `name`. Default `element`. */
  readonly labels?: RingLabels;
  /** Caption with shape, descriptor and Q/θ/φ under the drawing. Default true. */
  readonly caption?: boolean;
  /** Sizes from the theme. Default {@link DEFAULT_METRICS}. */
  readonly metrics?: SceneMetrics;
  /** Text width function (the renderer's font measure). Default: 0.6 em per character. */
  readonly measure?: TextMeasure;
  /** Chemical names of atoms (`chemicalNumbering`) for ring locants and fused-ring labels. Default none: reference locants. */
  readonly names?: ReadonlyMap<number, string>;
  /** Rings of the molecule (cyclic 0-based lists), so fused and spiro neighbours are named, not spelt out. Default none. */
  readonly rings?: readonly (readonly number[])[];
}

interface Drawn {
  readonly line: SceneLine;
  readonly near: number;
  readonly order: number;
}

const AZ = (dx: number, dy: number) => (Math.atan2(dx, -dy) * 180) / Math.PI;

/**
 * Lays out a ring placement (from `chairTemplate` or `ringProjection`) as a Scene.
 * @example layoutRing(ringProjection(ring, mol), ring, mol, graph, { labels: 'id' })
 */
export function layoutRing(placement: RingPlacement, ring: RingAnalysis, mol: Molecule, graph: Graph, options: RingLayoutOptions = {}): Scene {
  const { labels = 'element', caption = true } = options;
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const k = metrics.bondLength / placement.unitLength;
  const at = (a: number) => {
    const p = placement.points.get(a)!;
    return { x: p.x * k, y: p.y * k, near: p.near };
  };
  const labelStyle = textStyle(metrics, 'atom-label');
  const locantStyle: TextStyle = metrics.text['ring-locant'] ?? { fontSize: labelStyle.fontSize * 0.72, fontWeight: 'normal' };
  const clearance = metrics.gap * 0.6 + metrics.lineWidth / 2;
  const obstacles: Obstacles = { boxes: [], segments: [], rings: [] };
  const texts: SceneItem[] = [];
  const textBoxes: Box[] = [];
  const addText = (role: string, text: string, box: Box, t: TextBox, style: TextStyle, atom: number, runs?: readonly TextRun[]) => {
    obstacles.boxes.push(box);
    textBoxes.push(box);
    const typeset = runs?.some((r) => r.shift) ? { runs } : {};
    texts.push({ type: 'text', role, x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 + t.baseline, text, ...typeset, anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight, atom });
  };

  // 1. Ring heteroatom symbols at their vertices; bonds stop short of them.
  const rings = placement.rings ?? [ring];
  const ringAtoms = [...new Set(rings.flatMap((r) => r.atoms))];
  const cut = new Map<number, number>();
  for (const a of ringAtoms) {
    const text = ringVertexLabel(mol, a);
    if (!text) continue;
    const t = textBox(text, labelStyle, measure);
    const p = at(a);
    addText('atom-label', text, boxAt(p.x, p.y, t), t, labelStyle, a);
    cut.set(a, Math.max(t.width, t.height) / 2 + metrics.gap * 0.5);
  }

  // 2. Bonds, shortened at labelled vertices, sorted far → near (stable).
  const drawn: Drawn[] = placement.bonds.map((b, order) => {
    const [p, q] = [at(b.atoms[0]), at(b.atoms[1])];
    const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
    const [ux, uy] = [(q.x - p.x) / len, (q.y - p.y) / len];
    const c0 = Math.min(cut.get(b.atoms[0]) ?? 0, len / 3);
    const c1 = Math.min(cut.get(b.atoms[1]) ?? 0, len / 3);
    const line: SceneLine = { type: 'line', role: b.role, x1: p.x + ux * c0, y1: p.y + uy * c0, x2: q.x - ux * c1, y2: q.y - uy * c1, atoms: [b.atoms[0], b.atoms[1]] };
    return { line, near: (p.near + q.near) / 2, order };
  }).flatMap((d) => (d.line.role !== 'ring-bond' && isTerminalDouble(mol, graph, d.line.atoms![0]!, d.line.atoms![1]!) ? doubled(d, metrics.lineWidth) : [d]));
  drawn.sort((a, b) => a.near - b.near || a.order - b.order);
  const items: SceneItem[] = [];
  // half-length of a halo along the nearer bond: enough to cover the crossing (metrics.lineWidth counts the
  // halo's own width, so it is not used here)
  const halfGap = 1.5 * metrics.gap;
  drawn.forEach((d, i) => {
    for (const far of drawn.slice(0, i)) {
      if (far.line.atoms!.some((a) => d.line.atoms!.includes(a))) continue;
      const t = segmentCrossing(d.line, far.line);
      if (t === null) continue;
      const len = Math.hypot(d.line.x2 - d.line.x1, d.line.y2 - d.line.y1);
      const [t0, t1] = [Math.max(0, t - halfGap / len), Math.min(1, t + halfGap / len)];
      const pt = (s: number) => [d.line.x1 + s * (d.line.x2 - d.line.x1), d.line.y1 + s * (d.line.y2 - d.line.y1)] as const;
      const [[x1, y1], [x2, y2]] = [pt(t0), pt(t1)];
      items.push({ type: 'line', role: 'bond-halo', x1, y1, x2, y2, atoms: d.line.atoms! });
    }
    items.push(d.line);
    obstacles.segments.push(d.line);
  });

  // 3. Substituent labels beyond their bond ends: the bonded atom's symbol on the bond's line, the text reading
  //    away from the ring (`CH₂OH` on the right, `HOH₂C` on the left), each nearer its own bond end than any other.
  const step = Math.max(metrics.gap, labelStyle.fontSize * 0.25);
  const context: GroupContext = { names: options.names, rings: options.rings };
  const bondEnds = new Map<number, Point>();
  for (const d of drawn) {
    bondEnds.set(d.line.atoms![1]!, { x: d.line.x2, y: d.line.y2 });
    if (!bondEnds.has(d.line.atoms![0]!)) bondEnds.set(d.line.atoms![0]!, { x: d.line.x1, y: d.line.y1 });
  }
  for (const a of ringAtoms) bondEnds.set(a, at(a));
  const maxGap = labelStyle.fontSize / 2;
  for (const b of placement.bonds) {
    if (b.role === 'ring-bond') continue;
    const [from, atom] = b.atoms;
    const [p, q] = [at(from), at(atom)];
    const [dx, dy] = [q.x - p.x, q.y - p.y];
    const len = Math.hypot(dx, dy) || 1;
    const group = substituentLabel(mol, graph, atom, from, labels, context);
    const reversed = dx / len < -0.25;
    const runs = reversed ? group.reversed : group.forward;
    const t = runsBox(runs, labelStyle, measure);
    const anchorWidth = Math.min(t.width, measure(group.anchor, labelStyle));
    const candidates = bondLabelCandidates(q, AZ(dx, dy), metrics.gap + metrics.lineWidth / 2, { box: t, anchorWidth, reversed }, step);
    const others = [...bondEnds].filter(([a]) => a !== atom).map(([, pt]) => pt);
    const { box } = pickBondLabel(candidates, obstacles, clearance, q, others, maxGap);
    addText('atom-label', runsText(runs), box, t, labelStyle, atom, runs);
  }

  // 4. Ring locants beside their vertices, outward first (from the centre of the first ring that holds them).
  const located = new Set<number>();
  for (const r of rings) {
    const ringPts = r.atoms.map(at);
    const cx = ringPts.reduce((s, p) => s + p.x, 0) / ringPts.length;
    const cy = ringPts.reduce((s, p) => s + p.y, 0) / ringPts.length;
    r.atoms.forEach((a, j) => {
      if (located.has(a)) return;
      located.add(a);
      const text = ringAtomLabel(mol, r, j, labels, options.names);
      if (!text) return;
      const t = textBox(text, locantStyle, measure);
      const p = at(a);
      const candidates = aroundCandidates(p.x, p.y, AZ(p.x - cx, p.y - cy), (cut.get(a) ?? 0) + metrics.gap, t, step);
      // a locant reads as its vertex's only when it is nearer that vertex than any other bond end
      const others = [...bondEnds].filter(([b]) => b !== a).map(([, pt]) => pt);
      const picked = pickBondLabel(candidates, obstacles, clearance * 0.8, p, others, Infinity);
      addText('ring-locant', text, picked.clean ? picked.box : candidates[firstFree(candidates, obstacles, clearance * 0.8)]!, t, locantStyle, a);
    });
  }

  // 5. Bounds, caption, shift into positive coordinates.
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const it of items) {
    if (it.type !== 'line') continue;
    x0 = Math.min(x0, it.x1, it.x2); x1 = Math.max(x1, it.x1, it.x2);
    y0 = Math.min(y0, it.y1, it.y2); y1 = Math.max(y1, it.y1, it.y2);
  }
  [x0, y0, x1, y1] = [x0 - metrics.lineWidth, y0 - metrics.lineWidth, x1 + metrics.lineWidth, y1 + metrics.lineWidth];
  for (const b of textBoxes.map((bx) => grow(bx, metrics.lineWidth))) {
    x0 = Math.min(x0, b.x0); x1 = Math.max(x1, b.x1); y0 = Math.min(y0, b.y0); y1 = Math.max(y1, b.y1);
  }
  if (caption) {
    const capStyle = textStyle(metrics, 'caption');
    const lines = placement.rings ? fusedCaption(placement.rings) : ringCaption(ring);
    const midX = (x0 + x1) / 2;
    let top = y1 + Math.max(metrics.gap * 2, capStyle.fontSize * 0.7);
    for (const runs of lines) {
      const placed = captionLine(runs, capStyle, measure, midX, top + capStyle.fontSize * 0.73);
      texts.push(...placed.items);
      x0 = Math.min(x0, placed.x0); x1 = Math.max(x1, placed.x1);
      y1 = top + capStyle.fontSize * (0.73 + 0.3);
      top += capStyle.fontSize * 1.3;
    }
  }
  const dx = metrics.margin - x0;
  const dy = metrics.margin - y0;
  const element = (a: number) => mol.atoms[a]!.element;
  return {
    kind: placement.view === 'template' ? 'chair' : 'ring-projection',
    width: x1 - x0 + 2 * metrics.margin,
    height: y1 - y0 + 2 * metrics.margin,
    title: placement.rings ? fusedTitle(placement.rings) : ringTitle(ring, placement.view),
    desc: placement.rings ? fusedDescription(placement.rings, element) : ringDescription(ring, placement.view, placement.elevationDeg, element),
    items: [...items, ...texts].map((it) => shiftItem(it, dx, dy)),
  };
}

/**
 * Candidate boxes round a point at distance `from` and beyond, best first: the preferred azimuth, then turning
 * away from it by up to `maxDevDeg`, then farther out.
 */
function aroundCandidates(x: number, y: number, azDeg: number, from: number, t: TextBox, step: number, maxDevDeg = 180): Box[] {
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

/** One caption line of runs centred on midX with its baseline at y: one text item, scripts as typeset runs. */
function captionLine(runs: readonly CaptionRun[], style: TextStyle, measure: TextMeasure, midX: number, y: number): { items: SceneItem[]; x0: number; x1: number } {
  const typeset: TextRun[] = runs.map((r) => (r.level === 'base' ? { text: r.text } : { text: r.text, shift: r.level }));
  const total = runsBox(typeset, style, measure).width;
  const text = runsText(typeset);
  const item: SceneItem = { type: 'text', role: 'caption', x: midX, y, text, ...(typeset.some((r) => r.shift) ? { runs: typeset } : {}), anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight };
  return { items: [item], x0: midX - total / 2, x1: midX + total / 2 };
}

/** A substituent bond drawn double (C=O, S=O): two lines either side of the bond axis. */
function doubled(d: Drawn, lineWidth: number): Drawn[] {
  const { line } = d;
  const len = Math.hypot(line.x2 - line.x1, line.y2 - line.y1) || 1;
  const off = Math.max(1, 1.4 * lineWidth);
  const [nx, ny] = [(-(line.y2 - line.y1) / len) * off, ((line.x2 - line.x1) / len) * off];
  const side = (k: number): Drawn => ({ ...d, line: { ...line, x1: line.x1 + k * nx, y1: line.y1 + k * ny, x2: line.x2 + k * nx, y2: line.y2 + k * ny } });
  return [side(1), side(-1)];
}
