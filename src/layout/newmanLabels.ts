/** Label texts and candidate positions for Newman figures. */
import type { Molecule } from '../model/molecule.js';
import type { Box } from './labelPlacement.js';
import { reachToEdge } from './labelPlacement.js';
import type { TextMeasure, TextStyle } from './scene.js';

/** What a substituent label shows: element symbol, element + 1-based number (`C3`), or the file's atom name. */
export type NewmanLabels = 'element' | 'id' | 'name';

/** Label text of atom `i` (0-based) in the given mode; `name` falls back to the id when the file has none. */
export function atomLabelText(mol: Molecule, i: number, mode: NewmanLabels): string {
  const atom = mol.atoms[i]!;
  const id = `${atom.element}${i + 1}`;
  if (mode === 'element') return atom.element;
  if (mode === 'name') return atom.name?.trim() || id;
  return id;
}

/** Cap height and descender depth as fractions of the font size (DejaVu Sans: 0.729 em cap height). */
const CAP = 0.73;
const DESCENDER = 0.24;

/** A text box with its baseline offset: box centre (cx, cy) ⇒ baseline y = cy + baseline. */
export interface TextBox {
  readonly width: number;
  readonly height: number;
  readonly baseline: number;
}

/** Ink box of a one-line text: measured width, cap height plus a descender when the text has one. */
export function textBox(text: string, style: TextStyle, measure: TextMeasure): TextBox {
  const down = /[gjpqy(),;]/.test(text) ? DESCENDER : 0.02;
  const height = (CAP + down) * style.fontSize;
  return { width: measure(text, style), height, baseline: height / 2 - down * style.fontSize };
}

export const boxAt = (cx: number, cy: number, t: TextBox): Box => ({ x0: cx - t.width / 2, y0: cy - t.height / 2, x1: cx + t.width / 2, y1: cy + t.height / 2 });

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
