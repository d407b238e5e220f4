/** SVG → vector PDF with pdfkit + svg-to-pdfkit, text in the embedded DejaVu Sans, fixed dates (reproducible). */
import { usageError } from '../model/errors.js';
import { FONT_FILE, FONT_FILE_BOLD } from './fontFiles.js';

/** Page size of an SVG from its root width/height (pt, px or unitless = px), in pt. */
export function svgSizePt(svg: string): { width: number; height: number } {
  const root = /<svg\b[^>]*>/.exec(svg)?.[0] ?? '';
  const size = (name: string) => {
    const m = new RegExp(`\\s${name}="([0-9.]+)(pt|px)?"`).exec(root);
    if (!m) throw usageError('bad-svg', `the SVG has no numeric ${name}`);
    return m[2] === 'pt' ? Number(m[1]) : Number(m[1]) * 0.75;
  };
  return { width: size('width'), height: size('height') };
}

/**
 * A one-page PDF of the SVG at its own size; `currentColor` prints black.
 * @example writeFileSync('fig.pdf', await renderPdf(svg))
 */
export async function renderPdf(svg: string): Promise<Uint8Array> {
  const { width, height } = svgSizePt(svg);
  // loaded on first use: pdfkit takes about 0.2 s to load, and most runs write no PDF
  const [{ default: PDFDocument }, { default: SVGtoPDF }] = await Promise.all([import('pdfkit'), import('svg-to-pdfkit')]);
  const doc = new PDFDocument({ autoFirstPage: false, margin: 0, info: { CreationDate: new Date(0), ModDate: new Date(0), Producer: 'conformark', Creator: 'conformark' } });
  doc.registerFont('DejaVu Sans', FONT_FILE);
  doc.registerFont('DejaVu Sans Bold', FONT_FILE_BOLD);
  doc.addPage({ size: [width, height], margin: 0 });
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on('error', reject);
  });
  SVGtoPDF(doc, svg, 0, 0, { width, height, assumePt: true, fontCallback: (_family, bold) => (bold ? 'DejaVu Sans Bold' : 'DejaVu Sans') });
  doc.end();
  return await done;
}
