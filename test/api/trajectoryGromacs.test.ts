import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { xtcFrames } from '../../src/io/xtc.js';
import { trrFrames } from '../../src/io/trr.js';
import { cremerPople } from '../../src/geometry/cremerPople.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Vec3 } from '../../src/geometry/vec3.js';

// fixtures written by MDAnalysis 2.4.2 (XTC, TRR) and mdtraj 1.9.7 (GRO): scripts/fixtures/gromacs.py; `whole`
// holds the coordinates before the writer's atom-by-atom wrapping into the box
const FIX = join(__dirname, '..', 'fixtures', 'md');
const ref = JSON.parse(readFileSync(join(FIX, 'gromacs.json'), 'utf8')) as { whole: number[][][] };
const RINGS = { '1': [0, 1, 2, 3, 4, 5], '2': [18, 19, 20, 21, 22, 23], '3': [36, 37, 38, 39, 40] } as const;

function rows(path: string): string[][] {
  return readFileSync(path, 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
}

let dir: string;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-gmx-'));
  // the same trajectories with the box removed (zero box vectors / a zero box line), as a vacuum run writes them
  const xtc = Buffer.from(readFileSync(join(FIX, 'rings.xtc')));
  for await (const f of xtcFrames(join(FIX, 'rings.xtc'))) xtc.fill(0, f.offset + 16, f.offset + 52);
  writeFileSync(join(dir, 'nobox.xtc'), xtc);
  const trr = Buffer.from(readFileSync(join(FIX, 'rings.trr')));
  for await (const f of trrFrames(join(FIX, 'rings.trr'))) trr.fill(0, f.offset + 84, f.offset + 120);
  writeFileSync(join(dir, 'nobox.trr'), trr);
  const gro = readFileSync(join(FIX, 'rings.gro'), 'utf8').replace(/^ {3}3\.0{5}.*$/gm, '   0.00000   0.00000   0.00000');
  writeFileSync(join(dir, 'nobox.gro'), gro);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const CASES = [
  ['xtc', 'rings.xtc', 0.02, 0],
  ['trr', 'rings.trr', 1e-4, 0],
  ['gro', 'rings.gro', 0.02, 100],
] as const;

describe('analyzeTrajectory(GROMACS formats)', () => {
  for (const [format, file, tol, start] of CASES) {
    it(`analyzeTrajectory(${format}, wrapped atom by atom) makes each ring whole with the file's box and gives the Q of the unwrapped coordinates, time from the file`, async () => {
      for (const [ring, atoms] of Object.entries(RINGS)) {
        const out = join(dir, `${format}-${ring}`);
        const s = await analyzeTrajectory(join(FIX, file), { dir: out, ring, ...(format === 'gro' ? {} : { topology: join(FIX, 'rings.gro') }) });
        expect(s.source.format).toBe(format);
        expect(s.box).toBe('file');
        expect(s.timestep).toEqual({ value: 2.5, unit: 'ps' });
        expect(s.startTime).toBe(start);
        const table = rows(join(out, 'puckering.csv'));
        expect(table.length).toBe(5);
        table.forEach((r, k) => {
          const cp = cremerPople(atoms.map((a) => ref.whole[k]![a]!) as unknown as Vec3[])!;
          expect(Math.abs(Number(r[2]) - cp.Q)).toBeLessThan(tol);
          expect(Number(r[1])).toBeCloseTo(start + 2.5 * k, 4);
        });
      }
    });

    it(`analyzeTrajectory(${format} without a box) stops at the first split ring with the box message`, async () => {
      const opts = { dir: join(dir, `${format}-nobox`), ring: '2', ...(format === 'gro' ? {} : { topology: join(FIX, 'rings.gro') }) };
      const err = await analyzeTrajectory(join(dir, `nobox.${format}`), opts).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(ConformarkError);
      expect((err as ConformarkError).issues[0]!.message).toMatch(/^ring broken across the periodic box at frame \d \(ring bond \d+-\d+ is [\d.]+ Å\): give the box/);
    });
  }

  it('analyzeTrajectory(xtc) refuses a topology with another atom count and asks for a missing one', async () => {
    const e1 = await analyzeTrajectory(join(FIX, 'rings.xtc'), { dir: join(dir, 'm1'), topology: join(FIX, 'ring.pdb') }).catch((e: unknown) => e);
    expect((e1 as ConformarkError).issues[0]!.message).toBe(`topology has 6 atoms, ${join(FIX, 'rings.xtc')} has 87`);
    const e2 = await analyzeTrajectory(join(FIX, 'rings.trr'), { dir: join(dir, 'm2') }).catch((e: unknown) => e);
    expect((e2 as ConformarkError).code).toBe('no-topology');
  });
});
