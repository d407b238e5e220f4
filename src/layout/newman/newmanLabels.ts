/** Label texts and candidate positions for Newman figures. */
import type { Box } from '../text/labelPlacement.js';
import { reachToEdge } from '../text/labelPlacement.js';
import { boxAt, type TextBox } from '../text/textBox.js';

const RAD = Math.PI / 180;

const TURNS = [0, 6, -6, 12, -12, 18, -18];
const PUSHES = 31;

/**
 * Preference order of the candidates as [push step k, turn index]: cost k + |turn| / 4, ties in generation
 * order (k outer, turns inner). Fixed, so it is sorted once instead of once per label.
 */
const ORDER: readonly (readonly [number, number])[] = Array.from({ length: PUSHES * TURNS.length }, (_, n) => [Math.floor(n / TURNS.length), n % TURNS.length] as const)
  .map((kt) => ({ kt, cost: kt[0] + Math.abs(TURNS[kt[1]]!) / 4 }))
  .sort((p, q) => p.cost - q.cost)
  .map((s) => s.kt);

/**
 * Candidate label boxes beyond radius `from` along azimuth `azDeg` (about cx, cy), best first and made on
 * demand: straight out just past the end, then turned by up to ±18° and pushed outward step by step.
 */
export function* rayCandidates(cx: number, cy: number, azDeg: number, from: number, t: TextBox, step: number): Generator<Box, void, undefined> {
  const dirs: ({ ux: number; uy: number; reach: number } | undefined)[] = [];
  for (const [k, turn] of ORDER) {
    let dir = dirs[turn];
    if (!dir) {
      const a = (azDeg + TURNS[turn]!) * RAD;
      const ux = Math.sin(a);
      const uy = -Math.cos(a);
      dir = dirs[turn] = { ux, uy, reach: reachToEdge(t.width / 2, t.height / 2, ux, uy) };
    }
    const d = from + dir.reach + k * step;
    yield boxAt(cx + d * dir.ux, cy + d * dir.uy, t);
  }
}
