/**
 * IUPAC ring-form descriptor of a canonical form in a ring's own locants (JCBN 1980, Eur. J. Biochem. 111, 295;
 * docs/methods.md#ring-descriptor): locants of atoms above the reference plane as superscripts before the letter, those below as
 * subscripts after it, e.g. ^{4}C_{1}, ^{3,O}B, E_{3}.
 *
 * Plane choice when there are several (chairs, skews) [from memory, docs/methods.md#ring-descriptor]: the plane that leaves
 * the lowest-numbered ring carbon exoplanar; the ring heteroatom ranks after every carbon (it is O5 of a
 * pyranose, O4′ of a furanose), which also orders the locants inside a list (3,O not O,3).
 */
import type { CanonicalForm, FormLetter, ReferencePlane } from './ringForms.js';

/** A descriptor split for typesetting: superscripts before the letter, subscripts after it. */
export interface DescriptorParts {
  readonly letter: FormLetter;
  readonly above: readonly string[];
  readonly below: readonly string[];
}

/** Plain ASCII descriptor and its typeset forms. */
export interface RingDescriptor {
  /** Plain text, e.g. `4C1`, `3,OB`, `OS2`, `E3`, `OT1`. */
  readonly text: string;
  readonly parts: DescriptorParts;
  /** HTML with `<sup>`/`<sub>`, e.g. `<sup>4</sup>C<sub>1</sub>`. */
  readonly html: string;
}

/** Rank of a locant: carbons by number (a fusion locant `4a` just after 4), anything else (the heteroatom) after all of them. */
const rank = (locant: string, n: number) => {
  const m = /^(\d+)([a-z]?)$/.exec(locant);
  return m ? Number(m[1]) + (m[2] ? 0.5 : 0) : n;
};

function planeKey(plane: ReferencePlane, locants: readonly string[]): number[] {
  return [...plane.above, ...plane.below].map((j) => rank(locants[j]!, locants.length)).sort((a, b) => a - b);
}

function compareKeys(a: number[], b: number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

/**
 * The descriptor of `form` for a ring whose position j has locant `locants[j]`; `null` for forms without an
 * IUPAC letter (screw-boats).
 * @example formDescriptor(SIX_RING_FORMS[0], ['O','1','2','3','4','5'])?.text // '4C1'
 */
export function formDescriptor(form: CanonicalForm, locants: readonly string[]): RingDescriptor | null {
  const plane = chosenPlane(form, locants);
  if (form.letter === null || plane === null) return null;
  const n = locants.length;
  const names = (js: readonly number[]) =>
    js.map((j) => locants[j]!).sort((a, b) => rank(a, n) - rank(b, n));
  const parts: DescriptorParts = { letter: form.letter, above: names(plane.above), below: names(plane.below) };
  const text = `${parts.above.join(',')}${parts.letter}${parts.below.join(',')}`;
  const sup = parts.above.length ? `<sup>${parts.above.join(',')}</sup>` : '';
  const sub = parts.below.length ? `<sub>${parts.below.join(',')}</sub>` : '';
  return { text, parts, html: `${sup}${parts.letter}${sub}` };
}

/** The chosen reference plane of `form` for these locants (same rule as `formDescriptor`), or null. */
export function chosenPlane(form: CanonicalForm, locants: readonly string[]): ReferencePlane | null {
  if (form.planes.length === 0) return null;
  return [...form.planes].sort((a, b) => compareKeys(planeKey(a, locants), planeKey(b, locants)))[0]!;
}
