import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, copyFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { rng, walkXyz, type WalkFrame } from '../helpers/puckerWalk.js';
import { svgPaths, pathRects } from '../helpers/svgRead.js';

/**
 * A 20,000-frame synthetic run with thermal noise: a ⁴C₁ chair (θ a few degrees from the pole, φ anywhere)
 * with two twist-boat excursions and one ¹C₄ episode of 400 frames (frames 12,001–12,400).
 */
const FRAMES = 20_000;
const EPISODE: [number, number] = [12_001, 12_400];
function thermalWalk(): WalkFrame[] {
  const rand = rng(42);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const frames: WalkFrame[] = [];
  let phi = 0;
  for (let f = 1; f <= FRAMES; f++) {
    phi = (phi + 25 * gauss() + 360) % 360;
    const boat = (f > 4_000 && f <= 4_150) || (f > 16_000 && f <= 16_200);
    const flipped = f >= EPISODE[0] && f <= EPISODE[1];
    const polar = Math.abs(5 * gauss());
    const thetaDeg = boat ? 90 + 6 * gauss() : flipped ? 180 - polar : polar;
    frames.push({ thetaDeg, phiDeg: boat ? (90 + 8 * gauss() + 360) % 360 : phi, shape: boat ? 'twist-boat' : 'chair' });
  }
  return frames;
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-long-'));
  writeFileSync(join(dir, 'long.xyz'), walkXyz(thermalWalk(), { noiseA: 0.01, seed: 3 }));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('analyzeTrajectory on a 20,000-frame run', () => {
  it('analyzeTrajectory(20,000 frames) draws every time-series panel, shows the ¹C₄ episode, and writes no NaN', async () => {
    const out = join(dir, 'out');
    const summary = await analyzeTrajectory(join(dir, 'long.xyz'), { dir: out, formats: ['svg', 'png'] });
    expect(summary.frames.analysed).toBe(FRAMES);
    const svg = readFileSync(join(out, 'time-series.svg'), 'utf8');
    if (process.env.KEEP_FIGURES) copyFileSync(join(out, 'time-series.png'), process.env.KEEP_FIGURES);
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    const paths = svgPaths(svg);
    // the two panels are stacked: θ on top, φ below; find each panel's frame (the `axis` path) and its cells
    const axes = paths.filter((p) => p.cls === 'axis').map((p) => /M([\d.]+),([\d.]+)V([\d.]+)H([\d.]+)/.exec(p.d)!.slice(1).map(Number));
    expect(axes.length).toBe(2);
    const [theta, phi] = axes as [number[], number[]];
    const cells = paths.filter((p) => /^trace-\d$|^series-muted$/.test(p.cls)).flatMap((p) => pathRects(p.d).map((r) => ({ ...r, cls: p.cls })));
    const inPanel = (a: number[]) => cells.filter((c) => c.y0 >= a[1]! - 0.01 && c.y1 <= a[2]! + 0.01);
    expect(inPanel(theta).length).toBeGreaterThan(100);
    expect(inPanel(phi).filter((c) => c.cls.startsWith('trace')).length).toBeGreaterThan(0);
    expect(inPanel(phi).filter((c) => c.cls === 'series-muted').length).toBeGreaterThan(100);
    // ¹C₄ cells (θ > 150°, the top sixth of the θ panel) lie only over the episode's frames
    const [left, top, bottom, right] = [theta[0]!, theta[1]!, theta[2]!, theta[3]!];
    const xOf = (frame: number) => left + ((frame - 1) / (FRAMES - 1)) * (right - left);
    const flipped = inPanel(theta).filter((c) => c.y1 <= top + (bottom - top) / 6 + 0.01);
    expect(flipped.length).toBeGreaterThan(0);
    for (const c of flipped) {
      expect(c.x1).toBeGreaterThan(xOf(EPISODE[0]) - 3);
      expect(c.x0).toBeLessThan(xOf(EPISODE[1]) + 3);
    }
    // and the episode is drawn dark: at least one of its cells in the upper density levels
    expect(flipped.some((c) => Number(c.cls.slice(6)) >= 4)).toBe(true);
  }, 60_000);
});
