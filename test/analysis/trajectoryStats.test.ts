import { describe, expect, it } from 'vitest';
import { TrajectoryStats } from '../../src/analysis/trajectoryStats.js';

const feed = (shapes: string[], options = {}) => {
  const s = new TrajectoryStats(options);
  for (const sh of shapes) s.add(sh);
  return s.summary();
};

describe('TrajectoryStats', () => {
  it('summary() gives occupancy as fractions of the frames added', () => {
    const r = feed(['chair', 'chair', 'chair', 'boat']);
    expect(r.frames).toBe(4);
    expect(r.occupancy).toEqual({ chair: 0.75, boat: 0.25 });
    expect(r.counts).toEqual({ chair: 3, boat: 1 });
  });

  it('summary() counts transitions between consecutive frames of different shape only', () => {
    const r = feed(['chair', 'twist-boat', 'twist-boat', 'chair', 'twist-boat', 'boat', 'twist-boat', 'chair']);
    expect(r.transitions).toEqual({ chair: { 'twist-boat': 2 }, 'twist-boat': { chair: 2, boat: 1 }, boat: { 'twist-boat': 1 } });
  });

  it('summary() gives dwell runs, mean and longest run (the open last run included)', () => {
    const r = feed(['chair', 'chair', 'boat', 'chair', 'chair', 'chair', 'chair']);
    expect(r.dwell.chair).toEqual({ runs: 2, meanFrames: 3, longestFrames: 4 });
    expect(r.dwell.boat).toEqual({ runs: 1, meanFrames: 1, longestFrames: 1 });
  });

  it('summary() reports dwell in time as frames × stride × timestep when a timestep is given', () => {
    const r = feed(['chair', 'chair', 'boat'], { stride: 5, timestep: 2 });
    expect(r.dwell.chair).toEqual({ runs: 1, meanFrames: 2, longestFrames: 2, meanTime: 20, longestTime: 20 });
  });

  it('summary() of no frames is empty, and can be read again after more frames', () => {
    const s = new TrajectoryStats();
    expect(s.summary()).toEqual({ frames: 0, occupancy: {}, counts: {}, transitions: {}, dwell: {} });
    s.add('chair');
    expect(s.summary().dwell.chair!.longestFrames).toBe(1);
    s.add('chair');
    expect(s.summary().dwell.chair!.longestFrames).toBe(2);
  });
});
