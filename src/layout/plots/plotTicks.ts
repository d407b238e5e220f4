/** Axis ticks for plots: round steps (1, 2, 5 × 10^k) and short labels without float noise. */

/**
 * About `count` round tick values covering [lo, hi] (inclusive ends when they fall on a step).
 * @example niceTicks(0, 1000, 5) // [0, 200, 400, 600, 800, 1000]
 */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  const step = (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * mag;
  const out: number[] = [];
  for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + step * 1e-9; k++) out.push(k * step);
  return out;
}

/**
 * Short label of a tick value: integers plainly, otherwise up to 4 significant digits; large values with
 * k / M suffixes (12k, 1.5M).
 * @example formatTick(1500000) // '1.5M'
 */
export function formatTick(v: number): string {
  const a = Math.abs(v);
  if (a >= 1e6) return `${trim(v / 1e6)}M`;
  if (a >= 1e4) return `${trim(v / 1e3)}k`;
  return trim(v);
}

function trim(v: number): string {
  const s = Number(v.toPrecision(4)).toString();
  return s === '-0' ? '0' : s.replace('-', '−');
}

/**
 * One label style for a whole axis: k or M suffixes for every tick when the largest needs one, so an axis
 * never mixes 8000 with 10k.
 * @example tickFormatter([0, 5000, 10000])(5000) // '5k'
 */
export function tickFormatter(ticks: readonly number[]): (v: number) => string {
  const top = Math.max(0, ...ticks.map(Math.abs));
  if (top >= 1e6) return (v) => (v === 0 ? '0' : `${trim(v / 1e6)}M`);
  if (top >= 1e4) return (v) => (v === 0 ? '0' : `${trim(v / 1e3)}k`);
  return trim;
}
