/**
 * Reference: text widths as measureText took them before the advance table, from svg.js text boxes on svgdom
 * (kept verbatim as the oracle for test/render/fontAdvances.test.ts).
 */
import { sharedCanvas } from '../../src/render/svgDocument.js';

/** Width of `text` in em (font size 1) in DejaVu Sans, bold face for bold. */
export function svgdomTextEm(text: string, bold: boolean): number {
  const family = bold ? 'DejaVu Sans Bold' : 'DejaVu Sans';
  const node = sharedCanvas().plain(text).attr({ 'font-family': family, 'font-size': 100 });
  const em = node.bbox().width / 100;
  node.remove();
  return em;
}
