import { describe, expect, it } from 'vitest';
import { findEnergy, normalizeEnergyUnit, toKcalPerMol } from '../../src/io/energy.js';
import { parseText } from '../../src/io/parseText.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Molecule } from '../../src/model/molecule.js';

const mol = (properties: Record<string, string>, title = 'm'): Molecule => ({
  title,
  atoms: [],
  coords: new Float64Array(0),
  bonds: null,
  properties,
  source: { file: 'f.sdf', format: 'sdf', index: 3, line: 10 },
});

describe('findEnergy', () => {
  it('findEnergy(mol) takes the first field whose name contains "energy", unit from the value', () => {
    expect(findEnergy(mol({ name: 'x', 'MMFF94 Energy': '-12.5 kcal/mol', energy2: '3' }))).toEqual({
      value: -12.5, unit: 'kcal/mol', field: 'MMFF94 Energy', warning: null,
    });
  });

  it('findEnergy(mol) reads the unit from the field name (kJ, Eh, eV, hartree)', () => {
    expect(findEnergy(mol({ energy_kJ: '-40' }))?.unit).toBe('kJ/mol');
    expect(findEnergy(mol({ EnergyEh: '-1.5' }))?.unit).toBe('hartree');
    expect(findEnergy(mol({ 'energy [eV]': '0.2' }))?.unit).toBe('eV');
    expect(findEnergy(mol({ 'total energy (hartree)': '-1.5' }))?.unit).toBe('hartree');
    expect(findEnergy(mol({ E: '-3.0 Eh' }))).toMatchObject({ unit: 'hartree', field: 'E', value: -3 });
  });

  it('findEnergy(mol) warns when the unit is assumed (kcal/mol)', () => {
    const e = findEnergy(mol({ energy: '-7.25' }))!;
    expect(e.unit).toBe('kcal/mol');
    expect(e.warning).toEqual({
      code: 'energy-unit-assumed',
      message: "record 3: the energy in 'energy' has no unit; assumed kcal/mol (give the unit with the energy unit option)",
    });
    expect(findEnergy(mol({ energy: '-7.25' }), { unit: 'kJ' })).toMatchObject({ unit: 'kJ/mol', warning: null });
  });

  it('findEnergy(xyz frame) reads energy=value with a unit word after it, and bare-number comments as hartree', () => {
    const [a, b, c] = parseText(
      '1\nframe 1 energy=-76.4 kcal\nH 0 0 0\n1\n  -40.123456\nH 0 0 0\n1\n energy: -12.0 gnorm: 0.001\nH 0 0 0\n',
      { file: 't.xyz' },
    );
    expect(findEnergy(a!)).toMatchObject({ value: -76.4, unit: 'kcal/mol', field: 'energy', warning: null });
    expect(findEnergy(b!)).toMatchObject({ value: -40.123456, unit: 'hartree', field: 'title' });
    expect(findEnergy(b!)!.warning?.code).toBe('energy-unit-assumed');
    expect(findEnergy(c!)).toMatchObject({ value: -12, field: 'title' });
  });

  it('findEnergy(mol, {field}) names the field; a missing or non-numeric one is a user error', () => {
    expect(findEnergy(mol({ dE: '1.5', energy: '9' }), { field: 'de' })?.value).toBe(1.5);
    expect(() => findEnergy(mol({ a: '1' }), { field: 'E_mmff' })).toThrow(
      new ConformarkError({ code: 'missing-energy-field', file: 'f.sdf', line: 10, message: "record 3 has no field 'E_mmff'; its fields are 'a'" }),
    );
    expect(() => findEnergy(mol({ E_mmff: 'n/a' }), { field: 'E_mmff' })).toThrow("field 'E_mmff' of record 3 is not a number: 'n/a'");
    expect(() => findEnergy(mol({}), { unit: 'furlong' })).toThrow(/unknown energy unit 'furlong'/);
  });

  it('findEnergy(mol) is null without an energy, and skips non-numeric energy fields', () => {
    expect(findEnergy(mol({ name: 'x' }))).toBeNull();
    expect(findEnergy(mol({ energy_method: 'MMFF94s' }))).toBeNull();
    expect(findEnergy(mol({}, '42'))).toBeNull();
  });

  it('toKcalPerMol(value, unit) uses 4.184 J/cal and CODATA 2018 (Tiesinga et al. 2021, Rev. Mod. Phys.)', () => {
    expect(toKcalPerMol(1, 'hartree')).toBeCloseTo(627.5095, 4);
    expect(toKcalPerMol(4.184, 'kJ/mol')).toBeCloseTo(1, 12);
    expect(toKcalPerMol(1, 'eV')).toBeCloseTo(23.0605, 4);
    expect(toKcalPerMol(-3, 'kcal/mol')).toBe(-3);
  });

  it('normalizeEnergyUnit(word) maps the usual spellings', () => {
    expect(['kcal', 'kcal/mol', 'KCAL·MOL-1', 'kJ/mol', 'Eh', 'au', 'a.u.', 'Hartree', 'eV', '(kcal/mol)', 'cm-1'].map(normalizeEnergyUnit)).toEqual(
      ['kcal/mol', 'kcal/mol', 'kcal/mol', 'kJ/mol', 'hartree', 'hartree', 'hartree', 'hartree', 'eV', 'kcal/mol', null],
    );
  });
});
