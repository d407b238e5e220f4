/**
 * The few rules by which svg.js (3.2.8) on svgdom (0.1.24) turns attribute values and text into SVG bytes,
 * written out so renderSvg can emit the same bytes by string concatenation (see renderSvg.ts for why).
 * test/render/renderSvgDirect.test.ts checks these rules against svg.js itself.
 */

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

/** svg.js's test for a colour string: 3- or 6-digit hex, or anything starting `rgb(`. */
const isColour = (value: string): boolean => /^#[a-f0-9]{3}$|^#[a-f0-9]{6}$/i.test(value) || value.startsWith('rgb(');

/**
 * svg.js's Color text for such a string: lower-case `#rrggbb` (3-digit hex doubled; `rgb(r,g,b)` with integer
 * channels, whitespace ignored, rounded and clamped to 0–255). svg.js throws on any other `rgb(` text; so do we.
 */
export function colourText(value: string): string {
  let channels: number[];
  if (value.startsWith('rgb(')) {
    const m = /rgb\((\d+),(\d+),(\d+)\)/.exec(value.replace(/\s/g, ''));
    if (!m) throw new Error(`Unsupported string format, can't construct Color: ${value}`);
    channels = [m[1]!, m[2]!, m[3]!].map((v) => parseInt(v, 10));
  } else {
    const six = value.length === 4 ? `#${value[1]}${value[1]}${value[2]}${value[2]}${value[3]}${value[3]}` : value;
    channels = [1, 3, 5].map((k) => parseInt(six.slice(k, k + 2), 16));
  }
  return `#${channels.map((c) => Math.max(0, Math.min(255, Math.round(c))).toString(16).padStart(2, '0')).join('')}`;
}

/** The text svg.js writes for `attr(name, value)`, before escaping. */
export function attrValue(name: string, value: string | number): string {
  if (typeof value === 'number') return svgNumber(value);
  return COLOUR_ATTRIBUTES.has(name) && isColour(value) ? colourText(value) : value;
}

/** Attribute list as svgdom serialises it: ` name="value"` per entry, in insertion order. */
export function attrText(attrs: Readonly<Record<string, string | number>>): string {
  let out = '';
  for (const name in attrs) out += ` ${name}="${escapeXml(attrValue(name, attrs[name]!))}"`;
  return out;
}
