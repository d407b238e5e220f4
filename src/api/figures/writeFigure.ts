/** Writes a figure as SVG, PNG or PDF (chosen by the file extension), atomically. */
import { extname } from 'node:path';
import { usageError } from '../../model/errors.js';
import { writeAtomic } from '../../io/writeAtomic.js';
import { renderPng } from '../../render/renderPng.js';
import { renderPdf } from '../../render/renderPdf.js';

/** Output formats for figures. */
export const FIGURE_FORMATS = new Map([
  ['svg', 'Scalable Vector Graphics (text)'],
  ['png', 'raster image via resvg'],
  ['pdf', 'vector PDF via pdfkit'],
] as const);
export type FigureFormat = typeof FIGURE_FORMATS extends Map<infer K, unknown> ? K : never;

/** Options of {@link writeFigure}. */
export interface WriteFigureOptions {
  /** Output format. Default: from the extension of `path` (`.svg`, `.png`, `.pdf`). */
  readonly format?: FigureFormat;
  /** PNG resolution, dots per inch (the figure keeps its print size). Default 300. */
  readonly dpi?: number;
  /** Most pixels of a PNG. Default 64,000,000. */
  readonly maxPixels?: number;
}

/** Format of an output path from its extension; a clear error for anything else. */
export function figureFormat(path: string): FigureFormat {
  const ext = extname(path).slice(1).toLowerCase();
  if (FIGURE_FORMATS.has(ext as FigureFormat)) return ext as FigureFormat;
  throw usageError('bad-format', `cannot tell the figure format from "${path}": use .svg, .png or .pdf`);
}

/** The bytes of an SVG figure in the given format. */
export async function figureBytes(svg: string, format: FigureFormat, options: { readonly dpi?: number; readonly maxPixels?: number } = {}): Promise<string | Uint8Array> {
  if (format === 'svg') return svg.endsWith('\n') ? svg : `${svg}\n`;
  if (format === 'png') return renderPng(svg, { ...(options.dpi === undefined ? {} : { dpi: options.dpi }), ...(options.maxPixels === undefined ? {} : { maxPixels: options.maxPixels }) });
  return renderPdf(svg);
}

/**
 * Writes an SVG figure to `path` as SVG, PNG or PDF through a temporary file and a rename.
 * @example await writeFigure('out/butane.pdf', svg)
 */
export async function writeFigure(path: string, svg: string, options: WriteFigureOptions = {}): Promise<void> {
  const format = options.format ?? figureFormat(path);
  writeAtomic(path, await figureBytes(svg, format, options));
}
