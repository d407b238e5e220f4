/**
 * Vicinal ³J(H,H) couplings for H–C(sp3)–C(sp3)–H fragments of a molecule (docs/methods.md#karplus). Any other
 * fragment (sp2 carbons, heteroatoms, atoms that are not bonded as stated) is skipped with a reason, never
 * given a number. "sp3" means a carbon with four neighbours in the bond graph.
 */
import { atomPosition, type Molecule } from '../model/molecule.js';
import { usageError, type Warning } from '../model/errors.js';
import type { Graph } from '../perceive/graph.js';
import { torsion } from '../geometry/torsion.js';
import { KARPLUS_FORMS, type KarplusMethod } from './karplus.js';
import { HAASNOOT_SETS, FLUORINE_CHI_DEFAULT, haasnootJ, haasnootSetFor, type HaasnootSet } from './haasnoot.js';
import { couplingSubstituents, countSubstituents, isHydrogen } from './couplingSubstituents.js';

/** Equations for ³J: the generalised Haasnoot–de Leeuw–Altona 1980 equation or a plain Karplus form. */
export type CouplingMethod = 'haasnoot-1980' | KarplusMethod;

/** Every accepted `method` name. */
export const COUPLING_METHODS: readonly CouplingMethod[] = ['haasnoot-1980', ...KARPLUS_FORMS.keys()];

/** How each equation is named in figures and tables. */
export const COUPLING_METHOD_NAMES: ReadonlyMap<CouplingMethod, string> = new Map<CouplingMethod, string>([
  ['haasnoot-1980', 'Haasnoot–de Leeuw–Altona (1980)'],
  ['karplus-1959', 'Karplus (1959)'],
  ['karplus-1963', 'Karplus (1963)'],
]);

/** Short names for figure captions. */
export const COUPLING_METHOD_SHORT_NAMES: ReadonlyMap<CouplingMethod, string> = new Map<CouplingMethod, string>([
  ['haasnoot-1980', 'HLA 1980'],
  ['karplus-1959', 'Karplus 1959'],
  ['karplus-1963', 'Karplus 1963'],
]);

/** Options for the coupling calls. */
export interface CouplingOptions {
  /** Equation to use. Default `'haasnoot-1980'`. */
  readonly method?: CouplingMethod;
  /**
   * Haasnoot parameter set `a`–`e`, or `'auto'` (default): chosen by the number of non-H substituents
   * (0–1 → B, 2 → C, 3 → D, 4 → E; see `haasnootSetFor`). Ignored by the Karplus forms.
   */
  readonly haasnootSet?: HaasnootSet | 'auto';
  /** χ(F) on Huggins' scale. Default 4.00, alternative 3.90 (both from memory). */
  readonly fluorineElectronegativity?: number;
}

/** A predicted coupling. Atom indices are 0-based. */
export interface Coupling {
  /** The proton on the front carbon. */
  readonly front: number;
  /** The proton on the back carbon. */
  readonly back: number;
  readonly frontCarbon: number;
  readonly backCarbon: number;
  /** H–C–C–H torsion, degrees, (−180, 180]. */
  readonly torsionDeg: number;
  /** Predicted ³J, Hz. */
  readonly jHz: number;
  readonly method: CouplingMethod;
  /** Haasnoot parameter set used, or `null` for a Karplus form. */
  readonly haasnootSet: HaasnootSet | null;
  readonly warnings: readonly Warning[];
}

/** A fragment for which no coupling is predicted, with the reason. */
export interface SkippedCoupling {
  readonly front: number;
  readonly back: number;
  readonly frontCarbon: number;
  readonly backCarbon: number;
  readonly skipped: string;
}

export type CouplingResult = Coupling | SkippedCoupling;

/** True when the result is a skipped fragment. */
/**
 * The warning for a couplings request on a file without hydrogens (else nothing would say why none is printed),
 * or `null` when the molecule has hydrogens.
 * @example noHydrogenWarning(heavyAtomsOnly)?.code // 'no-hydrogens'
 */
export function noHydrogenWarning(mol: Pick<Molecule, 'atoms'>): Warning | null {
  if (mol.atoms.some((a) => a.element === 'H')) return null;
  return { code: 'no-hydrogens', message: 'the file has no hydrogen atoms: ³J(H,H) needs explicit hydrogens, so no couplings are predicted' };
}

export function isSkippedCoupling(r: CouplingResult): r is SkippedCoupling {
  return 'skipped' in r;
}

interface Resolved {
  readonly method: CouplingMethod;
  readonly set: HaasnootSet | 'auto';
  readonly fluorine: number;
}

function resolve(options: CouplingOptions): Resolved {
  const method = options.method ?? 'haasnoot-1980';
  if (!COUPLING_METHODS.includes(method)) {
    throw usageError('bad-coupling-method', `unknown coupling method "${method}"; use ${COUPLING_METHODS.join(', ')}`);
  }
  const set = options.haasnootSet ?? 'auto';
  if (set !== 'auto' && !HAASNOOT_SETS.has(set)) {
    throw usageError('bad-haasnoot-set', `unknown Haasnoot parameter set "${set}"; use a, b, c, d, e or auto`);
  }
  const fluorine = options.fluorineElectronegativity ?? FLUORINE_CHI_DEFAULT;
  if (!Number.isFinite(fluorine)) throw usageError('bad-electronegativity', 'χ(F) must be a finite number');
  return { method, set, fluorine };
}

/** Why the fragment hA–cA–cB–hB is not an H–C(sp3)–C(sp3)–H chain, or `null` when it is. */
function fragmentProblem(mol: Molecule, graph: Graph, hA: number, cA: number, cB: number, hB: number): string | null {
  const n = mol.atoms.length;
  const ids = [hA, cA, cB, hB];
  if (ids.some((i) => !Number.isInteger(i) || i < 0 || i >= n)) return 'atom index out of range';
  if (new Set(ids).size !== 4) return 'the four atoms must be distinct';
  for (const h of [hA, hB]) if (!isHydrogen(mol.atoms[h]!.element)) return `atom ${h + 1} is not a hydrogen`;
  for (const [x, y] of [[hA, cA], [cA, cB], [cB, hB]] as const) {
    if (!graph.bonded(x, y)) return `atoms ${x + 1} and ${y + 1} are not bonded`;
  }
  for (const c of [cA, cB]) {
    const el = mol.atoms[c]!.element;
    if (el !== 'C') return `atom ${c + 1} is ${el}, not carbon: only H–C–C–H couplings are predicted`;
    const k = graph.neighbors[c]!.length;
    if (k !== 4) return `carbon ${c + 1} has ${k} neighbours, not 4: only H–C(sp3)–C(sp3)–H couplings are predicted`;
  }
  return null;
}

/**
 * ³J between proton `hA` on carbon `cA` and proton `hB` on carbon `cB` (0-based atoms), from the torsion in
 * the coordinates. Returns a `SkippedCoupling` with a reason for anything but H–C(sp3)–C(sp3)–H.
 * @example vicinalCoupling(mol, graph, 6, 0, 1, 9).jHz // ≈ 13 for an axial–axial pair in a chair
 */
export function vicinalCoupling(
  mol: Molecule,
  graph: Graph,
  hA: number,
  cA: number,
  cB: number,
  hB: number,
  options: CouplingOptions = {},
): CouplingResult {
  const opts = resolve(options);
  const atoms = { front: hA, back: hB, frontCarbon: cA, backCarbon: cB };
  const problem = fragmentProblem(mol, graph, hA, cA, cB, hB);
  if (problem) return { ...atoms, skipped: problem };
  const torsionDeg = torsion(atomPosition(mol, hA), atomPosition(mol, cA), atomPosition(mol, cB), atomPosition(mol, hB));
  if (torsionDeg === null) return { ...atoms, skipped: 'H–C–C–H torsion undefined (collinear atoms)' };
  if (opts.method !== 'haasnoot-1980') {
    const jHz = KARPLUS_FORMS.get(opts.method)!.jHz(torsionDeg);
    return { ...atoms, torsionDeg, jHz, method: opts.method, haasnootSet: null, warnings: [] };
  }
  const set = opts.set === 'auto' ? haasnootSetFor(countSubstituents(mol, graph, cA, cB)) : opts.set;
  const scan = couplingSubstituents(mol, graph, [hA, cA, cB, hB], HAASNOOT_SETS.get(set)!.p7, opts.fluorine);
  if ('skipped' in scan) return { ...atoms, skipped: scan.skipped };
  const jHz = haasnootJ(torsionDeg, scan.substituents, set);
  return { ...atoms, torsionDeg, jHz, method: 'haasnoot-1980', haasnootSet: set, warnings: scan.warnings };
}

/**
 * Every coupling between the protons on `a` and the protons on `b` (0-based, bonded), front = `a`.
 * Non-sp3 or non-carbon ends give skipped entries; ends without protons give none.
 */
export function couplingsAcrossBond(
  mol: Molecule,
  graph: Graph,
  a: number,
  b: number,
  options: CouplingOptions = {},
): CouplingResult[] {
  if (!graph.bonded(a, b)) throw usageError('not-bonded', `atoms ${a + 1} and ${b + 1} are not bonded`);
  const protons = (c: number, other: number) =>
    graph.neighbors[c]!.filter((x) => x !== other && isHydrogen(mol.atoms[x]!.element));
  const out: CouplingResult[] = [];
  for (const hA of protons(a, b)) for (const hB of protons(b, a)) out.push(vicinalCoupling(mol, graph, hA, a, b, hB, options));
  return out;
}

/** Every vicinal H–H coupling across the bonds of a ring given in bonded order (0-based atoms). */
export function ringCouplings(
  mol: Molecule,
  graph: Graph,
  ringAtoms: readonly number[],
  options: CouplingOptions = {},
): CouplingResult[] {
  return ringAtoms.flatMap((a, i) => couplingsAcrossBond(mol, graph, a, ringAtoms[(i + 1) % ringAtoms.length]!, options));
}

/** The README.md JSON form of a coupling (`newman --json`, `inspect --couplings`), atoms 1-based. */
export interface CouplingJson {
  readonly front: number;
  readonly back: number;
  readonly torsionDeg: number;
  readonly jHz: number;
  readonly method: CouplingMethod;
}

/** Converts a coupling to its JSON form (1-based atoms). */
export function toCouplingJson(c: Coupling): CouplingJson {
  return { front: c.front + 1, back: c.back + 1, torsionDeg: c.torsionDeg, jHz: c.jHz, method: c.method };
}
