/**
 * Newman projection → Scene. Front bonds meet at the centre; the back atom is a circle whose bonds start at
 * its rim (Gold Book N04134); azimuth α is placed at x = cx + r sin α, y = cy − r cos α (docs/methods.md#newman-projection),
 * so a clockwise torsion reads clockwise on the page.
 */
import type { Molecule } from '../../model/molecule.js';
import { atomicMass } from '../../model/elements.js';
import { usageError } from '../../model/errors.js';
import type { NewmanView } from '../../analysis/newman.js';
import { wrap180 } from '../../geometry/vec3.js';
import { drawnAzimuths, type NewmanAngles } from './newmanAngles.js';
import { rayCandidates } from './newmanLabels.js';
import { atomLabelText, type NewmanLabels } from '../text/atomLabelText.js';
import { boxAt, textBox } from '../text/textBox.js';
import { firstFreeOf, grow, type Box, type Obstacles } from '../text/labelPlacement.js';
import { torsionArcPath, torsionArcPoints } from './torsionArc.js';
import { approximateMeasure, DEFAULT_METRICS, shiftItem, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';
import { couplingLines, newmanCaption, newmanDescription, torsionText, type AtomNames } from './newmanText.js';
import type { Graph } from '../../perceive/graph.js';
import { groupLabel, isTerminalDouble } from '../text/groupLabel.js';
import { runsBox } from '../text/textBox.js';
import { runsText, scriptSize } from '../text/textRuns.js';
import { bondLabelCandidates, pickBondLabel, type Point } from '../text/bondLabel.js';

/** How hydrogens are drawn: with labels, not at all, or as short bonds with small `H` labels (`collapse`). */
export type NewmanHydrogens = 'show' | 'hide' | 'collapse';

/** Options of {@link layoutNewman}. Lengths are multiples of the theme's `bondLength` (the circle radius). */
export interface NewmanLayoutOptions {
  /** `true` draws measured azimuths; `ideal` draws even spacing and still prints measured torsions. Default `true`. */
  readonly angles?: NewmanAngles;
  /** Front/back pairs (0-based atoms) to mark with a torsion arc and value. Default: the heaviest pair; `[]` marks none. */
  readonly mark?: readonly (readonly [number, number])[];
  /** Default `show`. `collapse`: hydrogen bonds drawn short, each with a small `H` (a bare stub would read as methyl). */
  readonly hydrogens?: NewmanHydrogens;
  /** Label text. Default `element`. */
  readonly labels?: NewmanLabels;
  /** Caption under the drawing (bond, conformation, marked torsions). Default true. */
  readonly caption?: boolean;
  /** Sizes from the theme. Default {@link DEFAULT_METRICS}. */
  readonly metrics?: SceneMetrics;
  /** Text width function (the renderer's font measure). Default: 0.6 em per character. */
  readonly measure?: TextMeasure;
  /** Smallest drawn front/back offset in `ideal` mode, degrees. Default 8. */
  readonly eclipsedOffsetDeg?: number;
  /** Predicted ³J(H,H) per front/back proton pair (0-based atoms), printed under the caption. Default none. */
  readonly couplings?: readonly NewmanCouplingLabel[];
  /** Bond graph: with it, `element` labels become group labels (`OMe`, `CH₂OH`/`HOH₂C`) and C=O is drawn double. Default none. */
  readonly graph?: Graph;
  /** Chemical names of atoms (`chemicalNumbering`): ring neighbours are labelled by them and captions use them. Default none. */
  readonly names?: AtomNames;
  /** Rings (cyclic 0-based lists), so ring neighbours are named by locant. Default none. */
  readonly rings?: readonly (readonly number[])[];
  /** Extra caption lines (e.g. the hydroxymethyl rotamer), printed after the marked torsions. Default none. */
  readonly notes?: readonly string[];
}

/** One coupling to print: protons on the front and back atoms, J in Hz, and the equation's name. */
export interface NewmanCouplingLabel {
  readonly front: number;
  readonly back: number;
  readonly jHz: number;
  readonly method: string;
}

const FRONT_END = 1.45;
const BACK_END = 1.95;
const FRONT_STUB = 1.2;
const BACK_STUB = 1.5;
const ARC_RADIUS = 0.52;

const polar = (r: number, azDeg: number): [number, number] => {
  const a = (azDeg * Math.PI) / 180;
  return [r * Math.sin(a), -r * Math.cos(a)];
};

function heaviestPair(mol: Molecule, front: readonly number[], back: readonly number[]): [number, number][] {
  const pick = (xs: readonly number[]) =>
    [...xs].sort((a, b) => atomicMass(mol.atoms[b]!.element) - atomicMass(mol.atoms[a]!.element) || a - b)[0];
  const f = pick(front);
  const b = pick(back);
  return f === undefined || b === undefined ? [] : [[f, b]];
}

/**
 * Lays out a Newman projection of `view` (from {@link newmanView}) as a Scene.
 * @example layoutNewman(newmanView(mol, graph, 1, 2), mol, { angles: 'ideal' })
 */
export function layoutNewman(view: NewmanView, mol: Molecule, options: NewmanLayoutOptions = {}): Scene {
  const { angles = 'true', hydrogens = 'show', labels = 'element', caption = true } = options;
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const R = metrics.bondLength;
  const isH = (i: number) => mol.atoms[i]!.element === 'H';
  const drawn = drawnAzimuths(view, angles, options.eclipsedOffsetDeg ?? 8);
  const visible = (m: ReadonlyMap<number, number>) => [...m.keys()].filter((i) => !(hydrogens === 'hide' && isH(i)));
  const frontAtoms = visible(drawn.front);
  const backAtoms = visible(drawn.back);
  const marks = options.mark ? options.mark.map(([x, y]) => [x, y] as [number, number]) : heaviestPair(mol, frontAtoms, backAtoms);
  for (const [x, y] of marks) {
    if (!frontAtoms.includes(x) || !backAtoms.includes(y)) {
      throw usageError('bad-mark', `cannot mark ${x + 1}:${y + 1}: the first atom must be a drawn substituent of the front atom ${view.front + 1} and the second of the back atom ${view.back + 1}`);
    }
  }

  // 1. Bonds and the back-atom circle, centred on (0, 0); shifted into place at the end.
  const items: SceneItem[] = [];
  const obstacles: Obstacles = { boxes: [], segments: [], rings: [{ cx: 0, cy: 0, r: R }] };
  const ends = new Map<string, number>();
  const graph = options.graph;
  const pushBond = (role: string, x1: number, y1: number, x2: number, y2: number, atoms: [number, number]) => {
    if (!graph || !isTerminalDouble(mol, graph, atoms[0], atoms[1])) {
      items.push({ type: 'line', role, x1, y1, x2, y2, atoms });
      return;
    }
    // C=O / S=O: two lines either side of the bond axis
    const len = Math.hypot(x2 - x1, y2 - y1) || 1;
    const off = Math.max(1, 1.4 * metrics.lineWidth);
    const [nx, ny] = [(-(y2 - y1) / len) * off, ((x2 - x1) / len) * off];
    for (const k of [1, -1]) items.push({ type: 'line', role, x1: x1 + k * nx, y1: y1 + k * ny, x2: x2 + k * nx, y2: y2 + k * ny, atoms });
  };
  for (const y of backAtoms) {
    const end = (hydrogens === 'collapse' && isH(y) ? BACK_STUB : BACK_END) * R;
    const [x1, y1] = polar(R, drawn.back.get(y)!);
    const [x2, y2] = polar(end, drawn.back.get(y)!);
    pushBond('back-bond', x1, y1, x2, y2, [view.back, y]);
    ends.set(`b${y}`, end);
  }
  items.push({ type: 'circle', role: 'back-atom', cx: 0, cy: 0, r: R, atom: view.back });
  // 2. Torsion guides (the hidden part of each marked back bond, inside the circle) and arcs.
  const arcs: { x: number; y: number; r: number; from: number; sweep: number }[] = [];
  marks.forEach(([x, y], k) => {
    const from = drawn.front.get(x)!;
    const sweep = wrap180(drawn.back.get(y)! - from);
    const [gx, gy] = polar(R, drawn.back.get(y)!);
    items.push({ type: 'line', role: 'torsion-guide', x1: 0, y1: 0, x2: gx, y2: gy, atoms: [view.back, y] });
    if (Math.abs(sweep) > 1e-6) arcs.push({ x, y, r: (ARC_RADIUS + 0.14 * k) * R, from, sweep });
  });
  const arcSlot = items.length;
  for (const x of frontAtoms) {
    const end = (hydrogens === 'collapse' && isH(x) ? FRONT_STUB : FRONT_END) * R;
    const [x2, y2] = polar(end, drawn.front.get(x)!);
    pushBond('front-bond', 0, 0, x2, y2, [view.front, x]);
    ends.set(`f${x}`, end);
  }
  for (const it of items) if (it.type === 'line') obstacles.segments.push(it);
  for (const a of arcs) {
    const pts = torsionArcPoints(0, 0, a.r, a.from, a.sweep);
    for (let i = 1; i < pts.length; i++) obstacles.segments.push({ x1: pts[i - 1]![0], y1: pts[i - 1]![1], x2: pts[i]![0], y2: pts[i]![1] });
  }

  // 3. Atom labels at bond ends, front first, each at the first free candidate position.
  const clearance = metrics.gap * 0.6 + metrics.lineWidth / 2;
  const textBoxes: Box[] = [];
  const labelStyle = textStyle(metrics, 'atom-label');
  const place = (role: string, text: string, candidates: Iterable<Box>, extra: Partial<Pick<SceneItem & { type: 'text' }, 'atom' | 'atoms'>>) => {
    const t = textBox(text, textStyle(metrics, role), measure);
    const box = firstFreeOf(candidates, obstacles, clearance);
    obstacles.boxes.push(box);
    textBoxes.push(box);
    const style = textStyle(metrics, role);
    items.push({ type: 'text', role, x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 + t.baseline, text, anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight, ...extra });
  };
  const step = Math.max(metrics.gap, labelStyle.fontSize * 0.25);
  const hStyle = { fontSize: scriptSize(labelStyle.fontSize), fontWeight: labelStyle.fontWeight };
  const context = { names: options.names, rings: options.rings };
  const endPoint = (side: 'f' | 'b', i: number): Point => {
    const [x, y] = polar(ends.get(`${side}${i}`)!, (side === 'f' ? drawn.front : drawn.back).get(i)!);
    return { x, y };
  };
  const allEnds = [...frontAtoms.map((i) => ({ i, p: endPoint('f', i) })), ...backAtoms.map((i) => ({ i, p: endPoint('b', i) })), { i: view.front, p: { x: 0, y: 0 } }];
  for (const [side, list, map] of [['f', frontAtoms, drawn.front], ['b', backAtoms, drawn.back]] as const) {
    for (const i of list.filter((a) => hydrogens !== 'hide' || !isH(a))) {
      const from = side === 'f' ? view.front : view.back;
      const small = hydrogens === 'collapse' && isH(i);
      const style = small ? hStyle : labelStyle;
      const az = map.get(i)!;
      const group = labels === 'element' && graph ? groupLabel(mol, graph, i, from, context) : null;
      const reversed = Math.sin((az * Math.PI) / 180) < -0.25;
      const runs = group ? (reversed ? group.reversed : group.forward) : [{ text: atomLabelText(mol, i, labels) }];
      const t = runsBox(runs, style, measure);
      const anchorWidth = Math.min(t.width, measure(group?.anchor ?? runsText(runs), style));
      const own = endPoint(side, i);
      const candidates = bondLabelCandidates(own, az, metrics.gap + metrics.lineWidth / 2, { box: t, anchorWidth, reversed: group !== null && reversed }, step, 30, 30);
      const { box } = pickBondLabel(candidates, obstacles, clearance, own, allEnds.filter((e) => e.i !== i).map((e) => e.p), style.fontSize / 2);
      obstacles.boxes.push(box);
      textBoxes.push(box);
      const typeset = runs.some((r) => 'shift' in r && r.shift) ? { runs } : {};
      items.push({ type: 'text', role: small ? 'hydrogen-label' : 'atom-label', x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 + t.baseline, text: runsText(runs), ...typeset, anchor: 'middle', fontSize: style.fontSize, fontWeight: style.fontWeight, atom: i });
    }
  }
  // 4. Torsion values beside their arcs, from the arc outward.
  for (const a of arcs) {
    const pair = view.pairs.find((p) => p.front === a.x && p.back === a.y)!;
    const text = torsionText(pair.torsionDeg);
    const t = textBox(text, textStyle(metrics, 'torsion-label'), measure);
    const mid = a.from + a.sweep / 2;
    place('torsion-label', text, rayCandidates(0, 0, mid, a.r + metrics.gap, t, step), { atoms: [a.x, view.front, view.back, a.y] });
  }

  // 5. Bounds, caption, shift into positive coordinates.
  let x0 = -BACK_END * R;
  let x1 = BACK_END * R;
  let y0 = -BACK_END * R;
  let y1 = BACK_END * R;
  for (const it of items) {
    if (it.type === 'line') {
      x0 = Math.min(x0, it.x1, it.x2); x1 = Math.max(x1, it.x1, it.x2);
      y0 = Math.min(y0, it.y1, it.y2); y1 = Math.max(y1, it.y1, it.y2);
    }
  }
  for (const b of textBoxes.map((bx) => grow(bx, metrics.lineWidth))) {
    x0 = Math.min(x0, b.x0); x1 = Math.max(x1, b.x1); y0 = Math.min(y0, b.y0); y1 = Math.max(y1, b.y1);
  }
  const captionLines = [
    ...(caption ? [...newmanCaption(view, mol, marks, angles, labels, options.names), ...(options.notes ?? [])] : []).map((text) => ({ text, role: 'caption' })),
    ...couplingLines(view, mol, options.couplings ?? [], labels, options.names).map((text) => ({ text, role: 'coupling-label' })),
  ];
  const capStyle = textStyle(metrics, 'caption');
  const capTop = y1 + Math.max(metrics.gap * 2, capStyle.fontSize * 0.7);
  captionLines.forEach(({ text: line, role }, k) => {
    const t = textBox(line, capStyle, measure);
    const cy = capTop + t.height / 2 + k * capStyle.fontSize * 1.3;
    const box = boxAt(0, cy, t);
    x0 = Math.min(x0, box.x0); x1 = Math.max(x1, box.x1); y1 = Math.max(y1, box.y1 + capStyle.fontSize * 0.22);
    items.push({ type: 'text', role, x: 0, y: cy + t.baseline, text: line, anchor: 'middle', fontSize: capStyle.fontSize, fontWeight: capStyle.fontWeight });
  });
  const dx = metrics.margin - x0;
  const dy = metrics.margin - y0;
  const shifted = items.map((it) => shiftItem(it, dx, dy));
  shifted.splice(arcSlot, 0, ...arcs.map((a): SceneItem => ({ type: 'path', role: 'torsion-arc', d: torsionArcPath(dx, dy, a.r, a.from, a.sweep), atoms: [a.x, view.front, view.back, a.y] })));
  return {
    kind: 'newman',
    width: x1 - x0 + 2 * metrics.margin,
    height: y1 - y0 + 2 * metrics.margin,
    title: `Newman projection along ${options.names?.get(view.front) ?? `${mol.atoms[view.front]!.element}${view.front + 1}`}–${options.names?.get(view.back) ?? `${mol.atoms[view.back]!.element}${view.back + 1}`}`,
    desc: newmanDescription(view, mol, marks, angles, labels, options.names),
    items: shifted,
  };
}
