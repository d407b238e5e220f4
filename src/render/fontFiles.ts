/** The shipped font files (DejaVu Sans, regular and bold), found relative to this module (src/render or dist/render). */
import { fileURLToPath } from 'node:url';

/** Package fonts folder. */
export const FONT_DIR = fileURLToPath(new URL('../../fonts/', import.meta.url));
/** The shipped regular and bold faces, used for measuring, PNG and PDF. */
export const FONT_FILE = fileURLToPath(new URL('../../fonts/DejaVuSans.ttf', import.meta.url));
export const FONT_FILE_BOLD = fileURLToPath(new URL('../../fonts/DejaVuSans-Bold.ttf', import.meta.url));
