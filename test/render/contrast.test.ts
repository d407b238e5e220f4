import { describe, expect, it } from 'vitest';
import { loadTheme } from '../../src/render/themes.js';
import { withTrajectoryRoles } from '../../src/api/trajectory/trajectoryTheme.js';
import { contrastRatio, minimumOpacity, over, rgb } from '../../src/render/contrast.js';

/**
 * WCAG 2.1 contrast, written out here independently of src/render/contrast.ts: relative luminance
 * L = 0.2126 R + 0.7152 G + 0.0722 B of linearised sRGB channels (c ≤ 0.03928 ? c/12.92 : ((c+0.055)/1.055)^2.4;
 * WCAG 2.1 quotes 0.03928, sRGB 0.04045, which give the same result for 8-bit colours), and ratio
 * (L1 + 0.05)/(L2 + 0.05). Success criterion 1.4.11 (non-text contrast): at least 3:1 against adjacent colours.
 */
function luminance(hex: string, opacity = 1): number {
  const h = hex.slice(1);
  const full = h.length === 3 ? [...h].map((c) => c + c).join('') : h;
  const lin = [0, 2, 4].map((i) => {
    const c = opacity * (parseInt(full.slice(i, i + 2), 16) / 255) + (1 - opacity); // over white
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * lin[0]! + 0.7152 * lin[1]! + 0.0722 * lin[2]!;
}
const ratio = (hex: string, opacity = 1) => 1.05 / (luminance(hex, opacity) + 0.05);

describe('contrast theme colours (WCAG 2.1 SC 1.4.11)', () => {
  it('the WCAG formula gives the published end points and a known mid value', () => {
    expect(ratio('#000000')).toBeCloseTo(21, 6);
    expect(ratio('#ffffff')).toBeCloseTo(1, 6);
    expect(ratio('#767676')).toBeCloseTo(4.54, 2); // the well-known lightest grey passing 4.5:1 on white (common practice, no source)
    expect(contrastRatio(rgb('#767676'), rgb('#fff'))).toBeCloseTo(ratio('#767676'), 6);
  });

  it('every role colour of `contrast` (figure and trajectory roles) has at least 3:1 on its white background', () => {
    const theme = withTrajectoryRoles(loadTheme('contrast'));
    expect(theme.background).toBe('#ffffff');
    // decoration, named here: grid lines (reading aids, not content) and the shape bands (background tints
    // behind the data; each band's shape is named by the legend swatch, whose colour is the bar colour)
    const decoration = (role: string) => role === 'grid' || role.startsWith('band-');
    const failures: string[] = [];
    const styles = [...Object.entries(theme.defaults), ...Object.entries(theme.roles)];
    for (const [role, style] of styles) {
      if (decoration(role)) continue;
      for (const key of ['stroke', 'fill'] as const) {
        const c = style[key];
        // `none`, and white used as a knock-out halo around marks, draw nothing against the background
        if (c === undefined || c === 'none' || /^#f{3}(f{3})?$/i.test(c)) continue;
        const r = ratio(c, style.opacity ?? 1);
        if (r < 3) failures.push(`${role}.${key} ${c}${style.opacity !== undefined ? ` at ${style.opacity}` : ''}: ${r.toFixed(2)}:1`);
      }
    }
    expect(failures).toEqual([]);
  });

  it('minimumOpacity finds the lightest shade of a colour that still reaches 3:1', () => {
    for (const c of ['#000000', '#0072B2', '#D55E00']) {
      const o = minimumOpacity(c, '#ffffff', 3);
      expect(ratio(c, o)).toBeGreaterThanOrEqual(3);
      expect(ratio(c, o - 0.01)).toBeLessThan(3);
      expect(contrastRatio(over(c, o, '#ffffff'), rgb('#ffffff'))).toBeGreaterThanOrEqual(3);
    }
  });
});
