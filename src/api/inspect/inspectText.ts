/** The readable per-record summary `conformark inspect` prints (the JSON report, laid out for a terminal). */
import type { RecordReport } from '../../analysis/recordReport.js';
import { COUPLING_METHOD_NAMES } from '../../analysis/coupling.js';
import type { ReportRing } from '../../analysis/ringReport.js';
import type { InspectReport } from './inspect.js';
import { safeText } from '../../layout/text/safeText.js';
import { formatIssue } from '../../model/errors.js';

const fixed = (v: number | null, digits: number, unit = ''): string => (v === null ? '—' : `${v.toFixed(digits)}${unit}`);
const signed = (v: number | null): string => (v === null ? '—' : `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(1)}`);

/**
 * Text summary of a report: one block per record, one sub-block per ring.
 * @example process.stdout.write(inspectText(await inspectFile('x.sdf')))
 */
export function inspectText(report: InspectReport): string {
  const bad = [...new Set(report.errors.map((e) => e.record))];
  const n = report.records.length + bad.length;
  const errors = bad.length > 0 ? ` (${bad.length} with an error, not analysed)` : '';
  const head = `${report.source.path} (${report.source.format}): ${n} record${n === 1 ? '' : 's'}${errors}`;
  // good and bad records in file order, each bad one as its error lines
  const blocks: { at: number; text: string }[] = report.records.map((r) => ({ at: r.index, text: recordText(r) }));
  for (const record of bad) {
    const lines = report.errors.filter((e) => e.record === record).map((e) => `  error: ${safeText(formatIssue(e), 1000).text}`);
    blocks.push({ at: record ?? Infinity, text: [`record ${record}`, ...lines].join('\n') });
  }
  blocks.sort((p, q) => p.at - q.at);
  return `${[head, ...blocks.map((b) => b.text)].join('\n\n')}\n`;
}

function atomLabel(record: RecordReport, id: number): string {
  const atom = record.atoms[id - 1];
  if (!atom) return String(id);
  return atom.name && atom.name !== atom.element ? `${safeText(atom.name, 40).text}(${id})` : `${atom.element}${id}`;
}

function recordText(record: RecordReport): string {
  const perceived = record.bonds.some((b) => b.perceived);
  const nr = record.rings.length;
  const metal = record.bonds.filter((b) => b.coordination).length;
  const aside = record.setAsideRings.length;
  const facts = [
    `${record.atoms.length} atoms`,
    `${record.bonds.length} bonds ${perceived ? 'perceived from coordinates' : 'from the file'}${metal > 0 ? ` (${metal} to metals)` : ''}`,
    `${nr} ring${nr === 1 ? '' : 's'}${aside > 0 ? ` (+${aside} not analysed)` : ''}`,
  ];
  if (record.energy) facts.push(`energy ${record.energy.value} ${record.energy.unit ?? '(unit unknown)'} (${record.energy.field})`);
  // titles come from files: no terminal control sequences, bounded length
  const title = safeText(record.title).text;
  const lines = [`record ${record.index}${title ? `  "${title}"` : ''}`, `  ${facts.join(' · ')}`];
  for (const ring of record.rings) lines.push(...ringText(record, ring));
  for (const ring of record.setAsideRings) lines.push(`  not analysed: ${ring.message}`);
  if (record.couplings && record.couplings.length > 0) {
    const method = record.couplings[0]!.method;
    lines.push(`  ³J(H,H) predictions, ${COUPLING_METHOD_NAMES.get(method) ?? method} (estimates, typical error about 1 Hz)`);
    for (const c of record.couplings) {
      const pair = `${atomLabel(record, c.front)}–${atomLabel(record, c.back)}`;
      lines.push(`    ring ${c.ring}  ${pair.padEnd(14)} ${c.jHz.toFixed(1).padStart(5)} Hz   H–C–C–H ${signed(c.torsionDeg)}°`);
    }
  }
  for (const w of record.warnings) lines.push(`  warning: ${w.message}`);
  return lines.join('\n');
}

/** How τm was found, in the text report. */
const TAU_METHOD_WORDS = {
  'closed-form': 'closed form',
  'least-squares': 'least-squares fit',
  blended: 'closed form blended with fit',
  fourier: 'Fourier form',
} as const;

function ringText(record: RecordReport, ring: ReportRing): string[] {
  const p = ring.puckering;
  const shape = [ring.shape, ring.descriptor ?? ''].filter(Boolean).join(' ');
  const numbers = [`Q ${fixed(p.Q, 3, ' Å')}`];
  if (ring.size === 6) numbers.push(`θ ${fixed(p.thetaDeg, 1, '°')}`);
  numbers.push(`φ ${fixed(p.phiDeg, 1, '°')}`);
  if (ring.pseudorotation) {
    const pr = ring.pseudorotation;
    numbers.push(`P ${pr.phaseDeg.toFixed(1)}°`, `τm ${pr.amplitudeDeg.toFixed(1)}° (${TAU_METHOD_WORDS[pr.method]})`);
  }
  const out = [
    `  ring ${ring.id ?? '?'} (${ring.size} atoms): ${ring.atoms.map((a) => atomLabel(record, a)).join('-')}`,
    `    shape      ${shape.padEnd(18)} ${numbers.join('   ')}`,
    `    torsions   ${ring.torsions.map((t) => signed(t.angleDeg)).join('  ')}`,
  ];
  const byAtom = new Map<number, string[]>();
  for (const s of ring.substituents) {
    const words = [atomLabel(record, s.atom), s.position ?? 'in plane', s.face ?? ''].filter(Boolean).join(' ');
    byAtom.set(s.ringAtom, [...(byAtom.get(s.ringAtom) ?? []), words]);
  }
  const positions = [...byAtom].map(([a, list]) => `${atomLabel(record, a)}: ${list.join(', ')}`);
  if (positions.length > 0) {
    out.push(`    positions  ${positions[0]}`);
    for (const p2 of positions.slice(1)) out.push(`               ${p2}`);
  }
  out.push(`    numbering  ${ring.referenceRule}`);
  return out;
}
