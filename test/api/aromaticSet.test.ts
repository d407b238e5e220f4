/**
 * A 50-ligand aromatic set (openchemlib ConformerGenerator 3D structures minimised with MMFF94s, and openchemlib's own 2D molfiles):
 * default batch and inspect stay quiet about flat aromatic rings, draw no Newman projection of a bond inside an
 * aromatic ring, and say once that 2D coordinates carry no conformation.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConformerGenerator, ForceFieldMMFF94, Molecule as OclMolecule, Resources } from 'openchemlib';
import { batchFile, formatSdf, formatXyz, inspectFile, type Molecule } from '../../src/index.js';
import { fromOpenchemlib } from '../helpers/fromOpenchemlib.js';

// drug-like aromatic ligands of our own choosing; several carry saturated rings whose bonds must still be drawn
const SMILES = [
  'c1ccccc1', 'Cc1ccccc1', 'Oc1ccccc1', 'Nc1ccccc1', 'Clc1ccc(Cl)cc1', 'COc1ccc(O)cc1', 'c1ccncc1', 'Cc1ccncc1',
  'c1ccc2ccccc2c1', 'c1ccc2[nH]ccc2c1', 'c1ccoc1', 'c1ccsc1', 'c1cc[nH]c1', 'c1cnc[nH]1', 'c1ccc(cc1)c1ccccc1',
  'OC(=O)c1ccccc1', 'CC(=O)Nc1ccc(O)cc1', 'CC(=O)Oc1ccccc1C(=O)O', 'Nc1ccc(cc1)S(N)(=O)=O', 'c1ccc2ncccc2c1',
  'c1ccc2occc2c1', 'c1ccc2sccc2c1', 'Fc1ccc(F)cc1', 'Brc1ccccc1', 'N#Cc1ccccc1', 'O=Cc1ccccc1', 'CCc1ccccc1',
  'c1ccc(cc1)C1CCCCC1', 'c1ccc(cc1)N1CCOCC1', 'c1ccc(cc1)N1CCNCC1', 'O=C1CCCN1c1ccccc1', 'c1ccc(cc1)C1CCCC1',
  'Cc1cc(C)cc(C)c1', 'c1cnccn1', 'c1cncnc1', 'c1ccnnc1', 'Cn1cnc2c1c(=O)n(C)c(=O)n2C', 'c1ccc2c(c1)ccc1ccccc12',
  'Oc1ccc(cc1)C(=O)O', 'COc1ccccc1OC', 'c1ccc(cc1)Oc1ccccc1', 'c1ccc(cc1)Cc1ccccc1', 'Nc1ncnc2[nH]cnc12',
  'O=c1cc[nH]c(=O)[nH]1', 'Cc1ccc(cc1)S(=O)(=O)N', 'c1ccc2c(c1)[nH]c1ccccc12', 'CC(C)Cc1ccc(cc1)C(C)C(=O)O',
  'c1ccc(nc1)c1ccccn1', 'OCc1ccccc1', 'c1ccc(cc1)C1CCOC1',
];

const dirs: string[] = [];
const temp = () => {
  const d = mkdtempSync(join(tmpdir(), 'cmk-arom-'));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

let three: Molecule[] = [];
const aromaticPairs: Set<string>[] = [];
let sdf3 = '';
let xyz3 = '';
let sdf2 = '';
beforeAll(() => {
  Resources.registerFromNodejs();
  three = SMILES.map((smiles, k) => {
    const base = OclMolecule.fromSmiles(smiles);
    const conf = new ConformerGenerator(100 + k).getOneConformerAsMolecule(base)!;
    new ForceFieldMMFF94(conf, 'MMFF94s').minimise();
    conf.ensureHelperArrays(OclMolecule.cHelperRings);
    const pairs = new Set<string>();
    for (let b = 0; b < conf.getAllBonds(); b++) {
      if (conf.isAromaticBond(b)) pairs.add([conf.getBondAtom(0, b) + 1, conf.getBondAtom(1, b) + 1].sort((x, y) => x - y).join('-'));
    }
    aromaticPairs.push(pairs);
    return { ...fromOpenchemlib(conf, smiles), source: { file: 'set', format: 'sdf' as const, index: k + 1, line: 1 } };
  });
  const dir = temp();
  sdf3 = join(dir, 'ligands-3d.sdf');
  xyz3 = join(dir, 'ligands-3d.xyz');
  sdf2 = join(dir, 'ligands-2d.sdf');
  writeFileSync(sdf3, formatSdf(three));
  writeFileSync(xyz3, formatXyz(three));
  // openchemlib's own 2D depiction coordinates, every z 0
  writeFileSync(sdf2, SMILES.map((s) => `${OclMolecule.fromSmiles(s).toMolfile().replace(/\n?$/, '\n')}$$$$\n`).join(''));
}, 120_000);

describe('batch and inspect on a 50-ligand aromatic set', () => {
  it.each([['SD file with bond orders', () => sdf3], ['XYZ file (bonds and flatness from geometry)', () => xyz3]])(
    'batchFile(%s) warns about no nearly planar ring and draws no Newman of an aromatic bond, but draws saturated rings',
    async (_, file) => {
      const { manifest, warnings } = await batchFile(file(), temp(), { sheet: false, tables: [] });
      expect(manifest.errors).toEqual([]);
      expect(warnings.filter((w) => w.warning.code === 'ring-nearly-planar').map((w) => `${w.record} ${w.warning.message}`)).toEqual([]);
      const newman = manifest.figures.filter((f) => f.kind === 'newman');
      for (const f of newman) expect(aromaticPairs[f.record! - 1]!.has([...f.bond!].sort((x, y) => x - y).join('-'))).toBe(false);
      // the saturated rings (cyclohexyl, morpholine, piperazine, pyrrolidinone, cyclopentyl, oxolane) keep theirs
      const withNewman = new Set(newman.map((f) => f.record));
      for (const s of ['c1ccc(cc1)C1CCCCC1', 'c1ccc(cc1)N1CCOCC1', 'c1ccc(cc1)C1CCCC1', 'c1ccc(cc1)C1CCOC1']) {
        expect(withNewman.has(SMILES.indexOf(s) + 1)).toBe(true);
      }
      expect(warnings.some((w) => w.warning.code === 'two-dimensional-input')).toBe(false);
    },
    120_000,
  );

  it('batchFile(sp2Bonds) draws the aromatic ring bonds on request', async () => {
    const { manifest } = await batchFile(sdf3, temp(), { sheet: false, tables: [], sp2Bonds: true });
    const benzene = manifest.figures.filter((f) => f.kind === 'newman' && f.record === 1);
    expect(benzene).toHaveLength(6);
  }, 120_000);

  it('batchFile and inspectFile of the 2D file say "2D coordinates" exactly once and nothing about planar rings', async () => {
    const { warnings } = await batchFile(sdf2, temp(), { sheet: false, tables: [] });
    const flat = warnings.filter((w) => w.warning.code === 'two-dimensional-input');
    expect(flat).toEqual([{ record: 1, warning: { code: 'two-dimensional-input', message: '2D coordinates: conformations need 3D input' } }]);
    expect(warnings.filter((w) => w.warning.code === 'ring-nearly-planar')).toEqual([]);
    const report = await inspectFile(sdf2);
    const all = report.records.flatMap((r) => r.warnings.map((w) => w.code));
    expect(all.filter((c) => c === 'two-dimensional-input')).toHaveLength(1);
    expect(all).not.toContain('ring-nearly-planar');
  }, 120_000);
});
