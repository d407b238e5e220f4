/** Legend of the log-scaled density shading: one swatch per level with the smallest count it stands for. */
import { densityLevel, levelThresholds } from './densityShading.js';
import { formatTick } from './plotTicks.js';
import { textStyle, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** Items of the legend, laid out in one row from (x, top); `bottom` is the y below it. */
export function densityLegend(
  maxCount: number, x: number, top: number, m: SceneMetrics, measure: TextMeasure,
  options: { readonly head?: string; readonly cls?: string } = {},
): { items: SceneItem[]; bottom: number; right: number } {
  const tick = textStyle(m, 'tick-label');
  const s = tick.fontSize * 1.1;
  const items: SceneItem[] = [];
  const head = options.head ?? 'frames per cell (log scale):';
  const cls = options.cls ?? 'density';
  items.push({ type: 'text', role: 'tick-label', x, y: top + s * 0.85, text: head, anchor: 'start', ...tick });
  let cx = x + measure(head, tick) + tick.fontSize * 0.6;
  const thresholds = levelThresholds(maxCount);
  // one swatch per distinct threshold, shaded as a cell with exactly that count is
  const shown = [...new Set(thresholds)].map((t) => ({ t, level: densityLevel(t, maxCount) }));
  for (const { t, level } of shown) {
    const d = `M${r(cx)},${r(top)}h${r(s)}v${r(s)}h${r(-s)}Z`;
    items.push({ type: 'path', role: `${cls}-${level}`, d });
    items.push({ type: 'path', role: 'swatch-frame', d });
    const text = `≥${formatTick(t)}`;
    items.push({ type: 'text', role: 'tick-label', x: cx + s + tick.fontSize * 0.3, y: top + s * 0.85, text, anchor: 'start', ...tick });
    cx += s + tick.fontSize * 0.9 + measure(text, tick);
  }
  const maxText = `max ${formatTick(maxCount)}`;
  items.push({ type: 'text', role: 'tick-label', x: cx, y: top + s * 0.85, text: maxText, anchor: 'start', ...tick });
  return { items, bottom: top + s, right: cx + measure(maxText, tick) };
}

const r = (v: number) => Math.round(v * 100) / 100;
