import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  ensembleFile,
  ensembleOf,
  ensembleText,
  formatSdf,
  isFreeEnergyField,
  prepareRecord,
  ringCouplings,
  isSkippedCoupling,
  writeEnsembleFigures,
  type Molecule,
} from '../../src/index.js';
import { butane } from '../helpers/newmanMolecules.js';
import { cyclohexaneEnsembles, withProperties } from '../helpers/ensembleFiles.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';

const dirs: string[] = [];
const temp = () => {
  const d = mkdtempSync(join(tmpdir(), 'cmk-ens-'));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

const at = (mol: Molecule, index: number): Molecule => ({ ...mol, source: { ...mol.source, index } });

let chairs: Molecule[] = [];
beforeAll(async () => {
  chairs = (await cyclohexaneEnsembles()).mch.slice(0, 2); // equatorial chair, then the flipped (axial) chair
}, 120_000);

describe('ensembleFile', () => {
  it('ensembleFile gives butane x_gauche = 0.3963 at ΔE 0.66 kcal/mol with g = 2 from a degeneracy field (derived, docs/methods.md#boltzmann)', async () => {
    const path = join(temp(), 'butane.sdf');
    const anti = withProperties(butane(180), { 'energy (kcal/mol)': '-3.20', g: '1' }, 'anti');
    const gauche = withProperties(butane(65), { 'energy (kcal/mol)': '-2.54', g: '2' }, 'gauche');
    writeFileSync(path, formatSdf([gauche, anti]));
    const { report, errors } = await ensembleFile(path, { degeneracyField: 'g' });
    expect(errors).toEqual([]);
    expect(report.conformers.map((c) => c.title)).toEqual(['anti', 'gauche']);
    const g = report.conformers[1]!;
    expect(g.record).toBe(1);
    expect(g.relativeEnergy).toBeCloseTo(0.66, 10);
    expect(g.degeneracy).toBe(2);
    expect(Math.abs(g.population - 0.3963) / 0.3963).toBeLessThan(1e-4);
    expect(report.notes.join(' ')).toMatch(/not free energies/);
    expect(report.notes.join(' ')).toMatch(/degeneracies from field 'g'/);
  });

  it('ensembleFile gives methylcyclohexane x_eq = 0.9496 at A = 1.74 kcal/mol, also from energies given in kJ/mol (derived, docs/methods.md#boltzmann)', async () => {
    const eq = withProperties(chairs[0]!, { energy_kcal: '0' });
    const ax = withProperties(chairs[1]!, { energy_kcal: '1.74' });
    const { report } = ensembleOf([at(ax, 1), at(eq, 2)]);
    expect(report.conformers[0]!.record).toBe(2);
    expect(Math.abs(report.conformers[0]!.population - 0.9496) / 0.9496).toBeLessThan(1e-4);
    expect(report.conformers.map((c) => c.rings[0]!.shape)).toEqual(['chair', 'chair']);
    const kj = ensembleOf([at(withProperties(eq, { E: '0' }), 1), at(withProperties(ax, { E: String(1.74 * 4.184) }), 2)], { energy: { unit: 'kJ/mol' } });
    expect(kj.report.conformers[0]!.population).toBeCloseTo(0.9496, 4);
    expect(kj.report.notes.join(' ')).toMatch(/converted to kcal\/mol from kJ\/mol/);
  });

  it('ensembleOf merges a duplicate: duplicateOf names the lower record, population 0, the others unchanged', () => {
    const eq = withProperties(chairs[0]!, { 'energy (kcal/mol)': '0' });
    const ax = withProperties(chairs[1]!, { 'energy (kcal/mol)': '1.74' });
    const again = withProperties(chairs[0]!, { 'energy (kcal/mol)': '0.02' });
    const { report } = ensembleOf([at(eq, 1), at(ax, 2), at(again, 3)]);
    const dup = report.conformers.find((c) => c.record === 3)!;
    expect(dup.duplicateOf).toBe(1);
    expect(dup.population).toBe(0);
    expect(report.conformers.find((c) => c.record === 1)!.population).toBeCloseTo(0.9496, 4);
    expect(report.notes.join(' ')).toMatch(/heavy-atom RMSD after optimal superposition .* 0\.125 Å/);
    expect(report.notes.join(' ')).toMatch(/weight is not added/);
    expect(ensembleText(report)).toMatch(/dup of r01/);
  });

  it('ensembleOf averages J over conformers with their populations (⟨J⟩ = Σ p_i J_i, docs/methods.md#boltzmann)', () => {
    const eq = at(withProperties(chairs[0]!, { 'energy (kcal/mol)': '0' }), 1);
    const ax = at(withProperties(chairs[1]!, { 'energy (kcal/mol)': '1.74' }), 2);
    const { report } = ensembleOf([eq, ax]);
    const j = [eq, ax].map((m) => {
      const p = prepareRecord(m);
      return new Map(ringCouplings(p.molecule, p.graph, p.rings[0]!).filter((c) => !isSkippedCoupling(c)).map((c) => [`${c.front + 1}-${c.back + 1}`, 'jHz' in c ? c.jHz : 0]));
    });
    expect(report.averages.couplings.length).toBeGreaterThan(0);
    const [p1, p2] = report.conformers.map((c) => c.population);
    for (const c of report.averages.couplings) {
      const key = `${c.front}-${c.back}`;
      expect(c.jHz).toBeCloseTo(p1! * j[0]!.get(key)! + p2! * j[1]!.get(key)!, 10);
      expect(c.method).toBe('haasnoot-1980');
    }
  });

  it('isFreeEnergyField recognises free-energy field names and nothing else', () => {
    expect(['G (kcal/mol)', 'free energy', 'Gibbs_kcal', 'dG', 'ΔG_kJ'].every(isFreeEnergyField)).toBe(true);
    expect(['energy', 'MMFF94s energy (kcal/mol)', 'Energy_kcal', 'E'].some(isFreeEnergyField)).toBe(false);
  });

  it('ensembleFile reports a record without an energy and ranks the rest', async () => {
    const path = join(temp(), 'partial.sdf');
    writeFileSync(path, formatSdf([withProperties(butane(180), { 'energy (kcal/mol)': '0' }), withProperties(butane(65), {}), withProperties(butane(-65), { 'energy (kcal/mol)': '0.66' })]));
    const { report, errors } = await ensembleFile(path);
    expect(errors.map((e) => [e.record, e.code])).toEqual([[2, 'no-energy']]);
    expect(report.conformers.map((c) => c.record)).toEqual([1, 3]);
  });

  it('ensembleFile refuses energies without a unit with one line asking for --energy-unit, and takes the option', async () => {
    const path = join(temp(), 'nounit.sdf');
    writeFileSync(path, formatSdf([withProperties(butane(180), { energy: '0' }), withProperties(butane(65), { energy: '0.66' })]));
    const refusal = await ensembleFile(path).catch((e: unknown) => e as Error);
    expect(refusal).toMatchObject({ code: 'energy-unit-unknown' });
    expect((refusal as Error).message).toMatch(/record 1: the energy in 'energy' has no unit: give it with --energy-unit/);
    expect((refusal as Error).message).not.toContain('\n');
    const { report } = await ensembleFile(path, { energy: { unit: 'kcal/mol' } });
    expect(report.conformers.map((c) => c.relativeEnergy)).toEqual([0, 0.66]);
    expect(report.notes).toContain('energy unit as given');
  });

  it('ensembleOf reads a semiempirical XYZ ensemble as hartree and warns when the spread looks like the wrong unit', () => {
    const xyz = (e: string, t: number) => ({ ...butane(t), title: ` energy: ${e} gnorm: 0.0003 xtb: 6.6.1` });
    const right = ensembleOf([at(xyz('-13.0000', 180), 1), at(xyz('-12.9990', 65), 2)]);
    expect(right.report.conformers[1]!.relativeEnergy).toBeCloseTo(0.6275, 4); // 0.001 Eh
    expect(right.warnings).toEqual([]);
    expect(right.report.notes.some((n) => n.includes("'energy: … gnorm: …'"))).toBe(true);
    // the same file forced to kcal/mol: a spread of 0.001 kcal/mol is implausible
    const wrong = ensembleOf([at(xyz('-13.0000', 180), 1), at(xyz('-12.9990', 65), 2)], { energy: { unit: 'kcal/mol' } });
    expect(wrong.warnings.map((w) => w.warning.code)).toEqual(['energy-spread-implausible']);
    expect(wrong.warnings[0]!.warning.message).toBe('relative energies span 0.0010 kcal/mol (read as kcal/mol); that looks like the wrong unit: check --energy-unit');
  });

  it('writeEnsembleFigures writes a well-formed sheet in energy order and an energy ladder', () => {
    const result = ensembleOf([at(withProperties(chairs[1]!, { 'energy (kcal/mol)': '1.74' }), 1), at(withProperties(chairs[0]!, { 'energy (kcal/mol)': '0' }), 2)]);
    const dir = temp();
    expect(writeEnsembleFigures({ ...result, errors: [] }, dir, { idPrefix: 'x-' })).toEqual(['ensemble-sheet-1.svg', 'energy-ladder.svg']);
    const sheet = readFileSync(join(dir, 'ensemble-sheet-1.svg'), 'utf8');
    const ladder = readFileSync(join(dir, 'energy-ladder.svg'), 'utf8');
    expect(xmlProblems(sheet)).toEqual([]);
    expect(xmlProblems(ladder)).toEqual([]);
    // one row per conformer, lowest first, each headed by record, ring form, ΔE and population
    expect([...sheet.matchAll(/class="row-heading"/g)]).toHaveLength(2);
    expect(sheet.indexOf('ΔE 0.00 kcal/mol · 95.0 %')).toBeGreaterThan(0);
    expect(sheet.indexOf('ΔE 1.74 kcal/mol · 5.0 %')).toBeGreaterThan(sheet.indexOf('ΔE 0.00 kcal/mol · 95.0 %'));
    expect(ladder).toContain('ΔE (kcal/mol)');
    expect([...ladder.matchAll(/class="level"/g)]).toHaveLength(2);
  });
});
