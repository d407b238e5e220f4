/**
 * Themes: JSON files that map Scene roles to stroke, fill and type. Validation admits only numbers, colours of
 * a strict form, enum words and allow-listed font names, so a theme can never inject markup or CSS.
 */
import { ConformarkError, type Issue } from '../model/errors.js';

/** Style of one role. Every field is optional; role styles override the per-primitive defaults. */
export interface RoleStyle {
  readonly stroke?: string;
  readonly fill?: string;
  /** Theme units. */
  readonly strokeWidth?: number;
  /** Dash and gap lengths, theme units. */
  readonly strokeDasharray?: readonly number[];
  readonly strokeLinecap?: 'butt' | 'round' | 'square';
  /** Theme units. */
  readonly fontSize?: number;
  readonly fontWeight?: 'normal' | 'bold';
  /** 0–1. */
  readonly opacity?: number;
}

export type Primitive = 'line' | 'path' | 'circle' | 'text';

/** A validated theme. */
export interface Theme {
  readonly name: string;
  readonly description: string;
  /** Unit of every length in the theme and of the SVG width/height. */
  readonly unit: 'pt' | 'px';
  readonly fontFamily: string;
  /** Figure background colour, or `none`. */
  readonly background: string;
  readonly sizes: {
    /** Base drawing length (Newman circle radius), theme units. */
    readonly bondLength: number;
    /** Clearance between labels and lines, theme units. */
    readonly gap: number;
    /** Border around the figure, theme units. */
    readonly margin: number;
  };
  readonly defaults: Readonly<Record<Primitive, RoleStyle>>;
  readonly roles: Readonly<Record<string, RoleStyle>>;
}

/** Font families a theme may name (the shipped DejaVu Sans measures all of them). */
export const FONT_FAMILIES: readonly string[] = ['DejaVu Sans', 'sans-serif', 'Helvetica', 'Arial', 'Liberation Sans'];

/** `#rgb`, `#rrggbb`, `currentColor` or `none`, nothing else. */
export const COLOUR = /^(#[0-9a-fA-F]{3}|#[0-9a-fA-F]{6}|currentColor|none)$/;
const NAME = /^[a-z][a-z0-9-]{0,40}$/;
const ROLE = /^[a-z][a-z0-9-]{0,40}$/;

type Check = (value: unknown, field: string) => void;

function validator(file: string) {
  const issues: Issue[] = [];
  const fail = (field: string, message: string) => issues.push({ code: 'bad-theme', file, line: null, message: `${field}: ${message}` });
  const num = (min: number, max: number): Check => (v, f) => {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < min || v > max) fail(f, `expected a number from ${min} to ${max}, got ${JSON.stringify(v)}`);
  };
  const colour: Check = (v, f) => {
    if (typeof v !== 'string' || !COLOUR.test(v)) fail(f, `expected a colour (#rgb, #rrggbb, currentColor or none), got ${JSON.stringify(v)}`);
  };
  const oneOf = (words: readonly string[]): Check => (v, f) => {
    if (typeof v !== 'string' || !words.includes(v)) fail(f, `expected one of ${words.join(', ')}, got ${JSON.stringify(v)}`);
  };
  const text = (max: number): Check => (v, f) => {
    if (typeof v !== 'string' || v.length > max || /[<>&"'`{}\\\u0000-\u001f]/.test(v)) fail(f, `expected plain text of at most ${max} characters without markup characters`);
  };
  const object = (v: unknown, f: string, fields: Record<string, Check>, required: readonly string[] = []) => {
    if (typeof v !== 'object' || v === null || Array.isArray(v)) return fail(f, 'expected an object');
    for (const [key, value] of Object.entries(v)) {
      // own keys only: `__proto__`, `constructor` or `toString` must not find Object.prototype's members
      const check = Object.hasOwn(fields, key) ? fields[key] : undefined;
      if (!check) fail(`${f}.${key}`, `unknown field (allowed: ${Object.keys(fields).join(', ')})`);
      else check(value, `${f}.${key}`);
    }
    for (const key of required) if (!(key in v)) fail(`${f}.${key}`, 'missing');
  };
  const dashes: Check = (v, f) => {
    if (!Array.isArray(v) || v.length > 8) return fail(f, 'expected a list of at most 8 numbers');
    v.forEach((x, i) => num(0, 100)(x, `${f}[${i}]`));
  };
  const style: Check = (v, f) => object(v, f, {
    stroke: colour, fill: colour, strokeWidth: num(0, 50), strokeDasharray: dashes,
    strokeLinecap: oneOf(['butt', 'round', 'square']), fontSize: num(1, 200), fontWeight: oneOf(['normal', 'bold']), opacity: num(0, 1),
  });
  const roles: Check = (v, f) => {
    if (typeof v !== 'object' || v === null || Array.isArray(v)) return fail(f, 'expected an object');
    for (const [key, value] of Object.entries(v)) {
      if (!ROLE.test(key)) fail(`${f}.${JSON.stringify(key).slice(1, -1)}`, 'role names are lower-case words joined by hyphens');
      else style(value, `${f}.${key}`);
    }
  };
  const theme = (v: unknown) => object(v, 'theme', {
    name: (x, f) => { if (typeof x !== 'string' || !NAME.test(x)) fail(f, 'expected a lower-case name of letters, digits and hyphens'); },
    description: text(200),
    unit: oneOf(['pt', 'px']),
    fontFamily: oneOf(FONT_FAMILIES),
    background: colour,
    sizes: (x, f) => object(x, f, { bondLength: num(1, 1000), gap: num(0, 100), margin: num(0, 500) }, ['bondLength', 'gap', 'margin']),
    defaults: (x, f) => object(x, f, { line: style, path: style, circle: style, text: style }, ['line', 'path', 'circle', 'text']),
    roles,
  }, ['name', 'unit', 'fontFamily', 'background', 'sizes', 'defaults', 'roles']);
  return { issues, theme };
}

/**
 * Validates parsed theme JSON; every problem names the file and the field.
 * @throws ConformarkError (code `bad-theme`) listing every issue.
 * @example parseTheme(JSON.parse(text), 'my-theme.json')
 */
export function parseTheme(json: unknown, file: string): Theme {
  const { issues, theme } = validator(file);
  theme(json);
  if (issues.length) throw new ConformarkError(issues);
  const t = json as Theme;
  return { ...t, description: t.description ?? '' };
}
