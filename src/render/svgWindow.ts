/**
 * Where figures get their text widths and font files. Kept as the import point for layout callers; nothing here
 * loads a DOM: widths come from the generated advance table (measureText.ts). The svgdom window lives in
 * svgDocument.ts, for the tests' svg.js reference only.
 */
export { measureText } from './measureText.js';
export { FONT_DIR, FONT_FILE, FONT_FILE_BOLD } from './fontFiles.js';
