/** Core data types shared by every layer. Atom indices are 0-based inside the library, 1-based for users. */

/** Input formats conformark reads. */
export type FormatName = 'xyz' | 'sdf' | 'pdb' | 'pdbqt' | 'mmcif' | 'mol2' | 'gro';

/** One atom as read from a file. */
export interface Atom {
  /** Element symbol, normalised capitalisation (`C`, `Cl`). */
  readonly element: string;
  /** Atom name from the file (PDB atom name, or an SD/XYZ label), or `null` when the file has none. */
  readonly name: string | null;
  /** Residue name (PDB resName, mmCIF comp_id, GRO/PSF residue name), when known. */
  readonly residue?: string;
  /** Residue sequence number as written in the file (PDB resSeq, mmCIF auth_seq_id), when known. */
  readonly residueNumber?: number;
  /** Residue insertion code (PDB iCode), `''` when blank; absent when the format has none. */
  readonly insertionCode?: string;
  /** Chain identifier (PDB chainID, mmCIF auth_asym_id, PSF segment), `''` when blank; absent when unknown. */
  readonly chain?: string;
  /** Atom serial number from the file (PDB/GRO/mmCIF id), which may differ from the file position. */
  readonly serial?: number;
  /** Alternate-location letter of the copy kept (`''` when the atom had none). */
  readonly altLoc?: string;
  /** Partial charge from the file (PDBQT columns 71-76, MOL2 charge column), when it has one. */
  readonly partialCharge?: number;
  /** Formal charge from the file (molfile), 0 when absent. */
  readonly charge?: number;
}

/** A bond between two atoms (0-based indices, `a < b`). */
export interface Bond {
  readonly a: number;
  readonly b: number;
  /** Bond order from the file (1, 2, 3, 4 = aromatic); 1 for perceived bonds. */
  readonly order: number;
  /** True when the bond was perceived from coordinates rather than read from the file. */
  readonly perceived: boolean;
}

/** Where a record came from, for messages and reports. */
export interface RecordSource {
  /** Path as the user gave it (`-` for standard input). */
  readonly file: string;
  readonly format: FormatName;
  /** Record (frame) number in the file, counted from 1. */
  readonly index: number;
  /** First line of the record in the file, counted from 1. */
  readonly line: number;
}

/**
 * One record (molecule, conformer or frame).
 * `coords` holds x, y, z of atom i at 3i, 3i+1, 3i+2, in Å.
 * `bonds` is `null` when the file gave none (bonds are then perceived).
 */
export interface Molecule {
  readonly title: string;
  readonly atoms: readonly Atom[];
  readonly coords: Float64Array;
  readonly bonds: readonly Bond[] | null;
  /** SD data fields or XYZ `key=value` comment properties, in file order. */
  readonly properties: Readonly<Record<string, string>>;
  readonly source: RecordSource;
  /** What the reader noticed but read past (close contacts between residues, CONECT not applied …). */
  readonly warnings?: readonly { readonly code: string; readonly message: string }[];
}

/** A 3-vector in Å (or a unit direction). */
export type Vec3 = readonly [number, number, number];

/** Position of atom `i` (0-based). */
export function atomPosition(mol: Pick<Molecule, 'coords'>, i: number): Vec3 {
  const c = mol.coords;
  return [c[3 * i]!, c[3 * i + 1]!, c[3 * i + 2]!];
}
