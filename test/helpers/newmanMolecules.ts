/** Test molecules for Newman tests, built from internal coordinates (no files). */
import type { Atom, Bond, Molecule, Vec3 } from '../../src/model/molecule.js';
import { add, cross, scale, sub, unit } from '../../src/geometry/vec3.js';

const RAD = Math.PI / 180;
const u = (v: Vec3): Vec3 => unit(v)!;

/** Places D bonded to C with |CD| = r, ∠BCD = angleDeg and torsion A–B–C–D = torsionDeg (NeRF). */
export function place(a: Vec3, b: Vec3, c: Vec3, r: number, angleDeg: number, torsionDeg: number): Vec3 {
  const bc = u(sub(c, b));
  const n = u(cross(sub(b, a), bc));
  const m = cross(n, bc);
  const th = angleDeg * RAD;
  const ph = torsionDeg * RAD;
  const d: Vec3 = [-r * Math.cos(th), r * Math.sin(th) * Math.cos(ph), r * Math.sin(th) * Math.sin(ph)];
  return add(add(add(c, scale(bc, d[0])), scale(m, d[1])), scale(n, d[2]));
}

/** Assembles a Molecule from elements, positions and 0-based bond pairs. */
export function molecule(title: string, elements: readonly string[], points: readonly Vec3[], bonds: readonly (readonly [number, number])[], names?: readonly string[]): Molecule {
  const atoms: Atom[] = elements.map((element, i) => ({ element, name: names?.[i] ?? null }));
  const coords = new Float64Array(points.flat());
  const bondList: Bond[] = bonds.map(([a, b]) => ({ a: Math.min(a, b), b: Math.max(a, b), order: 1, perceived: false }));
  return { title, atoms, coords, bonds: bondList, properties: {}, source: { file: 'test', format: 'xyz', index: 1, line: 1 } };
}

const TET = 109.4712;

/**
 * Ethane C1–C2 (atoms 0, 1) with H 2–4 on C1 and H 5–7 on C2; `offsetDeg` is the H2–C1–C2–H5 torsion
 * (60 staggered, 0 eclipsed). Ideal tetrahedral angles, C–C 1.54 Å, C–H 1.09 Å.
 */
export function ethane(offsetDeg: number): Molecule {
  const c1: Vec3 = [0, 0, 0];
  const c2: Vec3 = [1.54, 0, 0];
  const ref: Vec3 = [0, 1, 0];
  const front = [0, 120, 240].map((t) => place(ref, c2, c1, 1.09, TET, t));
  const back = [0, 120, 240].map((t) => place(front[0]!, c1, c2, 1.09, TET, offsetDeg + t));
  return molecule(`ethane ${offsetDeg}`, ['C', 'C', 'H', 'H', 'H', 'H', 'H', 'H'], [c1, c2, ...front, ...back], [
    [0, 1], [0, 2], [0, 3], [0, 4], [1, 5], [1, 6], [1, 7],
  ]);
}

/**
 * n-Butane C1–C2–C3–C4 (atoms 0–3) with C1–C2–C3–C4 = `torsionDeg`, C–C 1.53 Å, C–C–C 112°, then ten H
 * (4–6 on C1, 7–8 on C2, 9–10 on C3, 11–13 on C4), tetrahedral about each carbon.
 */
export function butane(torsionDeg: number): Molecule {
  const c1: Vec3 = [0, 0, 0];
  const c2: Vec3 = [1.53, 0, 0];
  const c3 = place([0, 1, 0], c1, c2, 1.53, 112, 0);
  const c4 = place(c1, c2, c3, 1.53, 112, torsionDeg);
  const h1 = [60, 180, 300].map((t) => place(c3, c2, c1, 1.09, TET, t));
  // torsion C4–C3–C2–C1 = C1–C2–C3–C4, so the C2 and C3 hydrogens sit at that torsion ± 120
  const h2 = [120, 240].map((t) => place(c4, c3, c2, 1.09, TET, torsionDeg + t));
  const h3 = [120, 240].map((t) => place(c1, c2, c3, 1.09, TET, torsionDeg + t));
  const h4 = [60, 180, 300].map((t) => place(c2, c3, c4, 1.09, TET, t));
  const points = [c1, c2, c3, c4, ...h1, ...h2, ...h3, ...h4];
  return molecule(`butane ${torsionDeg}`, ['C', 'C', 'C', 'C', ...Array(10).fill('H')], points, [
    [0, 1], [1, 2], [2, 3], [0, 4], [0, 5], [0, 6], [1, 7], [1, 8], [2, 9], [2, 10], [3, 11], [3, 12], [3, 13],
  ], ['C1', 'C2', 'C3', 'C4', 'H11', 'H12', 'H13', 'H21', 'H22', 'H31', 'H32', 'H41', 'H42', 'H43']);
}

/**
 * Cyclohexane chair (docs/methods.md#reference-geometries diffraction model, Bastiansen et al. 1973, from memory): C–C 1.536 Å,
 * C–C–C 111.4°, ring torsions ±54.94 (derived, docs/methods.md#cremer-pople-checks); C–H 1.10 Å, H–C–H 107.5° in the local
 * bisector plane (docs/methods.md#axial-equatorial). Carbons 0–5, then two H per carbon (6 + 2k, 7 + 2k on carbon k).
 */
export function cyclohexaneChair(): { mol: Molecule; ring: number[] } {
  const t = 54.94;
  const c: Vec3[] = [[0, 0, 0], [1.536, 0, 0]];
  c.push(place([0, 1, 0], c[0]!, c[1]!, 1.536, 111.4, 0));
  for (let k = 3; k < 6; k++) c.push(place(c[k - 3]!, c[k - 2]!, c[k - 1]!, 1.536, 111.4, k % 2 === 0 ? t : -t));
  // fix the first torsion sign so the ring closes: C0–C1–C2–C3 = +t, alternating
  const ring = [0, 1, 2, 3, 4, 5];
  const h: Vec3[] = [];
  for (let k = 0; k < 6; k++) {
    const ci = c[k]!;
    const prev = c[(k + 5) % 6]!;
    const next = c[(k + 1) % 6]!;
    const bis = u(add(u(sub(ci, prev)), u(sub(ci, next))));
    const nrm = u(cross(sub(prev, ci), sub(next, ci)));
    const half = (107.5 / 2) * RAD;
    h.push(add(ci, scale(add(scale(bis, Math.cos(half)), scale(nrm, Math.sin(half))), 1.1)));
    h.push(add(ci, scale(add(scale(bis, Math.cos(half)), scale(nrm, -Math.sin(half))), 1.1)));
  }
  const bonds: [number, number][] = ring.map((k) => [k, (k + 1) % 6]);
  for (let k = 0; k < 6; k++) bonds.push([k, 6 + 2 * k], [k, 7 + 2 * k]);
  return { mol: molecule('cyclohexane chair', [...Array(6).fill('C'), ...Array(12).fill('H')], [...c, ...h], bonds), ring };
}
