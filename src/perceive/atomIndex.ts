/** Atom selection tokens (README.md "Commands"): a number is a 1-based file index, anything else an atom name. */
import { ConformarkError } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';

/** How many names an "unknown atom name" message lists before it says "and N more". */
const LISTED_NAMES = 12;

/** A selection error for `mol` (no line: selections come from the command line). */
export function selectionError(mol: Molecule, code: string, message: string): ConformarkError {
  return new ConformarkError({ code, file: mol.source.file, line: null, message });
}

/**
 * Resolves one atom token to a 0-based index. A token of digits is a 1-based file index; any other token
 * is an atom name from the file (exact match first, then case-insensitive).
 * Errors (`ConformarkError`): `bad-selection` (empty token), `unknown-atom` (index out of range or no atom
 * of that name; the message lists the names that exist, truncated), `ambiguous-atom` (several atoms share
 * the name; the message lists their numbers).
 * @example atomIndex(glucose, '3') // 2
 * @example atomIndex(glucose, 'O5') // index of the atom named O5
 */
export function atomIndex(mol: Molecule, token: string): number {
  const text = token.trim();
  const count = mol.atoms.length;
  if (text === '') throw selectionError(mol, 'bad-selection', 'empty atom in selection');
  if (/^\d+$/.test(text)) {
    const number = Number(text);
    if (number < 1 || number > count) {
      throw selectionError(
        mol,
        'unknown-atom',
        `atom ${text} does not exist (the record has ${count} atom${count === 1 ? '' : 's'})`,
      );
    }
    return number - 1;
  }
  let matches = indicesNamed(mol, (name) => name === text);
  if (matches.length === 0) matches = indicesNamed(mol, (name) => name.toLowerCase() === text.toLowerCase());
  if (matches.length === 1) return matches[0]!;
  if (matches.length > 1) {
    const numbers = matches.slice(0, LISTED_NAMES).map((i) => i + 1).join(', ');
    const more = matches.length > LISTED_NAMES ? ` and ${matches.length - LISTED_NAMES} more` : '';
    throw selectionError(
      mol,
      'ambiguous-atom',
      `atom name ${text} is ambiguous: atoms ${numbers}${more} carry it; use an atom number`,
    );
  }
  throw selectionError(mol, 'unknown-atom', `no atom named ${text}; ${whatExists(mol)}`);
}

function indicesNamed(mol: Molecule, test: (name: string) => boolean): number[] {
  const out: number[] = [];
  mol.atoms.forEach((atom, i) => {
    if (atom.name !== null && test(atom.name.trim())) out.push(i);
  });
  return out;
}

function whatExists(mol: Molecule): string {
  const count = mol.atoms.length;
  const names = [...new Set(mol.atoms.flatMap((a) => (a.name === null || a.name.trim() === '' ? [] : [a.name.trim()])))];
  const range = count === 0 ? 'the record has no atoms' : `atom numbers are 1–${count}`;
  if (names.length === 0) return `the record has no atom names (${range})`;
  const shown = names.slice(0, LISTED_NAMES).join(', ');
  const more = names.length > LISTED_NAMES ? `, … (${names.length - LISTED_NAMES} more)` : '';
  return `names in the record: ${shown}${more} (${range})`;
}
