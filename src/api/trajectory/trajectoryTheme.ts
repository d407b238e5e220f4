/**
 * Roles of the trajectory figures that the shipped themes need not define: density levels, shape bands and
 * bars, canonical-form marks. They are derived from the theme (its series or line colour, its text sizes) and
 * put under the theme's own roles, so a theme that defines any of them wins.
 */
import type { RoleStyle, Theme } from '../../render/theme.js';
import { DENSITY_LEVELS } from '../../layout/plots/densityShading.js';

/** Ring shapes in a fixed order (bucket categories and colour order). */
export const SHAPE_ORDER = ['chair', 'twist-boat', 'boat', 'half-chair', 'envelope', 'screw-boat', 'twist', 'planar', 'puckered'] as const;

/** Okabe & Ito (2008) colour-blind-safe palette, one colour per shape in SHAPE_ORDER. */
const PALETTE = ['#0072B2', '#E69F00', '#009E73', '#CC79A7', '#F0E442', '#D55E00', '#56B4E9', '#999999', '#000000'];
/** Opacities per shape when the theme draws in currentColor (no hue to spare). */
const SHADES = [0.1, 0.32, 0.22, 0.45, 0.16, 0.55, 0.27, 0.05, 0.65];

/**
 * The theme with the trajectory roles added where it has none.
 * @example withTrajectoryRoles(loadTheme('column')).roles['density-6']
 */
export function withTrajectoryRoles(theme: Theme): Theme {
  const base = theme.roles.series?.stroke ?? theme.defaults.path.stroke ?? '#000000';
  const ink = theme.defaults.text.fill ?? base;
  const paper = theme.background === 'none' ? '#ffffff' : theme.background;
  const mono = base === 'currentColor';
  const tick = theme.roles['tick-label']?.fontSize ?? theme.defaults.text.fontSize ?? 8;
  const line = theme.roles.axis?.strokeWidth ?? theme.defaults.line.strokeWidth ?? 0.75;
  const roles: Record<string, RoleStyle> = {};
  for (let l = 1; l <= DENSITY_LEVELS; l++) {
    roles[`density-${l}`] = { fill: base, stroke: 'none', opacity: Math.round((0.1 + (0.9 * (l - 1)) / (DENSITY_LEVELS - 1)) * 100) / 100 };
  }
  // time-series density: a single frame in a column must stay visible, so the lightest level is darker
  for (let l = 1; l <= DENSITY_LEVELS; l++) {
    roles[`trace-${l}`] = { fill: base, stroke: 'none', opacity: Math.round((0.45 + (0.55 * (l - 1)) / (DENSITY_LEVELS - 1)) * 100) / 100 };
  }
  SHAPE_ORDER.forEach((shape, i) => {
    const fill = mono ? 'currentColor' : PALETTE[i]!;
    roles[`band-${shape}`] = { fill, stroke: 'none', opacity: mono ? SHADES[i]! : 0.3 };
    roles[`bar-${shape}`] = { fill, stroke: 'none', opacity: mono ? Math.min(1, SHADES[i]! * 2 + 0.1) : 0.85 };
  });
  roles['swatch-frame'] = { stroke: ink, strokeWidth: line * 0.6, fill: 'none' };
  roles['bar-frame'] = { stroke: ink, strokeWidth: line * 0.6, fill: 'none' };
  roles['form-chair'] = { stroke: mono ? 'currentColor' : paper, strokeWidth: line, fill: ink };
  roles['form-boat'] = { stroke: mono ? 'currentColor' : paper, strokeWidth: line * 0.6, fill: ink };
  roles['form-twist'] = { stroke: ink, strokeWidth: line, fill: mono ? 'none' : paper };
  roles['form-minor'] = { stroke: 'none', fill: ink, opacity: 0.6 };
  roles['form-label'] = { fill: ink, fontSize: Math.round(tick * 0.9 * 100) / 100 };
  roles['panel-title'] = { fill: ink, fontSize: tick };
  roles.series = { stroke: base, fill: 'none', strokeWidth: line * 1.2 };
  roles['series-point'] = { fill: base, stroke: 'none' };
  roles['series-muted'] = { fill: mono ? 'currentColor' : '#c4c4c4', stroke: 'none', opacity: mono ? 0.22 : 1 };
  return { ...theme, roles: { ...roles, ...theme.roles } };
}
