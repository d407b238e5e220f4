/**
 * Scene + theme → semantic SVG text with svg.js on svgdom (DESIGN.md "Figures"): every primitive carries its
 * role as `class`, bonds carry `data-atoms="i j"` (1-based, start atom first), labels `data-atom`; ids come
 * from the figure's own prefix; numbers are rounded here, once. No scripts, event attributes or external
 * references can arise: every attribute value is a number, an escaped string or a validated theme value.
 */
import type { Scene, SceneItem } from '../layout/scene.js';
import { usageError } from '../model/errors.js';
import type { Primitive, RoleStyle, Theme } from './theme.js';
import { loadTheme } from './themes.js';
import { sharedCanvas } from './svgWindow.js';
import { MAX_LABEL_LENGTH, safeText } from '../layout/safeText.js';

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
  if (style.strokeWidth !== undefined && kind !== 'text') a['stroke-width'] = round(style.strokeWidth);
  if (style.strokeDasharray?.length) a['stroke-dasharray'] = style.strokeDasharray.map(round).join(' ');
  if (style.strokeLinecap !== undefined && kind !== 'text') a['stroke-linecap'] = style.strokeLinecap;
  if (style.fill !== undefined) a.fill = style.fill;
  else if (kind !== 'text') a.fill = 'none';
  if (style.opacity !== undefined && style.opacity !== 1) a.opacity = round(style.opacity);
  if (kind === 'text') a['font-family'] = theme.fontFamily === 'sans-serif' ? 'sans-serif' : `${theme.fontFamily}, sans-serif`;
  return a;
}

const ids = (atoms: readonly number[] | undefined) => (atoms?.length ? { 'data-atoms': atoms.map((i) => i + 1).join(' ') } : {});

/**
 * Serialises a Scene with a theme (a Theme, a built-in name or a path; default `column`).
 * Same scene, theme and options → the same bytes.
 * @example renderSvg(layoutNewman(view, mol), 'projector', { idPrefix: 'fig2-' })
 */
export function renderSvg(scene: Scene, theme: Theme | string = 'column', options: RenderSvgOptions = {}): string {
  const t = loadTheme(theme);
  const prefix = options.idPrefix ?? `${scene.kind}-`;
  if (!ID_PREFIX.test(prefix)) throw usageError('bad-id-prefix', `id prefix "${prefix}" must start with a letter or _ and use only letters, digits, _ and -`);
  const round = roundTo(options.digits ?? 2);
  const canvas = sharedCanvas();
  canvas.clear();
  const root = canvas.node;
  for (const name of Array.from(root.attributes, (a) => a.name)) if (name !== 'xmlns') root.removeAttribute(name);
  const w = round(scene.width);
  const h = round(scene.height);
  canvas.attr({
    width: `${w}${t.unit}`, height: `${h}${t.unit}`, viewBox: `0 0 ${w} ${h}`,
    class: `conformark ${scene.kind} theme-${t.name}`, role: 'img', 'aria-labelledby': `${prefix}title ${prefix}desc`,
  });
  // last line of defence for text from files: no XML-invalid or direction-changing characters, bounded length
  canvas.element('title').attr({ id: `${prefix}title` }).words(safeText(scene.title, MAX_DESCRIPTION_LENGTH).text);
  canvas.element('desc').attr({ id: `${prefix}desc` }).words(safeText(scene.desc, MAX_DESCRIPTION_LENGTH).text);
  if (t.background !== 'none') canvas.rect(w, h).attr({ class: 'background', x: 0, y: 0, fill: t.background });
  for (const item of scene.items) drawItem(canvas, item, t, round);
  return canvas.svg((node: { attr(name: string, value: null): unknown }) => {
    node.attr('data-svgjs', null);
  });
}

function drawItem(canvas: ReturnType<typeof sharedCanvas>, item: SceneItem, theme: Theme, round: (x: number) => number): void {
  const style = { ...theme.defaults[item.type], ...theme.roles[item.role] };
  const attrs = styleAttrs(style, item.type, theme, round);
  switch (item.type) {
    case 'line':
      canvas.line(round(item.x1), round(item.y1), round(item.x2), round(item.y2)).attr({ class: item.role, ...ids(item.atoms), ...attrs });
      break;
    case 'path':
      canvas.path(item.d).attr({ class: item.role, ...ids(item.atoms), ...attrs });
      break;
    case 'circle':
      canvas.circle(round(2 * item.r)).attr({ cx: round(item.cx), cy: round(item.cy), class: item.role, ...(item.atom === undefined ? {} : { 'data-atom': item.atom + 1 }), ...attrs });
      break;
    case 'text': {
      const weight = item.fontWeight === 'bold' ? { 'font-weight': 'bold' } : {};
      canvas.plain(safeText(item.text, MAX_LABEL_LENGTH).text).attr({
        x: round(item.x), y: round(item.y), 'text-anchor': item.anchor, class: item.role,
        ...(item.atom === undefined ? {} : { 'data-atom': item.atom + 1 }), ...ids(item.atoms),
        ...attrs, 'font-size': round(item.fontSize), ...weight,
      });
      break;
    }
  }
}
