/** Fused-chair golden SVGs (byte-stable): fixtures from scripts/fixtures/fused-chairs.sh, column theme. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseText } from '../../src/io/parseText.js';
import { chairFigure } from '../../src/api/figures/chair.js';

describe('fused chair golden SVGs', () => {
  for (const name of ['trans-decalin', 'cis-decalin', 'abc-skeleton']) {
    it(`chairFigure(${name}) draws its fused chairs as in the golden`, async () => {
      const file = `test/data/fused/${name}.sdf`;
      const mol = parseText(readFileSync(file, 'utf8'), { file })[0]!;
      const { svg, rings } = chairFigure(mol, { idPrefix: `${name}-` });
      expect(rings!.length).toBe(name === 'abc-skeleton' ? 3 : 2);
      await expect(`${svg}\n`).toMatchFileSnapshot(`./__golden__/fused-${name}-column.svg`);
    });
  }
});
