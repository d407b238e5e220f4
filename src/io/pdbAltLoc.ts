/**
 * Alternate locations, resolved one residue at a time: one letter is chosen per residue (the requested one,
 * else the highest mean occupancy, then the first seen), and for every atom name that has alternates exactly
 * one copy is kept, so a blank-altLoc atom never stands beside its own alternate. Common practice, no source.
 */

/** An atom waiting for its residue to be complete. */
export interface PendingAtom<T> {
  readonly name: string;
  /** `''` when blank. */
  readonly altLoc: string;
  readonly occupancy: number;
  readonly payload: T;
}

/** What `--altloc` accepts besides a single letter or digit. */
export const HIGHEST_OCCUPANCY = 'highest-occupancy';

/** Checks an `altLoc` choice: `highest-occupancy` or one letter/digit. Returns an error message or null. */
export function altLocChoiceError(choice: string): string | null {
  return choice === HIGHEST_OCCUPANCY || /^[A-Za-z0-9]$/.test(choice) ? null : `altLoc expects a letter such as A or ${HIGHEST_OCCUPANCY}, got "${choice}"`;
}

/**
 * The atoms of one residue to keep, in file order, and the dropped ones.
 * @example keepAltLocs([N(''), CB('A', 0.6), CB('B', 0.4)], 'highest-occupancy').kept // N, CB A
 */
export function keepAltLocs<T>(atoms: readonly PendingAtom<T>[], choice: string): { kept: PendingAtom<T>[]; dropped: PendingAtom<T>[]; letter: string } {
  const letters: string[] = [];
  const occupancy = new Map<string, { sum: number; count: number }>();
  for (const a of atoms) {
    if (a.altLoc === '') continue;
    let o = occupancy.get(a.altLoc);
    if (o === undefined) {
      o = { sum: 0, count: 0 };
      occupancy.set(a.altLoc, o);
      letters.push(a.altLoc);
    }
    o.sum += a.occupancy;
    o.count++;
  }
  if (letters.length === 0) return { kept: atoms.slice(), dropped: [], letter: '' };
  let letter = letters.find((l) => l === choice) ?? letters.find((l) => l.toUpperCase() === choice.toUpperCase());
  if (letter === undefined) {
    letter = letters[0]!;
    let best = -Infinity;
    for (const l of letters) {
      const o = occupancy.get(l)!;
      const mean = o.sum / o.count;
      if (mean > best + 1e-9) [best, letter] = [mean, l];
    }
  }
  // per atom name with alternates: the chosen letter's copy, else the blank one, else the highest occupancy
  const byName = new Map<string, PendingAtom<T>[]>();
  for (const a of atoms) {
    const list = byName.get(a.name);
    if (list) list.push(a);
    else byName.set(a.name, [a]);
  }
  const keep = new Set<PendingAtom<T>>();
  for (const copies of byName.values()) {
    if (copies.every((c) => c.altLoc === '')) {
      copies.forEach((c) => keep.add(c));
      continue;
    }
    const pick =
      copies.find((c) => c.altLoc === letter) ??
      copies.find((c) => c.altLoc === '') ??
      copies.reduce((x, y) => (y.occupancy > x.occupancy + 1e-9 ? y : x));
    keep.add(pick);
  }
  const kept: PendingAtom<T>[] = [];
  const dropped: PendingAtom<T>[] = [];
  for (const a of atoms) (keep.has(a) ? kept : dropped).push(a);
  return { kept, dropped, letter };
}
