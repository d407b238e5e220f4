/**
 * A {@link Depiction} as inline SVG for the explorer page: ring faces and bonds carry `data-ring` / `data-bond`
 * keys and are focusable, so the page's script can point, hover and click; all text is escaped.
 */
import type { Depiction } from './depiction.js';
import { escapeHtml } from './escapeHtml.js';

/** Gap between the two lines of a double bond, px. */
const DOUBLE_GAP_PX = 4;
/** Drawn size over the coordinates' size (the page shrinks a wide picture to its column). */
const SHOWN_SCALE = 1.5;
/** Distance of an atom's tag from the atom, px. */
const TAG_PX = 15;

const n = (x: number) => String(Math.round(x * 10) / 10);

/**
 * The depiction's SVG element (one `<svg>` with no ids, so several may sit on one page).
 * @example depictionSvg(d).startsWith('<svg')
 */
export function depictionSvg(d: Depiction): string {
  const at = new Map(d.atoms.map((a) => [a.id, a]));
  const neighbours = new Map<number, number[]>(d.atoms.map((a) => [a.id, []]));
  for (const b of d.bonds) {
    neighbours.get(b.a)?.push(b.b);
    neighbours.get(b.b)?.push(b.a);
  }
  const parts: string[] = [];
  parts.push(`<svg xmlns="http://www.w3.org/2000/svg" class="depiction" viewBox="0 0 ${n(d.width)} ${n(d.height)}" width="${n(d.width * SHOWN_SCALE)}" height="${n(d.height * SHOWN_SCALE)}" role="img" aria-label="2D structure: point at a bond or a ring">`);
  for (const r of d.rings) {
    const points = r.atoms.map((id) => at.get(id)).filter((a) => a !== undefined).map((a) => `${n(a.x)},${n(a.y)}`).join(' ');
    parts.push(`<polygon class="ring-hit" data-ring="${escapeHtml(r.key)}" tabindex="0" aria-label="ring of atoms ${escapeHtml(r.key)}" points="${points}"/>`);
  }
  for (const b of d.bonds) {
    const p = at.get(b.a)!;
    const q = at.get(b.b)!;
    const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
    const [ox, oy] = [(-(q.y - p.y) / len) * DOUBLE_GAP_PX, ((q.x - p.x) / len) * DOUBLE_GAP_PX];
    const line = (dx: number, dy: number, cls: string) => `<line class="${cls}" x1="${n(p.x + dx)}" y1="${n(p.y + dy)}" x2="${n(q.x + dx)}" y2="${n(q.y + dy)}"/>`;
    if (b.order === 2) parts.push(line(ox / 2, oy / 2, 'bond'), line(-ox / 2, -oy / 2, 'bond'));
    else if (b.order === 3) parts.push(line(0, 0, 'bond'), line(ox, oy, 'bond'), line(-ox, -oy, 'bond'));
    else parts.push(line(0, 0, b.order === 4 ? 'bond aromatic' : 'bond'));
  }
  const labels: string[] = [];
  for (const a of d.atoms) {
    // the tag goes opposite the mean direction of the atom's bonds
    const ns = (neighbours.get(a.id) ?? []).map((id) => at.get(id)!);
    let [dx, dy] = ns.reduce(([sx, sy], m) => [sx + (a.x - m.x), sy + (a.y - m.y)], [0, 0]);
    const len = Math.hypot(dx, dy);
    [dx, dy] = len > 1e-6 ? [dx / len, dy / len] : ns.length > 0 ? [-(ns[0]!.y - a.y) / Math.hypot(ns[0]!.x - a.x, ns[0]!.y - a.y), (ns[0]!.x - a.x) / Math.hypot(ns[0]!.x - a.x, ns[0]!.y - a.y)] : [0, -1];
    // a labelled atom's tag sits clear of its label (about two characters wide)
    const r = a.label ? TAG_PX + 4 + 3 * Math.abs(dx) * Math.max(0, a.label.length - 1) : TAG_PX;
    const tag = `<text class="tag" x="${n(a.x + dx * r)}" y="${n(a.y + dy * r + 3.5)}">${escapeHtml(a.tag)}</text>`;
    if (a.label) labels.push(`<circle class="label-bg" cx="${n(a.x)}" cy="${n(a.y)}" r="9"/><text class="atom" x="${n(a.x)}" y="${n(a.y + 5)}">${escapeHtml(a.label)}</text>`);
    labels.push(tag);
  }
  for (const b of d.bonds) {
    const p = at.get(b.a)!;
    const q = at.get(b.b)!;
    parts.push(`<line class="bond-hit" data-bond="${escapeHtml(b.key)}" tabindex="0" aria-label="bond ${escapeHtml(b.key)}" x1="${n(p.x)}" y1="${n(p.y)}" x2="${n(q.x)}" y2="${n(q.y)}"/>`);
  }
  // labels over the hit lines, and transparent to the pointer, so a bond can be picked right up to its atoms
  parts.push(...labels, '</svg>');
  return parts.join('');
}
