import { describe, expect, it } from 'vitest';
import { energySpreadWarning, findEnergy, normalizeEnergyUnit, toKcalPerMol } from '../../src/io/energy.js';
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
      value: -12.5, unit: 'kcal/mol', unitFrom: 'value', field: 'MMFF94 Energy', warning: null,
    });
  });

  it('findEnergy(mol) reads the unit from the field name (kJ, Eh, eV, hartree)', () => {
    expect(findEnergy(mol({ energy_kJ: '-40' }))?.unit).toBe('kJ/mol');
    expect(findEnergy(mol({ EnergyEh: '-1.5' }))?.unit).toBe('hartree');
    expect(findEnergy(mol({ 'energy [eV]': '0.2' }))?.unit).toBe('eV');
    expect(findEnergy(mol({ 'total energy (hartree)': '-1.5' }))?.unit).toBe('hartree');
    expect(findEnergy(mol({ E: '-3.0 Eh' }))).toMatchObject({ unit: 'hartree', field: 'E', value: -3 });
  });

  it('findEnergy(mol) never guesses: a unit-less value has unit null and a warning asking for the unit', () => {
    const e = findEnergy(mol({ energy: '-7.25' }))!;
    expect(e).toMatchObject({ value: -7.25, unit: null, unitFrom: null });
    expect(e.warning).toEqual({
      code: 'energy-unit-unknown',
      message: "the energy in 'energy' has no unit: give it with --energy-unit (library: energy.unit) or put it in the SD field name, e.g. 'energy (kcal/mol)'",
    });
    expect(findEnergy(mol({ energy: '-7.25' }), { unit: 'kJ' })).toMatchObject({ unit: 'kJ/mol', unitFrom: 'option', warning: null });
  });

  const xyz = (comment: string) => parseText(`1\n${comment}\nH 0 0 0\n`, { file: 't.xyz' })[0]!;
  const kcal = (e: ReturnType<typeof findEnergy>) => toKcalPerMol(e!.value, e!.unit!);

  it('findEnergy(xyz) reads the semiempirical comment "energy: … gnorm: …" as hartree (-44.99 Eh = -28231.65 kcal/mol)', () => {
    const e = findEnergy(xyz(' energy: -44.990000000000 gnorm: 0.000412345678 xtb: 6.6.1 (8d0f1dd)'))!;
    expect(e).toMatchObject({ value: -44.99, unit: 'hartree', unitFrom: 'semiempirical-comment', field: 'title', warning: null });
    expect(kcal(e)).toBeCloseTo(-28231.651, 2);
  });

  it('findEnergy(xyz) reads a comment holding one decimal number (conformer-search ensembles) as hartree', () => {
    const e = findEnergy(xyz('  -40.123456'))!;
    expect(e).toMatchObject({ value: -40.123456, unit: 'hartree', unitFrom: 'conformer-ensemble-comment', warning: null });
    expect(kcal(e)).toBeCloseTo(-25177.84, 1);
    expect(findEnergy(xyz('42'))).toBeNull(); // a whole number is a title, not an energy
  });

  it('findEnergy(xyz) reads a quantum-chemistry trajectory comment "Coordinates from … E …" as hartree', () => {
    const e = findEnergy(xyz('Coordinates from ORCA-job opt E -232.123456789012'))!;
    expect(e).toMatchObject({ value: -232.123456789012, unit: 'hartree', unitFrom: 'quantum-trajectory-comment' });
    expect(kcal(e)).toBeCloseTo(-145659.67, 1);
  });

  it('findEnergy(xyz) reads extended-XYZ energy= (with Properties= or Lattice=) as eV: -1.5 eV = -34.59 kcal/mol', () => {
    const e = findEnergy(xyz('Properties=species:S:1:pos:R:3 energy=-1.5 pbc="F F F"'))!;
    expect(e).toMatchObject({ value: -1.5, unit: 'eV', unitFrom: 'extended-xyz', field: 'energy' });
    expect(kcal(e)).toBeCloseTo(-34.5908, 3);
    const lattice = findEnergy(xyz('Lattice="10 0 0 0 10 0 0 0 10" free_energy=-2.0'))!;
    expect(lattice).toMatchObject({ unit: 'eV', field: 'free_energy' });
    // without the extended-XYZ keys nothing says eV: unknown
    expect(findEnergy(xyz('frame 1 energy=-1.5'))).toMatchObject({ unit: null, warning: { code: 'energy-unit-unknown' } });
  });

  it('findEnergy(sdf) reads r_mmod_…Energy… fields (a modelling suite) as kJ/mol: 41.84 kJ/mol = 10 kcal/mol', () => {
    const e = findEnergy(mol({ 'r_mmod_Potential_Energy-MMFF94s': '41.84' }))!;
    expect(e).toMatchObject({ unit: 'kJ/mol', unitFrom: 'modelling-suite-field' });
    expect(kcal(e)).toBeCloseTo(10, 10);
  });

  it('findEnergy(xyz frame) reads energy=value with a unit word after it; a unit-less "energy: x" phrase is unknown', () => {
    const [a, c] = parseText('1\nframe 1 energy=-76.4 kcal\nH 0 0 0\n1\n energy -12.0\nH 0 0 0\n', { file: 't.xyz' });
    expect(findEnergy(a!)).toMatchObject({ value: -76.4, unit: 'kcal/mol', unitFrom: 'value', field: 'energy', warning: null });
    expect(findEnergy(c!)).toMatchObject({ value: -12, field: 'title', unit: null });
  });

  it('energySpreadWarning(kcal) warns below 0.01 and above 1,000 kcal/mol, not between', () => {
    expect(energySpreadWarning([-28231.15, -28231.146], 'kcal/mol')).toMatchObject({ code: 'energy-spread-implausible' });
    expect(energySpreadWarning([0, 3137], 'hartree')!.message).toBe(
      'relative energies span 3137 kcal/mol (read as hartree); that looks like the wrong unit: check --energy-unit',
    );
    expect(energySpreadWarning([0, 0.5, 4.2], 'kcal/mol')).toBeNull();
    expect(energySpreadWarning([5], 'kcal/mol')).toBeNull();
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
