/**
 * Element tokens as files write them → normalised symbols: `C`, `cl`, `CL` → `Cl`; atomic numbers (`6`) as some
 * XYZ writers use; labels with a numeric suffix (`C12`, `H3a` is not accepted). Cached, since a trajectory asks
 * for the same few tokens millions of times.
 */
import { elementByNumber, elementInfo } from '../model/elements.js';

const cache = new Map<string, string | null>();

/** The element symbol for a file token, or `null` when the token names no element. */
export function elementSymbol(token: string): string | null {
  const hit = cache.get(token);
  if (hit !== undefined) return hit;
  const symbol = lookup(token);
  if (cache.size < 10_000) cache.set(token, symbol);
  return symbol;
}

function lookup(token: string): string | null {
  if (/^\d{1,3}$/.test(token)) return elementByNumber(Number(token))?.symbol ?? null;
  const m = /^([A-Za-z]{1,2})\d*$/.exec(token);
  if (!m) return null;
  const letters = m[1]!;
  const direct = elementInfo(letters)?.symbol;
  if (direct) return direct;
  return null;
}

/** True when the token carries a label beyond the element (`C12`), so it is worth keeping as a name. */
export function isLabel(token: string): boolean {
  return /^[A-Za-z]{1,2}\d+$/.test(token);
}
