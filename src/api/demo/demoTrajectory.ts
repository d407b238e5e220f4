/** The demo's ring-walk step: puckering along the synthetic trajectory, its figures and its summary. */
import { join } from 'node:path';
import { analyzeTrajectory } from '../trajectory/trajectory.js';
import type { GallerySection } from './galleryPage.js';

/** The ring walk shipped in examples/ (written by scripts/make-ring-walk.mjs, 0.5 ps between frames). */
export const DEMO_TRAJECTORY = 'w2-ring-walk.xyz.gz';

/** Runs the trajectory analysis into `outDir/walk`; returns the gallery section that shows it and the files written. */
export async function demoTrajectory(path: string, outDir: string): Promise<{ section: GallerySection; files: readonly string[] }> {
  const summary = await analyzeTrajectory(path, { dir: join(outDir, 'walk'), ring: '1', timestep: '0.5 ps' });
  const percent = (shape: string) => `${((summary.occupancy[shape] ?? 0) * 100).toFixed(1)} %`;
  const figure = (name: string) => summary.files.find((f) => f.startsWith(name) && f.endsWith('.svg'));
  const captions: [string, string][] = [
    ['pucker-map', 'Every frame on a map of the Cremer–Pople sphere (binned density, log shading), with the canonical forms marked.'],
    ['time-series', 'θ and φ against time, with a band for each run of one shape.'],
    ['occupancy', 'Fraction of frames in each shape.'],
  ];
  const section: GallerySection = {
    id: 'walk',
    title: 'Ring walk · a synthetic trajectory',
    text: `${summary.frames.analysed} frames, 0.5 ps apart, of a cyclohexane ring built with the inverse Cremer–Pople formula (a scripted stand-in for a simulation): chair ${percent('chair')}, twist-boat ${percent('twist-boat')} of the frames.`,
    figures: captions.flatMap(([name, caption]) => {
      const file = figure(name);
      return file ? [{ file: `walk/${file}`, caption }] : [];
    }),
    links: summary.files.filter((f) => !f.endsWith('.svg')).map((f) => ({ file: `walk/${f}`, label: f })),
  };
  return { section, files: summary.files };
}
