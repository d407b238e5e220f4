/**
 * A ring figure before styling: every drawn atom on screen (Å, y down, with its nearness to the viewer) and
 * every drawn bond with its role. Both ring views (`chairTemplate`, `ringProjection`) produce one; `layoutRing`
 * turns it into a Scene.
 */
import type { ViewPoint } from './ringView.js';
import type { ChairOutlineKind } from './chairOutline.js';
import type { RingHydrogenMode } from './ringHydrogens.js';
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';

/** The two ring views: the trade's chair template, or the true orthographic projection. */
export type RingView = 'template' | 'projected';

/** Which hydrogens on ring atoms are drawn (see `drawnSubstituents`). */
export type RingHydrogens = RingHydrogenMode;

/** One drawn bond: `atoms` = [start atom, end atom] (ring atom first for substituents), 0-based. */
export interface PlacedBond {
  readonly atoms: readonly [number, number];
  /** `ring-bond`, a substituent position word (`axial`, `pseudo-equatorial`…) or `substituent-bond`. */
  readonly role: string;
}

/** What a ring view places. */
export interface RingPlacement {
  readonly view: RingView;
  /** Ring atoms in reference order (0-based). */
  readonly ring: readonly number[];
  /** Screen position of every drawn atom (ring atoms and drawn substituents), Å. */
  readonly points: ReadonlyMap<number, ViewPoint>;
  /** Ring bonds (j → j+1 in reference order), then substituent bonds. */
  readonly bonds: readonly PlacedBond[];
  /** Length in Å that is drawn as one theme `bondLength` (the mean ring bond). */
  readonly unitLength: number;
  /** Elevation of the view, degrees; null for the template (a stylised outline, not a view). */
  readonly elevationDeg: number | null;
  /** Azimuth of the view about the ring normal, degrees from reference atom 1 (projected view). */
  readonly azimuthDeg?: number;
  /** Template outline of the family (`right-peak` or its mirror outline `right-valley`). */
  readonly outline?: ChairOutlineKind;
  /** Fused chairs: every ring of the figure, `ring` first (`fusedChairTemplate`). Absent for one ring. */
  readonly rings?: readonly RingAnalysis[];
}

/** Default elevation of both views, degrees (docs/methods.md#chair-drawing: 15–25° looks conventional). */
export const DEFAULT_ELEVATION_DEG = 20;

/** The JSON form of a placement: 1-based atoms, screen coordinates in Å rounded to 1e-4. */
export interface PlacementJson {
  readonly view: RingView;
  readonly elevationDeg: number | null;
  readonly atoms: { atom: number; x: number; y: number; near: number }[];
  readonly bonds: { atoms: [number, number]; role: string }[];
}

const r4 = (x: number) => {
  const v = Math.round(x * 1e4) / 1e4;
  return Object.is(v, -0) ? 0 : v;
};

/**
 * JSON-ready placement (`chair --json` → `placement`).
 * @example toPlacementJson(chairTemplate(ring, mol)).bonds[0] // { atoms: [1, 2], role: 'ring-bond' }
 */
export function toPlacementJson(p: RingPlacement): PlacementJson {
  return {
    view: p.view,
    elevationDeg: p.elevationDeg,
    atoms: [...p.points].map(([atom, q]) => ({ atom: atom + 1, x: r4(q.x), y: r4(q.y), near: r4(q.near) })),
    bonds: p.bonds.map((b) => ({ atoms: [b.atoms[0] + 1, b.atoms[1] + 1], role: b.role })),
  };
}
