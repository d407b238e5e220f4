import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rayCandidates } from '../../src/layout/newman/newmanLabels.js';
import { boxAt, type TextBox } from '../../src/layout/text/textBox.js';
import { firstFree, firstFreeOf, reachToEdge, type Box, type Obstacles } from '../../src/layout/text/labelPlacement.js';

/** The candidate list as it was built before candidates were made on demand: all 217, then a stable sort. */
function eagerCandidates(cx: number, cy: number, azDeg: number, from: number, t: TextBox, step: number): Box[] {
  const scored: { cost: number; box: Box }[] = [];
  for (let k = 0; k <= 30; k++) {
    for (const dev of [0, 6, -6, 12, -12, 18, -18]) {
      const a = (azDeg + dev) * RAD;
      const ux = Math.sin(a);
      const uy = -Math.cos(a);
      const d = from + reachToEdge(t.width / 2, t.height / 2, ux, uy) + k * step;
      scored.push({ cost: k + Math.abs(dev) / 4, box: boxAt(cx + d * ux, cy + d * uy, t) });
    }
  }
  return scored.sort((p, q) => p.cost - q.cost).map((s) => s.box);
}

const RAD = Math.PI / 180;
const num = (max: number) => fc.double({ min: -max, max, noNaN: true });
const textBox = fc.record({ width: fc.double({ min: 0, max: 40, noNaN: true }), height: fc.double({ min: 0, max: 12, noNaN: true }), baseline: num(5) });

describe('rayCandidates', () => {
  it('rayCandidates yields exactly the boxes, in the order, of the eager sorted list (fast-check, seed 4242)', () => {
    fc.assert(
      fc.property(num(100), num(100), num(720), fc.double({ min: 0, max: 60, noNaN: true }), textBox, fc.double({ min: 0, max: 5, noNaN: true }), (cx, cy, az, from, t, step) => {
        expect([...rayCandidates(cx, cy, az, from, t, step)]).toEqual(eagerCandidates(cx, cy, az, from, t, step));
      }),
      { seed: 4242, numRuns: 200 },
    );
  });

  it('firstFreeOf picks the same box as firstFree over the whole list, also when nothing is free (fast-check, seed 99)', () => {
    const seg = fc.record({ x1: num(60), y1: num(60), x2: num(60), y2: num(60) });
    const box = fc.tuple(num(60), num(60), fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true })).map(([x, y, w, h]) => ({ x0: x, y0: y, x1: x + w, y1: y + h }));
    const obstacles: fc.Arbitrary<Obstacles> = fc.record({
      boxes: fc.array(box, { maxLength: 6 }), segments: fc.array(seg, { maxLength: 8 }),
      rings: fc.array(fc.record({ cx: num(10), cy: num(10), r: fc.double({ min: 0, max: 60, noNaN: true }) }), { maxLength: 2 }),
    });
    fc.assert(
      fc.property(num(360), textBox, obstacles, fc.double({ min: 0, max: 3, noNaN: true }), (az, t, obs, clearance) => {
        const all = eagerCandidates(0, 0, az, 20, t, 2);
        expect(firstFreeOf(rayCandidates(0, 0, az, 20, t, 2), obs, clearance)).toEqual(all[firstFree(all, obs, clearance)]);
      }),
      { seed: 99, numRuns: 200 },
    );
    const wall: Obstacles = { boxes: [{ x0: -1e3, y0: -1e3, x1: 1e3, y1: 1e3 }], segments: [], rings: [] };
    const t = { width: 10, height: 6, baseline: 2 };
    expect(firstFreeOf(rayCandidates(0, 0, 30, 20, t, 2), wall, 1)).toEqual(eagerCandidates(0, 0, 30, 20, t, 2).at(-1));
  });
});
