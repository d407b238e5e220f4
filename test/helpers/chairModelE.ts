/**
 * The cyclohexane chair model of docs/methods.md#axial-equatorial (C–C 1.536, C–C–C 111.4, C–H 1.10, H–C–H 107.5, H in the local
 * bisector plane), built from those numbers: derived geometry (docs/methods.md#axial-equatorial, docs/methods.md#reference-geometries), not a published structure.
 * Atoms: C1…C6 (0–5), then for carbon k its axial H (6 + 2k) and equatorial H (7 + 2k).
 */
import type { Bond, Molecule, Vec3 } from '../../src/model/molecule.js';
import { add, cross, dot, scale, sub, unit } from '../../src/geometry/vec3.js';
import { ringFromDisplacements } from '../../src/geometry/cremerPople.js';

const RAD = Math.PI / 180;

/** Builds a Molecule from elements, positions and bonds (0-based pairs). */
export function moleculeOf(elements: readonly string[], points: readonly Vec3[], pairs: readonly (readonly [number, number])[], title = 'model'): Molecule {
  const bonds: Bond[] = pairs.map(([a, b]) => ({ a: Math.min(a, b), b: Math.max(a, b), order: 1, perceived: false }));
  return {
    title,
    atoms: elements.map((element) => ({ element, name: null })),
    coords: Float64Array.from(points.flat()),
    bonds,
    properties: {},
    source: { file: 'model', format: 'xyz', index: 1, line: 1 },
  };
}

/** Chair ring positions (atom 1 up), normal +z. */
export function chairRing(cc = 1.536, angleDeg = 111.4): Vec3[] {
  const r = cc * Math.sqrt((2 * (1 - Math.cos(angleDeg * RAD))) / 3);
  const h = Math.sqrt(cc * cc - r * r) / 2;
  return ringFromDisplacements([h, -h, h, -h, h, -h], r);
}

/** The two hydrogens of ring atom `c` with ring neighbours `p`, `n`: [axial, equatorial]. */
export function ringHydrogens(c: Vec3, p: Vec3, n: Vec3, normal: Vec3, ch = 1.1, hchDeg = 107.5): [Vec3, Vec3] {
  const bis = unit(add(sub(c, p), sub(c, n)))!;
  const w = unit(cross(sub(p, c), sub(n, c)))!;
  const half = (hchDeg / 2) * RAD;
  const h1 = add(c, scale(add(scale(bis, Math.cos(half)), scale(w, Math.sin(half))), ch));
  const h2 = add(c, scale(add(scale(bis, Math.cos(half)), scale(w, -Math.sin(half))), ch));
  const tilt = (x: Vec3) => Math.abs(dot(unit(sub(x, c))!, normal));
  return tilt(h1) > tilt(h2) ? [h1, h2] : [h2, h1];
}

/** The full C6H12 chair model as a Molecule. */
export function cyclohexaneChair(): Molecule {
  const ring = chairRing();
  const points: Vec3[] = [...ring];
  const elements = ['C', 'C', 'C', 'C', 'C', 'C'];
  const pairs: [number, number][] = [];
  ring.forEach((c, k) => {
    const [ax, eq] = ringHydrogens(c, ring[(k + 5) % 6]!, ring[(k + 1) % 6]!, [0, 0, 1]);
    points.push(ax, eq);
    elements.push('H', 'H');
    pairs.push([k, (k + 1) % 6], [k, 6 + 2 * k], [k, 7 + 2 * k]);
  });
  return moleculeOf(elements, points, pairs, 'cyclohexane chair model');
}
