/**
 * Contact sheets as one SVG: the sheet's letters and captions rendered from a Scene, each panel's own SVG
 * nested at its place (`<svg x y width height viewBox>`), so every panel keeps its classes and ids (give each
 * panel a unique id prefix).
 */
import { usageError } from '../../model/errors.js';
import { layoutContactSheet, panelLetter, type SheetPanel } from '../../layout/sheets/contactSheet.js';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';

/** A panel for {@link contactSheet}: a rendered figure (theme units) and its caption lines. */
export interface ContactPanel extends SheetPanel {
  readonly svg: string;
}

/** Options of {@link contactSheet}. */
export interface ContactSheetSvgOptions {
  /** Theme of the sheet's text; use the panels' theme. Default `column`. */
  readonly theme?: Theme | string;
  /** Id prefix of the sheet's own ids (distinct from every panel's). Default `sheet-`. */
  readonly idPrefix?: string;
  /** Panels per row. Default 4. */
  readonly columns?: number;
  /** Sheet `<title>`. Default `Contact sheet`. */
  readonly title?: string;
}

const round = (x: number) => {
  const r = Math.round(x * 100) / 100;
  return Object.is(r, -0) ? 0 : r;
};

/** The root tag of an SVG string and what lies inside it. */
function splitRoot(svg: string): { tag: string; inner: string } {
  const start = svg.indexOf('<svg');
  const open = svg.indexOf('>', start);
  const close = svg.lastIndexOf('</svg>');
  if (start < 0 || open < 0 || close < open) throw usageError('bad-panel', 'a contact-sheet panel is not an SVG document');
  return { tag: svg.slice(start, open + 1), inner: svg.slice(open + 1, close) };
}

/** Nests a panel SVG at a placement, in the sheet's user units. */
export function nestPanel(svg: string, x: number, y: number, width: number, height: number, letter: string): string {
  const { tag, inner } = splitRoot(svg);
  const viewBox = /\sviewBox="([^"]*)"/.exec(tag)?.[1] ?? `0 0 ${round(width)} ${round(height)}`;
  const cls = /\sclass="([^"]*)"/.exec(tag)?.[1] ?? '';
  const labelled = /\saria-labelledby="([^"]*)"/.exec(tag)?.[1];
  return `<svg x="${round(x)}" y="${round(y)}" width="${round(width)}" height="${round(height)}" viewBox="${viewBox}" class="panel ${cls}" data-panel="${letter}"${labelled ? ` role="img" aria-labelledby="${labelled}"` : ''}>${inner}</svg>`;
}

/**
 * One SVG holding every panel in a grid with letters a, b, c… and captions.
 * @example contactSheet([{ svg, width: 99, height: 115, caption: ['r1, C2–C3 staggered'] }], { idPrefix: 's1-' })
 */
export function contactSheet(panels: readonly ContactPanel[], options: ContactSheetSvgOptions = {}): string {
  const theme = loadTheme(options.theme);
  const { scene, placements } = layoutContactSheet(panels, {
    columns: options.columns, title: options.title, metrics: sceneMetrics(theme), measure: measureText,
  });
  const sheet = renderSvg(scene, theme, { idPrefix: options.idPrefix ?? 'sheet-' });
  const nested = panels.map((p, k) => {
    const at = placements[k]!;
    return nestPanel(p.svg, at.x, at.y, at.width, at.height, panelLetter(k));
  });
  const close = sheet.lastIndexOf('</svg>');
  return `${sheet.slice(0, close)}${nested.join('')}</svg>`;
}
