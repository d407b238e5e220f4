/**
 * Placing a substituent label at its bond end so it reads as bonded there: the bonded atom's symbol (the
 * label's anchor, `C` of `CH₂OH` or of `HOH₂C`) is centred on the bond's continuation just past the end (Brecher
 * 2008, Pure Appl. Chem. 80, 277: the bond points at the attached atom's symbol), and a position is taken only
 * when the label is nearer its own bond end than any other bond end and within reach of it; other positions are
 * tried turning away from the bond and stepping outward.
 */
import { grow, isFree, type Box, type Obstacles } from './labelPlacement.js';
import type { TextBox } from './textBox.js';

/** A point on the page. */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** How a label sits on its bond: its box, the anchor glyph's width, and which end of the text the anchor is at. */
export interface AnchoredText {
  readonly box: TextBox;
  readonly anchorWidth: number;
  /** True when the anchor ends the text (label reads toward the bond). */
  readonly reversed: boolean;
}

const RAD = Math.PI / 180;

const reach = (hw: number, hh: number, ux: number, uy: number) =>
  Math.min(Math.abs(ux) < 1e-12 ? Infinity : hw / Math.abs(ux), Math.abs(uy) < 1e-12 ? Infinity : hh / Math.abs(uy));

/**
 * Candidate boxes, best first: anchor centred on the bond direction `azDeg` (clockwise from 12 o'clock) at
 * `gap` past `end`, then turned by up to `maxDevDeg` in 15° steps, then pushed out by `step`.
 */
export function bondLabelCandidates(end: Point, azDeg: number, gap: number, label: AnchoredText, step: number, maxDevDeg = 45, pushes = 16): Box[] {
  const { box: t, anchorWidth: wA, reversed } = label;
  const scored: { cost: number; box: Box }[] = [];
  for (let r = 0; r <= pushes; r++) {
    for (let dev = 0; dev <= maxDevDeg; dev += 15) {
      for (const sign of dev === 0 || dev === 180 ? [1] : [1, -1]) {
        const a = (azDeg + sign * dev) * RAD;
        const [ux, uy] = [Math.sin(a), -Math.cos(a)];
        const d = gap + reach(wA / 2, t.height / 2, ux, uy) + r * step * 0.6;
        const [px, py] = [end.x + d * ux, end.y + d * uy];
        const x0 = reversed ? px + wA / 2 - t.width : px - wA / 2;
        scored.push({ cost: r + dev / 25, box: { x0, y0: py - t.height / 2, x1: x0 + t.width, y1: py + t.height / 2 } });
      }
    }
  }
  return scored.sort((p, q) => p.cost - q.cost).map((s) => s.box);
}

/** Distance from a box to a point (0 inside). */
export const boxDistance = (b: Box, p: Point): number => Math.hypot(Math.max(b.x0 - p.x, 0, p.x - b.x1), Math.max(b.y0 - p.y, 0, p.y - b.y1));

/** The chosen box, and whether it met every rule (free, nearest its own end, within `maxGap`). */
export interface PickedLabel {
  readonly box: Box;
  readonly clean: boolean;
  /** How far the box misses the two distance rules (0 when clean; Infinity when no candidate was free). */
  readonly miss: number;
}

/**
 * The first candidate free of the obstacles (grown by `clearance`) that is nearer `own` than every point of
 * `others` and within `maxGap` of `own`; failing that the free one that misses these two rules by the least;
 * failing that the last candidate.
 */
export function pickBondLabel(candidates: readonly Box[], obstacles: Obstacles, clearance: number, own: Point, others: readonly Point[], maxGap: number): PickedLabel {
  let fallback: { box: Box; miss: number } | undefined;
  for (const b of candidates) {
    if (!isFree(grow(b, clearance), obstacles)) continue;
    const d = boxDistance(b, own);
    const nearestOther = others.reduce((m, p) => Math.min(m, boxDistance(b, p)), Infinity);
    if (d <= maxGap && nearestOther > d) return { box: b, clean: true, miss: 0 };
    const miss = Math.max(0, d - maxGap) + 2 * Math.max(0, d - nearestOther + 0.25);
    if (!fallback || miss < fallback.miss) fallback = { box: b, miss };
  }
  return { box: fallback?.box ?? candidates[candidates.length - 1]!, clean: false, miss: fallback?.miss ?? Infinity };
}
