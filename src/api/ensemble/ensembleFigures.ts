/**
 * Ensemble figures: conformer sheets of the distinct conformers in energy order, one row per conformer (ring
 * figure, then its informative Newman projections; a molecule without rings gets its first rotatable bond),
 * headed `r03 · chair ¹C₄ · ΔE 1.30 kcal/mol · 6.4 %`, and the energy ladder. Written atomically into a folder.
 */
import { join } from 'node:path';
import type { Theme } from '../../render/theme.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { measureText } from '../../render/svgWindow.js';
import { renderSvg } from '../../render/renderSvg.js';
import { layoutEnergyLadder, percentText, type LadderLevel, type LadderUnit } from '../../layout/plots/energyLadder.js';
import { figureBonds } from '../../analysis/figureBonds.js';
import { writeAtomic } from '../../io/writeAtomic.js';
import { drawFigure } from '../figures/figureKinds.js';
import { drawnRingForms } from '../figures/drawnRingForms.js';
import { conformerSheets, type ConformerRow, type SheetLayout } from '../figures/conformerSheet.js';
import { descriptorTextRuns, formRuns, headingRuns, INFORMATIVE_NOTE, sharedTitle, sheetTargets, type SheetTarget } from '../figures/sheetRows.js';
import { fixed } from '../tables/tableText.js';
import type { EnsembleResult } from './ensemble.js';

/** Options of {@link writeEnsembleFigures}. */
export interface EnsembleFigureOptions {
  /** Theme object, built-in name or path. Default `column`. */
  readonly theme?: Theme | string;
  /** Prefix of every id (`<prefix>r03-`, `<prefix>ladder-`). Default none. */
  readonly idPrefix?: string;
  /** Sheet format: `page` (17 cm wide, default) or `slide` (16:9; pair it with the `projector` theme). */
  readonly sheetLayout?: SheetLayout;
  /** Energy unit of the ladder's axis and labels: `kcal/mol` or `kJ/mol`. Default `kcal/mol`. */
  readonly ladderUnit?: LadderUnit;
  /** Writes one file (path, bytes). Default `writeAtomic`; a command that owns the folder stages through it. */
  readonly write?: (path: string, data: string) => void;
}

type Prepared = EnsembleResult['prepared'][number];

/** A row's figures: ring figures and informative Newmans, or the first ring or rotatable bond of a ring-free molecule. */
function rowTargets(p: Prepared): SheetTarget[] {
  const targets = sheetTargets(p);
  if (targets.length > 0) return targets;
  const bond = figureBonds(p.molecule, p.graph, p.rings, 'ring')[0] ?? figureBonds(p.molecule, p.graph, p.rings, 'rotatable')[0];
  return bond ? [{ kind: 'newman', target: { bond }, name: 'Newman' }] : [];
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
  const distinct = conformers.flatMap((c, i) => (c.duplicateOf === null ? [{ c, p: result.prepared[i]! }] : []));
  const forms = distinct.map(({ p }) => drawnRingForms(p));
  const { header, rest } = sharedTitle(distinct.map(({ c }) => c.title));

  // 1. Sheets: one row per distinct conformer.
  const rows: ConformerRow[] = [];
  distinct.forEach(({ c, p }, k) => {
    const panels = rowTargets(p).map((t, j) => {
      // a sheet of many conformers: ring hydrogens left out so the heavy substituents' positions stand out
      const fig = drawFigure(t.kind, { ...p, theme, idPrefix: `${prefix}${label(c.record)}-${j + 1}-`, ringHydrogens: 'none' }, t.target);
      return { svg: fig.svg, width: fig.width, height: fig.height, name: t.name };
    });
    if (panels.length === 0) return;
    const heading = headingRuns([label(c.record), rest[k]!, formRuns(forms[k]!), `ΔE ${fixed(c.relativeEnergy, 2)} kcal/mol`, percentText(c.population)]);
    rows.push({ label: label(c.record), heading, panels });
  });
  const sheets = conformerSheets(rows, {
    theme, layout: options.sheetLayout, idPrefix: `${prefix}sheet-`, header, title: 'Conformers in energy order',
    note: `Conformers in energy order, Boltzmann populations at ${result.report.temperatureK} K. ${INFORMATIVE_NOTE}`,
  });
  sheets.forEach((svg, s) => {
    const file = `ensemble-sheet-${s + 1}.svg`;
    write(join(dir, file), `${svg}\n`);
    written.push(file);
  });

  // 2. The ladder: a column per ring form, descriptors as the ring figures give them.
  const levels: LadderLevel[] = distinct.map(({ c }, k) => ({
    label: label(c.record), relativeEnergy: c.relativeEnergy, population: c.population,
    form: forms[k]!.map((f) => f.shape).join(' · '),
    descriptor: forms[k]!.flatMap((f, j) => (f.descriptor ? [...(j > 0 ? [{ text: ' ' }] : []), ...descriptorTextRuns(f.descriptor)] : [])),
  }));
  const scene = layoutEnergyLadder(levels, { unit: options.ladderUnit, metrics: sceneMetrics(theme), measure: measureText });
  write(join(dir, 'energy-ladder.svg'), `${renderSvg(scene, theme, { idPrefix: `${prefix}ladder-` })}\n`);
  written.push('energy-ladder.svg');
  return written;
}
