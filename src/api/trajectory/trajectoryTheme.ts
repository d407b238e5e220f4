/**
 * Roles of the trajectory figures that the shipped themes need not define: density levels, shape bands and
 * bars, canonical-form marks. They are derived from the theme (its series or line colour, its text sizes) and
 * put under the theme's own roles, so a theme that defines any of them wins.
 */
import type { RoleStyle, Theme } from '../../render/theme.js';
import { DENSITY_LEVELS } from '../../layout/plots/densityShading.js';
import { minimumOpacity } from '../../render/contrast.js';

/** Ring shapes in a fixed order (bucket categories and colour order); the medium-ring forms come last. */
export const SHAPE_ORDER = [
  'chair', 'twist-boat', 'boat', 'half-chair', 'envelope', 'screw-boat', 'twist', 'planar', 'puckered',
  'twist-chair', 'crown', 'boat-boat', 'boat-chair', 'twist-boat-chair', 'twist-chair-chair',
] as const;

/**
 * One colour per shape in SHAPE_ORDER: the Okabe & Ito (2008) colour-blind-safe palette, with its light members
 * (orange, pink, yellow, sky blue, grey) darkened along their hue until they reach 3:1 on white (WCAG 2.1
 * SC 1.4.11), since bars and swatches are graphics a reader needs.
 */
const PALETTE = ['#0072B2', '#B27A00', '#009E73', '#C26A99', '#948A1E', '#D55E00', '#3089C8', '#767676', '#000000',
  // medium-ring forms reuse the colours of shapes their ring size never has, so one ring's shapes stay distinct:
  // seven-rings chair, twist-boat, boat + twist-chair; eight-rings twist-boat + crown … twist-chair-chair
  '#C26A99', '#C26A99', '#009E73', '#948A1E', '#D55E00', '#3089C8'];
/** Opacities per shape when the theme draws in currentColor (no hue to spare), paired the same way. */
const SHADES = [0.1, 0.32, 0.22, 0.45, 0.16, 0.55, 0.27, 0.05, 0.65, 0.45, 0.45, 0.22, 0.16, 0.55, 0.27];

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
  // density ramps start at the lightest shade with 3:1 on the paper (a cell visited once must stay visible)
  const floor = minimumOpacity(mono ? '#000000' : base, mono ? '#ffffff' : paper, 3);
  for (let l = 1; l <= DENSITY_LEVELS; l++) {
    const opacity = Math.round((floor + ((1 - floor) * (l - 1)) / (DENSITY_LEVELS - 1)) * 100) / 100;
    roles[`density-${l}`] = { fill: base, stroke: 'none', opacity };
    roles[`trace-${l}`] = { fill: base, stroke: 'none', opacity };
  }
  SHAPE_ORDER.forEach((shape, i) => {
    const fill = mono ? 'currentColor' : PALETTE[i]!;
    roles[`band-${shape}`] = { fill, stroke: 'none', opacity: mono ? SHADES[i]! : 0.3 };
    roles[`bar-${shape}`] = { fill, stroke: 'none', opacity: mono ? Math.min(1, SHADES[i]! * 2 + 0.1) : 1 };
  });
  roles['swatch-frame'] = { stroke: ink, strokeWidth: line * 0.6, fill: 'none' };
  roles['bar-frame'] = { stroke: ink, strokeWidth: line * 0.6, fill: 'none' };
  roles['form-chair'] = { stroke: mono ? 'currentColor' : paper, strokeWidth: line, fill: ink };
  roles['form-boat'] = { stroke: mono ? 'currentColor' : paper, strokeWidth: line * 0.6, fill: ink };
  roles['form-twist'] = { stroke: ink, strokeWidth: line, fill: mono ? 'none' : paper };
  roles['form-minor'] = { stroke: 'none', fill: ink, opacity: 0.6 };
  roles['form-label'] = { fill: ink, fontSize: Math.round(tick * 0.9 * 100) / 100 };
  roles['panel-title'] = { fill: ink, fontSize: tick };
  // behind labels over shading: the paper colour (white where the theme leaves the background open)
  roles['label-halo'] = { stroke: paper, fill: paper, strokeWidth: Math.round(tick * 0.35 * 100) / 100, strokeLinecap: 'round' };
  roles.series = { stroke: base, fill: 'none', strokeWidth: line * 1.2 };
  roles['series-point'] = { fill: base, stroke: 'none' };
  // greyed on purpose (values that mean nothing); in colour themes still 3:1, in black ones lighter than any ramp shade
  roles['series-muted'] = { fill: mono || base === '#000000' ? ink : '#8c8c8c', stroke: 'none', opacity: mono || base === '#000000' ? 0.22 : 1 };
  return { ...theme, roles: { ...roles, ...theme.roles } };
}
