/** The public API of conformark: explicit named exports only. The CLI uses nothing else. */
export const VERSION = '0.1.0';

export type { Atom, Bond, Molecule, RecordSource, FormatName, Vec3 } from './model/molecule.js';
export { atomPosition } from './model/molecule.js';
export { ConformarkError, ParseError, formatIssue, usageError } from './model/errors.js';
export type { Issue, Warning } from './model/errors.js';
export { elementInfo, elementByNumber, atomicMass } from './model/elements.js';
export type { ElementInfo } from './model/elements.js';
export { torsion, torsionRad } from './geometry/torsion.js';
export { klynePrelog, torsionRelation } from './geometry/klynePrelog.js';
export type { KlynePrelog, TorsionRelation } from './geometry/klynePrelog.js';
export { wrap180, wrap360 } from './geometry/vec3.js';
export { writeAtomic, protectInput } from './io/writeAtomic.js';
export { buildGraph } from './perceive/graph.js';
export type { Graph } from './perceive/graph.js';
export {
  cremerPople,
  meanPlane,
  displacementsFromModes,
  sixRingModes,
  ringFromDisplacements,
  PHASE_THRESHOLD,
} from './geometry/cremerPople.js';
export type { Puckering, PuckeringMode } from './geometry/cremerPople.js';

// newman + render (area D)
export { newmanView, heaviestAtom, ECLIPSED_MAX_DEG, STAGGERED_MIN_DEG } from './analysis/newman.js';
export type { NewmanOptions, NewmanView, NewmanSubstituent, NewmanPair, NewmanConformation } from './analysis/newman.js';
export { toNewmanJson } from './analysis/newmanJson.js';
export type { NewmanJson, NewmanJsonOptions, NewmanCouplingInput } from './analysis/newmanJson.js';
export { layoutNewman } from './layout/newmanLayout.js';
export type { NewmanLayoutOptions, NewmanHydrogens } from './layout/newmanLayout.js';
export type { NewmanAngles } from './layout/newmanAngles.js';
export type { NewmanLabels } from './layout/newmanLabels.js';
export { torsionArcPath } from './layout/torsionArc.js';
export { approximateMeasure, textStyle, DEFAULT_METRICS } from './layout/scene.js';
export type { Scene, SceneItem, SceneLine, ScenePath, SceneCircle, SceneText, SceneMetrics, TextMeasure, TextStyle, FontWeight } from './layout/scene.js';
export { renderSvg } from './render/renderSvg.js';
export type { RenderSvgOptions } from './render/renderSvg.js';
export { renderPng } from './render/renderPng.js';
export type { RenderPngOptions } from './render/renderPng.js';
export { renderPdf, svgSizePt } from './render/renderPdf.js';
export { measureText } from './render/svgWindow.js';
export { parseTheme, FONT_FAMILIES } from './render/theme.js';
export type { Theme, RoleStyle } from './render/theme.js';
export { loadTheme, sceneMetrics, themeTextStyle, THEMES, DEFAULT_THEME } from './render/themes.js';
export type { ThemeName } from './render/themes.js';
export { newmanFigure } from './api/newman.js';
export type { NewmanFigure, NewmanFigureOptions } from './api/newman.js';
export { writeFigure, figureFormat, figureBytes, FIGURE_FORMATS } from './api/writeFigure.js';
export type { FigureFormat, WriteFigureOptions } from './api/writeFigure.js';
