/**
 * The `Molecule` an XYZ frame becomes: a plain record whose `properties` (the comment's `key=value` pairs)
 * are parsed on first use, since a trajectory reader rarely needs them. `properties` is an own, enumerable
 * accessor (so `{ ...mol }` copies the parsed value) defined with one shared getter: a getter written in an
 * object literal gives every object its own closure and hidden class, which cost ~2 µs and several hundred
 * bytes of long-lived garbage per frame.
 */
import type { Atom, Molecule, RecordSource } from '../model/molecule.js';
import { parseXyzComment } from './xyzComment.js';

const PROPERTIES: PropertyDescriptor = { enumerable: true, configurable: true };

export class XyzRecord implements Molecule {
  // `declare`: no field initialisers, so the constructor sets the keys in `Molecule` order (as `{ ...mol }` shows)
  declare readonly title: string;
  declare readonly atoms: readonly Atom[];
  declare readonly coords: Float64Array;
  declare readonly bonds: null;
  declare readonly properties: Readonly<Record<string, string>>;
  declare readonly source: RecordSource;
  #properties: Readonly<Record<string, string>> | null = null;

  static {
    PROPERTIES.get = function (this: XyzRecord) {
      return (this.#properties ??= parseXyzComment(this.title));
    };
  }

  constructor(title: string, atoms: readonly Atom[], coords: Float64Array, source: RecordSource) {
    this.title = title;
    this.atoms = atoms;
    this.coords = coords;
    this.bonds = null;
    Object.defineProperty(this, 'properties', PROPERTIES);
    this.source = source;
  }
}
