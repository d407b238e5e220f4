/**
 * Synthetic ring trajectories built with the inverse Cremer–Pople formula (docs/methods.md#cremer-pople, step 6): each frame
 * is an ideal ring at a chosen (Q, θ, φ) — or (q2, φ2) for five-rings — with hydrogens, a little Gaussian
 * noise and a random rigid motion. Seeded, so every run builds the same file.
 */
import { displacementsFromModes, ringFromDisplacements, sixRingModes } from '../../src/geometry/cremerPople.js';
import type { Vec3 } from '../../src/model/molecule.js';

/** One planned frame: the puckering it was built with and the shape it should get. */
export interface WalkFrame {
  readonly thetaDeg: number;
  readonly phiDeg: number;
  readonly shape: string;
}

/** Seeded uniform numbers in [0, 1) (mulberry32). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function gauss(rand: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

/** A random rotation matrix (from a random unit quaternion) applied with a translation. */
function rigidMotion(rand: () => number): (p: Vec3) => Vec3 {
  let [w, x, y, z] = [gauss(rand), gauss(rand), gauss(rand), gauss(rand)];
  const n = Math.hypot(w, x, y, z);
  [w, x, y, z] = [w / n, x / n, y / n, z / n];
  const m = [
    [1 - 2 * (y * y + z * z), 2 * (x * y - z * w), 2 * (x * z + y * w)],
    [2 * (x * y + z * w), 1 - 2 * (x * x + z * z), 2 * (y * z - x * w)],
    [2 * (x * z - y * w), 2 * (y * z + x * w), 1 - 2 * (x * x + y * y)],
  ];
  const t = [10 * (rand() - 0.5), 10 * (rand() - 0.5), 10 * (rand() - 0.5)];
  return (p) => [0, 1, 2].map((i) => m[i]![0]! * p[0] + m[i]![1]! * p[1] + m[i]![2]! * p[2] + t[i]!) as unknown as Vec3;
}

/** Ring atoms then two hydrogens per ring atom (outward, above and below), as XYZ atom lines. */
function ringWithHydrogens(ring: Vec3[]): { element: string; p: Vec3 }[] {
  const atoms = ring.map((p) => ({ element: 'C', p }));
  for (const p of ring) {
    const r = Math.hypot(p[0], p[1]);
    const u = [p[0] / r, p[1] / r];
    for (const s of [1, -1]) atoms.push({ element: 'H', p: [p[0] + 0.63 * u[0]!, p[1] + 0.63 * u[1]!, p[2] + s * 0.89] });
  }
  return atoms;
}

/** Options of `walkXyz`. */
export interface WalkOptions {
  /** Ring size, 5 or 6. Default 6. */
  readonly size?: 5 | 6;
  /** Q (six-rings) or q2 (five-rings), Å. Default 0.55 / 0.4. */
  readonly amplitudeA?: number;
  /** Standard deviation of the coordinate noise, Å. Default 0.003. */
  readonly noiseA?: number;
  readonly seed?: number;
}

/** XYZ text of the planned frames (φ of a five-ring frame is its φ2; θ is ignored). */
export function walkXyz(frames: readonly WalkFrame[], options: WalkOptions = {}): string {
  const size = options.size ?? 6;
  const amp = options.amplitudeA ?? (size === 6 ? 0.55 : 0.4);
  const rand = rng(options.seed ?? 7);
  const noise = options.noiseA ?? 0.003;
  const out: string[] = [];
  frames.forEach((f, k) => {
    const modes = size === 6 ? sixRingModes(amp, f.thetaDeg, f.phiDeg) : [{ m: 2, q: amp, phaseDeg: f.phiDeg }];
    const ring = ringFromDisplacements(displacementsFromModes(size, modes), size === 6 ? 1.45 : 1.26);
    const move = rigidMotion(rand);
    const atoms = ringWithHydrogens(ring).map(({ element, p }) => ({ element, p: move([p[0] + noise * gauss(rand), p[1] + noise * gauss(rand), p[2] + noise * gauss(rand)]) }));
    out.push(String(atoms.length), `frame ${k + 1}`);
    for (const a of atoms) out.push(`${a.element} ${a.p.map((v) => v.toFixed(5)).join(' ')}`);
  });
  return `${out.join('\n')}\n`;
}

/**
 * The six-ring walk of the tests: 30 chairs near θ = 0, a full pseudorotation on the equator (48 frames,
 * φ = 3.75 + 7.5k, never within 3.75° of a boat/twist-boat boundary), 30 chairs near θ = 180, 20 near θ = 0.
 */
export function sixRingWalk(): WalkFrame[] {
  const frames: WalkFrame[] = [];
  for (let k = 0; k < 30; k++) frames.push({ thetaDeg: 4, phiDeg: 12 * k, shape: 'chair' });
  for (let k = 0; k < 48; k++) {
    const phi = 3.75 + 7.5 * k;
    const nearBoat = Math.abs(((phi + 30) % 60) - 30) < 15;
    frames.push({ thetaDeg: 90, phiDeg: phi, shape: nearBoat ? 'boat' : 'twist-boat' });
  }
  for (let k = 0; k < 30; k++) frames.push({ thetaDeg: 176, phiDeg: 100, shape: 'chair' });
  for (let k = 0; k < 20; k++) frames.push({ thetaDeg: 3, phiDeg: 200, shape: 'chair' });
  return frames;
}

/** The five-ring walk: one turn of pseudorotation, φ2 = 2.25 + 4.5k (80 frames, 4 per canonical form). */
export function fiveRingWalk(): WalkFrame[] {
  return Array.from({ length: 80 }, (_, k) => {
    const phi = 2.25 + 4.5 * k;
    const nearEnvelope = Math.abs(((phi + 18) % 36) - 18) < 9;
    return { thetaDeg: 90, phiDeg: phi, shape: nearEnvelope ? 'envelope' : 'twist' };
  });
}
