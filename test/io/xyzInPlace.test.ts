import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { XyzConsumer } from '../../src/io/xyz.js';
import { LineSplitter } from '../../src/io/lines.js';
import { DEFAULT_LIMITS } from '../../src/io/limits.js';
import { readRecordsSettled } from '../../src/io/readRecords.js';
import { readFrames } from '../../src/io/readFrames.js';
import { parseTextSettled } from '../../src/io/parseText.js';
import type { Settled } from '../../src/io/sink.js';

const dir = mkdtempSync(join(tmpdir(), 'cfm-xyzrange-'));

/** Frames with every kind of line the in-place path must hand over to the string path. */
function mixed(frames: number): string {
  let s = '';
  for (let k = 1; k <= frames; k++) {
    const bad = k % 37;
    s += bad === 5 ? 'three\n' : bad === 9 ? '4\n' : bad === 7 ? '2\n' : '3\n';
    s += `  frame ${k} energy=${-k}.25 note="a b"\n`;
    s += bad === 11 ? `O 0 0 x${k}\n` : bad === 13 ? `O 0 0 1e${k % 3}\n` : `O\t0.0 0 ${k}.125\r\n`;
    s += bad === 17 ? 'Xx 1 2 3\n' : bad === 19 ? `N 0.957 0 ${k}\n` : `H   0.957 0 ${k}\n`;
    s += bad === 23 ? 'H -0.24\n' : bad === 29 ? `H -0.24 0.927 ${k} 0.5 extra\n` : `H -0.24 0.927 ${k}\n`;
    if (bad === 31) s += `\n`;
  }
  return s;
}

const outcome = (r: Settled) =>
  r.ok ? [r.molecule.title, r.molecule.source.index, r.molecule.source.line, r.molecule.atoms.map((a) => a.element).join(''), [...r.molecule.coords], r.molecule.properties] : [r.error.message, r.error.issues[0]!.line];

/** Feeds `text` to a fresh consumer one way or the other. */
function consume(text: string, inPlace: boolean): unknown[] {
  const out: Settled[] = [];
  // copy: the consumer reuses nothing of a molecule it emitted, but coords are checked after the run
  const c = new XyzConsumer('m.xyz', DEFAULT_LIMITS, (r) => out.push(r.ok ? { ok: true, molecule: { ...r.molecule, coords: r.molecule.coords.slice() } } : r));
  const splitter = new LineSplitter('m.xyz', 1000);
  for (const block of [...splitter.pushTextBlocks(text), ...splitter.endBlocks()]) {
    for (let k = 0; k < block.count; k++) {
      if (inPlace) c.feedRange(block.text, block.starts[k]!, block.ends[k]!, block.first + k);
      else c.feed(block.text.slice(block.starts[k], block.ends[k]), block.first + k);
    }
  }
  c.end();
  return out.map(outcome);
}

describe('XyzConsumer in place', () => {
  it('XyzConsumer.feedRange gives the same frames and the same messages as feed, line by line', () => {
    const text = mixed(400);
    const inPlace = consume(text, true);
    expect(inPlace).toEqual(consume(text, false));
    const frames = inPlace.filter((r) => r.length > 2);
    const messages = inPlace.filter((r) => r.length === 2).map((r) => String(r[0]));
    expect(frames.length).toBeGreaterThan(300);
    // the bad kinds all show up with their usual wording
    expect(messages.some((m) => m.includes('expected an atom count'))).toBe(true);
    expect(messages.some((m) => m.includes('is not a number'))).toBe(true);
    expect(messages.some((m) => m.includes('unknown element'))).toBe(true);
    expect(messages.some((m) => m.includes('more atom lines than the count line'))).toBe(true);
    expect(messages.some((m) => m.includes('expected an element and x y z'))).toBe(true);
  });

  it('readRecordsSettled(file of many 64 KiB pieces and batches) equals parseTextSettled, bad frames included', async () => {
    const text = mixed(5000); // ~0.4 MB: many decode pieces, lines cut across them, far more than one batch
    const path = join(dir, 'mixed.xyz');
    writeFileSync(path, text);
    const streamed: Settled[] = [];
    for await (const r of readRecordsSettled(path)) streamed.push(r);
    const whole = parseTextSettled(text, { file: path });
    expect(streamed.map(outcome)).toEqual(whole.map(outcome));
  });

  it('readFrames(reuse) over many batches yields every frame with its own values and lazily parsed properties', async () => {
    let text = '';
    for (let k = 1; k <= 3000; k++) text += `2\nframe ${k} step=${k}\nH 0 0 ${k}.5\nH 0 0.75 ${k}.5\n`;
    const path = join(dir, 'many.xyz');
    writeFileSync(path, text);
    let k = 0;
    for await (const f of readFrames(path, { reuse: true })) {
      k++;
      expect([f.index, f.line, f.title, f.coords[2], f.coords[5]]).toEqual([k, 4 * k - 3, `frame ${k} step=${k}`, k + 0.5, k + 0.5]);
      if (k % 997 === 0) expect({ ...f }.properties).toEqual({ step: String(k) });
    }
    expect(k).toBe(3000);
  });
});
