/** The `newman --json` document (README.md "JSON documents", schema `conformark/newman@1`): 1-based atoms, rounded degrees. */
import type { Molecule } from '../model/molecule.js';
import type { KlynePrelog, TorsionRelation } from '../geometry/klynePrelog.js';
import type { NewmanConformation, NewmanView } from './newman.js';

/** A vicinal coupling between a front and a back hydrogen (0-based atoms), as computed by the coupling area. */
export interface NewmanCouplingInput {
  readonly front: number;
  readonly back: number;
  readonly torsionDeg: number | null;
  readonly jHz: number | null;
  readonly method: string;
}

export interface NewmanJsonAtom {
  readonly atom: number;
  readonly element: string;
}
export interface NewmanJsonSubstituent extends NewmanJsonAtom {
  readonly azimuthDeg: number | null;
}
export interface NewmanJsonPair {
  readonly front: number;
  readonly back: number;
  readonly torsionDeg: number | null;
  readonly klynePrelog: KlynePrelog | null;
  readonly relation: TorsionRelation | null;
}
export interface NewmanJsonCoupling {
  readonly front: number;
  readonly back: number;
  readonly torsionDeg: number | null;
  readonly jHz: number | null;
  readonly method: string;
}

/** `conformark/newman@1`. */
export interface NewmanJson {
  readonly schema: 'conformark/newman@1';
  readonly record: number;
  readonly front: NewmanJsonAtom;
  readonly back: NewmanJsonAtom;
  readonly frontSubstituents: readonly NewmanJsonSubstituent[];
  readonly backSubstituents: readonly NewmanJsonSubstituent[];
  readonly pairs: readonly NewmanJsonPair[];
  readonly conformation: NewmanConformation | null;
  readonly minOffsetDeg: number | null;
  readonly couplings: readonly NewmanJsonCoupling[];
}

/** Options of {@link toNewmanJson}. */
export interface NewmanJsonOptions {
  /** ³J(H,H) for front/back hydrogen pairs (0-based atoms), from the coupling module. Default: none (`[]`). */
  readonly couplings?: readonly NewmanCouplingInput[];
  /** Decimal places for degrees and Hz. Default 4 (as every JSON document). */
  readonly digits?: number;
}

const rounder = (digits: number) => {
  const f = 10 ** digits;
  return (x: number | null): number | null => {
    if (x === null || !Number.isFinite(x)) return null;
    const r = Math.round(x * f) / f;
    // Rounding may carry −179.999 to −180: the range is (−180, 180].
    return Object.is(r, -0) ? 0 : r === -180 ? 180 : r;
  };
};

/**
 * The JSON document for a Newman view: atoms 1-based, degrees rounded once here.
 * @example JSON.stringify(toNewmanJson(view, mol))
 */
export function toNewmanJson(view: NewmanView, mol: Molecule, options: NewmanJsonOptions = {}): NewmanJson {
  const round = rounder(options.digits ?? 4);
  const sub = (s: NewmanView['frontSubstituents'][number]): NewmanJsonSubstituent => ({ atom: s.atom + 1, element: s.element, azimuthDeg: round(s.azimuthDeg) });
  return {
    schema: 'conformark/newman@1',
    record: mol.source.index,
    front: { atom: view.front + 1, element: view.frontElement },
    back: { atom: view.back + 1, element: view.backElement },
    frontSubstituents: view.frontSubstituents.map(sub),
    backSubstituents: view.backSubstituents.map(sub),
    pairs: view.pairs.map((p) => ({ front: p.front + 1, back: p.back + 1, torsionDeg: round(p.torsionDeg), klynePrelog: p.klynePrelog, relation: p.relation })),
    conformation: view.conformation,
    minOffsetDeg: round(view.minOffsetDeg),
    couplings: (options.couplings ?? []).map((c) => ({ front: c.front + 1, back: c.back + 1, torsionDeg: round(c.torsionDeg), jHz: round(c.jHz), method: c.method })),
  };
}
