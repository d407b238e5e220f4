/** Drawn azimuths of a Newman figure: the true projected ones, or textbook 120° spacing (docs/methods.md#newman-projection). */
import type { NewmanSubstituent, NewmanView } from '../../analysis/newman.js';
import { wrap180, wrap360 } from '../../geometry/vec3.js';

/** `true`: every bond at its measured azimuth. `ideal`: even spacing, back set turned by the measured torsion. */
export type NewmanAngles = 'true' | 'ideal';

/** Drawn azimuth (degrees clockwise from 12 o'clock) per substituent atom, front and back kept apart. */
export interface DrawnAzimuths {
  readonly front: ReadonlyMap<number, number>;
  readonly back: ReadonlyMap<number, number>;
}

const measured = (subs: readonly NewmanSubstituent[]) =>
  subs.filter((s) => s.azimuthDeg !== null).sort((a, b) => a.azimuthDeg! - b.azimuthDeg! || a.atom - b.atom);

/**
 * Smallest drawn offset of a back bond from a front bond in `true` mode, degrees: a back bond (nearly) eclipsed
 * by a front bond would start on it and vanish behind it, so it is turned to this offset; torsion values stay
 * measured (common practice, no source).
 */
export const TRUE_MIN_OFFSET_DEG = 5;

function opened(back: Map<number, number>, front: readonly number[]): Map<number, number> {
  for (const [atom, az] of back) {
    for (const f of front) {
      const d = wrap180(az - f);
      if (Math.abs(d) < TRUE_MIN_OFFSET_DEG) back.set(atom, wrap360(f + (d < 0 ? -TRUE_MIN_OFFSET_DEG : TRUE_MIN_OFFSET_DEG)));
    }
  }
  return back;
}

/** Evenly spaced azimuths starting at `start`, in the measured clockwise order. */
function spaced(subs: readonly NewmanSubstituent[], first: number, start: number): Map<number, number> {
  const k0 = subs.findIndex((s) => s.atom === first);
  const out = new Map<number, number>();
  subs.forEach((s, k) => out.set(s.atom, wrap360(start + ((k - k0 + subs.length) % subs.length) * (360 / subs.length))));
  return out;
}

/**
 * Azimuths to draw. In `ideal` mode the front bonds sit at 0, 360/n, …; the back set is evenly spaced and
 * turned so the back bond nearest the up bond keeps its measured torsion, and an eclipsed pair is opened
 * to `eclipsedOffsetDeg` so the back bond stays visible. Torsion labels always print measured values.
 */
export function drawnAzimuths(view: NewmanView, angles: NewmanAngles, eclipsedOffsetDeg = 8): DrawnAzimuths {
  const front = measured(view.frontSubstituents);
  const back = measured(view.backSubstituents);
  const trueMap = (subs: NewmanSubstituent[]) => new Map(subs.map((s) => [s.atom, s.azimuthDeg!]));
  if (angles === 'true' || view.up === null || !front.some((s) => s.atom === view.up)) {
    return { front: trueMap(front), back: opened(trueMap(back), front.map((s) => s.azimuthDeg!)) };
  }
  const upAz = view.frontSubstituents.find((s) => s.atom === view.up)!.azimuthDeg!;
  let nearest: NewmanSubstituent | undefined;
  for (const s of back) {
    if (!nearest || Math.abs(wrap180(s.azimuthDeg! - upAz)) < Math.abs(wrap180(nearest.azimuthDeg! - upAz))) nearest = s;
  }
  let turn = nearest ? wrap180(nearest.azimuthDeg! - upAz) : 0;
  if (Math.abs(turn) < eclipsedOffsetDeg) turn = turn < 0 ? -eclipsedOffsetDeg : eclipsedOffsetDeg;
  return {
    front: spaced(front, view.up, 0),
    back: nearest ? spaced(back, nearest.atom, turn) : new Map(),
  };
}
