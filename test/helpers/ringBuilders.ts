/**
 * Test helpers that build ring geometries from bond lengths and angles (docs/methods.md#cremer-pople-checks, docs/methods.md#axial-equatorial models) and wrap
 * them as Molecules.
 */
import { cremerPople, displacementsFromModes, ringFromDisplacements, sixRingModes } from '../../src/geometry/cremerPople.js';
import { add, cross, norm, scale, sub, unit } from '../../src/geometry/vec3.js';
import { buildGraph, type Graph } from '../../src/perceive/graph.js';
import type { Bond, Molecule, Vec3 } from '../../src/model/molecule.js';

const RAD = Math.PI / 180;

/** Solves F(x) = 0 by Newton's method with a forward-difference Jacobian (small dense systems). */
export function newton(f: (x: number[]) => number[], x0: number[], iterations = 50): number[] {
  let x = [...x0];
  for (let it = 0; it < iterations; it++) {
    const fx = f(x);
    if (Math.max(...fx.map(Math.abs)) < 1e-13) break;
    const n = x.length;
    const jac = fx.map(() => new Array<number>(n).fill(0));
    for (let k = 0; k < n; k++) {
      const h = 1e-7;
      const xh = [...x];
      xh[k]! += h;
      const fh = f(xh);
      for (let i = 0; i < n; i++) jac[i]![k] = (fh[i]! - fx[i]!) / h;
    }
    // Gaussian elimination with partial pivoting on [J | −F]
    const m = jac.map((row, i) => [...row, -fx[i]!]);
    for (let c = 0; c < n; c++) {
      let p = c;
      for (let r = c + 1; r < n; r++) if (Math.abs(m[r]![c]!) > Math.abs(m[p]![c]!)) p = r;
      [m[c], m[p]] = [m[p]!, m[c]!];
      for (let r = c + 1; r < n; r++) {
        const q = m[r]![c]! / m[c]![c]!;
        for (let k = c; k <= n; k++) m[r]![k]! -= q * m[c]![k]!;
      }
    }
    const dx = new Array<number>(n).fill(0);
    for (let r = n - 1; r >= 0; r--) {
      let s = m[r]![n]!;
      for (let k = r + 1; k < n; k++) s -= m[r]![k]! * dx[k]!;
      dx[r] = s / m[r]![r]!;
    }
    x = x.map((v, i) => v + dx[i]!);
  }
  return x;
}

const angle = (a: Vec3, b: Vec3, c: Vec3) => {
  const u = sub(a, b);
  const v = sub(c, b);
  return Math.acos((u[0] * v[0] + u[1] * v[1] + u[2] * v[2]) / (norm(u) * norm(v)));
};

/**
 * Ideal D3d chair with all bonds `bond` (Å) and all ring angles `angleDeg`: a regular hexagon of radius r in
 * projection, atoms alternately at +h and −h (atom 1 up), numbered clockwise seen from +z. Returns points and h.
 */
export function d3dChair(bond: number, angleDeg: number): { points: Vec3[]; h: number } {
  const build = ([r, h]: number[]) =>
    Array.from({ length: 6 }, (_, j) => {
      const a = (-2 * Math.PI * j) / 6;
      return [r! * Math.cos(a), r! * Math.sin(a), j % 2 === 0 ? h! : -h!] as Vec3;
    });
  const [r, h] = newton(
    (x) => {
      const p = build(x);
      return [norm(sub(p[1]!, p[0]!)) - bond, angle(p[5]!, p[0]!, p[1]!) - angleDeg * RAD];
    },
    [1.45, 0.25],
  );
  return { points: build([r!, h!]), h: h! };
}

/**
 * C2v boat with all bonds `bond` and all ring angles `angleDeg` (closed form): bow and stern atoms 1 and 4 at
 * (±p, 0), side atoms at (±bond/2, ±w), raised by dh relative to the sides.
 */
export function c2vBoat(bond: number, angleDeg: number): Vec3[] {
  const c = Math.cos(angleDeg * RAD);
  const s = bond / 2;
  const p = s - bond * c;
  const w = bond * Math.sqrt((1 - c) / 2);
  const dh = bond * Math.sqrt((1 + c - 2 * c * c) / 2);
  return [
    [p, 0, dh],
    [s, w, 0],
    [-s, w, 0],
    [-p, 0, dh],
    [-s, -w, 0],
    [s, -w, 0],
  ];
}

/**
 * D2 twist-boat with all bonds `bond` and all ring angles `angleDeg`, solved numerically: atoms 3 and 6 on the
 * x axis (a C2 axis), the others related by the C2 axes along x and y.
 */
export function d2TwistBoat(bond: number, angleDeg: number): Vec3[] {
  const build = ([a, y, c, u]: number[]): Vec3[] => [
    [-a!, y!, -c!],
    [a!, y!, c!],
    [u!, 0, 0],
    [a!, -y!, -c!],
    [-a!, -y!, c!],
    [-u!, 0, 0],
  ];
  const x = newton(
    (v) => {
      const q = build(v);
      return [
        norm(sub(q[1]!, q[0]!)) - bond,
        norm(sub(q[2]!, q[1]!)) - bond,
        angle(q[0]!, q[1]!, q[2]!) - angleDeg * RAD,
        angle(q[1]!, q[2]!, q[3]!) - angleDeg * RAD,
      ];
    },
    [0.75, 1.3, 0.35, 1.5],
  );
  return build(x);
}

/** The 12 numberings of a ring (6 starts × 2 directions) as index lists. */
export function numberings(n: number): number[][] {
  const out: number[][] = [];
  for (let s = 0; s < n; s++) {
    out.push(Array.from({ length: n }, (_, k) => (s + k) % n));
    out.push(Array.from({ length: n }, (_, k) => (s - k + n) % n));
  }
  return out;
}

/**
 * Renumbers `points` (or their mirror image, z → −z, when only that reaches it) so that their six-ring
 * Cremer–Pople φ is nearest `phiDeg` (θ left as it comes).
 */
export function renumberToPhi(points: readonly Vec3[], phiDeg: number): Vec3[] {
  let best: Vec3[] = [...points];
  let bestD = Infinity;
  const mirror = points.map(([x, y, z]) => [x, y, -z] as Vec3);
  for (const [source, order] of [points, mirror].flatMap((src) => numberings(src.length).map((o) => [src, o] as const))) {
    const p = order.map((i) => source[i]!);
    const phi = cremerPople(p)!.amplitudes[0]!.phaseDeg!;
    const d = Math.abs(((phi - phiDeg + 540) % 360) - 180);
    if (d < bestD) [best, bestD] = [p, d];
  }
  return best;
}

/** A six-ring at the Cremer–Pople point (Q, θ, φ) built by the inverse formula (regular hexagon radius 1.45). */
export function sixRingAt(Q: number, thetaDeg: number, phiDeg: number): Vec3[] {
  return ringFromDisplacements(displacementsFromModes(6, sixRingModes(Q, thetaDeg, phiDeg)), 1.45);
}

/** A five-ring at (q2, φ2) built by the inverse formula (regular pentagon radius 1.25). */
export function fiveRingAt(q2: number, phiDeg: number): Vec3[] {
  return ringFromDisplacements(displacementsFromModes(5, [{ m: 2, q: q2, phaseDeg: phiDeg }]), 1.25);
}

/**
 * Molecule of a ring (atoms in the given order, elements `elements[j]`, default all C) with, when `hydrogens`,
 * two H per ring atom in the local bisector plane (C–H `chLength` Å, H–C–H `hchDeg`), as in docs/methods.md#axial-equatorial.
 */
export function ringMolecule(
  points: readonly Vec3[],
  options: { elements?: string[]; hydrogens?: boolean; chLength?: number; hchDeg?: number } = {},
): { mol: Molecule; graph: Graph; ring: number[] } {
  const n = points.length;
  const { elements = points.map(() => 'C'), hydrogens = false, chLength = 1.1, hchDeg = 107.5 } = options;
  const coords: Vec3[] = [...points];
  const atoms = elements.map((element) => ({ element, name: null }));
  const bonds: Bond[] = points.map((_, j) => {
    const k = (j + 1) % n;
    return { a: Math.min(j, k), b: Math.max(j, k), order: 1, perceived: false };
  });
  if (hydrogens) {
    points.forEach((p, j) => {
      const u1 = unit(sub(points[(j + n - 1) % n]!, p))!;
      const u2 = unit(sub(points[(j + 1) % n]!, p))!;
      const out = unit(scale(add(u1, u2), -1))!;
      const perp = unit(cross(u1, u2))!;
      const half = (hchDeg * RAD) / 2;
      for (const sign of [1, -1]) {
        const dir = add(scale(out, Math.cos(half)), scale(perp, sign * Math.sin(half)));
        coords.push(add(p, scale(dir, chLength)));
        atoms.push({ element: 'H', name: null });
        bonds.push({ a: j, b: coords.length - 1, order: 1, perceived: false });
      }
    });
  }
  const mol: Molecule = {
    title: 'test ring',
    atoms,
    coords: Float64Array.from(coords.flat()),
    bonds,
    properties: {},
    source: { file: 'test', format: 'xyz', index: 1, line: 1 },
  };
  return { mol, graph: buildGraph(atoms.length, bonds), ring: points.map((_, j) => j) };
}
