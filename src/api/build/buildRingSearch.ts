/**
 * Private to `build`: the `ringForms` step. openchemlib's generator gives only the lower chair of a six-ring;
 * for every saturated six-ring this reshapes the lowest-energy conformer into the flipped chair, twist-boats
 * and boats (`buildRingForms.ts`), minimises each with MMFF94s and keeps those that stay distinct.
 * Starts whose minimisation changes a configuration (signed volume of any four-connected atom) are dropped.
 */
import type { Molecule as OclMolecule } from 'openchemlib';
import type { Ocl } from './buildOcl.js';
import { chiralSigns, minimiseMmff, writeCoords } from './buildOcl.js';
import { reshapeRing, ringTargets, ringWalk, sixRingShape } from './buildRingForms.js';
import type { RingTarget, SixRingShape } from './buildRingForms.js';

/** One minimised structure (openchemlib frame). */
export interface Candidate {
  readonly coords: Float64Array;
  /** MMFF94s energy, kcal/mol. */
  readonly energy: number;
  /** How it was made, in words (written to the SD file). */
  readonly origin: string;
  readonly fromSearch: boolean;
  /** Shape of each saturated six-ring, in the order of `BuildContext.rings`. */
  readonly shapes: readonly SixRingShape[];
}

/** What the ring step needs from `buildConformers`. */
export interface BuildContext {
  readonly ocl: Ocl;
  /** Container molecule (hydrogens explicit); its coordinates are overwritten. */
  readonly mol: OclMolecule;
  readonly neighbors: readonly (readonly number[])[];
  /** Saturated six-rings, atoms in bonded order. */
  readonly rings: readonly (readonly number[])[];
  readonly notes: string[];
  readonly maxIterations: number;
  isDuplicate(a: Candidate, b: Candidate): boolean;
}

/** Six-rings of openchemlib's ring set that are not aromatic and have only single ring bonds, in bonded order. */
export function saturatedSixRings(mol: OclMolecule, neighbors: readonly (readonly number[])[]): number[][] {
  const set = mol.getRingSet();
  const rings: number[][] = [];
  for (let r = 0; r < set.getSize(); r++) {
    if (set.getRingSize(r) !== 6 || set.isAromatic(r)) continue;
    if (Array.from(set.getRingBonds(r)).some((b) => mol.getBondOrder(b) !== 1)) continue;
    const walk = ringWalk(Array.from(set.getRingAtoms(r)), neighbors);
    if (walk) rings.push(walk);
  }
  return rings;
}

/** Minimal shape of each ring in `rings`. */
export function ringShapes(coords: Float64Array, rings: readonly (readonly number[])[]): SixRingShape[] {
  return rings.map((ring) => sixRingShape(coords, ring).shape);
}

/** "a chair", "an envelope": the shape with its article, for notes. */
const the = (shape: SixRingShape): string => `${/^[aeiou]/.test(shape) ? 'an' : 'a'} ${shape}`;

/** Adds the distinct ring forms of every saturated six-ring of `kept[0]` to `kept`; notes say what happened. */
export function addRingForms(ctx: BuildContext, kept: Candidate[]): void {
  const base = kept[0]!;
  const signs = chiralSigns(base.coords, ctx.neighbors);
  if (ctx.rings.length === 0) ctx.notes.push('ring forms: no saturated six-ring to reshape');
  ctx.rings.forEach((ring, r) => {
    const label = `ring ${r + 1} (atoms ${ring.map((i) => i + 1).join('-')})`;
    const current = sixRingShape(base.coords, ring);
    if (current.thetaDeg === null) return;
    const outcomes = new Map<string, number>();
    let added = 0;
    for (const target of ringTargets({ Q: current.Q, thetaDeg: current.thetaDeg, phiDeg: current.phiDeg })) {
      const start = reshapeRing(base.coords, ring, ctx.neighbors, target);
      if (!start) continue;
      const found = relax(ctx, start, ring, signs);
      let outcome = found.failure ?? '';
      if (found.coords) {
        const shapes = ringShapes(found.coords, ctx.rings);
        const form = shapes[r]!;
        // ASCII only: this text goes into the SD file
        const phi = target.kind === 'flipped-chair' ? '' : `, phi ${target.phiDeg.toFixed(0)}`;
        const start = `${target.kind} start (theta ${target.thetaDeg.toFixed(0)}${phi})`;
        const candidate: Candidate = {
          coords: found.coords, energy: found.energy, fromSearch: false, shapes,
          origin: `${label}: ${start}${found.nudged ? ', nudged off the boat,' : ''} minimised to ${the(form)}`,
        };
        const meant = target.kind === 'flipped-chair' ? 'chair' : target.kind;
        outcome = form === meant ? `stayed ${the(form)}` : `relaxed to ${the(form)}`;
        if (found.nudged) outcome = `stopped at the boat (a saddle point) and, nudged, ${outcome}`;
        if (!kept.some((k) => ctx.isDuplicate(k, candidate))) {
          kept.push(candidate);
          added++;
        }
      }
      const key = `${target.kind}|${outcome}`;
      outcomes.set(key, (outcomes.get(key) ?? 0) + 1);
    }
    const said = [...outcomes].map(([key, n]) => {
      const [kind, outcome] = key.split('|');
      return n === 1 ? `the ${kind} start ${outcome}` : `${n} ${kind} starts ${outcome}`;
    });
    ctx.notes.push(`${label}: ${said.join('; ')}; ${added} new distinct form${added === 1 ? '' : 's'}`);
  });
}

/** Nudge applied to a ring that stopped at a boat, in φ (deg): enough to leave the saddle point's symmetry. */
const BOAT_NUDGE_DEG = 10;

type Relaxed =
  | { coords: Float64Array; energy: number; nudged: boolean; failure?: undefined }
  | { coords?: undefined; failure: string };

/**
 * Minimises a start; a ring that stops exactly at a boat (a saddle point that symmetry can hold the minimiser
 * on) is turned by BOAT_NUDGE_DEG in φ and minimised again, and kept as a boat only if it stays one.
 */
function relax(ctx: BuildContext, start: Float64Array, ring: readonly number[], signs: Int8Array): Relaxed {
  let nudged = false;
  for (let attempt = 0; ; attempt++) {
    writeCoords(ctx.mol, start);
    const result = minimiseMmff(ctx.ocl, ctx.mol, ctx.maxIterations);
    if (!result.ok) return { failure: 'did not converge (dropped)' };
    if (chiralSigns(result.coords, ctx.neighbors).some((s, i) => s !== signs[i])) {
      return { failure: 'changed a configuration (dropped)' };
    }
    const shape = sixRingShape(result.coords, ring);
    if (attempt > 0 || shape.shape !== 'boat' || shape.thetaDeg === null || shape.phiDeg === null) {
      return { coords: result.coords, energy: result.energy, nudged };
    }
    const nudge: RingTarget = { kind: 'twist-boat', thetaDeg: shape.thetaDeg, phiDeg: shape.phiDeg + BOAT_NUDGE_DEG, Q: shape.Q };
    const next = reshapeRing(result.coords, ring, ctx.neighbors, nudge);
    if (!next) return { coords: result.coords, energy: result.energy, nudged };
    start = next;
    nudged = true;
  }
}
