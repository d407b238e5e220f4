/**
 * One svgdom window for the whole process (reused: faster than a window per figure, measured here), with the
 * shipped DejaVu Sans mapped for text measurement. Only measuring needs it: renderSvg writes markup directly.
 */
import { fileURLToPath } from 'node:url';
import { createSVGWindow, config } from 'svgdom';
import { SVG, registerWindow, type Svg } from '@svgdotjs/svg.js';
import type { TextMeasure } from '../layout/scene.js';

/** Package fonts folder, relative to this module (src/render or dist/render). */
export const FONT_DIR = fileURLToPath(new URL('../../fonts/', import.meta.url));
/** The shipped regular and bold faces, used for measuring, PNG and PDF. */
export const FONT_FILE = fileURLToPath(new URL('../../fonts/DejaVuSans.ttf', import.meta.url));
export const FONT_FILE_BOLD = fileURLToPath(new URL('../../fonts/DejaVuSans-Bold.ttf', import.meta.url));

let canvas: Svg | undefined;

/** The shared root `<svg>`, created on first use. Whoever adds to it removes what it added. */
export function sharedCanvas(): Svg {
  if (!canvas) {
    // setFontDir replaces svgdom's own folder: every family we emit must be mapped or it measures as 0.
    config
      .setFontDir(FONT_DIR)
      .setFontFamilyMappings({ 'DejaVu Sans': 'DejaVuSans.ttf', 'DejaVu Sans Bold': 'DejaVuSans-Bold.ttf', 'sans-serif': 'DejaVuSans.ttf' })
      .preloadFonts();
    const window = createSVGWindow();
    registerWindow(window, window.document);
    canvas = SVG(window.document.documentElement as unknown as SVGSVGElement) as Svg;
  }
  return canvas;
}

const widths = new Map<string, number>();

/**
 * Advance width of one line of text in DejaVu Sans (bold face for bold), in the units of `fontSize`.
 * @example measureText('Cl', { fontSize: 8, fontWeight: 'normal' }) // ≈ 8.6
 */
export const measureText: TextMeasure = (text, style) => {
  const family = style.fontWeight === 'bold' ? 'DejaVu Sans Bold' : 'DejaVu Sans';
  const key = `${family}\u0000${text}`;
  let em = widths.get(key);
  if (em === undefined) {
    const node = sharedCanvas().plain(text).attr({ 'font-family': family, 'font-size': 100 });
    em = node.bbox().width / 100;
    node.remove();
    widths.set(key, em);
  }
  return em * style.fontSize;
};
