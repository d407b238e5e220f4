/**
 * The selection grammar shared by every command: atoms by file position, name, serial or residue, and rings
 * by number, atom list, residue or residue name. README "Selecting atoms and rings" documents it for users.
 */
import { ConformarkError } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';
import type { Graph } from './graph.js';
import { residueLabel, residuesOf, type Residue } from './residues.js';

/** How many candidates a message lists before it says "and N more". */
const LISTED = 12;

/** A selection error for `mol` (no line: selections come from the command line). */
export function selectionError(mol: Molecule, code: string, message: string): ConformarkError {
  return new ConformarkError({ code, file: mol.source.file, line: null, message });
}

function listed(items: readonly string[], sep = ', '): string {
  const more = items.length > LISTED ? ` and ${items.length - LISTED} more` : '';
  return items.slice(0, LISTED).join(sep) + more;
}

/**
 * Splits an atom list such as `1-2-3` or `A/-1/N-A/-1/CA` at its `-` separators; a `-` right after `/` is the
 * sign of a residue number, not a separator.
 * @example splitAtomList('A/-1/N-A/-1/CA') // ['A/-1/N', 'A/-1/CA']
 */
export function splitAtomList(text: string): string[] {
  const parts: string[] = [];
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    if (text[i] === '-' && i > 0 && text[i - 1] !== '/') {
      parts.push(text.slice(start, i));
      start = i + 1;
    }
  }
  parts.push(text.slice(start));
  return parts;
}

/**
 * Resolves one atom token to a 0-based atom index:
 * - `12`: file position, counted from 1;
 * - `C1`: atom name (exact match first, then case-insensitive);
 * - `#6415`: the atom whose file serial (PDB/mmCIF/GRO atom id) is 6415 — never a position;
 * - `[chain/]residue/atom`: a residue-qualified atom, residue `42`, `42B` (insertion code), `PRO42` or
 *   `PRO42B` (name checked); an empty or missing chain matches any chain (`/42/CA`, `42/CA`, `B/NAG501/C1`).
 *
 * Errors (`ConformarkError`), each one line listing the candidates: `bad-selection`, `unknown-atom`,
 * `unknown-residue`, `ambiguous-atom`.
 * @example selectAtom(protein, 'A/PRO42/CA')
 * @example selectAtom(glycoprotein, '#6415') // NAG C1 by its serial
 */
export function selectAtom(mol: Molecule, token: string): number {
  const text = token.trim();
  if (text === '') throw selectionError(mol, 'bad-selection', 'empty atom in selection');
  if (/^\d+$/.test(text)) return byPosition(mol, text);
  if (text.startsWith('#')) return bySerial(mol, text);
  if (text.includes('/')) return byResidueAtom(mol, text);
  return byName(mol, text);
}

function byPosition(mol: Molecule, text: string): number {
  const count = mol.atoms.length;
  const number = Number(text);
  if (number < 1 || number > count) {
    throw selectionError(mol, 'unknown-atom', `atom ${text} does not exist (the record has ${count} atom${count === 1 ? '' : 's'})`);
  }
  return number - 1;
}

function bySerial(mol: Molecule, text: string): number {
  if (!/^#\d+$/.test(text)) throw selectionError(mol, 'bad-selection', `serial '${text}' should be # followed by the file's atom serial, e.g. #6415`);
  const serial = Number(text.slice(1));
  const hits: number[] = [];
  let low = Infinity;
  let high = -Infinity;
  mol.atoms.forEach((atom, i) => {
    if (atom.serial === undefined) return;
    low = Math.min(low, atom.serial);
    high = Math.max(high, atom.serial);
    if (atom.serial === serial) hits.push(i);
  });
  if (hits.length === 1) return hits[0]!;
  if (low === Infinity) {
    throw selectionError(mol, 'unknown-atom', `the record has no atom serials (PDB files carry them); select atom ${text.slice(1)} by position without '#'`);
  }
  if (hits.length === 0) throw selectionError(mol, 'unknown-atom', `no atom has serial ${serial} (serials in the record run ${low}–${high})`);
  throw selectionError(mol, 'ambiguous-atom', `serial ${serial} is carried by atoms ${listed(hits.map((i) => describeAtom(mol, i)))}; select by chain/residue/atom`);
}

/** `12 (A/PRO42/CA)` when the atom has a residue, else `12`. */
function describeAtom(mol: Molecule, i: number): string {
  const atom = mol.atoms[i]!;
  if (atom.residue === undefined || atom.residueNumber === undefined) return String(i + 1);
  const label = residueLabel({ chain: atom.chain ?? '', name: atom.residue, number: atom.residueNumber, insertion: atom.insertionCode ?? '' });
  return `${i + 1} (${label}/${(atom.name ?? '').trim()})`;
}

function byName(mol: Molecule, text: string): number {
  let matches = atomsNamed(mol, mol.atoms.map((_, i) => i), text, false);
  if (matches.length === 0) matches = atomsNamed(mol, mol.atoms.map((_, i) => i), text, true);
  if (matches.length === 1) return matches[0]!;
  if (matches.length > 1) {
    const withResidues = mol.atoms[matches[0]!]!.residue !== undefined;
    const hint = withResidues ? 'use chain/residue/atom (e.g. A/42/CA) or an atom number' : 'use an atom number';
    const shown = withResidues ? matches.map((i) => describeAtom(mol, i)) : matches.map((i) => String(i + 1));
    throw selectionError(mol, 'ambiguous-atom', `atom name ${text} is ambiguous: atoms ${listed(shown)} carry it; ${hint}`);
  }
  throw selectionError(mol, 'unknown-atom', `no atom named ${text}; ${whatExists(mol)}`);
}

function atomsNamed(mol: Molecule, among: readonly number[], text: string, anyCase: boolean): number[] {
  const want = anyCase ? text.toLowerCase() : text;
  return among.filter((i) => {
    const name = mol.atoms[i]!.name;
    if (name === null) return false;
    const trimmed = name.trim();
    return (anyCase ? trimmed.toLowerCase() : trimmed) === want;
  });
}

function whatExists(mol: Molecule): string {
  const count = mol.atoms.length;
  const names = [...new Set(mol.atoms.flatMap((a) => (a.name === null || a.name.trim() === '' ? [] : [a.name.trim()])))];
  const range = count === 0 ? 'the record has no atoms' : `atom numbers are 1–${count}`;
  if (names.length === 0) return `the record has no atom names (${range})`;
  const shown = names.slice(0, LISTED).join(', ');
  const more = names.length > LISTED ? `, … (${names.length - LISTED} more)` : '';
  return `names in the record: ${shown}${more} (${range})`;
}

function byResidueAtom(mol: Molecule, text: string): number {
  const parts = text.split('/');
  const atomName = parts[parts.length - 1]!.trim();
  if ((parts.length !== 2 && parts.length !== 3) || atomName === '') {
    throw selectionError(mol, 'bad-selection', `atom '${text}' should be [chain/]residue/atom, e.g. A/PRO42/CA or /42/CA`);
  }
  const chain = parts.length === 3 ? parts[0]!.trim() : '';
  const residues = matchResidues(mol, chain, parts[parts.length - 2]!.trim(), text);
  let hits = residues.map((r) => ({ r, atoms: atomsNamed(mol, r.atoms, atomName, false) }));
  if (hits.every((h) => h.atoms.length === 0)) hits = residues.map((r) => ({ r, atoms: atomsNamed(mol, r.atoms, atomName, true) }));
  const found = hits.filter((h) => h.atoms.length > 0);
  if (found.length === 1 && found[0]!.atoms.length === 1) return found[0]!.atoms[0]!;
  if (found.length === 0) {
    const r = residues[0]!;
    const names = [...new Set(r.atoms.map((i) => (mol.atoms[i]!.name ?? '').trim()).filter((n) => n !== ''))];
    const which = residues.length === 1 ? `residue ${residueLabel(r)} has` : `residues ${listed(residues.map(residueLabel))} have`;
    throw selectionError(mol, 'unknown-atom', `${which} no atom named ${atomName}; atoms of ${residueLabel(r)}: ${listed(names)}`);
  }
  const atoms = found.flatMap((h) => h.atoms);
  const hint = found.length > 1 ? 'give the chain and residue name' : 'select it by #serial or atom number';
  throw selectionError(mol, 'ambiguous-atom', `'${text}' matches atoms ${listed(atoms.map((i) => describeAtom(mol, i)))}; ${hint}`);
}

const residueCache = new WeakMap<Molecule, Residue[]>();

function cachedResidues(mol: Molecule): Residue[] {
  let r = residueCache.get(mol);
  if (r === undefined) {
    r = residuesOf(mol);
    residueCache.set(mol, r);
  }
  return r;
}

/** Every reading of `text` as [name]number[insertion] (names may end in digits: `A2M12` is tried as A2M 12 and A2M1 2). */
function residueParses(text: string): { name: string; number: number; insertion: string }[] {
  const out: { name: string; number: number; insertion: string }[] = [];
  for (let i = 0; i < text.length; i++) {
    const m = /^(-?\d+)([A-Za-z]?)$/.exec(text.slice(i));
    if (m === null) continue;
    const name = text.slice(0, i);
    if (name.endsWith('-')) continue;
    out.push({ name, number: Number(m[1]), insertion: m[2]! });
  }
  return out;
}

/**
 * The residues that `[chain/]residue` names (an empty chain matches any chain), at least one; errors list
 * the residues that come closest.
 */
function matchResidues(mol: Molecule, chain: string, residueText: string, whole: string): Residue[] {
  const all = cachedResidues(mol);
  if (all.length === 0) {
    throw selectionError(mol, 'unknown-residue', `'${whole}' names a residue, but the record has no residues (only PDB files carry them); select by atom number or name`);
  }
  const parses = residueParses(residueText);
  if (parses.length === 0) {
    throw selectionError(mol, 'bad-selection', `residue '${residueText}' should be a number with an optional name before it and insertion code after it, e.g. 42, 42B, PRO42, PRO42B`);
  }
  const chainOk = (r: Residue, anyCase: boolean): boolean =>
    chain === '' || r.chain === chain || (anyCase && r.chain.toLowerCase() === chain.toLowerCase());
  const match = (anyCase: boolean): Residue[] =>
    all.filter((r) =>
      chainOk(r, anyCase) &&
      parses.some((p) => p.number === r.number && p.insertion.toUpperCase() === r.insertion.toUpperCase() && (p.name === '' || p.name.toUpperCase() === r.name.toUpperCase())),
    );
  let found = match(false);
  if (found.length === 0) found = match(true);
  if (found.length > 0) return found;
  const numbers = new Set(parses.map((p) => p.number));
  const near = all.filter((r) => numbers.has(r.number));
  const where = chain === '' ? '' : ` in chain ${chain}`;
  if (near.length > 0) {
    throw selectionError(mol, 'unknown-residue', `no residue ${residueText}${where}; residues numbered ${[...new Set(near.map((r) => r.number))].join(' or ')}: ${listed(near.map(residueLabel))}`);
  }
  const chains = [...new Set(all.map((r) => r.chain))];
  const inChain = all.filter((r) => chainOk(r, true));
  const span = inChain.length === 0
    ? `chains in the record: ${listed(chains.map((c) => (c === '' ? '(blank)' : c)))}`
    : `residues${where} are numbered ${Math.min(...inChain.map((r) => r.number))}–${Math.max(...inChain.map((r) => r.number))}`;
  throw selectionError(mol, 'unknown-residue', `no residue ${residueText}${where}; ${span}`);
}

/** What a ring token is: a ring number, an ordered atom list, the rings of one residue, or of a residue name. */
export type RingTokenKind = 'number' | 'atoms' | 'residue' | 'name';

/** The kind of ring token `token` is (see {@link selectRings}). */
export function ringTokenKind(token: string): RingTokenKind {
  const text = token.trim();
  if (/^\d+$/.test(text)) return 'number';
  if (/^name:/i.test(text)) return 'name';
  if (text.endsWith('/')) return 'residue';
  return 'atoms';
}

/**
 * Resolves a ring token to rings (0-based atoms in cyclic order):
 * - `2`: the 2nd of `rings` (the numbering `inspect` prints);
 * - `1-2-3-4-5-6` (any atom tokens joined by `-`): that closed walk, in exactly that order; it need not be one
 *   of `rings`, but with `graph` every step must be a bond;
 * - `[chain/]residue/` (trailing slash): every ring of `rings` whose atoms all lie in that residue (`A/PRO42/`,
 *   `/3/`);
 * - `name:BGC` or `name:BGC,NAG`: every ring of every residue with one of those names, in file order.
 *
 * Errors (`ConformarkError`): `unknown-ring`, `no-ring`, `bad-selection`, `not-bonded` and those of
 * {@link selectAtom}.
 * @example selectRings(glycoprotein, 'name:NAG', rings) // one ring per NAG residue
 */
export function selectRings(mol: Molecule, token: string, rings: readonly (readonly number[])[], graph?: Graph): number[][] {
  const text = token.trim();
  switch (ringTokenKind(text)) {
    case 'number':
      return [ringByNumber(mol, rings, text)];
    case 'name':
      return ringsByName(mol, rings, text);
    case 'residue':
      return ringsOfResidue(mol, rings, text);
    default:
      return [ringWalk(mol, text, graph)];
  }
}

function ringByNumber(mol: Molecule, rings: readonly (readonly number[])[], text: string): number[] {
  const k = Number(text);
  const ring = rings[k - 1];
  if (k < 1 || !ring) {
    const have = rings.length === 0 ? 'the record has no rings' : `the record has ${rings.length} ring${rings.length === 1 ? '' : 's'}`;
    throw selectionError(mol, 'unknown-ring', `ring ${text} does not exist (${have})`);
  }
  return ring.slice();
}

/** Rings of `rings` lying wholly in one of `residues`, grouped in residue order. */
function ringsInside(mol: Molecule, rings: readonly (readonly number[])[], residues: readonly Residue[]): number[][] {
  const owner = new Int32Array(mol.atoms.length).fill(-1);
  residues.forEach((r, k) => r.atoms.forEach((a) => (owner[a] = k)));
  const byResidue: number[][][] = residues.map(() => []);
  for (const ring of rings) {
    const k = owner[ring[0]!]!;
    if (k >= 0 && ring.every((a) => owner[a] === k)) byResidue[k]!.push(ring.slice());
  }
  return byResidue.flat();
}

function ringsOfResidue(mol: Molecule, rings: readonly (readonly number[])[], text: string): number[][] {
  const parts = text.slice(0, -1).split('/');
  if (parts.length > 2 || parts[parts.length - 1]!.trim() === '') {
    throw selectionError(mol, 'bad-selection', `ring '${text}' should be [chain/]residue/, e.g. A/PRO42/ or /42/`);
  }
  const chain = parts.length === 2 ? parts[0]!.trim() : '';
  const residues = matchResidues(mol, chain, parts[parts.length - 1]!.trim(), text);
  const found = ringsInside(mol, rings, residues);
  if (found.length === 0) {
    throw selectionError(mol, 'no-ring', `${residues.length === 1 ? 'residue' : 'residues'} ${listed(residues.map(residueLabel))} ${residues.length === 1 ? 'has' : 'have'} no ring`);
  }
  return found;
}

function ringsByName(mol: Molecule, rings: readonly (readonly number[])[], text: string): number[][] {
  const names = text.slice(text.indexOf(':') + 1).split(',').map((s) => s.trim().toUpperCase());
  if (names.some((n) => n === '')) throw selectionError(mol, 'bad-selection', `ring '${text}' should be name: and residue names joined by ',', e.g. name:BGC,NAG`);
  const all = cachedResidues(mol);
  const residues = all.filter((r) => names.includes(r.name.toUpperCase()));
  if (residues.length === 0) {
    const present = [...new Set(all.map((r) => r.name))];
    const have = present.length === 0 ? 'the record has no residues' : `residue names in the record: ${listed(present)}`;
    throw selectionError(mol, 'unknown-residue', `no residue named ${names.join(' or ')}; ${have}`);
  }
  const found = ringsInside(mol, rings, residues);
  if (found.length === 0) throw selectionError(mol, 'no-ring', `the ${residues.length} residue${residues.length === 1 ? '' : 's'} named ${names.join(' or ')} have no ring`);
  return found;
}

function ringWalk(mol: Molecule, text: string, graph: Graph | undefined): number[] {
  const parts = splitAtomList(text);
  if (parts.some((p) => p.trim() === '')) {
    throw selectionError(mol, 'bad-selection', `ring '${text}' should be a ring number, atoms joined by '-' (e.g. 1-2-3-4-5-6), a residue (A/PRO42/) or name:NAG`);
  }
  const atoms = parts.map((p) => selectAtom(mol, p));
  if (atoms.length > 3 && atoms[0] === atoms[atoms.length - 1]) atoms.pop();
  if (atoms.length < 3) throw selectionError(mol, 'bad-selection', `ring '${text}' needs at least 3 atoms (or a ring number)`);
  if (new Set(atoms).size !== atoms.length) throw selectionError(mol, 'bad-selection', `ring '${text}' visits an atom twice; list each ring atom once`);
  if (graph !== undefined) {
    atoms.forEach((a, k) => {
      const b = atoms[(k + 1) % atoms.length]!;
      if (!graph.bonded(a, b)) {
        throw selectionError(mol, 'not-bonded', `atoms ${a + 1} and ${b + 1} are not bonded, so '${text}' is not a closed ring walk`);
      }
    });
  }
  return atoms;
}
