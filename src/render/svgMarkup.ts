/**
 * The few rules by which svg.js (3.2.8) on svgdom (0.1.24) turns attribute values and text into SVG bytes,
 * written out so renderSvg can emit the same bytes by string concatenation (see renderSvg.ts for why).
 * test/render/renderSvgDirect.test.ts checks these rules against svg.js itself.
 */
import { Color } from '@svgdotjs/svg.js';

/** svgdom's escaping of attribute values and text content: `& < > "` only. */
export function escapeXml(text: string): string {
  return /[&<>"]/.test(text) ? text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;') : text;
}

/** svg.js's SVGNumber value of a number: NaN becomes 0, ±Infinity ±3.4e38. */
export function svgValue(x: number): number {
  if (Number.isNaN(x)) return 0;
  return Number.isFinite(x) ? x : x < 0 ? -34e37 : 34e37;
}

/** svg.js's SVGNumber text of a unitless number. */
export const svgNumber = (x: number): string => String(svgValue(x));

/** Attributes whose string values svg.js parses as colours (hex and rgb() come out as lower-case #rrggbb). */
const COLOUR_ATTRIBUTES = new Set(['fill', 'stroke', 'color', 'bgcolor', 'stop-color', 'flood-color', 'lighting-color']);

// svg.js's own test (hex or rgb()), present at run time but missing from its type declarations
const isColour = (value: string): boolean => (Color as unknown as { test(v: string): boolean }).test(value);

/** The text svg.js writes for `attr(name, value)`, before escaping. */
export function attrValue(name: string, value: string | number): string {
  if (typeof value === 'number') return svgNumber(value);
  return COLOUR_ATTRIBUTES.has(name) && isColour(value) ? new Color(value).toString() : value;
}

/** Attribute list as svgdom serialises it: ` name="value"` per entry, in insertion order. */
export function attrText(attrs: Readonly<Record<string, string | number>>): string {
  let out = '';
  for (const name in attrs) out += ` ${name}="${escapeXml(attrValue(name, attrs[name]!))}"`;
  return out;
}
