/** Built-in themes (templates/*.json) and loading a theme by name or path. */
import { closeSync, openSync, readSync, statSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { usageError } from '../model/errors.js';
import type { SceneMetrics, TextStyle } from '../layout/scene.js';
import { parseTheme, type Theme } from './theme.js';

/** Package folder of the built-in theme files, relative to this module (src/render or dist/render). */
const TEMPLATES = new URL('../../templates/', import.meta.url);

/** Largest theme file read, bytes (a theme is a few KiB; this stops /dev/zero or a wrong huge file). */
const MAX_THEME_BYTES = 256 * 1024;

/** At most `max + 1` bytes of a file as UTF-8 text, so an endless or huge file is never read in full. */
function readBounded(path: string, max: number): string {
  const fd = openSync(path, 'r');
  try {
    const buf = Buffer.alloc(max + 1);
    let got = 0;
    for (let n = -1; n !== 0 && got < buf.length; got += n) n = readSync(fd, buf, got, buf.length - got, null);
    return buf.subarray(0, got).toString('utf8');
  } finally {
    closeSync(fd);
  }
}

/** Built-in themes: name → one-line purpose. `column` is the default. */
export const THEMES = new Map([
  ['column', 'print: black on white, sized for a journal column, pt'],
  ['projector', 'slides: heavier lines, larger type, currentColor'],
  ['contrast', 'colour-coded roles in the Okabe–Ito colour-blind-safe palette'],
] as const);

export type ThemeName = typeof THEMES extends Map<infer K, unknown> ? K : never;
export const DEFAULT_THEME: ThemeName = 'column';

const cache = new Map<string, Theme>();

function readTheme(path: string, shown: string): Theme {
  let text: string;
  try {
    text = readBounded(path, MAX_THEME_BYTES);
  } catch {
    throw usageError('bad-theme', `cannot read the theme file`, shown);
  }
  if (text.length > MAX_THEME_BYTES) throw usageError('bad-theme', `the theme file is larger than ${MAX_THEME_BYTES / 1024} KiB`, shown);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    throw usageError('bad-theme', `not valid JSON (${(err as Error).message})`, shown);
  }
  return parseTheme(json, shown);
}

/**
 * A theme by built-in name (`column`, `projector`, `contrast`) or by path to a JSON file; an already
 * validated Theme passes through. Default `column`.
 * @example loadTheme('projector').unit // 'px'
 */
export function loadTheme(theme: Theme | string = DEFAULT_THEME): Theme {
  if (typeof theme !== 'string') return theme;
  if (THEMES.has(theme as ThemeName)) {
    const hit = cache.get(theme);
    if (hit) return hit;
    const loaded = readTheme(fileURLToPath(new URL(`${theme}.json`, TEMPLATES)), `templates/${theme}.json`);
    cache.set(theme, loaded);
    return loaded;
  }
  if (!/[\\/]|\.json$/i.test(theme)) {
    throw usageError('unknown-theme', `unknown theme "${theme}" (built-in: ${[...THEMES.keys()].join(', ')}; or give a path to a .json file)`);
  }
  return themeFile(theme);
}

/** Theme files by absolute path, kept while the file's mtime and size stay the same. */
const files = new Map<string, { mtimeMs: number; size: number; theme: Theme }>();

function themeFile(path: string): Theme {
  const key = resolve(path);
  let stat;
  try {
    stat = statSync(key);
  } catch {
    throw usageError('bad-theme', `cannot read the theme file`, path);
  }
  const hit = files.get(key);
  if (hit && hit.mtimeMs === stat.mtimeMs && hit.size === stat.size) return hit.theme;
  const theme = readTheme(path, path);
  files.set(key, { mtimeMs: stat.mtimeMs, size: stat.size, theme });
  return theme;
}

/** Text style of a role in a theme: role entry over the text defaults. */
export function themeTextStyle(theme: Theme, role: string): TextStyle {
  const s = { ...theme.defaults.text, ...theme.roles[role] };
  return { fontSize: s.fontSize ?? 10, fontWeight: s.fontWeight ?? 'normal' };
}

/**
 * The numbers a layout needs from a theme: base length, clearances, thickest stroke and every text role's
 * size. Layouts take these instead of the theme, so they stay independent of rendering. Computed once per
 * theme object.
 */
export function sceneMetrics(theme: Theme): SceneMetrics {
  let metrics = metricsCache.get(theme);
  if (!metrics) metricsCache.set(theme, (metrics = metricsOf(theme)));
  return metrics;
}

/** Metrics per theme object (validated themes are not changed after loading). */
const metricsCache = new WeakMap<Theme, SceneMetrics>();

function metricsOf(theme: Theme): SceneMetrics {
  const styles = [...Object.values(theme.defaults), ...Object.values(theme.roles)];
  const text: Record<string, TextStyle> = { default: themeTextStyle(theme, '') };
  for (const role of Object.keys(theme.roles)) text[role] = themeTextStyle(theme, role);
  return {
    bondLength: theme.sizes.bondLength,
    gap: theme.sizes.gap,
    margin: theme.sizes.margin,
    lineWidth: Math.max(0, ...styles.map((s) => s.strokeWidth ?? 0)),
    text,
  };
}
