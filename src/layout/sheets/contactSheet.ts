/**
 * Contact sheet: a grid of figure panels, each with a bold panel letter (a, b, c…) above it and caption
 * lines under it. Pure: returns the sheet's own Scene (letters, captions) and where each panel goes; the
 * caller nests the panels' SVG at those places.
 */
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';

/** One panel: its drawn size (theme units) and caption lines (plain text). */
export interface SheetPanel {
  readonly width: number;
  readonly height: number;
  readonly caption: readonly string[];
}

/** Options of {@link layoutContactSheet}. */
export interface ContactSheetOptions {
  /** Panels per row. Default 4. */
  readonly columns?: number;
  /** Sheet title (`<title>`). Default `Contact sheet`. */
  readonly title?: string;
  /** Sizes from the theme. Default {@link DEFAULT_METRICS}. */
  readonly metrics?: SceneMetrics;
  /** Text width function. Default 0.6 em per character. */
  readonly measure?: TextMeasure;
}

/** Where a panel's SVG goes on the sheet (theme units). */
export interface PanelPlacement {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** Panel letter for position `k` (0-based): a…z, then aa, ab… */
export function panelLetter(k: number): string {
  let s = '';
  for (let n = k + 1; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(97 + ((n - 1) % 26)) + s;
  return s;
}

/** Breaks `text` at spaces into at most `max` lines that fit `width`; the last is cut with an ellipsis. */
function wrap(text: string, width: number, max: number, measure: (t: string) => number): string[] {
  const lines: string[] = [];
  let rest = text.trim();
  while (rest !== '' && lines.length < max - 1 && measure(rest) > width) {
    const words = rest.split(' ');
    let k = words.length - 1;
    while (k > 1 && measure(words.slice(0, k).join(' ')) > width) k--;
    if (k < 1 || measure(words.slice(0, k).join(' ')) > width) break;
    lines.push(words.slice(0, k).join(' '));
    rest = words.slice(k).join(' ');
  }
  if (rest !== '') lines.push(fit(rest, width, measure));
  return lines;
}

/** Cuts `text` with an ellipsis so that it fits `width`. */
function fit(text: string, width: number, measure: (t: string) => number): string {
  if (measure(text) <= width) return text;
  const chars = [...text];
  while (chars.length > 1 && measure(`${chars.join('')}…`) > width) chars.pop();
  return `${chars.join('')}…`;
}

/**
 * Lays out `panels` in a grid of equal cells (widest panel × tallest panel plus letter and caption rows).
 * @example layoutContactSheet([{ width: 90, height: 80, caption: ['r1 chair'] }]).placements[0]
 */
export function layoutContactSheet(panels: readonly SheetPanel[], options: ContactSheetOptions = {}): { scene: Scene; placements: PanelPlacement[] } {
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const columns = Math.max(1, Math.min(options.columns ?? 4, panels.length || 1));
  const letterStyle = { ...textStyle(metrics, 'panel-letter'), fontWeight: 'bold' as const };
  const capStyle = metrics.text['panel-caption'] ?? textStyle(metrics, 'caption');
  const lineH = capStyle.fontSize * 1.3;
  const letterH = letterStyle.fontSize * 1.25;
  const cellW = panels.reduce((m, p) => Math.max(m, p.width), metrics.bondLength * 3);
  const captions = panels.map((p) => p.caption.flatMap((line) => wrap(line, cellW, 2, (t) => measure(t, capStyle))));
  const maxLines = captions.reduce((m, c) => Math.max(m, c.length), 0);
  const panelH = panels.reduce((m, p) => Math.max(m, p.height), 0);
  const gap = metrics.bondLength * 0.6;
  const cellH = letterH + panelH + maxLines * lineH + gap * 0.25;
  const m = metrics.margin;
  const items: SceneItem[] = [];
  const placements = panels.map((p, k) => {
    const x0 = m + (k % columns) * (cellW + gap);
    const y0 = m + Math.floor(k / columns) * (cellH + gap);
    items.push({ type: 'text', role: 'panel-letter', x: x0, y: y0 + letterStyle.fontSize, text: panelLetter(k), anchor: 'start', ...letterStyle });
    captions[k]!.forEach((text, i) => {
      const y = y0 + letterH + panelH + (i + 1) * lineH - (lineH - capStyle.fontSize);
      items.push({ type: 'text', role: 'panel-caption', x: x0 + cellW / 2, y, text, anchor: 'middle', ...capStyle });
    });
    return { x: x0 + (cellW - p.width) / 2, y: y0 + letterH + (panelH - p.height) / 2, width: p.width, height: p.height };
  });
  const rows = Math.ceil(panels.length / columns);
  const scene: Scene = {
    kind: 'sheet',
    width: 2 * m + columns * cellW + (columns - 1) * gap,
    height: 2 * m + rows * cellH + Math.max(0, rows - 1) * gap,
    title: options.title ?? 'Contact sheet',
    desc: `${panels.length} panel${panels.length === 1 ? '' : 's'} (${panelLetter(0)}${panels.length > 1 ? `–${panelLetter(panels.length - 1)}` : ''}) in ${rows} row${rows === 1 ? '' : 's'} of up to ${columns}.`,
    items,
  };
  return { scene, placements };
}
