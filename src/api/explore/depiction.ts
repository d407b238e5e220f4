/**
 * The explorer's 2D picture of a record: heavy atoms placed by openchemlib's 2D coordinate generator (the
 * bond graph only, so every conformer of one compound gets the same picture), drawn by us as SVG in which every
 * bond and every ring is a target (`data-bond`, `data-ring`) the page's script listens to.
 */
import type { Molecule } from '../../model/molecule.js';
import { elementInfo } from '../../model/elements.js';
import type { Graph } from '../../perceive/graph.js';

/** A 2D picture: positions in px (y down), bonds and rings with the keys the page model uses (1-based atoms). */
export interface Depiction {
  readonly width: number;
  readonly height: number;
  readonly atoms: readonly { readonly id: number; readonly x: number; readonly y: number; readonly label: string; readonly tag: string }[];
  readonly bonds: readonly { readonly a: number; readonly b: number; readonly order: number; readonly key: string }[];
  readonly rings: readonly { readonly key: string; readonly atoms: readonly number[] }[];
}

/** Screen length of one bond, px. */
const BOND_PX = 50;
const MARGIN_PX = 28;

const SUBSCRIPT = '₀₁₂₃₄₅₆₇₈₉';
const sub = (n: number) => (n <= 1 ? '' : String(n).replace(/\d/g, (d) => SUBSCRIPT[Number(d)]!));

/** A key that is equal for records with the same atoms and bonds (so they share one picture). */
export function topologyKey(mol: Molecule): string {
  const bonds = (mol.bonds ?? []).map((b) => (b.a < b.b ? `${b.a}-${b.b}` : `${b.b}-${b.a}`)).sort();
  return `${mol.atoms.map((a) => a.element).join(',')}|${bonds.join(',')}`;
}

/**
 * The 2D picture of a record. `names` gives the tag printed beside each atom (chemical numbering where the
 * record has one, else the atom's name in the file, else its number).
 * @example const d = await depiction(mol, graph, rings, names); d.bonds.length
 */
export async function depiction(mol: Molecule, graph: Graph, rings: readonly (readonly number[])[], names: ReadonlyMap<number, string>): Promise<Depiction> {
  const { Molecule: OclMolecule } = await import('openchemlib');
  const heavy = mol.atoms.flatMap((a, i) => (a.element === 'H' ? [] : [i]));
  const slot = new Map(heavy.map((i, k) => [i, k]));
  const bonds = (mol.bonds ?? []).filter((b) => slot.has(b.a) && slot.has(b.b));
  const ocl = new OclMolecule(heavy.length, bonds.length);
  for (const i of heavy) ocl.addAtom(elementInfo(mol.atoms[i]!.element)?.z ?? 6);
  for (const b of bonds) {
    const k = ocl.addBond(slot.get(b.a)!, slot.get(b.b)!);
    ocl.setBondOrder(k, b.order >= 1 && b.order <= 3 ? b.order : 1);
  }
  ocl.inventCoordinates();
  // openchemlib's 2D y points up; scale so the mean bond is BOND_PX long
  const raw = heavy.map((_, k) => ({ x: ocl.getAtomX(k), y: -ocl.getAtomY(k) }));
  const lengths = bonds.map((b) => Math.hypot(raw[slot.get(b.a)!]!.x - raw[slot.get(b.b)!]!.x, raw[slot.get(b.a)!]!.y - raw[slot.get(b.b)!]!.y));
  const mean = lengths.length > 0 ? lengths.reduce((s, x) => s + x, 0) / lengths.length : 1;
  const scale = BOND_PX / (mean > 1e-6 ? mean : 1);
  const xs = raw.map((p) => p.x * scale);
  const ys = raw.map((p) => p.y * scale);
  const minX = Math.min(...xs, 0);
  const minY = Math.min(...ys, 0);
  const hydrogens = (i: number) => graph.neighbors[i]!.filter((j) => mol.atoms[j]!.element === 'H').length;
  const atoms = heavy.map((i, k) => {
    const element = mol.atoms[i]!.element;
    const h = hydrogens(i);
    // skeletal style: carbon unlabelled unless it stands alone
    const alone = graph.neighbors[i]!.every((j) => mol.atoms[j]!.element === 'H');
    const label = element === 'C' && !alone ? '' : `${element}${h > 0 ? `H${sub(h)}` : ''}`;
    const tag = names.get(i) ?? mol.atoms[i]!.name ?? String(i + 1);
    return { id: i + 1, x: round(xs[k]! - minX + MARGIN_PX), y: round(ys[k]! - minY + MARGIN_PX), label, tag };
  });
  const width = round(Math.max(...atoms.map((a) => a.x), 0) + MARGIN_PX);
  const height = round(Math.max(...atoms.map((a) => a.y), 0) + MARGIN_PX);
  return {
    width,
    height,
    atoms,
    bonds: bonds.map((b) => ({ a: b.a + 1, b: b.b + 1, order: b.order, key: b.a < b.b ? `${b.a + 1}-${b.b + 1}` : `${b.b + 1}-${b.a + 1}` })),
    rings: rings.map((r) => ({ key: r.map((i) => i + 1).sort((x, y) => x - y).join('-'), atoms: r.map((i) => i + 1) })),
  };
}

const round = (x: number) => Math.round(x * 10) / 10;
