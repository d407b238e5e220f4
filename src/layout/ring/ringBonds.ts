/**
 * Bond lines of a ring figure and the gaps where they cross. Each placed bond becomes a line from its start
 * (shortened at a labelled ring heteroatom) to its end; a substituent bond may be drawn shorter than placed
 * (a label shortens its own bond to find room). Drawing order, far to near: ring bonds by depth, then
 * substituent bonds by depth, then bonds flagged `front` (the inner axial bonds of the chair template): where a
 * later line crosses an earlier one, a short `bond-halo` line (styled with the background) is drawn under the
 * later one and opens a gap in the earlier. So a gap always cuts a ring bond behind, never a substituent bond
 * into dashes that would read as a hashed bond [common practice, no source].
 */
import { segmentCrossing } from '../text/labelPlacement.js';
import type { SceneItem, SceneLine } from '../scene.js';

/** One bond before styling, theme units: the line as placed, its vertex, depth and drawing flags. */
export interface BondSpec {
  readonly atoms: readonly [number, number];
  readonly role: string;
  /** Start of the line (the vertex of atoms[0], or past its heteroatom symbol). */
  readonly x1: number;
  readonly y1: number;
  /** End of the line at full length. */
  readonly x2: number;
  readonly y2: number;
  /** Position of atoms[0] (a shortened bond keeps its direction and is measured from here). */
  readonly px: number;
  readonly py: number;
  /** Mean nearness of the two atoms to the viewer. */
  readonly near: number;
  /** Drawn over everything it crosses. */
  readonly front: boolean;
  /** Drawn as two parallel lines (C=O, S=O). */
  readonly double: boolean;
  /** Index in the placement, to keep the order stable. */
  readonly order: number;
}

/** Lines of one bond at `factor` of its placed length from its vertex (1 = as placed). */
export function bondLines(spec: BondSpec, factor: number, lineWidth: number): SceneLine[] {
  const x2 = spec.px + factor * (spec.x2 - spec.px);
  const y2 = spec.py + factor * (spec.y2 - spec.py);
  const line: SceneLine = { type: 'line', role: spec.role, x1: spec.x1, y1: spec.y1, x2, y2, atoms: [spec.atoms[0], spec.atoms[1]] };
  if (!spec.double) return [line];
  const len = Math.hypot(x2 - spec.x1, y2 - spec.y1) || 1;
  const off = Math.max(1, 1.4 * lineWidth);
  const [nx, ny] = [(-(y2 - spec.y1) / len) * off, ((x2 - spec.x1) / len) * off];
  const side = (k: number): SceneLine => ({ ...line, x1: line.x1 + k * nx, y1: line.y1 + k * ny, x2: line.x2 + k * nx, y2: line.y2 + k * ny });
  return [side(1), side(-1)];
}

/** Drawing rank: ring bonds, then substituent bonds, then `front` bonds; far to near within each. */
const rank = (s: BondSpec) => (s.front ? 2 : s.role === 'ring-bond' ? 0 : 1);

/**
 * Scene lines of all bonds in drawing order with a halo under each later line where it crosses an earlier one
 * (bonds sharing an atom never cut each other). `factors` holds the drawn length of shortened bonds by index.
 * @example bondItems(specs, new Map(), 1.5, 0.8)
 */
export function bondItems(specs: readonly BondSpec[], factors: ReadonlyMap<number, number>, gap: number, lineWidth: number): SceneItem[] {
  const sorted = [...specs].sort((a, b) => rank(a) - rank(b) || a.near - b.near || a.order - b.order);
  const lines = sorted.flatMap((s) => bondLines(s, factors.get(s.order) ?? 1, lineWidth));
  const items: SceneItem[] = [];
  // half-length of a halo along the nearer bond: enough to cover the crossing
  const halfGap = 1.5 * gap;
  lines.forEach((d, i) => {
    for (const far of lines.slice(0, i)) {
      if (far.atoms!.some((a) => d.atoms!.includes(a))) continue;
      const t = segmentCrossing(d, far);
      if (t === null) continue;
      const len = Math.hypot(d.x2 - d.x1, d.y2 - d.y1);
      const [t0, t1] = [Math.max(0, t - halfGap / len), Math.min(1, t + halfGap / len)];
      const pt = (s: number) => [d.x1 + s * (d.x2 - d.x1), d.y1 + s * (d.y2 - d.y1)] as const;
      const [[x1, y1], [x2, y2]] = [pt(t0), pt(t1)];
      items.push({ type: 'line', role: 'bond-halo', x1, y1, x2, y2, atoms: d.atoms! });
    }
    items.push(d);
  });
  return items;
}
