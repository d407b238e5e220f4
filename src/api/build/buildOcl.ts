/**
 * Private to `build`: the openchemlib glue. openchemlib is loaded lazily (`await import`) so that commands that
 * never build structures start fast. Coordinates stay in openchemlib's frame inside `build`; `toFileFrame`
 * turns them into the frame openchemlib itself writes to molfiles (y and z negated, a 180° rotation about x:
 * torsion signs and chirality are kept), so our SD files match what openchemlib would have written.
 */
import type { Molecule as OclMolecule } from 'openchemlib';
import type { Atom, Bond } from '../../model/molecule.js';
import { ConformarkError } from '../../model/errors.js';

export type Ocl = typeof import('openchemlib');

let loading: Promise<Ocl> | null = null;

/** Loads openchemlib once and registers its force-field and conformer resources. */
export function loadOpenchemlib(): Promise<Ocl> {
  loading ??= import('openchemlib').then((ocl) => {
    ocl.Resources.registerFromNodejs();
    return ocl;
  });
  return loading;
}

/** A build error with no file position (the input is a SMILES string). */
export function buildError(code: string, message: string): ConformarkError {
  return new ConformarkError({ code, file: '', line: null, message });
}

/** openchemlib's messages carry a Java class prefix (`Class$S19: SmilesParser: …`); keep the readable part. */
export function oclMessage(err: unknown): string {
  const text = err instanceof Error ? err.message : String(err);
  return text.replace(/^Class\$\S*:\s*/, '').trim();
}

/** Atoms, bonds (a < b, orders 1–3; aromatic rings come Kekulé) and neighbour lists of an openchemlib molecule. */
export function topology(mol: OclMolecule): { atoms: Atom[]; bonds: Bond[]; neighbors: number[][] } {
  const n = mol.getAllAtoms();
  const atoms: Atom[] = Array.from({ length: n }, (_, i) => ({
    element: mol.getAtomLabel(i),
    name: null,
    charge: mol.getAtomCharge(i),
  }));
  const neighbors: number[][] = Array.from({ length: n }, () => []);
  const bonds: Bond[] = [];
  for (let k = 0; k < mol.getAllBonds(); k++) {
    const x = mol.getBondAtom(0, k);
    const y = mol.getBondAtom(1, k);
    bonds.push({ a: Math.min(x, y), b: Math.max(x, y), order: Math.max(1, mol.getBondOrder(k)), perceived: false });
    neighbors[x]!.push(y);
    neighbors[y]!.push(x);
  }
  for (const list of neighbors) list.sort((p, q) => p - q);
  return { atoms, bonds, neighbors };
}

/** Coordinates of an openchemlib molecule in its own frame, 3 per atom. */
export function readCoords(mol: OclMolecule): Float64Array {
  const n = mol.getAllAtoms();
  const out = new Float64Array(3 * n);
  for (let i = 0; i < n; i++) {
    out[3 * i] = mol.getAtomX(i);
    out[3 * i + 1] = mol.getAtomY(i);
    out[3 * i + 2] = mol.getAtomZ(i);
  }
  return out;
}

/** Sets the coordinates of an openchemlib molecule (its own frame). */
export function writeCoords(mol: OclMolecule, coords: Float64Array): void {
  for (let i = 0; i < mol.getAllAtoms(); i++) {
    mol.setAtomX(i, coords[3 * i]!);
    mol.setAtomY(i, coords[3 * i + 1]!);
    mol.setAtomZ(i, coords[3 * i + 2]!);
  }
}

/** openchemlib's frame → the molfile frame: (x, −y, −z). */
export function toFileFrame(coords: Float64Array): Float64Array {
  return coords.map((v, k) => (k % 3 === 0 ? v : v === 0 ? 0 : -v));
}

/** Result of one MMFF94s minimisation: coordinates and energy (kcal/mol), or the minimiser's return code. */
export type Minimised = { ok: true; coords: Float64Array; energy: number } | { ok: false; code: number };

/**
 * Minimises `mol` in place with MMFF94s. openchemlib copies the new coordinates back only on return code 0
 * (1: iteration limit reached, 2: line search failed), so any other code counts as a failure.
 * Throws `mmff-unsupported` when MMFF94s has no atom type or gives no finite energy.
 */
export function minimiseMmff(ocl: Ocl, mol: OclMolecule, maxIterations: number): Minimised {
  let field: InstanceType<Ocl['ForceFieldMMFF94']>;
  try {
    field = new ocl.ForceFieldMMFF94(mol, 'MMFF94s');
  } catch (err) {
    // openchemlib numbers atoms from 0 in this message; users count from 1
    const message = oclMessage(err).replace(/\batom (\d+)/g, (_, i: string) => `atom ${Number(i) + 1}`);
    throw buildError('mmff-unsupported', `MMFF94s cannot handle this structure: ${message}`);
  }
  if (!Number.isFinite(field.getTotalEnergy())) {
    throw buildError('mmff-unsupported', 'MMFF94s gives no finite energy for this structure');
  }
  const code = field.minimise({ maxIts: maxIterations });
  const energy = field.getTotalEnergy();
  if (code !== 0 || !Number.isFinite(energy)) return { ok: false, code };
  return { ok: true, coords: readCoords(mol), energy };
}

/** Sign of the signed volume at every atom with exactly four neighbours (0 elsewhere): a configuration check. */
export function chiralSigns(coords: Float64Array, neighbors: readonly (readonly number[])[]): Int8Array {
  return Int8Array.from(neighbors, (list, i) => {
    if (list.length !== 4) return 0;
    const v = list.slice(0, 3).map((k) => [0, 1, 2].map((d) => coords[3 * k + d]! - coords[3 * i + d]!));
    const [a, b, c] = v as [number[], number[], number[]];
    const det =
      a[0]! * (b[1]! * c[2]! - b[2]! * c[1]!) -
      a[1]! * (b[0]! * c[2]! - b[2]! * c[0]!) +
      a[2]! * (b[0]! * c[1]! - b[1]! * c[0]!);
    return Math.sign(det);
  });
}
