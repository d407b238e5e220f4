/**
 * Reference: the svg.js-on-svgdom renderer renderSvg used before it built strings directly (kept verbatim as
 * the oracle for test/render/renderSvgDirect.test.ts). Serialises a Scene through svg.js nodes.
 */
import type { Scene, SceneItem } from '../../src/layout/scene.js';
import type { Primitive, RoleStyle, Theme } from '../../src/render/theme.js';
import { loadTheme } from '../../src/render/themes.js';
import { sharedCanvas } from '../../src/render/svgDocument.js';
import { MAX_LABEL_LENGTH, safeText } from '../../src/layout/text/safeText.js';

const roundTo = (digits: number) => (x: number): number => {
  const f = 10 ** digits;
  const r = Math.round(x * f) / f;
  return Object.is(r, -0) ? 0 : r;
};

type Attrs = Record<string, string | number>;

function styleAttrs(style: RoleStyle, kind: Primitive, theme: Theme, round: (x: number) => number): Attrs {
  const a: Attrs = {};
  if (style.stroke !== undefined) a.stroke = style.stroke;
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

const ids = (atoms: readonly number[] | undefined) => (atoms?.length ? { 'data-atoms': atoms.map((i) => i + 1).join(' ') } : {});

/** The Scene as svg.js 3.2.8 on svgdom 0.1.24 writes it (no id-prefix check). */
export function svgjsRenderSvg(scene: Scene, theme: Theme | string = 'column', options: { idPrefix?: string; digits?: number } = {}): string {
  const t = loadTheme(theme);
  const prefix = options.idPrefix ?? `${scene.kind}-`;
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
  canvas.element('title').attr({ id: `${prefix}title` }).words(safeText(scene.title, 2000).text);
  canvas.element('desc').attr({ id: `${prefix}desc` }).words(safeText(scene.desc, 2000).text);
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
