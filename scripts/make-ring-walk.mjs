// Writes examples/w2-ring-walk.xyz.gz: a synthetic trajectory of a cyclohexane ring (C6H12) built with the inverse
// Cremer–Pople formula, standing in for a simulation run in the demo. It is not a simulation: the path is
// scripted (chair, a pseudorotation excursion through twist-boats and boats, the inverted chair, back), with
// small deterministic noise and a slow rigid tumble. Run after `npm run build`.
import { writeFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { displacementsFromModes, formatXyz, ringFromDisplacements, sixRingModes } from '../dist/index.js';

const FRAMES = 3000;
const TIMESTEP_PS = 0.5;
let seed = 20261201;
const random = () => {
  // mulberry32: small, fixed-seed generator, so the file is the same every time
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
};
const noise = (s) => (random() + random() + random() - 1.5) * s;

/** (θ, φ) of frame k along the scripted path. */
function path(k) {
  if (k < 1100) return [6 + noise(4), 40 + k * 0.3];
  if (k < 1250) return [6 + ((k - 1100) / 150) * 84, 30];
  if (k < 1750) return [90 + noise(4), 30 + (k - 1250) * 0.72];
  if (k < 1900) return [90 + ((k - 1750) / 150) * 84, 30 + 500 * 0.72];
  if (k < 2700) return [174 + noise(4), 200 + k * 0.3];
  return [174 - ((k - 2700) / 300) * 168, 100];
}

const sub = (a, b) => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const addv = (a, b) => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
const mul = (a, s) => [a[0] * s, a[1] * s, a[2] * s];
const unit = (a) => mul(a, 1 / Math.hypot(...a));
const cross = (a, b) => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];

/** Two hydrogens on each ring carbon, in the plane bisecting its ring bonds (H–C–H 107.5°, C–H 1.10 Å). */
function withHydrogens(ring) {
  const hs = [];
  const half = (107.5 / 2) * (Math.PI / 180);
  ring.forEach((p, j) => {
    const a = ring[(j + 5) % 6];
    const b = ring[(j + 1) % 6];
    const out = unit(addv(sub(p, a), sub(p, b)));
    const side = unit(cross(sub(a, p), sub(b, p)));
    for (const s of [1, -1]) hs.push(addv(p, mul(addv(mul(out, Math.cos(half)), mul(side, s * Math.sin(half))), 1.1)));
  });
  return hs;
}

function rotate(p, t) {
  const [a, b] = [0.0011 * t, 0.0007 * t];
  const [x, y, z] = p;
  const y1 = y * Math.cos(a) - z * Math.sin(a);
  const z1 = y * Math.sin(a) + z * Math.cos(a);
  return [x * Math.cos(b) + z1 * Math.sin(b), y1, -x * Math.sin(b) + z1 * Math.cos(b)];
}

const atoms = [...Array(6).fill({ element: 'C', name: null }), ...Array(12).fill({ element: 'H', name: null })];
const frames = [];
for (let k = 0; k < FRAMES; k++) {
  const [theta, phi] = path(k);
  const Q = 0.56 + (theta > 30 && theta < 150 ? 0.17 : 0) + noise(0.01);
  const ring = ringFromDisplacements(displacementsFromModes(6, sixRingModes(Q, theta, phi)), 1.46).map((p) =>
    p.map((v) => v + noise(0.006)),
  );
  const points = [...ring, ...withHydrogens(ring)].map((p) => rotate(p, k));
  const coords = new Float64Array(points.flat());
  frames.push({
    title: `synthetic ring walk frame ${k + 1}`,
    atoms,
    coords,
    bonds: null,
    properties: { time_ps: (k * TIMESTEP_PS).toFixed(1) },
    source: { file: 'w2-ring-walk.xyz', format: 'xyz', index: k + 1, line: 1 },
  });
}
writeFileSync('examples/w2-ring-walk.xyz.gz', gzipSync(formatXyz(frames, { digits: 4 }), { level: 9 }));
console.log(`wrote examples/w2-ring-walk.xyz.gz (${FRAMES} frames, ${TIMESTEP_PS} ps apart)`);
