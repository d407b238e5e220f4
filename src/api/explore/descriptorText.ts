/** A ring-form descriptor (`4C1`, `OS2`, `E3`) written with Unicode super- and subscripts for the page: ⁴C₁. */

const SUPER: Record<string, string> = { 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹', O: 'ᴼ', ',': '˒' };
const SUB: Record<string, string> = { 0: '₀', 1: '₁', 2: '₂', 3: '₃', 4: '₄', 5: '₅', 6: '₆', 7: '₇', 8: '₈', 9: '₉', ',': '‚' };

/**
 * The descriptor typeset with Unicode characters, or the plain text when a locant has no such character.
 * @example descriptorText('4C1') // '⁴C₁'
 */
export function descriptorText(plain: string): string {
  const m = /^([0-9a-zO,]*?)([BCEHST])([0-9a-zO,]*)$/.exec(plain);
  if (!m) return plain;
  const above = [...m[1]!].map((c) => SUPER[c]);
  const below = [...m[3]!].map((c) => SUB[c]);
  if ([...above, ...below].some((c) => c === undefined)) return plain;
  return `${above.join('')}${m[2]}${below.join('')}`;
}
