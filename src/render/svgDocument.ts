/**
 * The svgdom window with svg.js: the reference the direct SVG writer and the advance table are tested against
 * (test/helpers). One window for the whole process, with the shipped DejaVu Sans mapped. No library code loads it:
 * import it only where a DOM is needed.
 */
import { createSVGWindow, config } from 'svgdom';
import { SVG, registerWindow, type Svg } from '@svgdotjs/svg.js';
import { FONT_DIR } from './fontFiles.js';

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
