/**
 * Elements table: symbol, atomic number, standard atomic mass (IUPAC, rounded) and covalent radius in Å.
 * Radii: Cordero et al. 2008, Dalton Trans. 2832 (C is the sp3 value; Mn, Fe, Co low-spin values).
 * Elements without a Cordero value are absent; an unknown symbol is an input error.
 */

export interface ElementInfo {
  readonly symbol: string;
  readonly z: number;
  readonly mass: number;
  /** Cordero et al. 2008 covalent radius, Å. */
  readonly radius: number;
}

// symbol, Z, mass, Cordero radius
const TABLE: readonly (readonly [string, number, number, number])[] = [
  ['H', 1, 1.008, 0.31], ['He', 2, 4.0026, 0.28], ['Li', 3, 6.94, 1.28], ['Be', 4, 9.0122, 0.96],
  ['B', 5, 10.81, 0.84], ['C', 6, 12.011, 0.76], ['N', 7, 14.007, 0.71], ['O', 8, 15.999, 0.66],
  ['F', 9, 18.998, 0.57], ['Ne', 10, 20.18, 0.58], ['Na', 11, 22.99, 1.66], ['Mg', 12, 24.305, 1.41],
  ['Al', 13, 26.982, 1.21], ['Si', 14, 28.085, 1.11], ['P', 15, 30.974, 1.07], ['S', 16, 32.06, 1.05],
  ['Cl', 17, 35.45, 1.02], ['Ar', 18, 39.95, 1.06], ['K', 19, 39.098, 2.03], ['Ca', 20, 40.078, 1.76],
  ['Sc', 21, 44.956, 1.7], ['Ti', 22, 47.867, 1.6], ['V', 23, 50.942, 1.53], ['Cr', 24, 51.996, 1.39],
  ['Mn', 25, 54.938, 1.39], ['Fe', 26, 55.845, 1.32], ['Co', 27, 58.933, 1.26], ['Ni', 28, 58.693, 1.24],
  ['Cu', 29, 63.546, 1.32], ['Zn', 30, 65.38, 1.22], ['Ga', 31, 69.723, 1.22], ['Ge', 32, 72.63, 1.2],
  ['As', 33, 74.922, 1.19], ['Se', 34, 78.971, 1.2], ['Br', 35, 79.904, 1.2], ['Kr', 36, 83.798, 1.16],
  ['Rb', 37, 85.468, 2.2], ['Sr', 38, 87.62, 1.95], ['Y', 39, 88.906, 1.9], ['Zr', 40, 91.224, 1.75],
  ['Nb', 41, 92.906, 1.64], ['Mo', 42, 95.95, 1.54], ['Tc', 43, 98, 1.47], ['Ru', 44, 101.07, 1.46],
  ['Rh', 45, 102.91, 1.42], ['Pd', 46, 106.42, 1.39], ['Ag', 47, 107.87, 1.45], ['Cd', 48, 112.41, 1.44],
  ['In', 49, 114.82, 1.42], ['Sn', 50, 118.71, 1.39], ['Sb', 51, 121.76, 1.39], ['Te', 52, 127.6, 1.38],
  ['I', 53, 126.9, 1.39], ['Xe', 54, 131.29, 1.4], ['Cs', 55, 132.91, 2.44], ['Ba', 56, 137.33, 2.15],
  ['La', 57, 138.91, 2.07], ['Ce', 58, 140.12, 2.04], ['Pr', 59, 140.91, 2.03], ['Nd', 60, 144.24, 2.01],
  ['Pm', 61, 145, 1.99], ['Sm', 62, 150.36, 1.98], ['Eu', 63, 151.96, 1.98], ['Gd', 64, 157.25, 1.96],
  ['Tb', 65, 158.93, 1.94], ['Dy', 66, 162.5, 1.92], ['Ho', 67, 164.93, 1.92], ['Er', 68, 167.26, 1.89],
  ['Tm', 69, 168.93, 1.9], ['Yb', 70, 173.05, 1.87], ['Lu', 71, 174.97, 1.87], ['Hf', 72, 178.49, 1.75],
  ['Ta', 73, 180.95, 1.7], ['W', 74, 183.84, 1.62], ['Re', 75, 186.21, 1.51], ['Os', 76, 190.23, 1.44],
  ['Ir', 77, 192.22, 1.41], ['Pt', 78, 195.08, 1.36], ['Au', 79, 196.97, 1.36], ['Hg', 80, 200.59, 1.32],
  ['Tl', 81, 204.38, 1.45], ['Pb', 82, 207.2, 1.46], ['Bi', 83, 208.98, 1.48], ['Po', 84, 209, 1.4],
  ['At', 85, 210, 1.5], ['Rn', 86, 222, 1.5], ['Fr', 87, 223, 2.6], ['Ra', 88, 226, 2.21],
  ['Ac', 89, 227, 2.15], ['Th', 90, 232.04, 2.06], ['Pa', 91, 231.04, 2.0], ['U', 92, 238.03, 1.96],
  ['Np', 93, 237, 1.9], ['Pu', 94, 244, 1.87], ['Am', 95, 243, 1.8], ['Cm', 96, 247, 1.69],
];

const BY_SYMBOL: ReadonlyMap<string, ElementInfo> = new Map(
  TABLE.map(([symbol, z, mass, radius]) => [symbol.toLowerCase(), { symbol, z, mass, radius }]),
);
const BY_Z: ReadonlyMap<number, ElementInfo> = new Map(
  [...BY_SYMBOL.values()].map((e) => [e.z, e]),
);

/**
 * Looks up an element by symbol, case-insensitively (`cl`, `CL`, `Cl`); `D` and `T` are hydrogen isotopes.
 * Returns `undefined` for an unknown symbol.
 * @example elementInfo('cl')?.symbol // 'Cl'
 */
export function elementInfo(symbol: string): ElementInfo | undefined {
  const key = symbol.trim().toLowerCase();
  if (key === 'd' || key === 't') return BY_SYMBOL.get('h');
  return BY_SYMBOL.get(key);
}

/** Looks up an element by atomic number. */
export function elementByNumber(z: number): ElementInfo | undefined {
  return BY_Z.get(z);
}

/** Standard mass for ranking substituents ("heaviest first"); 0 for unknown symbols. */
export function atomicMass(symbol: string): number {
  return elementInfo(symbol)?.mass ?? 0;
}

/**
 * Non-metals and metalloids (B, Si, Ge, As, Sb, Te, At): their bonds are covalent. Every other element is a
 * metal, whose contacts are coordination (common practice, no source).
 */
const NOT_METAL: ReadonlySet<number> = new Set([1, 2, 5, 6, 7, 8, 9, 10, 14, 15, 16, 17, 18, 32, 33, 34, 35, 36, 51, 52, 53, 54, 85, 86]);

/**
 * True for a metal (by symbol, as {@link elementInfo} reads it); false for non-metals, metalloids and
 * unknown symbols.
 * @example isMetal('Zn') // true
 */
export function isMetal(symbol: string): boolean {
  const info = elementInfo(symbol);
  return info !== undefined && !NOT_METAL.has(info.z);
}
