/**
 * CONECT records applied to one model: CONECT lines name serials once per file (usually after the last
 * model), so a model gets them only where every serial is present in it with the element it had where the
 * serial first appeared, and each bond is no longer than the bond-perception cut-off (covalent radii of
 * Cordero et al. 2008, Dalton Trans. 2832, + 0.4 Å). Otherwise the model's bonds are perceived from its
 * coordinates, with a warning. Serials of alternate-location copies that were not kept are skipped.
 */
import { elementInfo } from '../model/elements.js';
import type { Warning } from '../model/errors.js';
import type { Conect } from './pdbLine.js';

/** Bond-perception tolerance the length check allows above the radius sum, Å (the perception default). */
const CONECT_SLACK_A = 0.4;

/** What one model offers to its CONECT records. */
export interface ConectModel {
  /** Serial → 0-based atom index in the model. */
  readonly serials: ReadonlyMap<number, number>;
  /** Serials of alternate copies that were read but not kept. */
  readonly dropped: ReadonlySet<number>;
  readonly elements: readonly string[];
  readonly coords: Float64Array;
  /** Model number, for messages; 0 when the file has one model. */
  readonly index: number;
}

/**
 * The CONECT bonds of a model as 0-based pairs, or `null` with a warning when they do not fit it.
 * `reference` maps each serial to the element it had where it first appeared in the file; when it is
 * `complete` (every atom of the file seen), a serial it lacks is an `error`: the file is broken, not the model.
 */
export function conectBonds(
  conect: readonly Conect[],
  model: ConectModel,
  reference: ReadonlyMap<number, string>,
  complete: boolean,
): { bonds: [number, number][] | null; warning: Warning | null; error?: { line: number; message: string } } {
  const bonds: [number, number][] = [];
  const where = model.index > 0 ? ` in model ${model.index}` : '';
  const reject = (line: number, why: string): { bonds: null; warning: Warning } => ({
    bonds: null,
    warning: { code: 'conect-not-applied', message: `CONECT (line ${line}) ${why}${where}; bonds perceived from coordinates instead` },
  });
  const absent = (line: number, serial: number) =>
    complete && !reference.has(serial) && !model.dropped.has(serial)
      ? { bonds: null, warning: null, error: { line, message: `CONECT refers to atom serial ${serial}, which is not in the file` } }
      : null;
  for (const c of conect) {
    for (const s of [c.serial, ...c.partners]) {
      const e = absent(c.line, s);
      if (e) return e;
    }
    if (model.dropped.has(c.serial)) continue;
    const a = model.serials.get(c.serial);
    if (a === undefined) return reject(c.line, `names atom serial ${c.serial}, which is not there`);
    for (const partner of c.partners) {
      if (model.dropped.has(partner)) continue;
      const b = model.serials.get(partner);
      if (b === undefined) return reject(c.line, `names atom serial ${partner}, which is not there`);
      if (b === a) continue;
      for (const [serial, atom] of [[c.serial, a], [partner, b]] as const) {
        const want = reference.get(serial);
        if (want !== undefined && want !== model.elements[atom]) {
          return reject(c.line, `names atom serial ${serial} as ${want}, but it is ${model.elements[atom]}`);
        }
      }
      const d = distance(model.coords, a, b);
      const limit = (elementInfo(model.elements[a]!)?.radius ?? 0) + (elementInfo(model.elements[b]!)?.radius ?? 0) + CONECT_SLACK_A;
      if (d > limit) return reject(c.line, `bonds serials ${c.serial} and ${partner}, ${d.toFixed(2)} Å apart (more than ${limit.toFixed(2)} Å)`);
      bonds.push([a, b]);
    }
  }
  return { bonds, warning: null };
}

function distance(c: Float64Array, i: number, j: number): number {
  return Math.hypot(c[3 * i]! - c[3 * j]!, c[3 * i + 1]! - c[3 * j + 1]!, c[3 * i + 2]! - c[3 * j + 2]!);
}
