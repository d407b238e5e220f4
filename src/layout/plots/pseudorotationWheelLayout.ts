/**
 * `pucker-map` for five-rings: a pseudorotation wheel. The Altona–Sundaralingam phase P runs clockwise from
 * 12 o'clock, the amplitude τm outward from the centre (grid circles every 20°); the 10 envelopes and 10 twists
 * sit on the rim at their P (P ≈ φ2 + 90 in the ring's reference numbering, docs/methods.md#five-ring-forms, derived).
 * Frames are binned into equal-area cells of the wheel with log shading.
 */
import type { PolarGrid } from '../../analysis/polarGrid.js';
import type { ShapeTable } from '../../analysis/shapeTable.js';
import { circlePath, discPoint, type Disc } from './discGeometry.js';
import { densityLegend } from './densityLegend.js';
import { densityItems, formLabel, type PuckerMapOptions } from './puckerMapLayout.js';
import { haloed } from './labelHalo.js';
import { approximateMeasure, DEFAULT_METRICS, textStyle, type Scene, type SceneItem } from '../scene.js';

/**
 * Scene of the wheel from a grid binned by τm / `maxAmplitudeDeg` and P.
 * @example layoutPseudorotationWheel(grid, table, 60)
 */
export function layoutPseudorotationWheel(grid: PolarGrid, table: ShapeTable, maxAmplitudeDeg: number, options: PuckerMapOptions = {}): Scene {
  const m = options.metrics ?? DEFAULT_METRICS;
  const measure = options.measure ?? approximateMeasure;
  const tick = textStyle(m, 'tick-label');
  const label = textStyle(m, 'form-label');
  const title = textStyle(m, 'panel-title');
  const R = tick.fontSize * 14;
  const ring = R + m.gap + label.fontSize * 2;
  const disc: Disc = { cx: m.margin + ring + tick.fontSize * 2, cy: m.margin + title.fontSize * 1.6 + ring, R };
  const items: SceneItem[] = [];
  items.push({ type: 'text', role: 'panel-title', x: disc.cx, y: m.margin + title.fontSize, text: 'pseudorotation phase P (clockwise from 12 o\'clock) and amplitude τm', anchor: 'middle', ...title });
  const step = 20;
  for (let a = step; a < maxAmplitudeDeg; a += step) items.push({ type: 'path', role: 'grid', d: circlePath(disc, a / maxAmplitudeDeg) });
  for (let p = 0; p < 360; p += 36) {
    const [x1, y1] = discPoint(disc, 0, p);
    const [x2, y2] = discPoint(disc, 1, p);
    items.push({ type: 'line', role: 'grid', x1, y1, x2, y2 });
  }
  const maxCount = Math.max(1, ...grid.counts);
  items.push(...densityItems(grid, disc, maxCount));
  items.push({ type: 'path', role: 'axis', d: circlePath(disc, 1) });
  for (let a = step; a <= maxAmplitudeDeg; a += step) {
    const [x, y] = discPoint(disc, a / maxAmplitudeDeg, 90);
    items.push(...haloed({ type: 'text', role: 'tick-label', x: x - tick.fontSize * 0.2, y: y - tick.fontSize * 0.3, text: `${a}°`, anchor: 'end', ...tick }));
  }
  const dotR = label.fontSize * 0.28;
  table.forms.forEach((f, i) => {
    const p = f.phiDeg + 90;
    const [x, y] = discPoint(disc, 1, p);
    items.push({ type: 'circle', role: f.shape === 'envelope' ? 'form-boat' : 'form-twist', cx: x, cy: y, r: dotR });
    const [lx, ly] = discPoint(disc, 1 + (m.gap + label.fontSize * 1.1) / R, p);
    items.push({ type: 'text', role: 'form-label', x: lx, y: ly + label.fontSize * 0.35, text: formLabel(table, i), anchor: 'middle', ...label });
  });
  const [px, py] = discPoint(disc, 1, 0);
  items.push({ type: 'text', role: 'tick-label', x: px + tick.fontSize * 2.2, y: py - label.fontSize * 1.2, text: 'P 0° ↻', anchor: 'start', ...tick });
  const width = disc.cx + ring + tick.fontSize * 2 + m.margin;
  const legend = densityLegend(maxCount, m.margin, disc.cy + ring + tick.fontSize, m, measure);
  items.push(...legend.items);
  const cap = textStyle(m, 'caption');
  const notes = [
    `Filled dots: envelopes; open dots: twists. Amplitude circles every ${step}°${grid.clamped ? `; ${grid.clamped} frames beyond ${maxAmplitudeDeg}° drawn at the rim` : ''}.`,
  ];
  let y = legend.bottom;
  for (const n of notes) {
    y += cap.fontSize * 1.3;
    items.push({ type: 'text', role: 'caption', x: m.margin, y, text: n, anchor: 'start', ...cap });
  }
  const textRight = Math.max(...notes.map((n) => m.margin + measure(n, cap)));
  return {
    kind: 'pucker-map',
    width: Math.max(width, textRight + m.margin, legend.right + m.margin),
    height: y + cap.fontSize * 0.5 + m.margin,
    title: `Pseudorotation wheel of ${options.ringLabel ?? 'ring'} over ${grid.total} frames`,
    desc: `Altona–Sundaralingam phase P clockwise from 12 o'clock, amplitude τm outward (0–${maxAmplitudeDeg}°); frames binned into equal-area cells with log-scaled shading (at most ${maxCount} frames per cell).`,
    items,
  };
}
