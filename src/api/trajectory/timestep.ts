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
