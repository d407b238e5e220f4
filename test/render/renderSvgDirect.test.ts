import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Scene, SceneItem } from '../../src/layout/scene.js';
import { Color, PathArray } from '@svgdotjs/svg.js';
import { EMPTY_PATH, renderSvg } from '../../src/render/renderSvg.js';
import { attrValue, colourText, escapeXml, svgNumber } from '../../src/render/svgMarkup.js';
import { parseTheme, type Theme } from '../../src/render/theme.js';
import { loadTheme, THEMES } from '../../src/render/themes.js';
import { svgjsRenderSvg } from '../helpers/svgjsRenderSvg.js';

// A theme with what the built-in ones lack: upper-case and 3-digit hex, a background, opacity, dashes, sans-serif.
const odd: Theme = parseTheme({
  ...loadTheme('column'), name: 'odd', fontFamily: 'sans-serif', background: '#AbC',
  roles: { ...loadTheme('column').roles, 'odd-role': { stroke: '#F0A', fill: '#12AB9F', opacity: 0.333, strokeDasharray: [1.234, 0.005], fontWeight: 'bold' } },
}, 'odd.json');
const themes = [...[...THEMES.keys()].map((n) => loadTheme(n)), odd];

const num = fc.oneof(
  fc.double({ min: -1e4, max: 1e4, noNaN: true }),
  fc.constantFrom(0, -0, 0.005, -0.005, 0.015, 1e-7, -1e-7, 123.455, 1e21, -1e21, Infinity, NaN),
);
const text = fc.oneof(fc.string({ unit: 'binary', maxLength: 12 }), fc.constantFrom('', 'a & b < c > "d"', "it's", '³J(H7,H12) −176°'));
const role = fc.oneof(fc.constantFrom('back-bond', 'front-bond', 'atom-label', 'caption', 'torsion-arc', 'odd-role', 'background'), fc.stringMatching(/^[a-z][a-z0-9-]{0,8}$/));
const atoms = fc.option(fc.array(fc.nat(300), { maxLength: 4 }), { nil: undefined });
const atom = fc.option(fc.nat(300), { nil: undefined });
const item: fc.Arbitrary<SceneItem> = fc.oneof(
  fc.record({ type: fc.constant('line' as const), role, x1: num, y1: num, x2: num, y2: num, atoms }, { requiredKeys: ['type', 'role', 'x1', 'y1', 'x2', 'y2'] }),
  fc.record({ type: fc.constant('path' as const), role, d: fc.oneof(text, fc.constant('M61.01,31.6A10.4,10.4,0,1,1,61.01,52.4')), atoms }, { requiredKeys: ['type', 'role', 'd'] }),
  fc.record({ type: fc.constant('circle' as const), role, cx: num, cy: num, r: num, atom }, { requiredKeys: ['type', 'role', 'cx', 'cy', 'r'] }),
  fc.record({
    type: fc.constant('text' as const), role, x: num, y: num, text, anchor: fc.constantFrom('start' as const, 'middle' as const, 'end' as const),
    fontSize: num, fontWeight: fc.constantFrom('normal' as const, 'bold' as const), atom, atoms,
  }, { requiredKeys: ['type', 'role', 'x', 'y', 'text', 'anchor', 'fontSize', 'fontWeight'] }),
);
const scene: fc.Arbitrary<Scene> = fc.record({
  kind: fc.constantFrom('newman', 'chair', 'plot'), width: num, height: num, title: text, desc: text, items: fc.array(item, { maxLength: 8 }),
});

describe('renderSvg writes the bytes svg.js on svgdom writes', () => {
  it('renderSvg(scene, theme, options) equals the svg.js renderer for random scenes (fast-check, seed 20250)', () => {
    fc.assert(
      fc.property(scene, fc.constantFrom(...themes), fc.integer({ min: 0, max: 4 }), fc.stringMatching(/^[a-z_][a-z0-9_-]{0,6}$/), (s, theme, digits, idPrefix) => {
        expect(renderSvg(s, theme, { digits, idPrefix })).toBe(svgjsRenderSvg(s, theme, { digits, idPrefix }));
      }),
      { seed: 20250, numRuns: 300 },
    );
  });

  it('renderSvg of an empty scene in every theme equals the svg.js renderer', () => {
    for (const theme of themes) {
      const s: Scene = { kind: 'newman', width: 10, height: 20, title: '', desc: '', items: [] };
      expect(renderSvg(s, theme)).toBe(svgjsRenderSvg(s, theme));
    }
  });
});

describe('svgMarkup rules', () => {
  it('escapeXml escapes & < > " and nothing else, as svgdom does', () => {
    expect(escapeXml(`a&b<c>d"e'f`)).toBe(`a&amp;b&lt;c&gt;d&quot;e'f`);
    expect(escapeXml('plain')).toBe('plain');
  });

  it('svgNumber writes NaN as 0 and infinities as ±3.4e+38, other numbers as JavaScript does', () => {
    expect([NaN, Infinity, -Infinity, 1.5, 1e21, -0].map(svgNumber)).toEqual(['0', '3.4e+38', '-3.4e+38', '1.5', '1e+21', '0']);
  });

  it('attrValue lower-cases and expands hex colours in colour attributes only', () => {
    expect(attrValue('fill', '#AbC')).toBe('#aabbcc');
    expect(attrValue('stroke', 'currentColor')).toBe('currentColor');
    expect(attrValue('class', '#AbC')).toBe('#AbC');
  });
});

describe('svgMarkup rules against svg.js itself', () => {
  it('colourText writes what svg.js Color writes for hex and rgb() colours', () => {
    const hex = fc.stringMatching(/^#([0-9a-fA-F]{3}|[0-9a-fA-F]{6})$/);
    const rgb = fc.tuple(fc.nat(400), fc.nat(400), fc.nat(400), fc.constantFrom('', ' ')).map(([r, g, b, s]) => `rgb(${r},${s}${g},${b}${s})`);
    fc.assert(fc.property(fc.oneof(hex, rgb), (value) => colourText(value) === new Color(value).toString()), { seed: 22, numRuns: 500 });
  });

  it('EMPTY_PATH is the text of an empty svg.js PathArray', () => {
    expect(EMPTY_PATH).toBe(new PathArray().toString());
  });
});
