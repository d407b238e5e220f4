/**
 * Reads conformark's own SVG back into Scenes (one per `<svg>`, nested panels of a sheet separately), so the
 * legibility check can run over committed figures exactly as drawn. Lines, circles and texts (with `<tspan>`
 * runs) are read; paths are skipped.
 */
import type { Scene, SceneItem, TextRun } from '../../src/layout/scene.js';

const attr = (tag: string, name: string): string | undefined => new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1];
const num = (tag: string, name: string) => Number(attr(tag, name) ?? 0);
const unescape = (t: string) => t.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');

interface Open {
  kind: string;
  width: number;
  height: number;
  items: SceneItem[];
}

/** Every `<svg>` of the document as a Scene, outermost first. */
export function scenesFromSvg(svg: string): Scene[] {
  const done: Scene[] = [];
  const stack: Open[] = [];
  const re = /<(\/?)(svg|line|circle|text)\b([^>]*)>/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(svg))) {
    const [, close, name, rest] = m as unknown as [string, string, string, string];
    const tag = ` ${rest}`;
    const top = stack[stack.length - 1];
    if (name === 'svg') {
      if (close) {
        const s = stack.pop()!;
        done.push({ kind: s.kind, width: s.width, height: s.height, title: '', desc: '', items: s.items });
      } else stack.push({ kind: (attr(tag, 'class') ?? '').split(' ').find((c) => c !== 'conformark' && c !== 'panel') ?? '', width: num(tag, 'width'), height: num(tag, 'height'), items: [] });
      continue;
    }
    if (close || !top) continue;
    const role = attr(tag, 'class') ?? '';
    const atoms = attr(tag, 'data-atoms')?.split(' ').map((a) => Number(a) - 1);
    const atomText = attr(tag, 'data-atom');
    const atom = atomText === undefined ? undefined : Number(atomText) - 1;
    if (name === 'line') {
      top.items.push({ type: 'line', role, x1: num(tag, 'x1'), y1: num(tag, 'y1'), x2: num(tag, 'x2'), y2: num(tag, 'y2'), ...(atoms ? { atoms } : {}) });
    } else if (name === 'circle') {
      top.items.push({ type: 'circle', role, cx: num(tag, 'cx'), cy: num(tag, 'cy'), r: num(tag, 'r'), ...(atom === undefined ? {} : { atom }) });
    } else {
      const end = svg.indexOf('</text>', re.lastIndex);
      const body = svg.slice(re.lastIndex, end);
      re.lastIndex = end + 7;
      const runs: TextRun[] = [];
      for (const part of body.matchAll(/<tspan\b([^>]*)>([^<]*)<\/tspan>|([^<]+)/g)) {
        if (part[3] !== undefined) runs.push({ text: unescape(part[3]) });
        else runs.push({ text: unescape(part[2]!), shift: Number(attr(` ${part[1]}`, 'baseline-shift')) < 0 ? 'sub' : 'sup' });
      }
      const text = runs.map((r) => r.text).join('');
      top.items.push({
        type: 'text', role, x: num(tag, 'x'), y: num(tag, 'y'), text, anchor: (attr(tag, 'text-anchor') ?? 'start') as 'start',
        fontSize: num(tag, 'font-size'), fontWeight: attr(tag, 'font-weight') === 'bold' ? 'bold' : 'normal',
        ...(runs.some((r) => r.shift) ? { runs } : {}), ...(atom === undefined ? {} : { atom }), ...(atoms ? { atoms } : {}),
      });
    }
  }
  return done.reverse();
}
