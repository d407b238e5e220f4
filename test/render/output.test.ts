import { inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { Resvg } from '@resvg/resvg-js';
import { renderPng } from '../../src/render/renderPng.js';
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
