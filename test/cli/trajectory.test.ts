import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseText } from '../../src/io/parseText.js';
import { formatSdf } from '../../src/io/writeSdf.js';
import { withBonds } from '../../src/perceive/withBonds.js';
import { sixRingWalk, walkXyz } from '../helpers/puckerWalk.js';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });
let dir: string;
const walk = sixRingWalk();

/** Multi-MODEL PDB of the same frames (HETATM records in fixed columns). */
function toPdb(xyz: string): string {
  const mols = parseText(xyz, { format: 'xyz' });
  const out: string[] = [];
  mols.forEach((m, k) => {
    out.push(`MODEL     ${String(k + 1).padStart(4)}`);
    m.atoms.forEach((a, i) => {
      const [x, y, z] = [0, 1, 2].map((d) => m.coords[3 * i + d]!.toFixed(3).padStart(8));
      const name = `${a.element}${i + 1}`.padEnd(3);
      out.push(`HETATM${String(i + 1).padStart(5)}  ${name} CHX A   1    ${x}${y}${z}  1.00  0.00          ${a.element.padStart(2)}`);
    });
    out.push('ENDMDL');
  });
  return `${out.join('\n')}\nEND\n`;
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-trajcli-'));
  const xyz = walkXyz(walk);
  writeFileSync(join(dir, 'walk.xyz.gz'), gzipSync(xyz));
  writeFileSync(join(dir, 'walk.pdb'), toPdb(xyz));
  writeFileSync(join(dir, 'walk.sdf'), formatSdf(parseText(xyz, { format: 'xyz' }).map((m) => withBonds(m))));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('conformark trajectory', () => {
  it('conformark trajectory walk.xyz.gz --ring 1 -d DIR --timestep 2 ps writes the table, summary and figures', () => {
    const out = join(dir, 'x');
    const r = run('trajectory', join(dir, 'walk.xyz.gz'), '--ring', '1', '-d', out, '--timestep', '2', 'ps', '--torsion', '1-2-3-4', '--formats', 'svg,pdf');
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('128 frames analysed');
    for (const f of ['puckering.csv', 'summary.json', 'pucker-map.svg', 'pucker-map.pdf', 'time-series.svg', 'occupancy.pdf']) expect(existsSync(join(out, f))).toBe(true);
    expect(readFileSync(join(out, 'puckering.csv'), 'utf8').split('\n')[0]).toBe('frame,time_ps,Q,thetaDeg,phiDeg,shape,descriptor,torsion_1_2_3_4');
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(s.occupancy.chair).toBeCloseTo(80 / 128, 4);
    expect(s.dwell.chair.longestTime).toBe(100);
  });

  it('conformark trajectory reads multi-MODEL PDB and multi-record SDF with the same results as XYZ', () => {
    const tables = ['walk.xyz.gz', 'walk.pdb', 'walk.sdf'].map((f, k) => {
      const out = join(dir, `m${k}`);
      const r = run('trajectory', join(dir, f), '--ring', '1-2-3-4-5-6', '-d', out);
      expect(r.status, r.stderr).toBe(0);
      return readFileSync(join(out, 'puckering.csv'), 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
    });
    for (const t of tables.slice(1)) {
      expect(t.map((c) => `${c[0]} ${c[5]}`)).toEqual(tables[0]!.map((c) => `${c[0]} ${c[5]}`)); // frame and shape
      // PDB keeps 3 decimals of the coordinates: angles agree to a few hundredths of a degree
      t.forEach((c, i) => expect(Math.abs(Number(c[3]) - Number(tables[0]![i]![3]))).toBeLessThan(0.2));
    }
  });

  it('conformark trajectory with a bad frame, a bad ring or a bad option exits 2 with one line', () => {
    const lines = walkXyz(walk.slice(0, 30)).split('\n');
    lines[20 * 20 + 5] = 'C 1.0 inf 0.0';
    writeFileSync(join(dir, 'bad.xyz'), lines.join('\n'));
    const bad = run('trajectory', join(dir, 'bad.xyz'), '-d', join(dir, 'b1'));
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(new RegExp(`^conformark: ${join(dir, 'bad.xyz')}:${20 * 20 + 6}: frame 21: y coordinate 'inf' is not (a number|finite)\n$`));
    const ring = run('trajectory', join(dir, 'walk.sdf'), '--ring', '3', '-d', join(dir, 'b2'));
    expect(ring.status).toBe(2);
    expect(ring.stderr).toMatch(/ring 3 does not exist \(the record has 1 ring\)/);
    const stride = run('trajectory', join(dir, 'walk.sdf'), '--stride', '0', '-d', join(dir, 'b3'));
    expect(stride.status).toBe(2);
    expect(stride.stderr).toBe('conformark: --stride expects a whole number from 1, got "0"\n');
    const fmt = run('trajectory', join(dir, 'walk.sdf'), '--formats', 'gif', '-d', join(dir, 'b4'));
    expect(fmt.stderr).toMatch(/--formats expects one of svg, png, pdf/);
  });

  it('trajectory FILE.dcd --topology PDB reads the DCD with its cell; without --topology it exits 2 with one line', () => {
    const fix = join('test', 'fixtures', 'md');
    const ok = run('trajectory', join(fix, 'ring.dcd'), '--topology', join(fix, 'ring.pdb'), '-d', join(dir, 'dcd'));
    expect(ok.status).toBe(0);
    expect(ok.stdout).toMatch(/^5 frames analysed \(1-2-3-4-5-6\): chair 100\.0%/);
    const noTop = run('trajectory', join(fix, 'ring.dcd'), '-d', join(dir, 'dcd2'));
    expect(noTop.status).toBe(2);
    expect(noTop.stderr).toMatch(/^conformark: .*holds coordinates only: give the atoms with --topology FILE/);
    const badBox = run('trajectory', join(fix, 'ring.dcd'), '--topology', join(fix, 'ring.pdb'), '--box', '0 1 1', '-d', join(dir, 'dcd3'));
    expect(badBox.status).toBe(2);
    expect(badBox.stderr.split('\n').length).toBe(2);
  });
});
