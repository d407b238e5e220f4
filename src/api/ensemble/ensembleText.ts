/** The ranked table `ensemble` prints: rank, record, title, E, ΔE, population, ring shapes; then the notes. */
import { safeText } from '../../layout/text/safeText.js';
import { fixed } from '../tables/tableText.js';
import { percentText } from '../../layout/plots/energyLadder.js';
import type { EnsembleReport } from './ensemble.js';

const pad = (s: string, n: number, right = false) => (right ? s.padStart(n) : s.padEnd(n));
// titles come from files: no terminal control sequences (safeText), then cut to the column
const cut = (s: string, n: number) => safeText(s, n).text;

/**
 * Plain-text table of an ensemble report, columns aligned, one conformer per line in energy order.
 * @example process.stdout.write(ensembleText(report))
 */
export function ensembleText(report: EnsembleReport): string {
  const width = Math.max(2, String(report.conformers.reduce((m, c) => Math.max(m, c.record), 0)).length);
  let rank = 0;
  const rows = report.conformers.map((c) => [
    c.duplicateOf === null ? String(++rank) : '–',
    `r${String(c.record).padStart(width, '0')}`,
    cut(c.title, 48),
    fixed(c.energy, 4),
    fixed(c.relativeEnergy, 2),
    c.duplicateOf === null ? percentText(c.population) : `dup of r${String(c.duplicateOf).padStart(width, '0')}`,
    c.rings.map((r) => `${r.shape}${r.descriptor ? ` ${r.descriptor}` : ''}`).join('; ') || '–',
  ]);
  const head = ['rank', 'record', 'title', `E (${report.unit})`, `ΔE (${report.unit})`, 'population', 'rings'];
  const right = [true, false, false, true, true, true, false];
  const w = head.map((h, k) => rows.reduce((m, r) => Math.max(m, [...r[k]!].length), [...h].length));
  const line = (cells: string[]) => cells.map((s, k) => pad(s, w[k]! + (s.length - [...s].length), right[k])).join('  ').trimEnd();
  const unique = report.conformers.filter((c) => c.duplicateOf === null).length;
  const out = [
    `${report.conformers.length} record${report.conformers.length === 1 ? '' : 's'}, ${unique} distinct, Boltzmann populations at ${fixed(report.temperatureK, 2)} K`,
    '',
    line(head),
    ...rows.map(line),
  ];
  if (report.averages.couplings.length > 0) {
    out.push('', 'population-weighted ⟨³J(H,H)⟩ (Hz):');
    for (const c of report.averages.couplings) out.push(`  H${c.front}–H${c.back}  ${fixed(c.jHz, 1)}`);
  }
  out.push('', ...report.notes.map((n) => `note: ${n}`));
  return `${out.join('\n')}\n`;
}
