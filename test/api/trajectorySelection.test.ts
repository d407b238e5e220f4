import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { cremerPople } from '../../src/geometry/cremerPople.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Vec3 } from '../../src/geometry/vec3.js';

// rings.xtc / rings.gro: two cyclohexanes (CHX 1, 2), a cyclopentane (CPE 3), twelve waters; written by
// MDAnalysis and mdtraj (scripts/fixtures/gromacs.py), `whole` = coordinates before wrapping
const FIX = join(__dirname, '..', 'fixtures', 'md');
const ref = JSON.parse(readFileSync(join(FIX, 'gromacs.json'), 'utf8')) as { whole: number[][][] };
const top = join(FIX, 'rings.gro');
const xtc = join(FIX, 'rings.xtc');

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-sel-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function table(path: string): { header: string[]; rows: string[][] } {
  const [head, ...rest] = readFileSync(path, 'utf8').trim().split('\n');
  return { header: head!.split(','), rows: rest.map((l) => l.split(',')) };
}

async function failure(p: Promise<unknown>): Promise<string> {
  const err = await p.catch((e: unknown) => e);
  expect(err).toBeInstanceOf(ConformarkError);
  return (err as ConformarkError).issues[0]!.message;
}

describe('analyzeTrajectory(residue selections)', () => {
  it('analyzeTrajectory(ring name:CHX,CPE) follows every ring of those residues in one pass, one CSV column set and figure set per ring', async () => {
    const out = join(dir, 'names');
    const s = await analyzeTrajectory(xtc, { dir: out, topology: top, ring: 'name:CHX,CPE' });
    expect(s.rings.map((r) => r.tag)).toEqual(['CHX1', 'CHX2', 'CPE3']);
    expect(s.rings.map((r) => r.atoms)).toEqual([[1, 2, 3, 4, 5, 6], [19, 20, 21, 22, 23, 24], [37, 38, 39, 40, 41]]);
    expect(s.rings[2]!.residue).toEqual({ name: 'CPE', number: 3, insertion: '', chain: '' });
    expect(s.ring.atoms).toEqual(s.rings[0]!.atoms);
    const { header, rows } = table(join(out, 'puckering.csv'));
    expect(header.slice(0, 4)).toEqual(['frame', 'time_ps', 'CHX1_Q', 'CHX1_thetaDeg']);
    expect(header).toContain('CPE3_P');
    expect(header).toContain('CHX2_descriptor');
    for (const r of s.rings) {
      const q = header.indexOf(`${r.tag}_Q`);
      rows.forEach((row, k) => {
        const cp = cremerPople(r.atoms.map((a) => ref.whole[k]![a - 1]!) as unknown as Vec3[])!;
        expect(Math.abs(Number(row[q]) - cp.Q)).toBeLessThan(0.02);
      });
      for (const f of ['pucker-map', 'time-series', 'occupancy']) expect(existsSync(join(out, `${f}-${r.tag}.svg`))).toBe(true);
    }
    expect(s.rings[2]!.occupancy).toEqual({ envelope: 0.6, twist: 0.4 });
  });

  it('analyzeTrajectory(ring /2/ or residue-qualified atoms) follows the ring of that residue only, columns without a prefix', async () => {
    const s = await analyzeTrajectory(xtc, { dir: join(dir, 'res'), topology: top, ring: '/2/' });
    expect(s.rings.length).toBe(1);
    expect(s.ring.atoms).toEqual([19, 20, 21, 22, 23, 24]);
    expect(table(join(dir, 'res', 'puckering.csv')).header[2]).toBe('Q');
    const walk = await analyzeTrajectory(xtc, { dir: join(dir, 'walk'), topology: top, ring: '/CPE3/C1-/3/C2-/3/C3-/3/C4-/3/C5' });
    expect(walk.ring.atoms).toEqual([37, 38, 39, 40, 41]);
  });

  it('analyzeTrajectory(ambiguous atom name, unknown residue name, residue without a ring) says which residues there are', async () => {
    expect(await failure(analyzeTrajectory(xtc, { dir: join(dir, 'e1'), topology: top, ring: 'C1-C2-C3-C4-C5-C6' }))).toMatch(/C1.*ambiguous|ambiguous.*C1/);
    expect(await failure(analyzeTrajectory(xtc, { dir: join(dir, 'e2'), topology: top, ring: 'name:BGC' }))).toBe('no residue named BGC; residue names in the record: CHX, CPE, SOL');
    expect(await failure(analyzeTrajectory(xtc, { dir: join(dir, 'e3'), topology: top, ring: '/4/' }))).toMatch(/SOL4 has no ring/);
  });

  it('analyzeTrajectory(DCD with a PDB topology, ring A/CHX1/) selects by chain and residue name', async () => {
    const s = await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: join(dir, 'pdb'), topology: join(FIX, 'ring.pdb'), ring: 'A/CHX1/' });
    expect(s.rings[0]!.residue).toEqual({ name: 'CHX', number: 1, insertion: '', chain: 'A' });
    expect(s.rings[0]!.label).toBe('A_CHX1 ring 1-2-3-4-5-6');
  });
});
