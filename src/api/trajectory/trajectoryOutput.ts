/** Writes `summary.json` and the three trajectory figures of each ring (each in every requested format). */
import { jsonText } from '../jsonText.js';
import type { OutputFolder } from '../../io/outputFolder.js';
import { figureBytes, type FigureFormat } from '../figures/writeFigure.js';
import { loadTheme, sceneMetrics } from '../../render/themes.js';
import { renderSvg } from '../../render/renderSvg.js';
import { measureText } from '../../render/svgWindow.js';
import type { Theme } from '../../render/theme.js';
import type { Scene } from '../../layout/scene.js';
import { layoutPuckerMap } from '../../layout/plots/puckerMapLayout.js';
import { layoutPseudorotationWheel } from '../../layout/plots/pseudorotationWheelLayout.js';
import { layoutTimeSeries, type SeriesSpec } from '../../layout/plots/timeSeriesLayout.js';
import { layoutOccupancy } from '../../layout/plots/occupancyLayout.js';
import type { Timestep } from './timestep.js';
import type { RingSetup } from './trajectorySetup.js';
import { PHI_THETA_MIN, type TrajectoryPlots } from './trajectoryPlots.js';
import { SHAPE_ORDER, withTrajectoryRoles } from './trajectoryTheme.js';

/** Figure options of a run. */
export interface TrajectoryFigureOptions {
  readonly formats: readonly FigureFormat[];
  readonly theme?: Theme | string;
  readonly timestep: Timestep | null;
  /** PNG resolution, dots per inch. Default 300. */
  readonly dpi?: number;
  /** Most pixels of one PNG. Default 64,000,000. */
  readonly maxPixels?: number;
}

const angle = (label: string, max: number, step: number, wraps: boolean, extra: Partial<SeriesSpec> = {}): SeriesSpec => ({
  label, min: 0, max, wraps, ticks: Array.from({ length: max / step + 1 }, (_, i) => i * step), ...extra,
});

/** Series shown in the time series for a ring size. */
export function seriesSpecs(size: number, plots: TrajectoryPlots): SeriesSpec[] {
  const bins = plots.series.binning;
  const binning = (i: number) => (bins[i] ? { binning: bins[i] } : {});
  if (size === 6) {
    const note = `grey: φ where θ < ${PHI_THETA_MIN}° or > ${180 - PHI_THETA_MIN}° (near a chair, φ is set by noise)`;
    return [angle('θ (°)', 180, 45, false, binning(0)), angle('φ (°)', 360, 90, true, { ...binning(1), muted: { index: 2, note } })];
  }
  if (size === 5) return [angle('P (°)', 360, 90, true, binning(0)), angle('τm (°)', plots.maxAmplitudeDeg, 20, false, binning(1))];
  let qMax = 0.2;
  for (const b of plots.series.buckets()) qMax = Math.max(qMax, b.ranges[0]?.[1] ?? 0);
  const top = Math.ceil(qMax * 10) / 10;
  return [{ label: 'Q (Å)', min: 0, max: top, wraps: false, ticks: [0, top / 2, top], ...binning(0) }, angle('φ₂ (°)', 360, 90, true, binning(1))];
}

/** The scenes of a run: map (six- and five-rings only), time series, occupancy. */
export function trajectoryScenes(summary: { occupancy: Record<string, number>; frames: { analysed: number } }, plots: TrajectoryPlots, setup: RingSetup, theme: Theme, timestep: Timestep | null): Map<string, Scene> {
  const metrics = sceneMetrics(theme);
  const common = { metrics, measure: measureText, ringLabel: setup.label };
  const scenes = new Map<string, Scene>();
  const n = setup.ring.length;
  if (n === 6) scenes.set('pucker-map', layoutPuckerMap(plots.north, plots.south, setup.table, common));
  if (n === 5) scenes.set('pucker-map', layoutPseudorotationWheel(plots.north, setup.table, plots.maxAmplitudeDeg, common));
  scenes.set('time-series', layoutTimeSeries(plots.series.buckets(), seriesSpecs(n, plots), SHAPE_ORDER, { ...common, ...(timestep ? { timestep } : {}) }));
  scenes.set('occupancy', layoutOccupancy(summary.occupancy, { ...common, frames: summary.frames.analysed }));
  return scenes;
}

/** What the figures of one ring need. */
export interface RingFigures {
  readonly summary: { occupancy: Record<string, number>; frames: { analysed: number } };
  readonly plots: TrajectoryPlots;
  readonly setup: RingSetup;
  /** Added to the file names (`-CHX2`), '' for a single ring. */
  readonly suffix: string;
}

/**
 * Writes every ring's figures and then commits the folder with summary.json as its manifest (so the figures,
 * the CSV and the summary appear together); returns the paths written, relative to the folder.
 */
export async function writeTrajectoryFiles(folder: OutputFolder, summary: object, rings: readonly RingFigures[], options: TrajectoryFigureOptions): Promise<string[]> {
  const files = ['summary.json'];
  const theme = withTrajectoryRoles(loadTheme(options.theme));
  for (const ring of rings) {
    const figures: [string, string][] = [];
    for (const [name, scene] of trajectoryScenes(ring.summary, ring.plots, ring.setup, theme, options.timestep)) {
      const file = `${name}${ring.suffix}`;
      figures.push([file, renderSvg(scene, theme, { idPrefix: `${file}-` })]);
    }
    for (const [name, svg] of figures) {
      for (const format of options.formats) {
        folder.write(`${name}.${format}`, await figureBytes(svg, format, { dpi: options.dpi, maxPixels: options.maxPixels }));
        files.push(`${name}.${format}`);
      }
    }
  }
  folder.commit(jsonText({ ...summary, files: ['puckering.csv', ...files] }));
  return files;
}
