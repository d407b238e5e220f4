/**
 * One ring, analysed: reference numbering, Cremer–Pople puckering, shape and IUPAC descriptor, five-ring
 * pseudorotation, ring torsions and substituent positions. Never NaN: a nearly planar ring gets `planar`,
 * `phiDeg` null and a warning.
 */
import { atomPosition, type Molecule, type Vec3 } from '../model/molecule.js';
import { usageError, type Warning } from '../model/errors.js';
import { cremerPople, meanPlane, PHASE_THRESHOLD, type Puckering } from '../geometry/cremerPople.js';
import { altonaSundaralingamFit, fourierPseudorotation, type AmplitudeMethod } from '../geometry/pseudorotation.js';
import { torsion } from '../geometry/torsion.js';
import type { Graph } from '../perceive/graph.js';
import { isTrigonalRing } from '../perceive/trigonalAtoms.js';
import { ringReference } from './ringReference.js';
import { classifyRing, type FormFit, type RingShapeOptions } from './ringShape.js';
import { chosenPlane, type DescriptorParts } from './ringDescriptor.js';
import type { RingShape } from './ringForms.js';
import { ringSubstituents, type RingSubstituent, type SubstituentOptions } from './substituents.js';

/**
 * How a five-ring's τm was found (P is the Altona–Sundaralingam closed form in all but `fourier`): `closed-form`
 * ν2 / cos P, `least-squares` fit of all five torsions at that P (near P = 90° and 270°), `blended` between the
 * two, or `fourier` (P and amplitude from the Fourier form, on request).
 */
export type PseudorotationMethod = AmplitudeMethod | 'fourier';

/** Options of `analyzeRing`. */
export interface AnalyzeRingOptions extends RingShapeOptions, SubstituentOptions {
  /** Ring id to carry into the report (e.g. its number in `inspect`). Default none. */
  readonly id?: number;
  /** Use `ringAtoms` exactly in the given order (user-given ordered ring). Default false: reference order. */
  readonly ordered?: boolean;
  /** With `ordered`: locants of the positions (chemical locants) and the numbering rule in words. Default: 1…N. */
  readonly locants?: readonly string[];
  readonly numberingRule?: string;
  /**
   * Five-ring pseudorotation. `altona-sundaralingam` (default): P from the closed form, τm from ν2 / cos P where
   * |cos P| ≥ 0.3, from a least-squares fit of all five torsions where |cos P| ≤ 0.2, blended between.
   * `fourier`: P and amplitude from the Fourier form of the same model.
   */
  readonly pseudorotation?: 'altona-sundaralingam' | 'fourier';
}

/**
 * Cremer–Pople numbers as reported: phases withheld where their amplitude is below 0.05 Å, and θ and φ null for a
 * planar ring (they are noise there).
 */
export interface RingPuckering {
  readonly Q: number;
  readonly thetaDeg: number | null;
  readonly phiDeg: number | null;
  readonly amplitudes: readonly { readonly m: number; readonly q: number; readonly phaseDeg: number | null }[];
}

/** The analysis of one ring (0-based atoms; `toReportRing` gives the 1-based JSON). */
export interface RingAnalysis {
  readonly id?: number;
  /** Ring atoms in reference order. */
  readonly atoms: readonly number[];
  readonly size: number;
  /** Locant of each position in descriptors. */
  readonly locants: readonly string[];
  /** The numbering rule that was applied, in words. */
  readonly referenceRule: string;
  readonly puckering: RingPuckering;
  /** Cremer–Pople unit normal, ring centroid and displacements z_j (Å), for drawings. */
  readonly normal: Vec3;
  readonly centre: Vec3;
  readonly z: readonly number[];
  /** Five-rings only: AS phase P and amplitude τm, degrees, and how τm was found. */
  readonly pseudorotation: { phaseDeg: number; amplitudeDeg: number; method: PseudorotationMethod } | null;
  readonly shape: RingShape;
  readonly descriptor: string | null;
  readonly descriptorParts: DescriptorParts | null;
  readonly descriptorHtml: string | null;
  readonly fit: FormFit | null;
  /** Ring torsions j, j+1, j+2, j+3 (mod N), j = 1…N. */
  readonly torsions: readonly { readonly atoms: readonly number[]; readonly angleDeg: number | null }[];
  readonly substituents: readonly RingSubstituent[];
  readonly warnings: readonly Warning[];
}

function puckeringOf(points: Vec3[]): Puckering {
  const pk = cremerPople(points);
  if (pk) return pk;
  const plane = meanPlane(points); // three-rings: flat by definition
  if (!plane) throw usageError('degenerate-ring', 'ring atoms are collinear: no mean plane');
  return { Q: 0, amplitudes: [], thetaDeg: null, phiDeg: null, ...plane, z: plane.z.map(() => 0) };
}

function pseudorotationOf(nu: (number | null)[], method: 'altona-sundaralingam' | 'fourier'): RingAnalysis['pseudorotation'] {
  if (nu.some((v) => v === null)) return null;
  const values = nu as number[];
  if (method === 'fourier') {
    const f = fourierPseudorotation(values);
    return f ? { ...f, method: 'fourier' } : null;
  }
  const as = altonaSundaralingamFit(values);
  return as ? { phaseDeg: as.phaseDeg, amplitudeDeg: as.amplitudeDeg, method: as.amplitudeMethod } : null;
}

/**
 * Analyses one ring of `mol` (atoms 0-based, any cyclic order unless `ordered`).
 * @example analyzeRing(mol, graph, [0, 1, 2, 3, 4, 5]).descriptor // '1C4'
 */
export function analyzeRing(
  mol: Pick<Molecule, 'atoms' | 'coords'>,
  graph: Graph,
  ringAtoms: readonly number[],
  options: AnalyzeRingOptions = {},
): RingAnalysis {
  // 1. Reference numbering and Cremer–Pople coordinates in that numbering.
  const ref = ringReference(mol, graph, ringAtoms, { ordered: options.ordered ?? false, locants: options.locants, rule: options.numberingRule });
  const atoms = ref.atoms;
  const n = atoms.length;
  const label = atoms.map((a) => a + 1).join('-');
  const pk = puckeringOf(atoms.map((a) => atomPosition(mol, a)));
  // 2. Shape and descriptor.
  const cls = classifyRing(pk, ref.locants, options);
  const warnings: Warning[] = [];
  const planar = cls.shape === 'planar';
  // an aromatic or other sp²-only ring is meant to be flat: only a ring that should pucker gets the warning
  if (planar && n > 3 && !isTrigonalRing(mol, graph, atoms)) {
    warnings.push({
      code: 'ring-nearly-planar',
      message: `ring ${label} is nearly planar (Q ${pk.Q.toFixed(3)} Å): phase and ring form are undefined`,
    });
  }
  if (cls.fit?.quality === 'distorted') {
    const [a, b] = cls.fit.nearest.map((f) => f.descriptor ?? f.shape);
    warnings.push({
      code: 'ring-form-distorted',
      message: `ring ${label} is ${cls.fit.distanceDeg.toFixed(1)}° from the nearest form (between ${a} and ${b})`,
    });
  }
  // 3. Ring torsions and, for five-rings, pseudorotation (ν0 = torsion N,1,2,3; ν_k = torsion k).
  const torsions = atoms.map((_, j) => {
    const quad = [0, 1, 2, 3].map((k) => atoms[(j + k) % n]!);
    const [a, b, c, d] = quad.map((x) => atomPosition(mol, x)) as [Vec3, Vec3, Vec3, Vec3];
    return { atoms: quad, angleDeg: torsion(a, b, c, d) };
  });
  if (torsions.some((t) => t.angleDeg === null)) {
    warnings.push({ code: 'ring-torsion-undefined', message: `ring ${label} has a collinear triple of atoms` });
  }
  const nu = n === 5 ? [torsions[4]!, ...torsions.slice(0, 4)].map((t) => t.angleDeg) : [];
  const pseudorotation = n === 5 && !planar ? pseudorotationOf(nu, options.pseudorotation ?? 'altona-sundaralingam') : null;
  // 4. Substituents.
  const plane = cls.form ? chosenPlane(cls.form, ref.locants) : null;
  const substituents = ringSubstituents(mol, graph, atoms, pk.normal, cls.shape, cls.form, plane, options);
  return {
    ...(options.id === undefined ? {} : { id: options.id }),
    atoms,
    size: n,
    locants: ref.locants,
    referenceRule: ref.rule,
    puckering: {
      Q: pk.Q,
      thetaDeg: planar ? null : pk.thetaDeg,
      phiDeg: planar ? null : pk.phiDeg,
      amplitudes: pk.amplitudes.map(({ m, q, phaseDeg }) => ({
        m,
        q,
        phaseDeg: phaseDeg === null || Math.abs(q) < PHASE_THRESHOLD ? null : phaseDeg,
      })),
    },
    normal: pk.normal,
    centre: pk.centre,
    z: pk.z,
    pseudorotation,
    shape: cls.shape,
    descriptor: cls.descriptor,
    descriptorParts: cls.descriptorParts,
    descriptorHtml: cls.descriptorHtml,
    fit: cls.fit,
    torsions,
    substituents,
    warnings,
  };
}
