import { describe, expect, it } from 'vitest';
import { runsMarkup, runsText, scriptSize, textRuns, MIN_TEXT_SIZE } from '../../../src/layout/text/textRuns.js';
import { renderSvg } from '../../../src/render/renderSvg.js';

describe('textRuns', () => {
  it('textRuns reads _x and ^x as one lowered or raised character, braces as a group', () => {
    expect(textRuns('CH_2OH')).toEqual([{ text: 'CH' }, { text: '2', shift: 'sub' }, { text: 'OH' }]);
    expect(textRuns('^4C_1')).toEqual([{ text: '4', shift: 'sup' }, { text: 'C' }, { text: '1', shift: 'sub' }]);
    expect(runsMarkup(textRuns('B_{2,5}'))).toBe('B_{2,5}');
    expect(runsText(textRuns('^1T_O'))).toBe('1TO');
  });

  it('scriptSize never goes below 6 pt nor above the base size', () => {
    expect(scriptSize(8)).toBe(MIN_TEXT_SIZE);
    expect(scriptSize(12)).toBeCloseTo(8.64, 6);
    expect(scriptSize(5)).toBe(5);
  });

  it('renderSvg writes script runs as tspans with a smaller size and a baseline shift', () => {
    const runs = textRuns('E_O');
    const svg = renderSvg({ kind: 't', width: 20, height: 20, title: 't', desc: 'd', items: [{ type: 'text', role: 'caption', x: 2, y: 10, text: runsText(runs), runs, anchor: 'start', fontSize: 8, fontWeight: 'normal' }] });
    expect(svg).toContain('>E<tspan font-size="6" baseline-shift="-1.92">O</tspan></text>');
  });
});
