/**
 * Scene: the JSON-serialisable 2D drawing every figure kind produces and every renderer consumes.
 * Coordinates are in theme units (pt or px), y pointing down as in SVG; atom indices are 0-based here and
 * become 1-based in the SVG (`data-atoms`, `data-atom`). Roles name what an element is (`front-bond`,
 * `back-atom`, `atom-label`…); themes style roles, users restyle the SVG by class.
 */

/** A straight segment from (x1, y1) to (x2, y2); `atoms` = [start atom, end atom] when it is a bond. */
export interface SceneLine {
  readonly type: 'line';
  readonly role: string;
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
  readonly atoms?: readonly number[];
}

/** An SVG path (`d` already in scene coordinates, absolute commands). */
export interface ScenePath {
  readonly type: 'path';
  readonly role: string;
  readonly d: string;
  readonly atoms?: readonly number[];
}

export interface SceneCircle {
  readonly type: 'circle';
  readonly role: string;
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
  readonly atom?: number;
}

/**
 * One piece of typeset text: on the baseline, or a smaller lowered (`sub`) or raised (`sup`) piece
 * (`CH₃` is `CH` + sub `3`; `⁴C₁` is sup `4` + `C` + sub `1`).
 */
export interface TextRun {
  readonly text: string;
  readonly shift?: 'sub' | 'sup';
}

/** Text drawn at its baseline point (x, y), anchored start/middle/end; plain text, escaped on output. */
export interface SceneText {
  readonly type: 'text';
  readonly role: string;
  readonly x: number;
  readonly y: number;
  readonly text: string;
  /**
   * Typeset pieces (sub- and superscripts as smaller shifted runs); when present `text` is their plain
   * concatenation, kept for titles, search and older readers. Absent: `text` is drawn as one run.
   */
  readonly runs?: readonly TextRun[];
  readonly anchor: 'start' | 'middle' | 'end';
  /** Font size in theme units, as measured by the layout. */
  readonly fontSize: number;
  readonly fontWeight: FontWeight;
  readonly atom?: number;
  readonly atoms?: readonly number[];
}

export type SceneItem = SceneLine | ScenePath | SceneCircle | SceneText;

/** A complete figure: size in theme units, items in drawing order (later items on top). */
export interface Scene {
  /** Figure kind, used as a class on the root (`newman`, `chair`, `plot`…). */
  readonly kind: string;
  readonly width: number;
  readonly height: number;
  /** Short statement of what the figure shows (SVG `<title>`). */
  readonly title: string;
  /** Longer description (SVG `<desc>`). */
  readonly desc: string;
  readonly items: readonly SceneItem[];
}

export type FontWeight = 'normal' | 'bold';

/** Size and weight of one text role. */
export interface TextStyle {
  readonly fontSize: number;
  readonly fontWeight: FontWeight;
}

/** Width of `text` at the given style, in theme units. Layout stays pure: the renderer supplies a real one. */
export type TextMeasure = (text: string, style: TextStyle) => number;

/**
 * Numbers a layout needs from the theme, in theme units. Derived from a theme by `sceneMetrics(theme)` in
 * render/, so layouts never read themes themselves.
 */
export interface SceneMetrics {
  /** Base drawing length (Newman circle radius, chair bond length). */
  readonly bondLength: number;
  /** Thickest stroke in the figure, for clearances. */
  readonly lineWidth: number;
  /** Clearance between a label and any line or other label. */
  readonly gap: number;
  /** Empty border around the figure. */
  readonly margin: number;
  /** Text style per text role; roles not listed use `text.default`. */
  readonly text: Readonly<Record<string, TextStyle>>;
}

/** Text style of `role` from metrics, falling back to the `default` entry, then to 10 units normal. */
export function textStyle(metrics: SceneMetrics, role: string): TextStyle {
  return metrics.text[role] ?? metrics.text.default ?? { fontSize: 10, fontWeight: 'normal' };
}

/** Rough measure (0.6 em per character, 0.66 em bold) for layouts built without a font. */
export const approximateMeasure: TextMeasure = (text, style) =>
  [...text].length * style.fontSize * (style.fontWeight === 'bold' ? 0.66 : 0.6);

/** Metrics used when no theme is given: sizes in pt for an 8 pt label. */
export const DEFAULT_METRICS: SceneMetrics = {
  bondLength: 24,
  lineWidth: 0.8,
  gap: 1.5,
  margin: 4,
  text: {
    default: { fontSize: 8, fontWeight: 'normal' },
    'torsion-label': { fontSize: 6.5, fontWeight: 'normal' },
    caption: { fontSize: 7, fontWeight: 'normal' },
  },
};

/** The item moved by (dx, dy); paths are already placed in final coordinates and stay as they are. */
export function shiftItem(it: SceneItem, dx: number, dy: number): SceneItem {
  switch (it.type) {
    case 'line': return { ...it, x1: it.x1 + dx, y1: it.y1 + dy, x2: it.x2 + dx, y2: it.y2 + dy };
    case 'circle': return { ...it, cx: it.cx + dx, cy: it.cy + dy };
    case 'text': return { ...it, x: it.x + dx, y: it.y + dy };
    case 'path': return it;
  }
}
