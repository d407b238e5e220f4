/**
 * SVG → PNG with resvg and the shipped DejaVu Sans (system fonts off, so output never depends on the host).
 * The PNG carries its resolution in a pHYs chunk (PNG specification, 2nd ed., W3C 2003, §11.3.5.3), so a
 * word processor places a 300 dpi figure at its print size.
 */
import { crc32 } from 'node:zlib';
import { createRequire } from 'node:module';
import type { Resvg as ResvgClass } from '@resvg/resvg-js';
import { usageError } from '../model/errors.js';
import { FONT_FILE, FONT_FILE_BOLD } from './fontFiles.js';

// loaded on first use (a native addon): most runs write no PNG
let Resvg: typeof ResvgClass | undefined;
const loadResvg = (): typeof ResvgClass => (Resvg ??= (createRequire(import.meta.url)('@resvg/resvg-js') as { Resvg: typeof ResvgClass }).Resvg);

/** Default PNG resolution, dots per inch (print). */
export const DEFAULT_DPI = 300;

/** Default cap on the pixels of one PNG: 64 megapixels (an 8,000 × 8,000 image, 256 MB of RGBA while drawn). */
export const DEFAULT_MAX_PIXELS = 64_000_000;

/** Options of {@link renderPng}. */
export interface RenderPngOptions {
  /** Resolution, dots per inch: the SVG's size in pt or CSS px (96 per inch) becomes this many pixels per inch. Default 300. */
  readonly dpi?: number;
  /** Zoom over the SVG's CSS pixel size (1 pt = 4/3 px) instead of `dpi`; the resolution tag is 96 × scale. */
  readonly scale?: number;
  /** Page colour behind the figure (`currentColor` paints black). Default `#ffffff`. */
  readonly background?: string;
  /** Most pixels (width × height) of the image; a larger one is refused before any is drawn. Default 64,000,000. */
  readonly maxPixels?: number;
}

/** The PNG bytes with a pHYs chunk (pixels per metre, unit metre) after IHDR, replacing any earlier one. */
export function withResolution(png: Uint8Array, dpi: number): Uint8Array {
  const ppm = Math.round(dpi / 0.0254);
  const data = Buffer.alloc(9);
  data.writeUInt32BE(ppm, 0);
  data.writeUInt32BE(ppm, 4);
  data[8] = 1;
  const chunk = Buffer.alloc(21);
  chunk.writeUInt32BE(9, 0);
  chunk.write('pHYs', 4, 'latin1');
  data.copy(chunk, 8);
  chunk.writeUInt32BE(crc32(chunk.subarray(4, 17)) >>> 0, 17);
  // signature (8) + IHDR (4 length + 4 type + 13 data + 4 crc) = 33; drop any pHYs chunk resvg wrote
  const bytes = Buffer.from(png);
  const parts: Buffer[] = [bytes.subarray(0, 33), chunk];
  for (let at = 33; at < bytes.length; ) {
    const len = bytes.readUInt32BE(at);
    const end = at + 12 + len;
    if (bytes.toString('latin1', at + 4, at + 8) !== 'pHYs') parts.push(bytes.subarray(at, end));
    at = end;
  }
  return new Uint8Array(Buffer.concat(parts));
}

/** Resolution of PNG bytes from their pHYs chunk, dots per inch (rounded to 0.01), or null without one. */
export function pngResolution(png: Uint8Array): { x: number; y: number } | null {
  const bytes = Buffer.from(png.buffer, png.byteOffset, png.byteLength);
  for (let at = 8; at + 12 <= bytes.length; ) {
    const len = bytes.readUInt32BE(at);
    if (bytes.toString('latin1', at + 4, at + 8) === 'pHYs' && len === 9 && bytes[at + 16] === 1) {
      const dpi = (ppm: number) => Math.round(ppm * 0.0254 * 100) / 100;
      return { x: dpi(bytes.readUInt32BE(at + 8)), y: dpi(bytes.readUInt32BE(at + 12)) };
    }
    at += 12 + len;
  }
  return null;
}

/**
 * Rasterises an SVG string to PNG bytes at `dpi` (default 300), tagged with that resolution.
 * @example writeFileSync('fig.png', renderPng(svg, { dpi: 600 }))
 */
export function renderPng(svg: string, options: RenderPngOptions = {}): Uint8Array {
  const { background = '#ffffff', maxPixels = DEFAULT_MAX_PIXELS } = options;
  const scale = options.scale ?? (options.dpi ?? DEFAULT_DPI) / 96;
  if (!(Number.isFinite(scale) && scale > 0)) throw usageError('bad-option', `PNG resolution must be a positive number, got ${options.scale ?? options.dpi}`);
  const resvg = new (loadResvg())(svg, {
    font: { loadSystemFonts: false, fontFiles: [FONT_FILE, FONT_FILE_BOLD], defaultFontFamily: 'DejaVu Sans', sansSerifFamily: 'DejaVu Sans' },
    fitTo: { mode: 'zoom', value: scale },
    background,
    logLevel: 'off',
  });
  const width = Math.ceil(resvg.width * scale);
  const height = Math.ceil(resvg.height * scale);
  if (width * height > maxPixels) {
    const mp = ((width * height) / 1e6).toFixed(1);
    throw usageError('too-many-pixels', `the PNG would be ${width} × ${height} pixels (${mp} megapixels), more than the limit of ${maxPixels} (raise with --max-pixels, option maxPixels; lower --dpi; or write SVG or PDF)`);
  }
  return withResolution(new Uint8Array(resvg.render().asPng()), scale * 96);
}
