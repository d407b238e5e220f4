/**
 * Text widths in the shipped DejaVu Sans faces from a generated advance table (fontAdvances.ts, written by
 * scripts/make-font-advances.mjs): the figures the svgdom text box gave before, to the last bit, without loading a
 * DOM or the font engine. svgdom measures a text as fontkit lays it out (glyph advances summed, no kerning), and the
 * box it returns spans the larger of the first UTF-16 unit alone and the whole string; both are reproduced here,
 * with the Latin ligatures the faces form by default (ff, fi, fl, ffi, ffl; only when the string's script is Latin,
 * as fontkit decides it: the first code point of a script other than common). A string with a code point outside
 * the table (marks, joining scripts, default-ignorables, characters the face lacks, astral planes) is laid out by
 * fontkit itself, loaded on first need. test/render/fontAdvances.test.ts checks both paths against svgdom.
 */
import { createRequire } from 'node:module';
import type { TextMeasure } from '../layout/scene.js';
import { BOLD, type FaceAdvances, LATIN_SCRIPT, OTHER_SCRIPT, REGULAR } from './fontAdvances.js';
import { FONT_FILE, FONT_FILE_BOLD } from './fontFiles.js';

/** One face unpacked: advance + 1 per BMP code point (0: not in the table). */
interface Face {
  readonly advances: Uint16Array;
  readonly unitsPerEm: number;
  readonly ligatures: readonly (readonly [string, number])[];
  readonly file: string;
}

/** Script class per BMP code point: 0 common or not in the table, 1 Latin, 2 another script. */
let scripts: Uint8Array | undefined;
const faces: { regular?: Face; bold?: Face } = {};

function unpack(table: FaceAdvances, file: string): Face {
  const advances = new Uint16Array(0x10000);
  const runs = table.runs;
  for (let i = 0; i < runs.length; ) {
    const start = runs[i]!;
    const count = runs[i + 1]!;
    for (let k = 0; k < count; k++) advances[start + k] = runs[i + 2 + k]! + 1;
    i += 2 + count;
  }
  return { advances, unitsPerEm: table.unitsPerEm, ligatures: table.ligatures, file };
}

function scriptTable(): Uint8Array {
  const s = new Uint8Array(0x10000);
  for (const [ranges, value] of [[LATIN_SCRIPT, 1], [OTHER_SCRIPT, 2]] as const) {
    for (let i = 0; i < ranges.length; i += 2) s.fill(value, ranges[i]!, ranges[i + 1]! + 1);
  }
  return s;
}

/** Width in font units as svgdom's text box gives it, or `null` when the table cannot say. */
export function tableUnits(face: Face, text: string): number | null {
  const adv = face.advances;
  let sum = 0;
  let script = 0;
  let f = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    const a = adv[c]!;
    if (a === 0) return null; // surrogates are never in the table
    sum += a - 1;
    if (script === 0) script = (scripts ??= scriptTable())[c]!;
    if (c === 0x66) f = true;
  }
  if (f && script === 1) sum += ligatureChange(face, text);
  const first = text.length > 0 ? adv[text.charCodeAt(0)]! - 1 : 0;
  return first > sum ? first : sum;
}

/** The change in advance when the face's ligatures replace their letters, scanning left to right as fontkit does. */
function ligatureChange(face: Face, text: string): number {
  const adv = face.advances;
  let change = 0;
  for (let i = 0; i < text.length; i++) {
    for (const [letters, advance] of face.ligatures) {
      if (!text.startsWith(letters, i)) continue;
      for (let k = 0; k < letters.length; k++) change -= adv[letters.charCodeAt(k)]! - 1;
      change += advance;
      i += letters.length - 1;
      break;
    }
  }
  return change;
}

interface EngineFont {
  readonly unitsPerEm: number;
  layout(text: string): { glyphs: { advanceWidth: number }[] };
}
const engineFonts = new Map<string, EngineFont>();

/** Width in font units laid out by fontkit, as svgdom measures (first UTF-16 unit alone or the whole, the larger). */
function engineUnits(face: Face, text: string): number {
  let font = engineFonts.get(face.file);
  if (!font) {
    const fontkit = createRequire(import.meta.url)('fontkit') as { openSync(file: string): EngineFont };
    font = fontkit.openSync(face.file);
    engineFonts.set(face.file, font);
  }
  if (text === '') return 0;
  const sum = (s: string): number => font.layout(s).glyphs.reduce((a, g) => a + g.advanceWidth, 0);
  return Math.max(sum(text.slice(0, 1)), sum(text));
}

const widths = new Map<string, number>();

/**
 * Advance width of one line of text in DejaVu Sans (bold face for bold), in the units of `fontSize`.
 * @example measureText('Cl', { fontSize: 8, fontWeight: 'normal' }) // ≈ 8.6
 */
export const measureText: TextMeasure = (text, style) => {
  const bold = style.fontWeight === 'bold';
  const key = `${bold ? 'b' : 'r'}${text}`;
  let em = widths.get(key);
  if (em === undefined) {
    const face = bold ? (faces.bold ??= unpack(BOLD, FONT_FILE_BOLD)) : (faces.regular ??= unpack(REGULAR, FONT_FILE));
    const units = tableUnits(face, text) ?? engineUnits(face, text);
    // the same operations as svgdom's box at font-size 100, then measureText's division
    em = ((units / face.unitsPerEm) * 100) / 100;
    widths.set(key, em);
  }
  return em * style.fontSize;
};
