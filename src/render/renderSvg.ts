/**
 * Scene + theme → semantic SVG text (README.md "Figures and themes"): every primitive carries its role as `class`, bonds
 * carry `data-atoms="i j"` (1-based, start atom first), labels `data-atom`; ids come from the figure's own
 * prefix; numbers are rounded here, once. No scripts, event attributes or external references can arise:
 * every attribute value is a number, an escaped string or a validated theme value.
 *
 * Why strings and not svg.js here: the markup is the bytes svg.js 3.2.8 on svgdom 0.1.24 produced for the same
 * calls (canvas.line/path/circle/plain + attr, then svg() without `data-svgjs`), but building, cloning and
 * serialising svgdom nodes cost more than half of every figure (batch bench). The rules that svg.js applies
 * (number text, colour normalising, escaping, attribute order) live in svgMarkup.ts; a property test renders
 * random scenes both ways and compares bytes, and the goldens pin them. svg.js on svgdom stays the test
 * reference (svgDocument.ts).
 */
import type { Scene, SceneItem } from '../layout/scene.js';
import { usageError } from '../model/errors.js';
import type { Primitive, RoleStyle, Theme } from './theme.js';
import { loadTheme } from './themes.js';
import { attrText, escapeXml, svgNumber, svgValue } from './svgMarkup.js';
import { MAX_LABEL_LENGTH, safeText } from '../layout/text/safeText.js';
import { runShift, scriptSize } from '../layout/text/textRuns.js';
import type { SceneText } from '../layout/scene.js';

/** Longest `<title>`/`<desc>` written, characters (labels: `MAX_LABEL_LENGTH`). */
const MAX_DESCRIPTION_LENGTH = 2000;

/** Options of {@link renderSvg}. */
export interface RenderSvgOptions {
  /** Prefix of every id in the figure (`<title>`, `<desc>`); keeps ids unique when figures share a page. Default `"<kind>-"`. */
  readonly idPrefix?: string;
  /** Decimal places of coordinates and sizes. Default 2. */
  readonly digits?: number;
}

const ID_PREFIX = /^[A-Za-z_][A-Za-z0-9_-]{0,60}$/;

const roundTo = (digits: number) => (x: number): number => {
  const f = 10 ** digits;
  const r = Math.round(x * f) / f;
  return Object.is(r, -0) ? 0 : r;
};

type Attrs = Record<string, string | number>;

function styleAttrs(style: RoleStyle, kind: Primitive, theme: Theme, round: (x: number) => number): Attrs {
  const a: Attrs = {};
  if (style.stroke !== undefined) a.stroke = style.stroke;
  // text is stroked only where its role asks (a halo behind a label), then with round joins
  const strokedText = kind === 'text' && style.stroke !== undefined && style.stroke !== 'none' && style.strokeWidth !== undefined;
  if (style.strokeWidth !== undefined && (kind !== 'text' || strokedText)) a['stroke-width'] = round(style.strokeWidth);
  if (strokedText) a['stroke-linejoin'] = 'round';
  if (style.strokeDasharray?.length) a['stroke-dasharray'] = style.strokeDasharray.map(round).join(' ');
  if (style.strokeLinecap !== undefined && kind !== 'text') a['stroke-linecap'] = style.strokeLinecap;
  if (style.fill !== undefined) a.fill = style.fill;
  else if (kind !== 'text') a.fill = 'none';
  if (style.opacity !== undefined && style.opacity !== 1) a.opacity = round(style.opacity);
  if (kind === 'text') a['font-family'] = theme.fontFamily === 'sans-serif' ? 'sans-serif' : `${theme.fontFamily}, sans-serif`;
  return a;
}

/** Style attribute text per theme, digits, primitive and role: themes are immutable once validated. */
const styleCache = new WeakMap<Theme, Map<string, string>>();

function styleText(theme: Theme, kind: Primitive, role: string, digits: number, round: (x: number) => number): string {
  let byKey = styleCache.get(theme);
  if (!byKey) styleCache.set(theme, (byKey = new Map()));
  const key = `${digits}\u0000${kind}\u0000${role}`;
  let text = byKey.get(key);
  if (text === undefined) {
    text = attrText(styleAttrs({ ...theme.defaults[kind], ...theme.roles[role] }, kind, theme, round));
    byKey.set(key, text);
  }
  return text;
}

const atomList = (atoms: readonly number[] | undefined) => (atoms?.length ? ` data-atoms="${atoms.map((i) => i + 1).join(' ')}"` : '');
const atomOne = (atom: number | undefined) => (atom === undefined ? '' : ` data-atom="${svgNumber(atom + 1)}"`);

/**
 * Serialises a Scene with a theme (a Theme, a built-in name or a path; default `column`).
 * Same scene, theme and options → the same bytes.
 * @example renderSvg(layoutNewman(view, mol), 'projector', { idPrefix: 'fig2-' })
 */
export function renderSvg(scene: Scene, theme: Theme | string = 'column', options: RenderSvgOptions = {}): string {
  const t = loadTheme(theme);
  const prefix = options.idPrefix ?? `${scene.kind}-`;
  if (!ID_PREFIX.test(prefix)) throw usageError('bad-id-prefix', `id prefix "${prefix}" must start with a letter or _ and use only letters, digits, _ and -`);
  const digits = options.digits ?? 2;
  const round = roundTo(digits);
  const w = round(scene.width);
  const h = round(scene.height);
  let out = `<svg xmlns="http://www.w3.org/2000/svg"${attrText({
    width: `${w}${t.unit}`, height: `${h}${t.unit}`, viewBox: `0 0 ${w} ${h}`,
    class: `conformark ${scene.kind} theme-${t.name}`, role: 'img', 'aria-labelledby': `${prefix}title ${prefix}desc`,
  })} version="1.1" xmlns:xlink="http://www.w3.org/1999/xlink">`;
  // last line of defence for text from files: no XML-invalid or direction-changing characters, bounded length
  const title = safeText(scene.title, MAX_DESCRIPTION_LENGTH).text;
  const desc = safeText(scene.desc, MAX_DESCRIPTION_LENGTH).text;
  out += `<title id="${escapeXml(prefix)}title">${escapeXml(title)}</title><desc id="${escapeXml(prefix)}desc">${escapeXml(desc)}</desc>`;
  if (t.background !== 'none') out += `<rect${attrText({ width: w, height: h, class: 'background', x: 0, y: 0, fill: t.background })}></rect>`;
  for (const item of scene.items) out += itemText(item, styleText(t, item.type, item.role, digits, round), round);
  return `${out}</svg>`;
}

/** svg.js draws an empty `d` as its own empty path array, `M0 0 ` (test/render/renderSvgDirect.test.ts checks). */
export const EMPTY_PATH = 'M0 0 ';

function itemText(item: SceneItem, style: string, round: (x: number) => number): string {
  const role = escapeXml(item.role);
  const n = (x: number) => svgNumber(round(x));
  switch (item.type) {
    case 'line':
      return `<line x1="${n(item.x1)}" y1="${n(item.y1)}" x2="${n(item.x2)}" y2="${n(item.y2)}" class="${role}"${atomList(item.atoms)}${style}></line>`;
    case 'path':
      return `<path d="${escapeXml(item.d || EMPTY_PATH)}" class="${role}"${atomList(item.atoms)}${style}></path>`;
    case 'circle':
      // svg.js circle(size) stores r = size / 2, then cx = cy = r before the given centre replaces them
      return `<circle r="${svgNumber(svgValue(round(2 * item.r)) / 2)}" cx="${n(item.cx)}" cy="${n(item.cy)}" class="${role}"${atomOne(item.atom)}${style}></circle>`;
    case 'text':
      return `<text x="${n(item.x)}" y="${n(item.y)}" text-anchor="${escapeXml(item.anchor)}" class="${role}"${atomOne(item.atom)}${atomList(item.atoms)}${style} font-size="${n(item.fontSize)}"${item.fontWeight === 'bold' ? ' font-weight="bold"' : ''}>${textContent(item, n)}</text>`;
  }
}

/**
 * Text content: plain text, or runs with each sub/superscript in a `<tspan>` with its own `font-size` and a
 * numeric `baseline-shift` (user units, positive up), which resvg (PNG) and svg-to-pdfkit (PDF) both honour.
 */
function textContent(item: SceneText, n: (x: number) => string): string {
  const safe = (t: string) => escapeXml(safeText(t, MAX_LABEL_LENGTH).text);
  if (!item.runs?.some((r) => r.shift)) return safe(item.text);
  return item.runs
    .map((r) => (r.shift ? `<tspan font-size="${n(scriptSize(item.fontSize))}" baseline-shift="${n(runShift(r, item.fontSize))}">${safe(r.text)}</tspan>` : safe(r.text)))
    .join('');
}
