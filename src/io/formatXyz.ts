/**
 * Molecules → multi-frame XYZ text. The comment line carries the title and the properties as `key=value`
 * pairs (quoted where needed), so `parseText(formatXyz(mols))` gives the same atoms, title words and properties.
 */
import type { Molecule } from '../model/molecule.js';
import { formatXyzPair, parseXyzComment } from './xyzComment.js';

/** Options of `formatXyz`. */
export interface FormatXyzOptions {
  /** Decimals of the coordinates, Å. Default 6. */
  readonly digits?: number;
}

/**
 * Writes the records as XYZ frames, one after another.
 * @example formatXyz([mol]) // '3\nwater\nO 0.000000 0.000000 0.000000\n...'
 */
export function formatXyz(mols: readonly Molecule[], options: FormatXyzOptions = {}): string {
  const digits = options.digits ?? 6;
  const out: string[] = [];
  for (const mol of mols) {
    out.push(String(mol.atoms.length), commentLine(mol));
    const c = mol.coords;
    mol.atoms.forEach((atom, i) => {
      const xyz = [c[3 * i]!, c[3 * i + 1]!, c[3 * i + 2]!].map((v) => fixed(v, digits).padStart(digits + 6));
      out.push(`${atom.element.padEnd(2)} ${xyz.join(' ')}`);
    });
  }
  return out.length > 0 ? `${out.join('\n')}\n` : '';
}

/** The title, then every property the title does not already state. */
function commentLine(mol: Molecule): string {
  const title = mol.title.replace(/\r?\n/g, ' ');
  const stated = parseXyzComment(title);
  const extra = Object.entries(mol.properties)
    .filter(([k, v]) => stated[k] !== v)
    .map(([k, v]) => formatXyzPair(k, v));
  return [title, ...extra].filter((s) => s !== '').join(' ');
}

function fixed(v: number, digits: number): string {
  const s = v.toFixed(digits);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}
