/**
 * The legibility check (`figureLegibility`) over every ring figure of the test corpus (test/helpers/ringCorpus.ts,
 * built once into test/data/ring-corpus/ring-corpus.sdf by scripts/fixtures/ring-corpus.mjs): for every record and
 * every ring, the default figure (the chair template for chairs, else the projected view) and, for chairs, the
 * projected view as well. The goal is zero everywhere; until then both kinds are held to a recorded count that
 * may only go down (a ratchet: a change that got a figure better must lower it, so the record stays exact).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseText } from '../../src/io/parseText.js';
import { chairFigure } from '../../src/api/figures/chair.js';
import { figureLegibility } from '../../src/layout/text/figureLegibility.js';
import { measureText } from '../../src/render/svgWindow.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { findRings } from '../../src/perceive/findRings.js';
import { RING_CORPUS } from '../helpers/ringCorpus.js';

const records = parseText(readFileSync('test/data/ring-corpus/ring-corpus.sdf', 'utf8'), { file: 'ring-corpus.sdf' });

interface Checked {
  readonly figure: string;
  readonly view: string;
  readonly problems: readonly string[];
}

const checked: Checked[] = records.flatMap((mol) => {
  const rings = findRings(buildGraph(mol.atoms.length, mol.bonds ?? []));
  return rings.flatMap((_, i) => {
    const name = `${mol.title} ring ${i + 1}`;
    const first = chairFigure(mol, { ring: i + 1 });
    const figures = first.ring.shape === 'chair' && first.view === 'template' ? [first, chairFigure(mol, { ring: i + 1, view: 'projected' })] : [first];
    return figures.map((f) => ({ figure: `${name} (${f.view})`, view: f.view, problems: figureLegibility(f.scene, { measure: measureText }).problems.map((p) => `${p.kind}: ${p.message}`) }));
  });
});

/**
 * Problems still counted (89 on the templates and 252 on the projected views before labels could shorten their
 * bond, read either way or go skeletal). Chair templates: the two acetylated sugars (an AcO / AcHN on C2 crowded by the axial H
 * on C1 and C5). Projected views: true projections, whose substituent bonds end on or near other bonds.
 */
const NOT_YET_ZERO = { template: 4, projected: 196 };
const count = (view: string) => checked.filter((c) => c.view === view).reduce((n, c) => n + c.problems.length, 0);
const listed = (view: string) => checked.filter((c) => c.view === view && c.problems.length > 0).map((c) => `${c.figure}: ${c.problems.join('; ')}`);

describe('ring corpus legibility', () => {
  it('the fixture holds every corpus entry, and every figure was drawn', () => {
    expect(new Set(records.map((m) => m.title.replace(/ #\d+$/, '')))).toEqual(new Set(RING_CORPUS.map((e) => e.name)));
    expect(checked.filter((c) => c.view === 'template').length).toBeGreaterThanOrEqual(30);
  });

  it.each(['template', 'projected'] as const)('figureLegibility counts no more problems on the %s figures than recorded', (view) => {
    if (count(view) > NOT_YET_ZERO[view]) expect(listed(view)).toEqual([]);
    expect(count(view)).toBe(NOT_YET_ZERO[view]);
  });
});
