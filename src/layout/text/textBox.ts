/** Ink boxes of one-line texts, for label placement. */
import type { Box } from './labelPlacement.js';
import type { TextMeasure, TextRun, TextStyle } from '../scene.js';
import { runsExtent, runsWidth } from './textRuns.js';

/** Cap height and descender depth as fractions of the font size (DejaVu Sans: 0.729 em cap height). */
const CAP = 0.73;
const DESCENDER = 0.24;

/** A text box with its baseline offset: box centre (cx, cy) ⇒ baseline y = cy + baseline. */
export interface TextBox {
  readonly width: number;
  readonly height: number;
  readonly baseline: number;
}

/** Ink box of a one-line text: measured width, cap height plus a descender when the text has one. */
export function textBox(text: string, style: TextStyle, measure: TextMeasure): TextBox {
  const down = /[gjpqy(),;]/.test(text) ? DESCENDER : 0.02;
  const height = (CAP + down) * style.fontSize;
  return { width: measure(text, style), height, baseline: height / 2 - down * style.fontSize };
}

export const boxAt = (cx: number, cy: number, t: TextBox): Box => ({ x0: cx - t.width / 2, y0: cy - t.height / 2, x1: cx + t.width / 2, y1: cy + t.height / 2 });

/** Ink box of typeset runs (scripts smaller and shifted), in the same form as {@link textBox}. */
export function runsBox(runs: readonly TextRun[], style: TextStyle, measure: TextMeasure): TextBox {
  const { up, down } = runsExtent(runs, style);
  return { width: runsWidth(runs, style, measure), height: up + down, baseline: (up + down) / 2 - down };
}
