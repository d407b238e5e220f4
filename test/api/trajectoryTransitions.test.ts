/**
 * Transitions and inversions of a built chair-flip walk with flicker: the core-set rule (Buchete & Hummer 2008,
 * J. Phys. Chem. B 112, 6057) must count the planned inversions exactly; the expected counts are derived from the
 * walk's construction.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { ConformarkError } from '../../src/model/errors.js';
import { rng, walkXyz, type WalkFrame } from '../helpers/puckerWalk.js';

const INVERSIONS = 6;

/**
 * A chair-flip walk with thermal flicker: INVERSIONS times, 15 frames in one chair (θ within 4° of the pole,
 * with excursions to θ = 20–25° that stay chairs), then a passage through θ = 30…150 at φ = 15° (midway
 * between forms, outside every core) with ten frames flickering across the boat/twist-boat boundary on the
 * equator (φ = 12° / 18°), into the other chair.
 */
function flickerWalk(): WalkFrame[] {
  const rand = rng(16);
  const frames: WalkFrame[] = [];
  const chair = (north: boolean) => {
    for (let k = 0; k < 15; k++) {
      const t = k % 5 === 4 ? 20 + 5 * rand() : 4 * rand();
      frames.push({ thetaDeg: north ? t : 180 - t, phiDeg: 360 * rand(), shape: 'chair' });
    }
  };
  for (let m = 0; m <= INVERSIONS; m++) {
    const north = m % 2 === 0;
    chair(north);
    if (m === INVERSIONS) break;
    for (const t of [30, 50, 70]) frames.push({ thetaDeg: north ? t : 180 - t, phiDeg: 15, shape: '' });
    for (let k = 0; k < 10; k++) frames.push({ thetaDeg: 90, phiDeg: k % 2 === 0 ? 12 : 18, shape: '' });
    for (const t of [110, 130, 150]) frames.push({ thetaDeg: north ? t : 180 - t, phiDeg: 15, shape: '' });
  }
  return frames;
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-core-'));
  writeFileSync(join(dir, 'flip.xyz'), walkXyz(flickerWalk()));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const sum = (m: Readonly<Record<string, Readonly<Record<string, number>>>>) => Object.values(m).reduce((s, to) => s + Object.values(to).reduce((a, b) => a + b, 0), 0);

describe('analyzeTrajectory(core-set transitions)', () => {
  it('analyzeTrajectory(chair flips with flicker) counts the constructed inversions as direct chair-to-chair transitions, not the flicker', async () => {
    const s = await analyzeTrajectory(join(dir, 'flip.xyz'), { dir: join(dir, 'core'), timestep: '10 ps' });
    expect(s.assignment).toEqual({ rule: 'core', coreRadiusDeg: 10, unassignedFrames: 0 });
    expect(s.inversions!.count).toBe(INVERSIONS);
    // 7 × 15 + 6 × 16 frames of 10 ps = 2.01 ns
    expect(s.inversions!.perNs).toBeCloseTo(INVERSIONS / 2.01, 9);
    const chairs = Object.keys(s.forms.occupancy).filter((f) => /^\d+C\d+$/.test(f));
    expect(chairs.length).toBe(2);
    const [a, b] = chairs as [string, string];
    expect(s.forms.transitions).toEqual({ [a]: { [b]: INVERSIONS / 2 }, [b]: { [a]: INVERSIONS / 2 } });
    expect(s.transitions).toEqual({});
    expect(s.dwell.chair!.runs).toBe(1);
  });

  it('analyzeTrajectory(transitions: frame) counts every change between frames, flicker included', async () => {
    const s = await analyzeTrajectory(join(dir, 'flip.xyz'), { dir: join(dir, 'frame'), transitions: 'frame' });
    expect(s.assignment).toEqual({ rule: 'frame', coreRadiusDeg: null, unassignedFrames: 0 });
    // at least the nine boat/twist-boat flips of every passage
    expect(s.transitions.boat!['twist-boat']! + s.transitions['twist-boat']!.boat!).toBeGreaterThanOrEqual(9 * INVERSIONS);
    expect(sum(s.transitions)).toBeGreaterThan(10 * INVERSIONS);
    expect(s.inversions!.count).toBe(INVERSIONS);
    expect(s.inversions!.perNs).toBeNull();
  });

  it('analyzeTrajectory(a walk that starts outside every core) leaves those frames unassigned; a bad rule or radius is refused', async () => {
    const start: WalkFrame[] = [{ thetaDeg: 30, phiDeg: 15, shape: '' }, { thetaDeg: 20, phiDeg: 15, shape: '' }, ...flickerWalk()];
    writeFileSync(join(dir, 'late.xyz'), walkXyz(start));
    const s = await analyzeTrajectory(join(dir, 'late.xyz'), { dir: join(dir, 'late') });
    expect(s.assignment.unassignedFrames).toBe(2);
    const e1 = await analyzeTrajectory(join(dir, 'flip.xyz'), { dir: join(dir, 'x'), transitions: 'every' as 'core' }).catch((e: unknown) => e);
    expect((e1 as ConformarkError).issues[0]!.message).toBe('--transitions expects core or frame, got "every"');
    const e2 = await analyzeTrajectory(join(dir, 'flip.xyz'), { dir: join(dir, 'y'), coreRadiusDeg: 95 }).catch((e: unknown) => e);
    expect((e2 as ConformarkError).issues[0]!.message).toBe('--core-radius expects degrees between 0 and 90, got 95');
  });
});
