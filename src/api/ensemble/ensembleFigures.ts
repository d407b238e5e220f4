/**
 * Ensemble figures: a contact sheet of the distinct conformers in energy order (a ring figure of the first
 * ring, else a Newman projection of the first ring bond or rotatable bond) captioned with ΔE and population,
 * and the energy ladder. Written atomically into a folder.
 */
import { join } from 'node:path';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';
import { layoutEnergyLadder, percentText } from '../../layout/plots/energyLadder.js';
import { figureBonds } from '../../analysis/figureBonds.js';
import { writeAtomic } from '../../io/writeAtomic.js';
import { canDraw, drawFigure, type FigureKind, type FigureTarget } from '../figures/figureKinds.js';
import { contactSheet, type ContactPanel } from '../figures/contactSheet.js';
import { fixed } from '../tables/tableText.js';
import type { EnsembleResult } from './ensemble.js';

/** Options of {@link writeEnsembleFigures}. */
export interface EnsembleFigureOptions {
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Prefix of every id (`<prefix>r03-`, `<prefix>ladder-`). Default none. */
  readonly idPrefix?: string;
  /** Panels per sheet. Default 24. */
  readonly sheetSize?: number;
  /** Writes one file (path, bytes). Default `writeAtomic`; a command that owns the folder stages through it. */
  readonly write?: (path: string, data: string) => void;
}

/** The panel drawn for a conformer, or `null` when it has neither a ring nor a bond to show. */
function panelTarget(p: EnsembleResult['prepared'][number]): { kind: FigureKind; target: FigureTarget } | null {
  if (p.rings.length > 0 && canDraw('ring')) return { kind: 'ring', target: { ring: 0 } };
  const bond = figureBonds(p.molecule, p.graph, p.rings, 'ring')[0] ?? figureBonds(p.molecule, p.graph, p.rings, 'rotatable')[0];
  return bond ? { kind: 'newman', target: { bond } } : null;
}

/**
 * Writes `ensemble-sheet-N.svg` and `energy-ladder.svg` into `dir`; returns the file names written.
 * @example writeEnsembleFigures(await ensembleFile('c.sdf'), 'figs')
 */
export function writeEnsembleFigures(result: EnsembleResult, dir: string, options: EnsembleFigureOptions = {}): string[] {
  const theme = loadTheme(options.theme);
  const prefix = options.idPrefix ?? '';
  const { conformers } = result.report;
  const width = Math.max(2, String(conformers.reduce((m, c) => Math.max(m, c.record), 0)).length);
  const label = (n: number) => `r${String(n).padStart(width, '0')}`;
  const write = options.write ?? writeAtomic;
  const written: string[] = [];
  const panels: ContactPanel[] = [];
  conformers.forEach((c, i) => {
    if (c.duplicateOf !== null) return;
    const p = result.prepared[i]!;
    const what = panelTarget(p);
    if (!what) return;
    // a sheet of many conformers: ring hydrogens left out so the heavy substituents' positions stand out
    const fig = drawFigure(what.kind, { ...p, theme, idPrefix: `${prefix}${label(c.record)}-`, ringHydrogens: 'none' }, what.target);
    const caption = [`${label(c.record)} ${c.title}`.trim(), `ΔE ${fixed(c.relativeEnergy, 2)} kcal/mol, ${percentText(c.population)}`];
    panels.push({ svg: fig.svg, width: fig.width, height: fig.height, caption });
  });
  const size = options.sheetSize ?? 24;
  for (let s = 0; s * size < panels.length; s++) {
    const svg = contactSheet(panels.slice(s * size, (s + 1) * size), { theme, idPrefix: `${prefix}sheet-${s + 1}-`, title: 'Conformers in energy order' });
    const file = `ensemble-sheet-${s + 1}.svg`;
    write(join(dir, file), `${svg}\n`);
    written.push(file);
  }
  const levels = conformers.filter((c) => c.duplicateOf === null).map((c) => ({ label: label(c.record), relativeEnergy: c.relativeEnergy, population: c.population }));
  const scene = layoutEnergyLadder(levels, { unit: result.report.unit, metrics: sceneMetrics(theme), measure: measureText });
  write(join(dir, 'energy-ladder.svg'), `${renderSvg(scene, theme, { idPrefix: `${prefix}ladder-` })}\n`);
  written.push('energy-ladder.svg');
  return written;
}
