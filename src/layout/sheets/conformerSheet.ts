/**
 * Conformer sheets: one row per conformer (its ring figure, then its informative Newman projections), each row
 * headed by one line such as `r03 · chair ⁴C₁ · ΔE 1.30 kcal/mol · 6.4 %`, the compound named once in a header
 * above the rows, and a note under them saying what was left out. A row is never broken: panels that do not fit
 * the width are left out of the sheet and named in the note. Rows go onto as many sheets as the height needs.
 * Panels are placed at their own size (never scaled), so their type keeps its print size. Pure: returns each
 * sheet's own Scene (header, row headings, panel letters, note) and where each panel goes.
 */
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem, type SceneMetrics, type TextMeasure, type TextRun, type TextStyle } from '../scene.js';
import { runsWidth } from '../text/textRuns.js';
import { panelLetter } from './contactSheet.js';

/** A panel of a row: drawn size (theme units) and a short name used when it has to be left out (`C2–O2`). */
export interface RowPanel {
  readonly width: number;
  readonly height: number;
  readonly name: string;
}

/** One conformer: its heading (runs, for typeset descriptors) and its panels, most important first. */
export interface SheetRow {
  readonly heading: readonly TextRun[];
  /** Record label used in the note (`r03`). */
  readonly label: string;
  readonly panels: readonly RowPanel[];
}

/** Options of {@link layoutConformerSheets}. */
export interface ConformerSheetOptions {
  /** Largest sheet width, theme units. */
  readonly maxWidth: number;
  /** Largest sheet height, theme units; more rows go onto further sheets. Default: no limit. */
  readonly maxHeight?: number;
  /** Draw every sheet at exactly maxWidth × maxHeight (a slide). Default false: as large as the content. */
  readonly fixedSize?: boolean;
  /** Header printed once above the rows (the compound). Default none. */
  readonly header?: string;
  /** Sentences under the rows (what the rows show); the panels left out for width are added to it. */
  readonly note?: string;
  /** Sheet title (`<title>`), numbered when there are several sheets. Default `Conformer sheet`. */
  readonly title?: string;
  readonly metrics?: SceneMetrics;
  readonly measure?: TextMeasure;
}

/** Where one panel goes: row and panel index into the input, and its box (theme units). */
export interface RowPanelPlacement {
  readonly row: number;
  readonly panel: number;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** One laid-out sheet. */
export interface ConformerSheetPage {
  readonly scene: Scene;
  readonly placements: readonly RowPanelPlacement[];
}

/** Breaks `text` at spaces into lines no wider than `width` (a word wider than that stays on its own line). */
export function wrapWords(text: string, width: number, measure: (t: string) => number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line === '' ? word : `${line} ${word}`;
    if (line !== '' && measure(next) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line !== '') lines.push(line);
  return lines;
}

interface RowPlan {
  readonly index: number;
  readonly shown: number[];
  readonly height: number;
}

/**
 * Lays out rows onto sheets no wider than `maxWidth` (and no taller than `maxHeight`).
 * @example layoutConformerSheets([{ label: 'r01', heading: [{ text: 'r01 · chair' }], panels: [{ width: 120, height: 100, name: 'ring' }] }], { maxWidth: 482 })[0].placements
 */
export function layoutConformerSheets(rows: readonly SheetRow[], options: ConformerSheetOptions): ConformerSheetPage[] {
  const metrics = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const m = metrics.margin;
  const gap = metrics.bondLength * 0.5;
  const inner = options.maxWidth - 2 * m;
  const headStyle: TextStyle = { ...textStyle(metrics, 'sheet-header'), fontWeight: 'bold' };
  const rowStyle = textStyle(metrics, 'row-heading');
  const letterStyle: TextStyle = { ...textStyle(metrics, 'panel-letter'), fontWeight: 'bold' };
  const noteStyle = metrics.text['sheet-note'] ?? textStyle(metrics, 'caption');
  const lineH = (s: TextStyle) => s.fontSize * 1.3;

  // 1. Each row's panels: left to right while they fit; the first always (a row is never empty).
  const left: string[] = [];
  const plans: RowPlan[] = rows.map((row, index) => {
    const shown: number[] = [];
    let x = 0;
    // in priority order: the first panel that does not fit ends the row, so a less informative narrow one never jumps ahead
    for (const [k, p] of row.panels.entries()) {
      if (shown.length > 0 && x + p.width > inner) break;
      shown.push(k);
      x += p.width + gap;
    }
    const dropped = row.panels.filter((_, k) => !shown.includes(k)).map((p) => p.name);
    if (dropped.length > 0) left.push(`${row.label} ${dropped.join(', ')}`);
    const panelH = shown.reduce((h, k) => Math.max(h, row.panels[k]!.height), 0);
    return { index, shown, height: lineH(rowStyle) + lineH(letterStyle) + panelH };
  });

  // 2. Header and note: wrapped to the width, never cut.
  const headerLines = options.header ? wrapWords(options.header, inner, (t) => measure(t, headStyle)) : [];
  const noteText = [options.note ?? '', left.length > 0 ? `Left out for width: ${left.join('; ')}.` : ''].filter(Boolean).join(' ');
  const noteLines = noteText ? wrapWords(noteText, inner, (t) => measure(t, noteStyle)) : [];
  const headerH = headerLines.length * lineH(headStyle) + (headerLines.length > 0 ? gap * 0.5 : 0);
  const noteH = noteLines.length * lineH(noteStyle) + (noteLines.length > 0 ? gap * 0.5 : 0);

  // 3. Rows onto sheets.
  const room = (options.maxHeight ?? Infinity) - 2 * m - headerH - noteH;
  const pages: RowPlan[][] = [];
  let used = Infinity;
  for (const plan of plans) {
    if (used + gap + plan.height > room && (pages.length === 0 || pages[pages.length - 1]!.length > 0) && used !== 0) {
      pages.push([]);
      used = 0;
    }
    pages[pages.length - 1]!.push(plan);
    used += (used === 0 ? 0 : gap) + plan.height;
  }

  // 4. Each sheet.
  return pages.map((page, p) => {
    const items: SceneItem[] = [];
    const placements: RowPanelPlacement[] = [];
    let y = m;
    for (const line of headerLines) {
      items.push({ type: 'text', role: 'sheet-header', x: m, y: y + headStyle.fontSize, text: line, anchor: 'start', ...headStyle });
      y += lineH(headStyle);
    }
    if (headerLines.length > 0) y += gap * 0.5;
    let width = 0;
    let letter = 0;
    page.forEach((plan, r) => {
      if (r > 0) y += gap;
      const row = rows[plan.index]!;
      items.push({ type: 'text', role: 'row-heading', x: m, y: y + rowStyle.fontSize, text: row.heading.map((t) => t.text).join(''), runs: row.heading, anchor: 'start', ...rowStyle });
      width = Math.max(width, runsWidth(row.heading, rowStyle, measure));
      const top = y + lineH(rowStyle);
      let x = m;
      for (const k of plan.shown) {
        const panel = row.panels[k]!;
        items.push({ type: 'text', role: 'panel-letter', x, y: top + letterStyle.fontSize, text: panelLetter(letter++), anchor: 'start', ...letterStyle });
        placements.push({ row: plan.index, panel: k, x, y: top + lineH(letterStyle), width: panel.width, height: panel.height });
        x += panel.width + gap;
      }
      width = Math.max(width, x - gap - m);
      y += plan.height;
    });
    if (noteLines.length > 0) y += gap * 0.5;
    for (const line of noteLines) {
      items.push({ type: 'text', role: 'sheet-note', x: m, y: y + noteStyle.fontSize, text: line, anchor: 'start', ...noteStyle });
      width = Math.max(width, measure(line, noteStyle));
      y += lineH(noteStyle);
    }
    for (const line of headerLines) width = Math.max(width, measure(line, headStyle));
    const n = pages.length;
    const rowCount = page.length;
    const scene: Scene = {
      kind: 'sheet',
      width: options.fixedSize ? options.maxWidth : Math.min(options.maxWidth, width + 2 * m),
      height: options.fixedSize && options.maxHeight !== undefined ? options.maxHeight : y + m,
      title: `${options.title ?? 'Conformer sheet'}${n > 1 ? ` (${p + 1} of ${n})` : ''}`,
      desc: `${rowCount} conformer${rowCount === 1 ? '' : 's'}, one per row: ring figure first, then Newman projections; panels ${panelLetter(0)}–${panelLetter(Math.max(0, letter - 1))}.`,
      items,
    };
    return { scene, placements };
  });
}
