import { readdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { BOLD, REGULAR } from '../../src/render/fontAdvances.js';
import { FONT_FILE, FONT_FILE_BOLD } from '../../src/render/fontFiles.js';
import { measureText } from '../../src/render/measureText.js';
import { svgdomTextEm } from '../helpers/svgdomMeasureText.js';

interface EngineFont {
  characterSet: number[];
  layout(text: string): { glyphs: { advanceWidth: number }[] };
}
const fontkit = createRequire(import.meta.url)('fontkit') as { openSync(file: string): EngineFont };
const faces = [
  { bold: false, font: fontkit.openSync(FONT_FILE), table: REGULAR },
  { bold: true, font: fontkit.openSync(FONT_FILE_BOLD), table: BOLD },
];
const em = (text: string, bold: boolean) => measureText(text, { fontSize: 1, fontWeight: bold ? 'bold' : 'normal' });

/** The code points the table holds (plain), from its runs. */
function plainCodePoints(runs: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < runs.length; i += 2 + runs[i + 1]!) for (let k = 0; k < runs[i + 1]!; k++) out.push(runs[i]! + k);
  return out;
}

describe('measureText gives the widths svgdom measures in the shipped fonts', () => {
  it('for every printable code point of both faces alone, bit for bit', () => {
    for (const { bold, font } of faces) {
      const bad: string[] = [];
      for (const cp of font.characterSet) {
        if (cp < 0x20 || (cp >= 0x7f && cp < 0xa0)) continue; // control characters print nothing
        const c = String.fromCodePoint(cp);
        if (em(c, bold) !== svgdomTextEm(c, bold)) bad.push(cp.toString(16));
      }
      expect(bad).toEqual([]);
    }
  });

  it('for every text in the committed gallery figures', () => {
    const texts = new Set<string>();
    const unescape = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');
    for (const file of readdirSync('gallery').filter((f) => f.endsWith('.svg'))) {
      for (const m of readFileSync(`gallery/${file}`, 'utf8').matchAll(/<(?:text|tspan)\b[^>]*>([^<]+)</g)) texts.add(unescape(m[1]!));
    }
    expect(texts.size).toBeGreaterThan(50);
    for (const t of texts) for (const bold of [false, true]) expect(em(t, bold), t).toBe(svgdomTextEm(t, bold));
  });

  it('for random strings over letters that form ligatures, other scripts, marks, ignorables and astral characters', () => {
    const pieces = fc.constantFrom('f', 'i', 'l', 'j', 's', 't', 'ff', 'C', 'H', '1', ' ', '°', 'α', 'б', 'Å', '\u0301', '\u00ad', 'ب', 'ا', 'ߊ', 'ע', '\u05b4', '😀', '𝐀', '−', '₂', '′', '—', '\ufffd');
    const text = fc.array(pieces, { maxLength: 8 }).map((p) => p.join(''));
    fc.assert(fc.property(text, fc.boolean(), (t, bold) => em(t, bold) === svgdomTextEm(t, bold)), { seed: 22, numRuns: 600 });
  });

  it('for the ligature letters and the context-sensitive Latin letters next to every code point in the table', () => {
    // fontkit is what svgdom lays text out with; checked directly here, 20,000 pairs per face
    const sum = (font: EngineFont, s: string) => font.layout(s).glyphs.reduce((a, g) => a + g.advanceWidth, 0);
    for (const { bold, font, table } of faces) {
      const bad: string[] = [];
      for (const cp of plainCodePoints(table.runs)) {
        const x = String.fromCharCode(cp);
        for (const c of ['f', 'i', 'j', 'l']) {
          for (const s of [c + x, x + c]) {
            const engine = Math.max(sum(font, s.slice(0, 1)), sum(font, s)) / table.unitsPerEm;
            if (em(s, bold) !== (engine * 100) / 100) bad.push(s);
          }
        }
      }
      expect(bad).toEqual([]);
    }
  });

  it('for the empty string: zero', () => {
    expect(em('', false)).toBe(0);
    expect(svgdomTextEm('', false)).toBe(0);
  });
});
