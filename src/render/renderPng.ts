/** SVG → PNG with resvg and the shipped DejaVu Sans (system fonts off, so output never depends on the host). */
import { Resvg } from '@resvg/resvg-js';
import { FONT_FILE, FONT_FILE_BOLD } from './svgWindow.js';

/** Options of {@link renderPng}. */
export interface RenderPngOptions {
  /** Zoom over the SVG's CSS pixel size (1 pt = 4/3 px). Default 4 (about 384 dpi for pt figures). */
  readonly scale?: number;
  /** Page colour behind the figure (`currentColor` paints black). Default `#ffffff`. */
  readonly background?: string;
}

/**
 * Rasterises an SVG string to PNG bytes.
 * @example writeFileSync('fig.png', renderPng(svg, { scale: 2 }))
 */
export function renderPng(svg: string, options: RenderPngOptions = {}): Uint8Array {
  const { scale = 4, background = '#ffffff' } = options;
  const resvg = new Resvg(svg, {
    font: { loadSystemFonts: false, fontFiles: [FONT_FILE, FONT_FILE_BOLD], defaultFontFamily: 'DejaVu Sans', sansSerifFamily: 'DejaVu Sans' },
    fitTo: { mode: 'zoom', value: scale },
    background,
    logLevel: 'off',
  });
  return new Uint8Array(resvg.render().asPng());
}
