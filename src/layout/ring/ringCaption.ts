/**
 * Words of a ring figure: the caption (shape and typeset IUPAC descriptor; Q, θ, φ) and the SVG title and
 * description. Descriptor locants are smaller raised or lowered runs (typeset as tspans), digits and heteroatom
 * locants alike (⁴C₁, B₂,₅, E_O).
 */
import type { RingAnalysis } from '../../analysis/ringAnalysis.js';
import type { DescriptorParts } from '../../analysis/ringDescriptor.js';
import type { RingView } from './ringPlacement.js';

/** One run of caption text: baseline text, or a smaller raised (`sup`) / lowered (`sub`) run. */
export interface CaptionRun {
  readonly text: string;
  readonly level: 'base' | 'sup' | 'sub';
}

const MINUS = '\u2212';

/** Runs of a typeset descriptor: ⁴C₁ as a raised `4`, `C` and a lowered `1`; ^{3,O}B as a raised run and a base run. */
export function descriptorRuns(parts: DescriptorParts): CaptionRun[] {
  const runs: CaptionRun[] = [];
  const push = (text: string, level: CaptionRun['level']) => {
    if (!text) return;
    const last = runs[runs.length - 1];
    if (last && last.level === level) runs[runs.length - 1] = { text: last.text + text, level };
    else runs.push({ text, level });
  };
  const script = (locants: readonly string[], level: 'sup' | 'sub') => {
    push(locants.join(','), level);
  };
  script(parts.above, 'sup');
  push(parts.letter, 'base');
  script(parts.below, 'sub');
  return runs;
}

/** A length or angle as printed: fixed decimals, true minus sign; an em dash when undefined. */
export function numberText(value: number | null, digits: number): string {
  if (value === null) return '—';
  const t = value.toFixed(digits);
  return Number(t) === 0 ? (0).toFixed(digits) : t.replace('-', MINUS);
}

/** Caption lines as runs: shape with descriptor (or the view when none), then `Q 0.565 Å  θ 2.1°  φ —`. */
export function ringCaption(ring: RingAnalysis): CaptionRun[][] {
  const head: CaptionRun[] = [{ text: `${ring.shape}${ring.descriptorParts ? ' ' : ''}`, level: 'base' }];
  if (ring.descriptorParts) head.push(...descriptorRuns(ring.descriptorParts));
  if (ring.fit?.quality === 'distorted') head.push({ text: ' (distorted)', level: 'base' });
  const pk = ring.puckering;
  const numbers = [`Q ${numberText(pk.Q, 3)} Å`];
  if (ring.size === 6) numbers.push(`θ ${numberText(pk.thetaDeg, 1)}°`);
  numbers.push(`φ ${pk.phiDeg === null ? '—' : `${numberText(pk.phiDeg, 1)}°`}`);
  return [head, [{ text: numbers.join('  '), level: 'base' }]];
}

const ids = (ring: RingAnalysis) => ring.atoms.map((a) => a + 1).join('-');

/** The `<title>` of a ring figure. */
export function ringTitle(ring: RingAnalysis, view: RingView): string {
  const form = ring.descriptor ? ` ${ring.descriptor}` : '';
  const what = view === 'template' ? 'Chair drawing' : 'Projected view';
  return `${what} of ring ${ids(ring)} (${ring.shape}${form})`;
}

/** The `<desc>` of a ring figure: view, numbers, and every substituent's position and face. */
export function ringDescription(ring: RingAnalysis, view: RingView, elevationDeg: number | null, element: (atom: number) => string, viewNote = ''): string {
  const how =
    view === 'template'
      ? `Stylised chair outline placed from the measured Cremer–Pople displacements and substituent positions.`
      : `Orthographic view of the measured coordinates in the ring frame (normal toward the viewer side, ${elevationDeg ?? 0}° elevation${viewNote}).`;
  const pk = ring.puckering;
  const numbers = `Q ${numberText(pk.Q, 3)} Å, θ ${numberText(pk.thetaDeg, 1)}, φ ${numberText(pk.phiDeg, 1)}.`;
  const subs = ring.substituents
    .map((s) => `${element(s.atom)}${s.atom + 1} on ${element(s.ringAtom)}${s.ringAtom + 1}: ${s.position ?? 'unclassified'}${s.face ? `, ${s.face}` : ''}`)
    .join('; ');
  return `${how} Ring ${ids(ring)}: ${ring.shape}${ring.descriptor ? ` ${ring.descriptor}` : ''}; ${numbers}${subs ? ` Substituents: ${subs}.` : ''}`;
}

/** A ring's name on a fused figure: its number as `inspect` lists it, else its atoms. */
const fusedName = (ring: RingAnalysis) => (ring.id === undefined ? `ring ${ids(ring)}` : `ring ${ring.id}`);

/** Caption of fused chairs: one line per ring, `ring 1: chair ⁴C₁  Q 0.565 Å  θ 2.1°`. */
export function fusedCaption(rings: readonly RingAnalysis[]): CaptionRun[][] {
  return rings.map((ring) => {
    const [head, numbers] = ringCaption(ring);
    return [{ text: `${fusedName(ring)}: `, level: 'base' }, ...head!, { text: '  ', level: 'base' }, ...numbers!];
  });
}

/** The `<title>` of fused chairs. */
export function fusedTitle(rings: readonly RingAnalysis[]): string {
  return `Fused chair drawing of rings ${rings.map((r) => `${ids(r)} (${r.shape}${r.descriptor ? ` ${r.descriptor}` : ''})`).join(', ')}`;
}

/** The `<desc>` of fused chairs: how they are placed, then every ring as `ringDescription` says it. */
export function fusedDescription(rings: readonly RingAnalysis[], element: (atom: number) => string): string {
  const how = 'Stylised chair outlines sharing their fusion bonds, each placed from its measured Cremer–Pople displacements and substituent positions, all seen from the side of the first ring.';
  const each = rings.map((r) => ringDescription(r, 'template', null, element).replace(/^Stylised chair outline[^.]*\. /, ''));
  return `${how} ${each.join(' ')}`;
}
