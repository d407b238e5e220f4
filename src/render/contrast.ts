/**
 * Colour contrast after WCAG 2.1 (W3C Recommendation, 2018): relative luminance of sRGB colours and the
 * contrast ratio (L1 + 0.05) / (L2 + 0.05). Success criterion 1.4.11 (non-text contrast) asks 3:1 for the
 * graphics a reader needs; themes use this to keep their lightest marks above that.
 */

/** sRGB channels 0–1 of `#rgb` or `#rrggbb`. */
export function rgb(colour: string): [number, number, number] {
  const h = colour.replace('#', '');
  const full = h.length === 3 ? [...h].map((c) => c + c).join('') : h;
  return [0, 2, 4].map((i) => parseInt(full.slice(i, i + 2), 16) / 255) as [number, number, number];
}

/** WCAG 2.1 relative luminance of sRGB channels (0–1). */
export function relativeLuminance([r, g, b]: readonly [number, number, number]): number {
  const lin = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
}

/** Contrast ratio of two sRGB colours, 1–21. */
export function contrastRatio(a: readonly [number, number, number], b: readonly [number, number, number]): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

/** `colour` painted at `opacity` over `paper` (both `#rrggbb`), as sRGB channels. */
export function over(colour: string, opacity: number, paper: string): [number, number, number] {
  const c = rgb(colour), p = rgb(paper);
  return [0, 1, 2].map((i) => opacity * c[i]! + (1 - opacity) * p[i]!) as [number, number, number];
}

/** Smallest opacity (to 0.01) at which `colour` over `paper` reaches `ratio`; 1 when even full colour does not. */
export function minimumOpacity(colour: string, paper: string, ratio = 3): number {
  for (let o = 0.01; o < 1; o += 0.01) {
    const a = Math.round(o * 100) / 100;
    if (contrastRatio(over(colour, a, paper), rgb(paper)) >= ratio) return a;
  }
  return 1;
}
