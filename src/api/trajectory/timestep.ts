/** Time between frames as the user writes it: `2 ps`, `2ps`, `0.5 ns`. */
import { usageError } from '../../model/errors.js';

/** Time units accepted for a timestep. */
export const TIME_UNITS = ['fs', 'ps', 'ns', 'us', 'µs', 'ms', 's'] as const;
export type TimeUnit = (typeof TIME_UNITS)[number];

/** A timestep: value > 0 in `unit`. */
export interface Timestep {
  readonly value: number;
  readonly unit: TimeUnit;
}

/**
 * Parses `"2 ps"` or `"2ps"` (value > 0, unit fs, ps, ns, us/µs, ms or s).
 * @example parseTimestep('2 ps') // { value: 2, unit: 'ps' }
 */
export function parseTimestep(text: string): Timestep {
  const m = /^\s*([0-9]*\.?[0-9]+(?:[eE][-+]?[0-9]+)?)\s*([a-zµ]+)\s*$/.exec(text);
  const value = m ? Number(m[1]) : NaN;
  const unit = m?.[2] as TimeUnit | undefined;
  if (!m || !(value > 0) || !Number.isFinite(value) || !unit || !(TIME_UNITS as readonly string[]).includes(unit)) {
    throw usageError('bad-option', `--timestep expects a positive value and a unit (${TIME_UNITS.join(', ')}), e.g. "2 ps" or 2ps; got "${text}"`);
  }
  return { value, unit };
}

/** Seconds per unit. */
const SECONDS: Readonly<Record<TimeUnit, number>> = { fs: 1e-15, ps: 1e-12, ns: 1e-9, us: 1e-6, µs: 1e-6, ms: 1e-3, s: 1 };

/**
 * `value` in unit `from`, expressed in unit `to`.
 * @example convertTime(1, 'ns', 'ps') // 1000
 */
export function convertTime(value: number, from: TimeUnit, to: TimeUnit): number {
  return +((value * SECONDS[from]) / SECONDS[to]).toPrecision(12);
}

/**
 * Parses the time of frame 1, `"0"` or a value ≥ 0 with a unit (`"10 ns"`), for `--start-time`.
 * @example parseStartTime('10 ns') // { value: 10, unit: 'ns' }
 */
export function parseStartTime(text: string): Timestep {
  if (/^\s*0+(\.0*)?\s*$/.test(text)) return { value: 0, unit: 'ps' };
  const m = /^\s*([0-9]*\.?[0-9]+(?:[eE][-+]?[0-9]+)?)\s*([a-zµ]+)\s*$/.exec(text);
  const unit = m?.[2] as TimeUnit | undefined;
  if (!m || !Number.isFinite(Number(m[1])) || !unit || !(TIME_UNITS as readonly string[]).includes(unit)) {
    throw usageError('bad-option', `--start-time expects a value ≥ 0 and a unit (${TIME_UNITS.join(', ')}), e.g. "10 ns"; got "${text}"`);
  }
  return { value: Number(m[1]), unit };
}
