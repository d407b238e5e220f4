/**
 * A ring-form descriptor as one line of plain text with Unicode superscripts and subscripts
 * (⁴C₁, ¹˒⁴B, ᴼS₂), for figures whose text items cannot shift baselines. Falls back to the ASCII text when a
 * locant has no superscript or subscript form.
 */
import type { DescriptorParts } from '../../analysis/ringDescriptor.js';

const SUP: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', O: 'ᴼ', N: 'ᴺ', ',': '˒' };
const SUB: Record<string, string> = { '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉', O: 'ₒ', ',': '‚' };

function mapAll(text: string, table: Record<string, string>): string | null {
  let out = '';
  for (const ch of text) {
    const m = table[ch];
    if (m === undefined) return null;
    out += m;
  }
  return out;
}

/**
 * @example typesetDescriptor({ letter: 'C', above: ['4'], below: ['1'] }) // '⁴C₁'
 */
export function typesetDescriptor(parts: DescriptorParts): string {
  const sup = mapAll(parts.above.join(','), SUP);
  const sub = mapAll(parts.below.join(','), SUB);
  if (sup === null || sub === null) return `${parts.above.join(',')}${parts.letter}${parts.below.join(',')}`;
  return `${sup}${parts.letter}${sub}`;
}
