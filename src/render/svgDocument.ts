/**
 * The svgdom window and svg.js, for handing a figure over as an editable svg.js document (figureDocument.ts) and
 * as the reference the direct SVG writer is tested against. One window for the whole process, with the shipped
 * DejaVu Sans mapped, so svg.js measurements (bbox) agree with measureText. Load it only where a DOM is needed.
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

/** A figure's SVG text as a detached svg.js element on the shared window (edit it, then `.svg()` for the text). */
export function svgDocument(svg: string): Svg {
  sharedCanvas(); // registers the window svg.js creates elements in
  return SVG(svg.replace(/^<\?xml[^>]*>\s*/, '')) as Svg;
}
