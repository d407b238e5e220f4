import { mkdtempSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseTheme } from '../../src/render/theme.js';
import { loadTheme, sceneMetrics, THEMES } from '../../src/render/themes.js';
import { ConformarkError } from '../../src/model/errors.js';

const good = () => JSON.parse(JSON.stringify(loadTheme('column')));
const messages = (json: unknown): string[] => {
  try {
    parseTheme(json, 'my.json');
  } catch (err) {
    expect(err).toBeInstanceOf(ConformarkError);
    return (err as ConformarkError).issues.map((i) => `${i.file}: ${i.message}`);
  }
  return [];
};

describe('themes', () => {
  it('loadTheme loads every built-in and they validate', () => {
    for (const name of THEMES.keys()) expect(loadTheme(name).name).toBe(name);
    expect(loadTheme('column').unit).toBe('pt');
    expect(loadTheme('projector').defaults.line.stroke).toBe('currentColor');
    expect(loadTheme('contrast').roles['front-bond']!.stroke).toBe('#0072B2'); // Okabe–Ito blue
  });

  it('parseTheme rejects colours that could carry CSS or markup, naming file and field', () => {
    const t = good();
    t.roles['front-bond'] = { stroke: 'red;}svg{display:none' };
    t.defaults.text.fill = 'url(http://x)';
    expect(messages(t)).toEqual([
      'my.json: theme.defaults.text.fill: expected a colour (#rgb, #rrggbb, currentColor or none), got "url(http://x)"',
      'my.json: theme.roles.front-bond.stroke: expected a colour (#rgb, #rrggbb, currentColor or none), got "red;}svg{display:none"',
    ]);
  });

  it('parseTheme rejects unknown fields, fonts off the allow-list, markup in text and bad role names', () => {
    const t = good();
    t.script = 'x';
    t.fontFamily = 'Comic"/><script>';
    t.description = '<b>bold</b>';
    t.roles['Bad Role'] = {};
    t.roles.caption = { fontSize: -3, fontWeight: 'heavy' };
    const m = messages(t).join('\n');
    expect(m).toMatch(/theme\.script: unknown field/);
    expect(m).toMatch(/theme\.fontFamily: expected one of DejaVu Sans/);
    expect(m).toMatch(/theme\.description: expected plain text/);
    expect(m).toMatch(/Bad Role: role names are lower-case/);
    expect(m).toMatch(/theme\.roles\.caption\.fontSize: expected a number from 1 to 200, got -3/);
    expect(m).toMatch(/theme\.roles\.caption\.fontWeight: expected one of normal, bold/);
  });

  it('parseTheme reports missing sections', () => {
    expect(messages({ name: 'x' }).join('\n')).toMatch(/theme\.unit: missing[\s\S]*theme\.roles: missing/);
  });

  it('loadTheme reads a theme file by path and reports unreadable, invalid JSON and unknown names', () => {
    const dir = mkdtempSync(join(tmpdir(), 'cmk-theme-'));
    const ok = join(dir, 'mine.json');
    writeFileSync(ok, JSON.stringify({ ...good(), name: 'mine' }));
    expect(loadTheme(ok).name).toBe('mine');
    const broken = join(dir, 'broken.json');
    writeFileSync(broken, '{ "name": ');
    expect(() => loadTheme(broken)).toThrow(/broken\.json: not valid JSON/);
    expect(() => loadTheme(join(dir, 'none.json'))).toThrow(/cannot read the theme file/);
    expect(() => loadTheme('glossy')).toThrow(/unknown theme "glossy" \(built-in: column, projector, contrast/);
  });

  it('sceneMetrics takes sizes, the thickest stroke and text styles from the theme', () => {
    const m = sceneMetrics(loadTheme('projector'));
    expect(m.bondLength).toBe(64);
    expect(m.lineWidth).toBe(4);
    expect(m.text['torsion-label']).toEqual({ fontSize: 21, fontWeight: 'normal' });
    expect(m.text.default).toEqual({ fontSize: 26, fontWeight: 'normal' });
  });

  it('loadTheme keeps a theme file until its modification time or size changes', () => {
    const dir = mkdtempSync(join(tmpdir(), 'cmk-theme-'));
    const file = join(dir, 'mine.json');
    writeFileSync(file, JSON.stringify({ ...good(), name: 'mine' }));
    const first = loadTheme(file);
    expect(loadTheme(file)).toBe(first);
    writeFileSync(file, JSON.stringify({ ...good(), name: 'mine-too' }));
    expect(loadTheme(file).name).toBe('mine-too');
    writeFileSync(file, JSON.stringify({ ...good(), name: 'mine-ter' })); // same size as before: the mtime tells
    utimesSync(file, new Date(2000, 0, 1), new Date(2000, 0, 1));
    expect(loadTheme(file).name).toBe('mine-ter');
  });

  it('sceneMetrics returns the same metrics object for the same theme object', () => {
    const theme = loadTheme('column');
    expect(sceneMetrics(theme)).toBe(sceneMetrics(theme));
    expect(sceneMetrics({ ...theme, sizes: { ...theme.sizes, gap: 9 } }).gap).toBe(9);
  });
});
