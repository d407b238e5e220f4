import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { THEMES } from '../../src/render/themes.js';
import { RING_CASES, ringCaseSvg } from '../helpers/chairCases.js';

const dir = new URL('./__golden__/', import.meta.url);

describe('ring figure golden SVGs (byte-stable, nothing normalised)', () => {
  for (const theme of THEMES.keys()) {
    for (const c of RING_CASES) {
      it(`chairFigure ${c.name} in theme ${theme} matches its golden`, async () => {
        const file = `ring-${c.name}-${theme}.svg`;
        const svg = `${ringCaseSvg(c, theme)}\n`;
        const golden = fileURLToPath(new URL(file, dir));
        // leave the new output beside a changed golden, for review
        if (existsSync(golden) && readFileSync(golden, 'utf8') !== svg) writeFileSync(golden.replace(/\.svg$/, '-changed.svg'), svg);
        await expect(svg).toMatchFileSnapshot(`./__golden__/${file}`);
      });
    }
  }
});
