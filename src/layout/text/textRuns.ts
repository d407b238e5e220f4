/**
 * Typeset text as runs: sub- and superscripts are real pieces of smaller text on a shifted baseline (SVG
 * `<tspan>` with `font-size` and `baseline-shift`), not Unicode sub/superscript glyphs, which are tiny and do not
 * exist for capital letters (E_O, ¹T_O). Placement of scripts after IUPAC 2008 graphical representation
 * standards (Brecher, Pure Appl. Chem. 80, 277): subscript counts follow the element symbol on a lowered
 * baseline. Sizes: scripts at 72 % of the base size, never below {@link MIN_TEXT_SIZE}.
 */
import type { TextMeasure, TextRun, TextStyle } from '../scene.js';

/** Smallest type drawn on any figure at the default theme, pt. */
export const MIN_TEXT_SIZE = 6;

/** Script size as a fraction of the base size (common practice, no source). */
const SCRIPT_SCALE = 0.72;
/** Baseline shifts as fractions of the base size: subscripts down, superscripts up (common practice, no source). */
const SUB_SHIFT = 0.24;
const SUP_SHIFT = 0.4;
const CAP = 0.73;
const DESCENDER = 0.24;

/**
 * Runs from a small markup: `_x` / `^x` lower / raise one character, `_{…}` / `^{…}` a group.
 * @example textRuns('CH_2OH') // [{ text: 'CH' }, { text: '2', shift: 'sub' }, { text: 'OH' }]
 * @example textRuns('^4C_1') // [{ text: '4', shift: 'sup' }, { text: 'C' }, { text: '1', shift: 'sub' }]
 */
export function textRuns(markup: string): TextRun[] {
  const runs: TextRun[] = [];
  const push = (text: string, shift?: 'sub' | 'sup') => {
    if (!text) return;
    const last = runs[runs.length - 1];
    if (last && last.shift === shift) runs[runs.length - 1] = shift ? { text: last.text + text, shift } : { text: last.text + text };
    else runs.push(shift ? { text, shift } : { text });
  };
  const chars = [...markup];
  for (let i = 0; i < chars.length; i++) {
    const ch = chars[i]!;
    if ((ch === '_' || ch === '^') && i + 1 < chars.length) {
      const shift = ch === '_' ? 'sub' : 'sup';
      if (chars[i + 1] === '{') {
        const close = chars.indexOf('}', i + 2);
        const end = close < 0 ? chars.length : close;
        push(chars.slice(i + 2, end).join(''), shift);
        i = end;
      } else {
        push(chars[i + 1]!, shift);
        i += 1;
      }
    } else push(ch);
  }
  return runs;
}

/** The plain text of runs (what `SceneText.text` holds). */
export const runsText = (runs: readonly TextRun[]): string => runs.map((r) => r.text).join('');

/** The runs written back as markup (`CH_{3}`), for tests and descriptions. */
export const runsMarkup = (runs: readonly TextRun[]): string =>
  runs.map((r) => (r.shift === 'sub' ? `_{${r.text}}` : r.shift === 'sup' ? `^{${r.text}}` : r.text)).join('');

/** Size of script runs for a base size: 72 %, at least {@link MIN_TEXT_SIZE}, never above the base. */
export const scriptSize = (fontSize: number): number => Math.min(fontSize, Math.max(MIN_TEXT_SIZE, fontSize * SCRIPT_SCALE));

/** Upward baseline shift of a run, in theme units (negative = lowered). */
export function runShift(run: TextRun, fontSize: number): number {
  return run.shift === 'sub' ? -SUB_SHIFT * fontSize : run.shift === 'sup' ? SUP_SHIFT * fontSize : 0;
}

/** Style of one run at a base style. */
export const runStyle = (run: TextRun, style: TextStyle): TextStyle =>
  run.shift ? { fontSize: scriptSize(style.fontSize), fontWeight: style.fontWeight } : style;

/** Advance width of runs at a base style. */
export function runsWidth(runs: readonly TextRun[], style: TextStyle, measure: TextMeasure): number {
  let w = 0;
  for (const r of runs) w += measure(r.text, runStyle(r, style));
  return w;
}

/** Ink extent of runs above (`up`) and below (`down`) the baseline, theme units. */
export function runsExtent(runs: readonly TextRun[], style: TextStyle): { up: number; down: number } {
  let up = 0;
  let down = 0;
  for (const r of runs) {
    const size = runStyle(r, style).fontSize;
    const shift = runShift(r, style.fontSize);
    const desc = /[gjpqy(),;]/.test(r.text) ? DESCENDER : 0.02;
    up = Math.max(up, CAP * size + shift);
    down = Math.max(down, desc * size - shift);
  }
  return { up, down };
}
