// Writes src/render/fontAdvances.ts: the advance width of every "plain" code point of the two shipped faces
// (fonts/DejaVuSans.ttf, fonts/DejaVuSans-Bold.ttf), the Latin ligatures their default features form, and
// which code points set a string's script. measureText sums these instead of laying text out with the font
// engine (fontkit, as svgdom does: glyph advances summed, no kerning), with the same result.
// Usage: node scripts/make-font-advances.mjs   (rerun when a font file changes; test/render/fontAdvances.test.ts
// checks the table against the engine)
//
// A code point is plain when, laid out alone, it gives its own glyph (not hidden as a default-ignorable), the
// glyph is no mark, no substitution lookup can change it from a string of plain code points, and it is in the
// Basic Multilingual Plane, and its script has no joining forms (Arabic, N'Ko). Strings with anything else are measured by the engine itself at run time.
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as fontkit from 'fontkit';

/** Scripts fontkit shapes with joining forms (its Arabic shaper). */
const JOINING = new Set(['arab', 'nko ', 'syrc', 'mong', 'phag', 'mand']);
const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const arr = (x) => (x == null ? [] : Array.isArray(x) ? x : x.toArray());

function coverage(c) {
  if (!c) return [];
  if (c.version === 1) return arr(c.glyphs);
  return arr(c.rangeRecords).flatMap((r) => Array.from({ length: r.end - r.start + 1 }, (_, k) => r.start + k));
}

/** Glyphs a substitution lookup rewrites, and the ligatures (first glyph + components → ligature glyph). */
function lookupGlyphs(lookup) {
  const changed = new Set();
  const ligatures = [];
  for (let st of arr(lookup.subTables)) {
    let type = lookup.lookupType;
    if (type === 7) {
      type = st.lookupType;
      st = st.extension;
    }
    if (type === 5 || type === 6) continue; // contexts act through their nested lookups, listed on their own
    const cov = coverage(st.coverage);
    for (const g of cov) changed.add(g);
    if (type === 4) {
      arr(st.ligatureSets).forEach((set, k) => {
        for (const lig of arr(set)) {
          const components = arr(lig.components);
          for (const g of components) changed.add(g);
          ligatures.push({ glyphs: [cov[k], ...components], ligature: lig.glyph });
        }
      });
    }
  }
  return { changed, ligatures };
}

function face(file) {
  const font = fontkit.openSync(join(root, 'fonts', file));
  const cmap = new Map();
  for (const cp of font.characterSet) if (cp <= 0xffff && (cp < 0xd800 || cp > 0xdfff)) cmap.set(cp, font.glyphForCodePoint(cp).id);
  const byGlyph = new Map();
  for (const [cp, g] of cmap) byGlyph.set(g, [...(byGlyph.get(g) ?? []), cp]);
  const gsub = font.GSUB;
  // the Latin ligatures: ligature lookups whose glyphs are all ASCII letters (f-ligatures in DejaVu)
  const changed = new Set();
  const latinLigatures = [];
  const allowed = new Set();
  for (const lookup of arr(gsub.lookupList)) {
    const l = lookupGlyphs(lookup);
    const ascii = l.ligatures.length > 0 && l.ligatures.every((x) => x.glyphs.every((g) => (byGlyph.get(g) ?? []).some((cp) => /[a-z]/i.test(String.fromCharCode(cp)))));
    if (ascii && lookup.lookupType === 4) {
      for (const x of l.ligatures) {
        const text = x.glyphs.map((g) => String.fromCharCode(byGlyph.get(g).find((cp) => /[a-z]/i.test(String.fromCharCode(cp))))).join('');
        // kept only if the default features form it (discretionary ligatures are never formed)
        const run = font.layout(text);
        if (run.glyphs.length === 1 && run.glyphs[0].id === x.ligature) latinLigatures.push([text, font.getGlyph(x.ligature).advanceWidth, lookup]);
        for (const g of x.glyphs) allowed.add(g);
      }
    } else for (const g of l.changed) changed.add(g);
  }
  if (new Set(latinLigatures.map((x) => x[2])).size > 1) throw new Error(`${file}: Latin ligatures from more than one lookup`);
  for (const x of latinLigatures) x.pop();
  const marks = new Set();
  const classDef = font.GDEF?.glyphClassDef;
  if (classDef) for (const [cp, g] of cmap) if (font.GDEF && classOf(classDef, g) === 3) marks.add(cp);
  const plain = new Map();
  const suspects = [];
  for (const [cp, g] of cmap) {
    if (g === 0 || marks.has(cp)) continue;
    const run = font.layout(String.fromCharCode(cp));
    if (run.glyphs.length !== 1 || run.glyphs[0].id !== g) continue;
    if (JOINING.has(run.script)) continue; // joining forms depend on the neighbours: always the engine
    if (changed.has(g) && !allowed.has(g)) {
      suspects.push(cp);
      continue;
    }
    plain.set(cp, run.glyphs[0].advanceWidth);
  }
  // a glyph a nested (context) lookup rewrites stays plain only if no pair of plain code points changes it
  const plainList = [...plain.keys()];
  const sum = (s) => font.layout(s).glyphs.reduce((a, x) => a + x.advanceWidth, 0);
  for (const cp of suspects) {
    const c = String.fromCharCode(cp);
    const adv = font.getGlyph(cmap.get(cp)).advanceWidth;
    const ok = plainList.every((o) => {
      const x = String.fromCharCode(o);
      return sum(c + x) === adv + plain.get(o) && sum(x + c) === adv + plain.get(o);
    });
    if (ok) plain.set(cp, adv);
  }
  console.log(`${file}: context-rewritten but plain: ${suspects.filter((cp) => plain.has(cp)).map((cp) => String.fromCharCode(cp)).join(' ')}`);
  return { font, plain, latinLigatures, unitsPerEm: font.unitsPerEm };
}

function classOf(classDef, g) {
  if (classDef.version === 1) {
    const k = g - classDef.startGlyph;
    return k >= 0 && k < classDef.classValueArray.length ? classDef.classValueArray.get?.(k) ?? classDef.classValueArray[k] : 0;
  }
  for (const r of arr(classDef.classRangeRecord)) if (g >= r.start && g <= r.end) return r.class;
  return 0;
}

/** Runs of consecutive code points, flattened: start, count, advance × count, … */
function runs(plain) {
  const cps = [...plain.keys()].sort((a, b) => a - b);
  const out = [];
  for (let i = 0; i < cps.length; ) {
    let j = i;
    while (j + 1 < cps.length && cps[j + 1] === cps[j] + 1) j++;
    out.push(cps[i], j - i + 1, ...cps.slice(i, j + 1).map((cp) => plain.get(cp)));
    i = j + 1;
  }
  return out;
}

/** Inclusive ranges, flattened: start, end, … */
function ranges(cps) {
  const s = [...cps].sort((a, b) => a - b);
  const out = [];
  for (let i = 0; i < s.length; ) {
    let j = i;
    while (j + 1 < s.length && s[j + 1] === s[j] + 1) j++;
    out.push(s[i], s[j]);
    i = j + 1;
  }
  return out;
}

const regular = face('DejaVuSans.ttf');
const bold = face('DejaVuSans-Bold.ttf');
const latin = [];
const other = [];
for (const cp of new Set([...regular.plain.keys(), ...bold.plain.keys()])) {
  const script = regular.font.layout(String.fromCharCode(cp)).script;
  if (script === 'latn') latin.push(cp);
  else if (script !== 'zzzz') other.push(cp);
}

const wrap = (xs) => {
  const lines = [];
  for (let i = 0; i < xs.length; i += 24) lines.push(`    ${xs.slice(i, i + 24).join(', ')},`);
  return lines.join('\n');
};
const faceText = (name, f) => `/** ${name}: ${f.plain.size} plain code points. */
export const ${name === 'DejaVu Sans' ? 'REGULAR' : 'BOLD'}: FaceAdvances = {
  unitsPerEm: ${f.unitsPerEm},
  ligatures: [${f.latinLigatures.map(([t, a]) => `['${t}', ${a}]`).join(', ')}],
  runs: [
${wrap(runs(f.plain))}
  ],
};
`;

const text = `// Generated by scripts/make-font-advances.mjs from fonts/DejaVuSans.ttf and fonts/DejaVuSans-Bold.ttf
// with fontkit ${JSON.parse((await import('node:fs')).readFileSync(join(root, 'node_modules/fontkit/package.json'), 'utf8')).version}. Do not edit; rerun the script.

/** Advance widths of one face, in font units. */
export interface FaceAdvances {
  readonly unitsPerEm: number;
  /** Ligatures the face's default features form from Latin letters, in the order the font tries them: [letters, advance]. */
  readonly ligatures: readonly (readonly [string, number])[];
  /** Runs of consecutive plain code points, flattened: start, count, then count advances. */
  readonly runs: readonly number[];
}

${faceText('DejaVu Sans', regular)}
${faceText('DejaVu Sans Bold', bold)}
/** Plain code points whose script is Latin (the first such or other-script code point decides a string's script), as inclusive ranges. */
export const LATIN_SCRIPT: readonly number[] = [
${wrap(ranges(latin))}
];

/** Plain code points of a script other than Latin (neither common nor inherited), as inclusive ranges. */
export const OTHER_SCRIPT: readonly number[] = [
${wrap(ranges(other))}
];
`;
writeFileSync(join(root, 'src/render/fontAdvances.ts'), text);
console.log(`regular ${regular.plain.size} plain of ${regular.font.characterSet.length}, ligatures ${regular.latinLigatures.map((x) => x.join(':')).join(' ')}`);
console.log(`bold ${bold.plain.size} plain of ${bold.font.characterSet.length}, ligatures ${bold.latinLigatures.map((x) => x.join(':')).join(' ')}`);
