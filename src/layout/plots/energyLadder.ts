/**
 * Energy ladder: one horizontal line per conformer at its relative energy on a vertical axis (kcal/mol),
 * labelled with record, ΔE and population. Labels that would overlap are moved apart and joined to their
 * level by a thin leader. Pure: returns a Scene.
 */
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** One level: label text (e.g. `r03`), energy relative to the lowest (kcal/mol) and population fraction. */
export interface LadderLevel {
  readonly label: string;
  readonly relativeEnergy: number;
  readonly population: number;
}

/** Options of {@link layoutEnergyLadder}. */
export interface EnergyLadderOptions {
  /** Unit shown on the axis. Default `kcal/mol`. */
  readonly unit?: string;
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

/**
 * Lays out the ladder (lowest level at the bottom).
 * @example layoutEnergyLadder([{ label: 'r1', relativeEnergy: 0, population: 0.6 }, { label: 'r2', relativeEnergy: 0.66, population: 0.4 }])
 */
export function layoutEnergyLadder(levels: readonly LadderLevel[], options: EnergyLadderOptions = {}): Scene {
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const unit = options.unit ?? 'kcal/mol';
  const B = metrics.bondLength;
  const tick = textStyle(metrics, 'tick-label');
  const lab = textStyle(metrics, 'level-label');
  const axisTitle = textStyle(metrics, 'axis-label');
  const top = levels.reduce((m, l) => Math.max(m, l.relativeEnergy), 1);
  const step = tickStep(top);
  const yMax = Math.ceil(top / step - 1e-9) * step;
  const digits = step < 1 ? (step < 0.1 ? 2 : 1) : 0;
  const tickTexts = Array.from({ length: Math.round(yMax / step) + 1 }, (_, k) => num(k * step, digits));
  const tickW = tickTexts.reduce((m, t) => Math.max(m, measure(t, tick)), -Infinity);
  const m = metrics.margin;
  const plotTop = m + axisTitle.fontSize * 2;
  const plotH = Math.max(8 * B, levels.length * lab.fontSize * 1.35);
  const axisX = m + tickW + metrics.gap * 2 + B * 0.2;
  const lineX0 = axisX + B * 0.5;
  const lineX1 = lineX0 + B * 2.5;
  const labelX = lineX1 + B * 0.8;
  const yOf = (e: number) => plotTop + plotH * (1 - e / yMax);
  const items: SceneItem[] = [];
  // axis, ticks and title
  items.push({ type: 'line', role: 'axis', x1: axisX, y1: yOf(0), x2: axisX, y2: yOf(yMax) });
  tickTexts.forEach((text, k) => {
    const y = yOf(k * step);
    items.push({ type: 'line', role: 'axis', x1: axisX - B * 0.2, y1: y, x2: axisX, y2: y });
    items.push({ type: 'text', role: 'tick-label', x: axisX - B * 0.2 - metrics.gap, y: y + tick.fontSize * 0.35, text, anchor: 'end', ...tick });
  });
  const titleText = `ΔE (${unit})`;
  items.push({ type: 'text', role: 'axis-label', x: m, y: m + axisTitle.fontSize, text: titleText, anchor: 'start', ...axisTitle });
  // levels, bottom up, labels pushed apart
  const order = levels.map((l, i) => i).sort((a, b) => levels[a]!.relativeEnergy - levels[b]!.relativeEnergy || a - b);
  const gapY = lab.fontSize * 1.3;
  let previous = Infinity;
  let labelW = measure(titleText, axisTitle) - labelX + m;
  for (const i of order) {
    const l = levels[i]!;
    const y = yOf(l.relativeEnergy);
    const ly = Math.min(y, previous - gapY);
    previous = ly;
    items.push({ type: 'line', role: 'level', x1: lineX0, y1: y, x2: lineX1, y2: y });
    if (Math.abs(ly - y) > 0.01) items.push({ type: 'line', role: 'leader', x1: lineX1, y1: y, x2: labelX - metrics.gap, y2: ly });
    const text = `${l.label}: ΔE ${num(l.relativeEnergy, 2)}, ${percentText(l.population)}`;
    labelW = Math.max(labelW, measure(text, lab));
    items.push({ type: 'text', role: 'level-label', x: labelX, y: ly + lab.fontSize * 0.35, text, anchor: 'start', ...lab });
  }
  const lowestLabel = Math.min(plotTop, previous - lab.fontSize);
  const shift = lowestLabel < plotTop - lab.fontSize ? plotTop - lab.fontSize - lowestLabel : 0;
  const moved = shift === 0 ? items : items.map((it) => shiftItem(it, shift));
  return {
    kind: 'energy-ladder',
    width: labelX + labelW + m,
    height: yOf(0) + shift + tick.fontSize + m,
    title: options.title ?? 'Conformer energy ladder',
    desc: `${levels.length} conformer${levels.length === 1 ? '' : 's'} at their energies relative to the lowest, in ${unit}; each label gives record, ΔE and Boltzmann population.`,
    items: moved,
  };
}

function shiftItem(it: SceneItem, dy: number): SceneItem {
  if (it.type === 'line') return { ...it, y1: it.y1 + dy, y2: it.y2 + dy };
  if (it.type === 'text') return { ...it, y: it.y + dy };
  return it;
}
