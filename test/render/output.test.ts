import { crc32, inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { Resvg } from '@resvg/resvg-js';
import { pngResolution, renderPng } from '../../src/render/renderPng.js';
import { renderPdf, svgSizePt } from '../../src/render/renderPdf.js';
import { NEWMAN_CASES, caseSvg } from '../helpers/newmanGallery.js';
import { FONT_FILE } from '../../src/render/svgWindow.js';

const svg = caseSvg(NEWMAN_CASES[0]!, 'column');

describe('renderPng', () => {
  it('renderPng gives a PNG of the SVG size times the scale with real ink on it', () => {
    const png = renderPng(svg, { scale: 2 });
    expect([...png.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const view = new DataView(png.buffer, png.byteOffset);
    const { width, height } = svgSizePt(svg);
    expect(view.getUint32(16)).toBe(Math.round((width * 4) / 3 * 2)); // pt → CSS px → zoom
    expect(Math.abs(view.getUint32(20) - (height * 4) / 3 * 2)).toBeLessThanOrEqual(1);
    // decode the same SVG with resvg and count dark pixels: bonds and labels, not a blank page
    const pixels = new Resvg(svg, { font: { loadSystemFonts: false, fontFiles: [FONT_FILE], defaultFontFamily: 'DejaVu Sans' }, background: '#ffffff', fitTo: { mode: 'zoom', value: 2 } }).render().pixels;
    let dark = 0;
    for (let i = 0; i < pixels.length; i += 4) if (pixels[i]! < 128) dark++;
    const share = dark / (pixels.length / 4);
    expect(share).toBeGreaterThan(0.01);
    expect(share).toBeLessThan(0.3);
  });

  it('renderPng(svg, { dpi }) keeps the print size and tags the PNG with its resolution (pHYs read back)', () => {
    /** Every chunk of a PNG, read here independently of the code under test (PNG spec §5.3: length, type, data, CRC). */
    const chunks = (png: Uint8Array) => {
      const out: { type: string; data: Buffer; crcOk: boolean }[] = [];
      const b = Buffer.from(png);
      for (let at = 8; at < b.length; ) {
        const len = b.readUInt32BE(at);
        const type = b.toString('latin1', at + 4, at + 8);
        out.push({ type, data: b.subarray(at + 8, at + 8 + len), crcOk: crc32(b.subarray(at + 4, at + 8 + len)) >>> 0 === b.readUInt32BE(at + 8 + len) });
        at += 12 + len;
      }
      return out;
    };
    const { width } = svgSizePt(svg);
    for (const [dpi, expected] of [[undefined, 300], [600, 600], [150, 150]] as const) {
      const png = renderPng(svg, dpi === undefined ? {} : { dpi });
      const list = chunks(png);
      expect(list.every((c) => c.crcOk)).toBe(true);
      expect(list[0]!.type).toBe('IHDR');
      const phys = list.filter((c) => c.type === 'pHYs');
      expect(phys.length).toBe(1);
      const ppm = phys[0]!.data.readUInt32BE(0);
      expect(phys[0]!.data.readUInt32BE(4)).toBe(ppm);
      expect(phys[0]!.data[8]).toBe(1); // unit: metre
      expect(ppm * 0.0254).toBeCloseTo(expected, 0);
      // pixels across = width in inches × dpi (a pt is 1/72 in)
      expect(Math.abs(list[0]!.data.readUInt32BE(0) - (width / 72) * expected)).toBeLessThanOrEqual(1);
      expect(pngResolution(png)!.x).toBeCloseTo(expected, 0);
    }
  });

  it('renderPng refuses an image over maxPixels (default 64 megapixels) before drawing it, with a ConformarkError', () => {
    const png = renderPng(svg);
    const view = new DataView(png.buffer, png.byteOffset);
    const pixels = view.getUint32(16) * view.getUint32(20); // IHDR width × height
    expect(() => renderPng(svg, { maxPixels: Math.floor(pixels * 0.9) })).toThrow(expect.objectContaining({ code: 'too-many-pixels' }));
    expect(renderPng(svg, { maxPixels: Math.ceil(pixels * 1.02) })).toEqual(png);
    // a page 100 inches square at 300 dpi is 900 megapixels: over the default, refused without allocating it
    const huge = '<svg xmlns="http://www.w3.org/2000/svg" width="7200pt" height="7200pt" viewBox="0 0 7200 7200"><rect width="10" height="10"/></svg>';
    expect(() => renderPng(huge)).toThrow(/30000 × 30000 pixels \(900\.0 megapixels\), more than the limit of 64000000/);
    expect(() => renderPng(svg, { dpi: Number.NaN })).toThrow(expect.objectContaining({ code: 'bad-option' }));
  });

  it('renderPng draws text with the shipped font (labels add ink)', () => {
    const noText = svg.replace(/<text\b[^>]*>[^<]*<\/text>/g, '');
    const ink = (s: string) => {
      const px = new Resvg(s, { font: { loadSystemFonts: false, fontFiles: [FONT_FILE] }, background: '#ffffff' }).render().pixels;
      let n = 0;
      for (let i = 0; i < px.length; i += 4) if (px[i]! < 128) n++;
      return n;
    };
    expect(renderPng(svg).length).toBeGreaterThan(renderPng(noText).length);
    expect(ink(svg)).toBeGreaterThan(ink(noText) * 1.3);
  });
});

describe('renderPdf', () => {
  it('renderPdf writes a one-page vector PDF at the figure size with DejaVu Sans text, same bytes each time', async () => {
    const pdf = Buffer.from(await renderPdf(svg));
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    expect(text).toMatch(/\/BaseFont \/[A-Z]{6}\+DejaVuSans/);
    const { width, height } = svgSizePt(svg);
    const box = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(text)!;
    expect(Number(box[1])).toBeCloseTo(width, 2);
    expect(Number(box[2])).toBeCloseTo(height, 2);
    expect(text).toContain('(D:19700101000000Z)');
    // the page content draws text (Tj/TJ) and strokes lines (S): vector, not an image
    const streams = [...text.matchAll(/stream\r?\n/g)].map((m) => {
      const start = m.index! + m[0].length;
      try {
        return inflateSync(pdf.subarray(start, text.indexOf('endstream', start))).toString('latin1');
      } catch {
        return '';
      }
    });
    const content = streams.find((s) => /\bBT\b/.test(s))!;
    expect(content).toMatch(/T[jJ]/);
    expect(content).toMatch(/\bS\b/);
    // the ToUnicode map holds the characters printed, e.g. C (0043) and ° (00b0)
    expect(streams.some((s) => /<0043>/i.test(s) && /<00b0>/i.test(s))).toBe(true);
    expect(Buffer.from(await renderPdf(svg)).equals(pdf)).toBe(true);
  });
});
