/**
 * Ring placement → Scene. Bonds are drawn far to near with gaps where they cross (ringBonds: a gap cuts the
 * ring bond behind, never a substituent bond). Ring heteroatoms are written at their vertex (bonds stop short
 * of the symbol); substituent labels sit beyond their bond ends and ring locants beside their vertex, each
 * measured and placed clear of every line and label (ringLabelPlacement), and the placement the legibility
 * check counts fewest problems on is kept. The caption goes underneath.
 */
import type { Molecule } from '../../model/molecule.js';
import type { Graph } from '../../perceive/graph.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import { grow, type Box } from '../text/labelPlacement.js';
import { boxAt, textBox } from '../text/textBox.js';
import { approximateMeasure, DEFAULT_METRICS, shiftItem, textStyle, type Scene, type SceneItem, type SceneMetrics, type SceneText, type TextMeasure, type TextRun, type TextStyle } from '../scene.js';
import { fusedCaption, fusedDescription, fusedTitle, ringCaption, ringDescription, ringTitle, type CaptionRun } from './ringCaption.js';
import { ringAtomLabel, ringVertexLabel, substituentLabel, type RingLabels } from './ringLabels.js';
import { isTerminalDouble, type GroupContext } from '../text/groupLabel.js';
import { runsBox } from '../text/textBox.js';
import { runsText } from '../text/textRuns.js';
import { figureLegibility } from '../text/figureLegibility.js';
import type { RingPlacement } from './ringPlacement.js';
import { bondItems, type BondSpec } from './ringBonds.js';
import { PLACEMENT_ORDERS, placeRingLabels, type LocantJob, type SubstituentJob } from './ringLabelPlacement.js';

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
  // 1. Ring heteroatom symbols at their vertices; bonds stop short of them.
  const rings = placement.rings ?? [ring];
  const ringAtoms = [...new Set(rings.flatMap((r) => r.atoms))];
  const cut = new Map<number, number>();
  const fixed: SceneText[] = [];
  const fixedBoxes: Box[] = [];
  for (const a of ringAtoms) {
    const text = ringVertexLabel(mol, a);
    if (!text) continue;
    const t = textBox(text, labelStyle, measure);
    const p = at(a);
    const box = boxAt(p.x, p.y, t);
    fixedBoxes.push(box);
    fixed.push({ type: 'text', role: 'atom-label', x: p.x, y: p.y + t.baseline, text, anchor: 'middle', fontSize: labelStyle.fontSize, fontWeight: labelStyle.fontWeight, atom: a });
    cut.set(a, Math.max(t.width, t.height) / 2 + metrics.gap * 0.5);
  }

  // 2. Bonds as placed, shortened at labelled vertices.
  const specs: BondSpec[] = placement.bonds.map((b, order) => {
    const [p, q] = [at(b.atoms[0]), at(b.atoms[1])];
    const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
    const [ux, uy] = [(q.x - p.x) / len, (q.y - p.y) / len];
    const c0 = Math.min(cut.get(b.atoms[0]) ?? 0, len / 3);
    const c1 = Math.min(cut.get(b.atoms[1]) ?? 0, len / 3);
    const double = b.role !== 'ring-bond' && isTerminalDouble(mol, graph, b.atoms[0], b.atoms[1]);
    return { atoms: b.atoms, role: b.role, x1: p.x + ux * c0, y1: p.y + uy * c0, x2: q.x - ux * c1, y2: q.y - uy * c1, px: p.x, py: p.y, near: (p.near + q.near) / 2, front: b.front ?? false, double, order };
  });

  // 3. Substituent labels beyond their bond ends (the bonded atom's symbol on the bond's line, the text
  //    reading away from the ring: `CH₂OH` on the right, `HOH₂C` on the left) and ring locants beside their
  //    vertices, outward first; several orders are tried and the one the legibility check likes better is kept.
  const context: GroupContext = { names: options.names, rings: options.rings };
  const subs: SubstituentJob[] = placement.bonds.flatMap((b, order) => {
    if (b.role === 'ring-bond') return [];
    const group = substituentLabel(mol, graph, b.atoms[1], b.atoms[0], labels, context);
    const z = labels === 'element' ? skeletalChild(mol, graph, b.atoms[1], b.atoms[0], context) : null;
    const zLabel = z === null ? null : substituentLabel(mol, graph, z, b.atoms[1], labels, context);
    const expand = z === null || !zLabel ? {} : { expand: { atom: z, ...zLabel, double: isTerminalDouble(mol, graph, b.atoms[1], z) } };
    return [{ bond: order, atom: b.atoms[1], forward: group.forward, reversed: group.reversed, anchor: group.anchor, ...expand }];
  });
  // locants outward from the centre of the first ring that holds them
  const located = new Set<number>();
  const locants: LocantJob[] = rings.flatMap((r) => {
    const ringPts = r.atoms.map(at);
    const cx = ringPts.reduce((t, p) => t + p.x, 0) / ringPts.length;
    const cy = ringPts.reduce((t, p) => t + p.y, 0) / ringPts.length;
    return r.atoms.flatMap((a, j) => {
      if (located.has(a)) return [];
      located.add(a);
      const text = ringAtomLabel(mol, r, j, labels, options.names);
      if (!text) return [];
      const p = at(a);
      return [{ atom: a, text, at: p, azDeg: AZ(p.x - cx, p.y - cy), from: (cut.get(a) ?? 0) + metrics.gap }];
    });
  });
  const sizes = { gap: metrics.gap, lineWidth: metrics.lineWidth, label: labelStyle, locant: locantStyle, measure };
  let best: { items: SceneItem[]; texts: SceneText[]; boxes: Box[]; total: number } | undefined;
  for (const order of PLACEMENT_ORDERS) {
    const placed = placeRingLabels(specs, subs, locants, fixedBoxes, sizes, order);
    const lines = bondItems([...specs, ...placed.extra], placed.factors, metrics.gap, metrics.lineWidth);
    const texts = [...fixed, ...placed.texts];
    const { total } = figureLegibility({ kind: 'chair', width: 0, height: 0, title: '', desc: '', items: [...lines, ...texts] }, { measure });
    if (!best || total < best.total) best = { items: lines, texts, boxes: [...fixedBoxes, ...placed.boxes], total };
    if (total === 0) break;
  }
  const items = best!.items;
  const texts: SceneItem[] = [...best!.texts];
  const textBoxes = best!.boxes;

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

/** One caption line of runs centred on midX with its baseline at y: one text item, scripts as typeset runs. */
function captionLine(runs: readonly CaptionRun[], style: TextStyle, measure: TextMeasure, midX: number, y: number): { items: SceneItem[]; x0: number; x1: number } {
  const typeset: TextRun[] = runs.map((r) => (r.level === 'base' ? { text: r.text } : { text: r.text, shift: r.level }));
  const total = runsBox(typeset, style, measure).width;
  const text = runsText(typeset);
  const item: SceneItem = { type: 'text', role: 'caption', x: midX, y, text, ...(typeset.some((r) => r.shift) ? { runs: typeset } : {}), anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight };
  return { items: [item], x0: midX - total / 2, x1: midX + total / 2 };
}

/**
 * The heavy atom Z of a CH₂–Z substituent (`CH₂OH`, `CH₂OAc`, `CH₂Cl`) that may be drawn in skeletal form, the
 * CH₂ as a bare vertex; null for anything else (a methyl, a ring atom, a branched carbon).
 */
function skeletalChild(mol: Molecule, graph: Graph, atom: number, from: number, context: GroupContext): number | null {
  const el = (a: number) => mol.atoms[a]!.element;
  if (el(atom) !== 'C' || (context.rings ?? []).some((r) => r.includes(atom))) return null;
  const heavy = graph.neighbors[atom]!.filter((b) => b !== from && el(b) !== 'H');
  const hs = graph.neighbors[atom]!.filter((b) => el(b) === 'H').length;
  return heavy.length === 1 && hs === 2 && el(heavy[0]!) !== 'C' ? heavy[0]! : null;
}
