/**
 * Energy ladder: one column per ring form (chair, twist-boat…), a short horizontal line per conformer at its
 * relative energy on a vertical axis with ticks (kcal/mol, or kJ/mol), each labelled `r03 ⁴C₁ 1.30 (6.4 %)`.
 * Levels of one column whose labels would overlap are merged into one labelled level: their lines keep their
 * true heights and are joined by a bracket, from which one horizontal leader goes to a block of labels (highest
 * energy on top). Leaders are never slanted, so near-equal levels neither fan out nor converge. Pure: returns a
 * Scene.
 */
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure, type TextRun, type TextStyle } from '../scene.js';
import { runsWidth } from '../text/textRuns.js';

/** One level: label text (e.g. `r03`), energy relative to the lowest (kcal/mol) and population fraction. */
export interface LadderLevel {
  readonly label: string;
  /** kcal/mol above the lowest level. */
  readonly relativeEnergy: number;
  readonly population: number;
  /** Column the level is drawn in: its ring form (`chair`, `twist-boat`, `chair · boat` for two rings). Default `''` (one column, no heading). */
  readonly form?: string;
  /** Typeset ring-form descriptor (⁴C₁ as runs) printed after the label. Default none. */
  readonly descriptor?: readonly TextRun[];
}

/** Energy units of the axis; levels are always given in kcal/mol. */
export const LADDER_UNITS = new Map([
  ['kcal/mol', 1],
  ['kJ/mol', 4.184],
] as const);
export type LadderUnit = typeof LADDER_UNITS extends Map<infer K, unknown> ? K : never;

/** Options of {@link layoutEnergyLadder}. */
export interface EnergyLadderOptions {
  /** Unit of the axis and the labels (values converted from kcal/mol; 1 kcal = 4.184 kJ, thermochemical calorie). Default `kcal/mol`. */
  readonly unit?: LadderUnit;
  /** Figure title (`<title>`). Default `Conformer energy ladder`. */
  readonly title?: string;
  readonly metrics?: SceneMetrics;
  readonly measure?: TextMeasure;
}

const MINUS = '\u2212';
const num = (x: number, d: number) => {
  const t = x.toFixed(d);
  return (/^-0(\.0*)?$/.test(t) ? t.slice(1) : t).replace('-', MINUS);
};

/** Population as printed: one decimal per cent, `<0.1 %` below that. */
export function percentText(p: number): string {
  return p > 0 && p < 0.0005 ? '<0.1 %' : `${num(100 * p, 1)} %`;
}

/** Tick step giving about five intervals: 1, 2 or 5 × 10^k. */
function tickStep(max: number): number {
  const raw = max / 5;
  const mag = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? 10 * mag;
}

interface Cluster {
  members: { level: LadderLevel; y: number }[];
  /** Centre of the label block (y). */
  at: number;
}
const clusterTop = (c: Cluster) => c.members[0]!.y;
const clusterBottom = (c: Cluster) => c.members[c.members.length - 1]!.y;
const clusterMid = (c: Cluster) => (clusterTop(c) + clusterBottom(c)) / 2;

/**
 * Groups a column's levels (sorted by y, top of the page first) and places each group's block of labels.
 * Levels closer than a label row are near-equal and start in one group. A block may slide along its group only
 * as far as the group's middle stays between its first and last row, so the leader from the group's bracket to
 * the block stays horizontal; a single level's label stays level with it. Groups whose blocks cannot be placed
 * apart that way are merged, until every block clears its neighbours by `clear`.
 */
function clusterLevels(sorted: { level: LadderLevel; y: number }[], rowH: number, clear: number): Cluster[] {
  let clusters: Cluster[] = [];
  for (const m of sorted) {
    const last = clusters[clusters.length - 1];
    if (last && m.y - clusterBottom(last) < rowH) last.members.push(m);
    else clusters.push({ members: [m], at: m.y });
  }
  const half = (c: Cluster) => (c.members.length * rowH) / 2;
  const slack = (c: Cluster) => ((c.members.length - 1) * rowH) / 2;
  for (;;) {
    // top-down: each block as high as its range and the block above allow; a block pushed past its range merges
    let conflict = -1;
    let bottom = -Infinity;
    clusters.forEach((c, i) => {
      if (conflict >= 0) return;
      c.at = Math.max(clusterMid(c) - slack(c), bottom + clear + half(c));
      if (c.at > clusterMid(c) + slack(c) + 1e-9) conflict = i;
      bottom = c.at + half(c);
    });
    if (conflict < 0) break;
    const [a, b] = [clusters[conflict - 1]!, clusters[conflict]!];
    clusters = [...clusters.slice(0, conflict - 1), { members: [...a.members, ...b.members], at: 0 }, ...clusters.slice(conflict + 1)];
  }
  // bottom-up: each block back towards its group's middle, as far as the block below allows
  let top = Infinity;
  for (let i = clusters.length - 1; i >= 0; i--) {
    const c = clusters[i]!;
    c.at = Math.max(c.at, Math.min(clusterMid(c), top - clear - half(c)));
    top = c.at - half(c);
  }
  return clusters;
}

/** The label of a level as runs: record, descriptor, energy in the axis unit, population. */
function levelRuns(l: LadderLevel, factor: number, digits: number): TextRun[] {
  const runs: TextRun[] = [{ text: `${l.label} ` }];
  if (l.descriptor && l.descriptor.length > 0) runs.push(...l.descriptor, { text: ' ' });
  runs.push({ text: `${num(l.relativeEnergy * factor, digits)} (${percentText(l.population)})` });
  return runs;
}

/**
 * Lays out the ladder (lowest level at the bottom; columns left to right by their lowest level).
 * @example layoutEnergyLadder([{ label: 'r1', relativeEnergy: 0, population: 0.6, form: 'chair' }, { label: 'r2', relativeEnergy: 5.1, population: 0.4, form: 'twist-boat' }])
 */
export function layoutEnergyLadder(levels: readonly LadderLevel[], options: EnergyLadderOptions = {}): Scene {
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const unit = options.unit ?? 'kcal/mol';
  const factor: number = LADDER_UNITS.get(unit) ?? 1;
  const digits = unit === 'kJ/mol' ? 1 : 2;
  const B = metrics.bondLength;
  const tick = textStyle(metrics, 'tick-label');
  const lab = textStyle(metrics, 'level-label');
  const head: TextStyle = { ...textStyle(metrics, 'column-label'), fontWeight: 'bold' };
  const axisTitle = textStyle(metrics, 'axis-label');
  const gap = metrics.gap;

  // 1. The axis: 0 to a round number above the highest level, about five intervals.
  const top = levels.reduce((m, l) => Math.max(m, l.relativeEnergy * factor), factor);
  const step = tickStep(top);
  const yMax = Math.ceil(top / step - 1e-9) * step;
  const tickDigits = step < 1 ? (step < 0.1 ? 2 : 1) : 0;
  const tickTexts = Array.from({ length: Math.round(yMax / step) + 1 }, (_, k) => num(k * step, tickDigits));
  const tickW = tickTexts.reduce((m, t) => Math.max(m, measure(t, tick)), 0);
  const m = metrics.margin;
  const plotH = Math.max(8 * B, 6 * lab.fontSize * 1.35);
  const axisX = m + tickW + gap * 2 + B * 0.2;
  const yOf = (e: number) => plotH * (1 - e / yMax);
  const items: SceneItem[] = [];
  items.push({ type: 'line', role: 'axis', x1: axisX, y1: yOf(0), x2: axisX, y2: yOf(yMax) });
  tickTexts.forEach((text, k) => {
    const y = yOf(k * step);
    items.push({ type: 'line', role: 'axis', x1: axisX - B * 0.2, y1: y, x2: axisX, y2: y });
    items.push({ type: 'text', role: 'tick-label', x: axisX - B * 0.2 - gap, y: y + tick.fontSize * 0.35, text, anchor: 'end', ...tick });
  });

  // 2. Columns by ring form, ordered by their lowest level.
  const forms: string[] = [];
  const byEnergy = levels.map((l, i) => i).sort((a, b) => levels[a]!.relativeEnergy - levels[b]!.relativeEnergy || a - b);
  for (const i of byEnergy) if (!forms.includes(levels[i]!.form ?? '')) forms.push(levels[i]!.form ?? '');
  const rowH = lab.fontSize * 1.3;
  const lineLen = B * 1.4;
  let x = axisX + B * 0.5;
  let highest = yOf(yMax) - tick.fontSize;
  let lowest = yOf(0) + tick.fontSize * 0.35;
  const headings: { x: number; text: string }[] = [];
  for (const form of forms) {
    const members = byEnergy.filter((i) => (levels[i]!.form ?? '') === form).map((i) => ({ level: levels[i]!, y: yOf(levels[i]!.relativeEnergy * factor) }));
    members.sort((a, b) => a.y - b.y);
    // a row of labels already holds its leading, so blocks may touch
    const clusters = clusterLevels(members, rowH, 0);
    const bracketX = x + lineLen + gap;
    const labelX = bracketX + (clusters.some((c) => c.members.length > 1) ? B * 0.4 : gap);
    let labelW = 0;
    for (const c of clusters) {
      const many = c.members.length > 1;
      for (const { y } of c.members) items.push({ type: 'line', role: 'level', x1: x, y1: y, x2: many ? bracketX : x + lineLen, y2: y });
      const mid = clusterMid(c);
      if (many) items.push({ type: 'line', role: 'leader', x1: bracketX, y1: clusterTop(c), x2: bracketX, y2: clusterBottom(c) });
      const from = many ? bracketX : x + lineLen;
      if (labelX - gap - from > 0.5) items.push({ type: 'line', role: 'leader', x1: from, y1: mid, x2: labelX - gap, y2: mid });
      const blockTop = c.at - (c.members.length * rowH) / 2;
      c.members.forEach(({ level }, k) => {
        const runs = levelRuns(level, factor, digits);
        const baseline = blockTop + (k + 0.5) * rowH + lab.fontSize * 0.35;
        labelW = Math.max(labelW, runsWidth(runs, lab, measure));
        items.push({ type: 'text', role: 'level-label', x: labelX, y: baseline, text: runs.map((r) => r.text).join(''), runs, anchor: 'start', ...lab });
      });
      highest = Math.min(highest, blockTop);
      lowest = Math.max(lowest, blockTop + c.members.length * rowH);
    }
    if (form !== '') headings.push({ x, text: form });
    x = Math.max(labelX + labelW, x + measure(form, head)) + B * 0.8;
  }

  // 3. Column headings and the axis title above everything, then the whole figure moved into its margins.
  const headY = highest - gap * 2;
  for (const h of headings) items.push({ type: 'text', role: 'column-label', x: h.x, y: headY, text: h.text, anchor: 'start', ...head });
  const titleText = `ΔE (${unit})`;
  const titleY = (headings.length > 0 ? headY - head.fontSize - gap * 2 : headY);
  items.push({ type: 'text', role: 'axis-label', x: m, y: titleY, text: titleText, anchor: 'start', ...axisTitle });
  const dy = m + axisTitle.fontSize - titleY;
  const width = Math.max(x - B * 0.8 + m, m * 2 + measure(titleText, axisTitle));
  const shown = forms.filter((f) => f !== '');
  return {
    kind: 'energy-ladder',
    width,
    height: lowest + dy + m,
    title: options.title ?? 'Conformer energy ladder',
    desc: `${levels.length} conformer${levels.length === 1 ? '' : 's'} at their energies relative to the lowest, in ${unit}${shown.length > 0 ? `, one column per ring form (${shown.join(', ')})` : ''}; each label gives record, ring form, ΔE and Boltzmann population; levels too close to label apart share one bracketed label.`,
    items: items.map((it) => shift(it, dy)),
  };
}

function shift(it: SceneItem, dy: number): SceneItem {
  if (it.type === 'line') return { ...it, y1: it.y1 + dy, y2: it.y2 + dy };
  if (it.type === 'text') return { ...it, y: it.y + dy };
  return it;
}
