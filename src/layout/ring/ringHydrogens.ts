/**
 * Which substituents of a ring figure are drawn, by the hydrogen mode. `stereo` (the default) draws a ring
 * atom's H only where it shows the configuration: at a ring atom with one H and one heavy substituent (or one
 * further ring bond of a fused system); the H pair of a CH₂ and the lone H of an sp2 CH are left to skeletal
 * convention. `all` draws every ring hydrogen, `none` no ring hydrogen. Heavy substituents are always drawn
 * [common practice, no source].
 */
import type { Molecule } from '../../model/molecule.js';
import type { RingSubstituent } from '../../analysis/substituents.js';

/** Ring hydrogens drawn: every one, only those that show a configuration, or none. */
export type RingHydrogenMode = 'all' | 'stereo' | 'none';

/** The user's word for a mode, accepting the earlier `show` (= all) and `hide` (= none). */
export function ringHydrogenMode(word: string | undefined): RingHydrogenMode | null {
  if (word === undefined) return 'stereo';
  if (word === 'show') return 'all';
  if (word === 'hide') return 'none';
  return word === 'all' || word === 'stereo' || word === 'none' ? word : null;
}

/**
 * The substituents to draw from `subs` (one ring or a fused system), in their order.
 * `extraHeavy(ringAtom)` counts heavy neighbours outside `subs` that the figure draws as ring bonds (fusion).
 * @example drawnSubstituents(ring.substituents, mol, 'stereo')
 */
export function drawnSubstituents(
  subs: readonly RingSubstituent[],
  mol: Pick<Molecule, 'atoms'>,
  mode: RingHydrogenMode,
  extraHeavy: (ringAtom: number) => number = () => 0,
): RingSubstituent[] {
  const isH = (s: RingSubstituent) => mol.atoms[s.atom]!.element === 'H';
  return subs.filter((s) => {
    if (!isH(s) || mode === 'all') return true;
    if (mode === 'none') return false;
    const here = subs.filter((t) => t.ringAtom === s.ringAtom);
    const hs = here.filter(isH).length;
    const heavy = here.length - hs + extraHeavy(s.ringAtom);
    return hs === 1 && heavy === 1 && s.position !== null;
  });
}
