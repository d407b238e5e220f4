/**
 * What goes into a conformer sheet's row: the figures (ring figures, then the informative Newman projections of
 * informativeBonds.ts), the heading runs (`r03 · chair ⁴C₁ · ΔE 1.30 kcal/mol · 6.4 %`) and the compound name
 * shared by every title, printed once in the sheet's header.
 */
import { informativeBonds } from '../../analysis/informativeBonds.js';
import { chemicalNumbering } from '../../analysis/chemicalNumbering.js';
import type { DescriptorParts } from '../../analysis/ringDescriptor.js';
import type { TextRun } from '../../layout/scene.js';
import type { PreparedRecord } from '../prepare.js';
import { canDraw, type FigureKind, type FigureTarget } from './figureKinds.js';
import type { DrawnRingForm } from './drawnRingForms.js';

/** One figure of a row and its short name (`ring 1`, `C5–C6`). */
export interface SheetTarget {
  readonly kind: FigureKind;
  readonly target: FigureTarget;
  readonly name: string;
}

/** The sentence a sheet's note starts with: what each row shows and what is left out by choice. */
export const INFORMATIVE_NOTE =
  'Each row: the ring figure, then Newman projections along the ring bond with the most heavy substituents and along exocyclic bonds to heavy groups. Left out: the other ring bonds (alike within a ring form; the ring torsions are in the ring figure and the tables) and methyl-like rotors.';

/**
 * Ring figures and informative Newman projections of a record, in row order.
 * @example sheetTargets(prepareRecord(glucoside)).map((t) => t.name) // ['ring', 'C1–C2', 'C1–O1', 'C5–C6', 'C2–O2', …]
 */
export function sheetTargets(p: PreparedRecord): SheetTarget[] {
  const { names, locants } = chemicalNumbering(p.molecule, p.graph, p.rings);
  const nameOf = (a: number) => names.get(a) ?? `${p.molecule.atoms[a]!.element}${a + 1}`;
  const rings: SheetTarget[] = canDraw('ring') ? p.rings.map((_, i) => ({ kind: 'ring', target: { ring: i }, name: p.rings.length > 1 ? `ring ${i + 1}` : 'ring' })) : [];
  const bonds = informativeBonds(p.molecule, p.graph, p.rings, locants).map(({ bond }): SheetTarget => ({ kind: 'newman', target: { bond }, name: `${nameOf(bond[0])}–${nameOf(bond[1])}` }));
  return [...rings, ...bonds];
}

/** A descriptor as runs: locants above raised before the letter, those below lowered after it. */
export function descriptorTextRuns(parts: DescriptorParts): TextRun[] {
  const runs: TextRun[] = [];
  if (parts.above.length > 0) runs.push({ text: parts.above.join(','), shift: 'sup' });
  runs.push({ text: parts.letter });
  if (parts.below.length > 0) runs.push({ text: parts.below.join(','), shift: 'sub' });
  return runs;
}

/** `chair ⁴C₁` (and `chair ⁴C₁ / twist-boat ¹S₃` for two rings) as runs. */
export function formRuns(forms: readonly DrawnRingForm[]): TextRun[] {
  return forms.flatMap((f, k) => [
    { text: `${k > 0 ? ' / ' : ''}${f.shape}${f.descriptor ? ' ' : ''}` },
    ...(f.descriptor ? descriptorTextRuns(f.descriptor) : []),
  ]);
}

/** Heading runs: the parts joined by ` · `, empty parts skipped. */
export function headingRuns(parts: readonly (string | readonly TextRun[])[]): TextRun[] {
  const runs: TextRun[] = [];
  for (const part of parts) {
    const pieces = typeof part === 'string' ? (part === '' ? [] : [{ text: part }]) : [...part];
    if (pieces.length === 0) continue;
    if (runs.length > 0) runs.push({ text: ' · ' });
    runs.push(...pieces);
  }
  // neighbouring plain runs merged, so the heading measures and renders as few pieces as possible
  return runs.reduce<TextRun[]>((out, r) => {
    const last = out[out.length - 1];
    if (last && !last.shift && !r.shift) out[out.length - 1] = { text: last.text + r.text };
    else out.push(r);
    return out;
  }, []);
}

const NUMBERING_WORD = /^(conformer|conf\.?|rotamer|model|frame|record|structure|isomer|#)$/i;

/**
 * The words every title starts with (the compound), printed once, and what is left of each title. A left-over
 * that only numbers the record (`conformer 3`, `3`) is dropped: the record label says it.
 * @example sharedTitle(['menthol conformer 1', 'menthol conformer 2']) // { header: 'menthol', rest: ['', ''] }
 */
export function sharedTitle(titles: readonly string[]): { header: string; rest: string[] } {
  const words = titles.map((t) => t.trim().split(/\s+/).filter(Boolean));
  let n = 0;
  while (words.length > 0 && words.every((w) => n < w.length && w[n] === words[0]![n])) n++;
  while (n > 0 && NUMBERING_WORD.test(words[0]![n - 1]!)) n--;
  const header = words[0]?.slice(0, n).join(' ') ?? '';
  const rest = words.map((w) => {
    const tail = w.slice(n);
    const numbering = tail.length > 0 && tail.every((x, i) => /^\d+[a-z]?$/i.test(x) || (i < tail.length - 1 && NUMBERING_WORD.test(x)));
    return numbering ? '' : tail.join(' ');
  });
  return { header, rest };
}
