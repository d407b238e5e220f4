/**
 * Conformer sheets as SVG: a page 17 cm wide (fits a 17.8 cm two-column page; rows go onto further sheets
 * below 24 cm of height) or a 16:9 slide (33.867 × 19.05 cm, 13.333 × 7.5 in, the common widescreen slide; use it with the
 * `projector` theme). Each panel's own SVG is nested at its place at its own size, so type keeps its print size.
 */
import { layoutConformerSheets, type RowPanel, type SheetRow } from '../../layout/sheets/conformerSheet.js';
import type { TextRun } from '../../layout/scene.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';
import { nestPanel } from './contactSheet.js';
import { panelLetter } from '../../layout/sheets/contactSheet.js';

/** Sheet formats: page size in cm and whether every sheet is exactly that size. */
export const SHEET_LAYOUTS = new Map([
  ['page', { widthCm: 17, heightCm: 24, fixed: false }],
  ['slide', { widthCm: 33.8667, heightCm: 19.05, fixed: true }],
] as const);
export type SheetLayout = typeof SHEET_LAYOUTS extends Map<infer K, unknown> ? K : never;

/** A rendered panel of a row. */
export interface ConformerPanel extends RowPanel {
  readonly svg: string;
}

/** One conformer's row for {@link conformerSheets}. */
export interface ConformerRow {
  readonly label: string;
  readonly heading: readonly TextRun[];
  readonly panels: readonly ConformerPanel[];
}

/** Options of {@link conformerSheets}. */
export interface ConformerSheetSvgOptions {
  /** Theme of the sheet's text; use the panels' theme. Default `column`. */
  readonly theme?: Theme | string;
  /** `page` (17 cm wide, default) or `slide` (16:9). */
  readonly layout?: SheetLayout;
  /** Id prefix of each sheet's own ids; the sheet number is added (`<prefix>1-`). Default `sheet-`. */
  readonly idPrefix?: string;
  /** The compound, printed once above the rows. */
  readonly header?: string;
  /** What the rows show and what was left out. */
  readonly note?: string;
  /** Sheet `<title>`. Default `Conformer sheet`. */
  readonly title?: string;
}

const CM = { pt: 72 / 2.54, px: 96 / 2.54 } as const;

/**
 * Sheets (SVG strings) holding every row, one conformer per row.
 * @example conformerSheets([{ label: 'r01', heading: [{ text: 'r01 · chair' }], panels: [{ svg, width: 120, height: 100, name: 'ring' }] }])
 */
export function conformerSheets(rows: readonly ConformerRow[], options: ConformerSheetSvgOptions = {}): string[] {
  const theme = loadTheme(options.theme);
  const frame = SHEET_LAYOUTS.get(options.layout ?? 'page')!;
  const perCm = CM[theme.unit];
  const pages = layoutConformerSheets(rows as readonly SheetRow[], {
    maxWidth: frame.widthCm * perCm,
    maxHeight: frame.heightCm * perCm,
    fixedSize: frame.fixed,
    header: options.header,
    note: options.note,
    title: options.title,
    metrics: sceneMetrics(theme),
    measure: measureText,
  });
  return pages.map(({ scene, placements }, s) => {
    const sheet = renderSvg(scene, theme, { idPrefix: `${options.idPrefix ?? 'sheet-'}${s + 1}-` });
    const nested = placements.map((at, k) => nestPanel(rows[at.row]!.panels[at.panel]!.svg, at.x, at.y, at.width, at.height, panelLetter(k)));
    const close = sheet.lastIndexOf('</svg>');
    return `${sheet.slice(0, close)}${nested.join('')}</svg>`;
  });
}
