/**
 * `pucker-map`: where the frames of a six-ring sit on the Cremer–Pople sphere. Our design: the two
 * hemispheres side by side, each as a Lambert azimuthal equal-area disc (ρ = √2 sin(θ/2) from its pole, so
 * equal areas on the sphere stay equal on paper): the θ = 0 chair at the centre of the left disc, the θ = 180
 * chair at the centre of the right one, boats and twist-boats on both rims (the equator), envelopes and
 * half-chairs as small dots between. φ runs clockwise from 12 o'clock on both discs, so a rim point of one
 * disc is the same point of the sphere as the rim point of the other at the same angle. Frames are shown as
 * equal-area histogram cells with log shading, never one by one.
 */
import type { PolarGrid } from '../../analysis/polarGrid.js';
import type { ShapeTable } from '../../analysis/shapeTable.js';
import { densityLevel, DENSITY_LEVELS, levelPaths } from './densityShading.js';
import { circlePath, discPoint, sectorPath, type Disc } from './discGeometry.js';
import { densityLegend } from './densityLegend.js';
import { textStyle, approximateMeasure, DEFAULT_METRICS, type Scene, type SceneItem, type SceneMetrics, type TextMeasure } from '../scene.js';
import { typesetDescriptor } from '../text/typesetDescriptor.js';
import { haloed } from './labelHalo.js';

/** Options of the map layouts. */
export interface PuckerMapOptions {
  /** Theme numbers (text sizes, margin). Default `DEFAULT_METRICS`. */
  readonly metrics?: SceneMetrics;
  /** Text measure. Default `approximateMeasure`. */
  readonly measure?: TextMeasure;
  /** Words naming the ring in the title, e.g. `ring 1-2-3-4-5-6`. Default `ring`. */
  readonly ringLabel?: string;
}

/** Radius fraction of polar angle θ (deg, 0…90 from the disc's pole) on the equal-area disc. */
export const equalAreaRadius = (thetaFromPoleDeg: number): number => Math.SQRT2 * Math.sin((thetaFromPoleDeg * Math.PI) / 360);

/** Density cells of one grid on a disc, grouped per level. */
export function densityItems(grid: PolarGrid, disc: Disc, maxCount: number): SceneItem[] {
  const pieces: string[][] = Array.from({ length: DENSITY_LEVELS }, () => []);
  for (const c of grid.cells()) {
    pieces[densityLevel(c.count, maxCount) - 1]!.push(sectorPath(disc, c.inner, c.outer, c.startDeg, c.endDeg));
  }
  return levelPaths(pieces);
}

/** Label of canonical form i: typeset descriptor, else the shape word. */
export function formLabel(table: ShapeTable, i: number): string {
  const parts = table.parts[i];
  return parts ? typesetDescriptor(parts) : table.forms[i]!.shape;
}

function hemisphere(grid: PolarGrid, disc: Disc, south: boolean, table: ShapeTable, maxCount: number, m: SceneMetrics): SceneItem[] {
  const items: SceneItem[] = [];
  for (const t of [30, 60]) items.push({ type: 'path', role: 'grid', d: circlePath(disc, equalAreaRadius(t)) });
  for (let a = 0; a < 360; a += 30) {
    const [x1, y1] = discPoint(disc, equalAreaRadius(30), a);
    const [x2, y2] = discPoint(disc, 1, a);
    items.push({ type: 'line', role: 'grid', x1, y1, x2, y2 });
  }
  items.push(...densityItems(grid, disc, maxCount));
  items.push({ type: 'path', role: 'axis', d: circlePath(disc, 1) });
  const label = textStyle(m, 'form-label');
  const dotR = label.fontSize * 0.28;
  table.forms.forEach((f, i) => {
    const theta = south ? 180 - f.thetaDeg! : f.thetaDeg!;
    if (theta > 90 + 1e-9) return;
    const rho = equalAreaRadius(theta);
    const [x, y] = discPoint(disc, rho, f.phiDeg);
    if (f.shape === 'chair') {
      items.push({ type: 'circle', role: 'form-chair', cx: x, cy: y, r: dotR * 1.3 });
      items.push(...haloed({ type: 'text', role: 'form-label', x: x + dotR * 2, y: y + dotR * 2 + label.fontSize * 0.8, text: formLabel(table, i), anchor: 'start', ...label }));
    } else if (f.shape === 'boat' || f.shape === 'twist-boat') {
      items.push({ type: 'circle', role: f.shape === 'boat' ? 'form-boat' : 'form-twist', cx: x, cy: y, r: dotR });
      const [lx, ly] = discPoint(disc, 1 + (m.gap + label.fontSize * 0.9) / disc.R, f.phiDeg);
      items.push({ type: 'text', role: 'form-label', x: lx, y: ly + label.fontSize * 0.35, text: formLabel(table, i), anchor: 'middle', ...label });
    } else {
      items.push({ type: 'circle', role: 'form-minor', cx: x, cy: y, r: dotR * 0.6 });
    }
  });
  return items;
}

/**
 * Scene of the six-ring map from the two hemisphere grids (north: θ ≤ 90, south: θ > 90, each binned by
 * equal-area radius and φ).
 * @example layoutPuckerMap(north, south, table, { ringLabel: 'ring 1' })
 */
export function layoutPuckerMap(north: PolarGrid, south: PolarGrid, table: ShapeTable, options: PuckerMapOptions = {}): Scene {
  const m = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const tick = textStyle(m, 'tick-label');
  const label = textStyle(m, 'form-label');
  const title = textStyle(m, 'panel-title');
  const R = tick.fontSize * 11;
  const ring = R + m.gap + label.fontSize * 1.6;
  const top = m.margin + title.fontSize * 1.4 + label.fontSize * 1.4;
  const left: Disc = { cx: m.margin + ring, cy: top + ring, R };
  const right: Disc = { cx: left.cx + 2 * ring + tick.fontSize * 2, cy: left.cy, R };
  const maxCount = Math.max(1, ...north.counts, ...south.counts);
  const items: SceneItem[] = [];
  const heading = (d: Disc, text: string) => items.push({ type: 'text', role: 'panel-title', x: d.cx, y: m.margin + title.fontSize, text, anchor: 'middle', ...title });
  heading(left, 'θ 0–90° (chair at θ = 0 in the centre)');
  heading(right, 'θ 90–180° (chair at θ = 180 in the centre)');
  items.push(...hemisphere(north, left, false, table, maxCount, m));
  items.push(...hemisphere(south, right, true, table, maxCount, m));
  const phiMark = (d: Disc) => {
    const [x, y] = discPoint(d, 1, 0);
    items.push({ type: 'text', role: 'tick-label', x: x + tick.fontSize * 1.6, y: y - label.fontSize * 0.9, text: 'φ 0° ↻', anchor: 'start', ...tick });
  };
  phiMark(left);
  phiMark(right);
  const width = right.cx + ring + m.margin;
  const legendTop = left.cy + ring + tick.fontSize;
  const legend = densityLegend(maxCount, m.margin, legendTop, m, measure);
  items.push(...legend.items);
  const notes = [
    'Equal-area projection of each hemisphere; grid circles at θ = 30° and 60° (150° and 120°), spokes every 30° of φ.',
    'Filled dots: boats; open dots: twist-boats; small dots: envelopes and half-chairs.',
  ];
  const cap = textStyle(m, 'caption');
  let y = legend.bottom;
  for (const n of notes) {
    y += cap.fontSize * 1.3;
    items.push({ type: 'text', role: 'caption', x: m.margin, y, text: n, anchor: 'start', ...cap });
  }
  const textRight = Math.max(...notes.map((n) => m.margin + measure(n, cap)));
  const frames = north.total + south.total;
  return {
    kind: 'pucker-map',
    width: Math.max(width, textRight + m.margin, legend.right + m.margin),
    height: y + cap.fontSize * 0.5 + m.margin,
    title: `Cremer–Pople puckering map of ${options.ringLabel ?? 'ring'} over ${frames} frames`,
    desc: `Two equal-area hemisphere discs of the Cremer–Pople sphere (θ 0–90° left, 90–180° right; φ clockwise from 12 o'clock), frames binned into equal-area cells with log-scaled shading (at most ${maxCount} frames per cell).`,
    items,
  };
}
