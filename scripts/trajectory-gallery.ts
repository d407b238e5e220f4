/**
 * Writes the trajectory examples in gallery/ from synthetic trajectories built with the inverse Cremer–Pople
 * formula (test/helpers/puckerWalk.ts): `npx tsx scripts/trajectory-gallery.ts`. A six-ring that stays a
 * chair most of the time, with seeded excursions to the pseudorotation equator and one chair flip, and a
 * five-ring that pseudorotates between north and south. Nothing here is drawn by hand.
 */
import { copyFileSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../src/api/trajectory.js';
import { rng, walkXyz, type WalkFrame } from '../test/helpers/puckerWalk.js';

/** Chair → equator excursions → flipped chair, with a drifting φ and a little wobble in θ. */
function sixRingStory(frames: number): WalkFrame[] {
  const rand = rng(3);
  const out: WalkFrame[] = [];
  let theta = 6;
  let phi = 0;
  let home = 6;
  for (let k = 0; k < frames; k++) {
    if (k === Math.floor(frames * 0.55)) home = 174; // the ring flips
    const onEquator = Math.sin(k / 170) > 0.93 || (k > frames * 0.5 && k < frames * 0.55);
    const target = onEquator ? 90 : home;
    theta += 0.08 * (target - theta) + 2.5 * (rand() - 0.5);
    theta = Math.min(179, Math.max(1, theta));
    phi = (phi + (onEquator ? 2.5 : 0.5) + 6 * (rand() - 0.5) + 360) % 360;
    out.push({ thetaDeg: theta, phiDeg: phi, shape: '' });
  }
  return out;
}

/** A furanose-like ring moving between P ≈ 10 (north) and P ≈ 165 (south) through the east. */
function fiveRingStory(frames: number): WalkFrame[] {
  const rand = rng(4);
  let phi2 = 280;
  return Array.from({ length: frames }, (_, k) => {
    const target = Math.sin(k / 400) > 0 ? 280 : 75;
    phi2 += 0.03 * (target - phi2) + 8 * (rand() - 0.5);
    return { thetaDeg: 90, phiDeg: (phi2 + 360) % 360, shape: '' };
  });
}

const work = mkdtempSync(join(tmpdir(), 'conformark-gallery-'));
try {
  const six = join(work, 'six.xyz');
  writeFileSync(six, walkXyz(sixRingStory(6000), { noiseA: 0.006, seed: 9 }));
  await analyzeTrajectory(six, { dir: join(work, 'six'), timestep: '2 ps', formats: ['svg'], theme: 'contrast' });
  for (const f of ['pucker-map', 'time-series', 'occupancy']) copyFileSync(join(work, 'six', `${f}.svg`), `gallery/trajectory-cyclohexane-${f}.svg`);
  const five = join(work, 'five.xyz');
  writeFileSync(five, walkXyz(fiveRingStory(4000), { size: 5, amplitudeA: 0.38, noiseA: 0.006, seed: 10 }));
  await analyzeTrajectory(five, { dir: join(work, 'five'), timestep: '1 ps', formats: ['svg'] });
  for (const f of ['pucker-map', 'time-series']) copyFileSync(join(work, 'five', `${f}.svg`), `gallery/trajectory-cyclopentane-${f}.svg`);
  process.stdout.write('wrote gallery/trajectory-*.svg\n');
} finally {
  rmSync(work, { recursive: true, force: true });
}
