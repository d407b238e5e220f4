/** Minimal typings for svgdom 0.1.24 (the package ships none): only what render/ uses. */
declare module 'svgdom' {
  interface SvgdomConfig {
    setFontDir(dir: string): SvgdomConfig;
    setFontFamilyMappings(map: Record<string, string>): SvgdomConfig;
    preloadFonts(): SvgdomConfig;
  }
  export const config: SvgdomConfig;
  export function createSVGWindow(): Window & typeof globalThis;
}

/** Minimal typings for svg-to-pdfkit 0.1.8. */
declare module 'svg-to-pdfkit' {
  interface SvgToPdfOptions {
    width?: number;
    height?: number;
    assumePt?: boolean;
    preserveAspectRatio?: string;
    fontCallback?: (family: string, bold: boolean, italic: boolean) => string;
    colorCallback?: (color: [[number, number, number], number]) => [[number, number, number], number];
  }
  export default function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x: number, y: number, options?: SvgToPdfOptions): void;
}
