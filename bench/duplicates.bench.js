// Duplicate detection when every energy ties (the energy window prunes nothing): time per record for 2,000
// and 20,000 distinct conformers of one skeleton, and against comparing every pair (the old algorithm) at
// 2,000. Goal: per-record time at 20,000 within a small factor of that at 2,000 (a quadratic scan: 10x).
import { performance } from 'node:perf_hooks';
import { findDuplicates, heavyAtomRmsd } from '../dist/index.js';

// a cyclohexane chair (C only, 1.53 Å bonds) moved at random by up to ±0.3 Å per coordinate: distinct
// conformers at the default 0.125 Å threshold, with a few near copies
const base = [];
for (let k = 0; k < 6; k++) {
  const a = (k * Math.PI) / 3;
  base.push(1.45 * Math.cos(a), 1.45 * Math.sin(a), k % 2 ? 0.25 : -0.25);
}
let seed = 21;
const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
const atoms = Array.from({ length: 6 }, () => ({ element: 'C', name: 'C' }));
const molecule = (k) => ({ atoms, bonds: [], coords: Float64Array.from(base, (c) => c + 0.6 * (random() - 0.5)), title: `c${k}`, properties: {}, source: { file: 'bench', index: k + 1, line: 1, format: 'xyz' } });
const make = (n) => Array.from({ length: n }, (_, k) => molecule(k));
const everyPair = (records) => {
  const unique = [];
  return records.map((r, i) => {
    const m = unique.find((u) => heavyAtomRmsd(records[u], r).rmsdA <= 0.125);
    if (m !== undefined) return m;
    unique.push(i);
    return null;
  });
};
const time = (fn) => {
  const t = performance.now();
  const out = fn();
  return { ms: performance.now() - t, out };
};
const small = make(2_000);
const large = make(20_000);
const energies = (n) => new Array(n).fill(0);
findDuplicates(small.slice(0, 200), { energies: energies(200) }); // warm-up
const best = (fn) => Math.min(...Array.from({ length: 3 }, () => time(fn).ms));
const s = best(() => findDuplicates(small, { energies: energies(small.length) }));
const l = time(() => findDuplicates(large, { energies: energies(large.length) }));
const pairs = time(() => everyPair(small));
const same = JSON.stringify(pairs.out) === JSON.stringify(findDuplicates(small, { energies: energies(small.length) }));
const unique = l.out.filter((d) => d === null).length;
console.log(`2,000 tied records: ${(s / 2).toFixed(3)} ms per 1,000 records... total ${s.toFixed(0)} ms; every pair ${pairs.ms.toFixed(0)} ms (same result: ${same})`);
console.log(`20,000 tied records (${unique} unique): ${l.ms.toFixed(0)} ms`);
console.log(`per-record growth 2,000 -> 20,000: ${((l.ms / 20_000) / (s / 2_000)).toFixed(2)}x (quadratic would be 10x); speed-up over every pair at 2,000: ${(pairs.ms / s).toFixed(1)}x`);
