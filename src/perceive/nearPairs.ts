/** Pairs of touching spheres by a uniform spatial grid, in linear time. */
import { scratchFloat64, scratchInt32 } from './scratch.js';

/**
 * Pairs found by {@link nearPairs}: `i[k] < j[k]` at squared distance `d2[k]`, for k < `count`. The arrays
 * are scratch (see scratch.ts): read them before the next call.
 */
export interface PairList {
  count: number;
  i: Int32Array;
  j: Int32Array;
  d2: Float64Array;
}

/**
 * Every pair of the `n` points (`coords` = x, y, z of point i at 3i…3i+2) with
 * `min ≤ d_ij ≤ reach[i] + reach[j] + slack`, in unspecified order.
 *
 * The points go into cubic cells of edge 2·max(reach) + slack (so each such pair lies in the same or
 * adjacent cells), stored cell by cell by a counting sort with their coordinates and reaches copied in
 * that order, so the scan reads memory sequentially. The cells of the bounding box are addressed directly
 * when there are not many more of them than points (any physical density); a sparse, far-flung box falls
 * back to a map of occupied cells. Building and scanning are linear in `n`.
 * @example nearPairs(coords, n, radii, 0.4, 0.4).count // candidate bonds
 */
export function nearPairs(coords: Float64Array, n: number, reach: Float64Array, slack: number, min: number): PairList {
  let maxReach = 0;
  for (let k = 0; k < n; k++) maxReach = Math.max(maxReach, reach[k]!);
  const size = Math.max(2 * maxReach + slack, 1e-6);
  const low = [Infinity, Infinity, Infinity];
  const high = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < n; i++) {
    for (let d = 0; d < 3; d++) {
      const v = coords[3 * i + d]!;
      if (v < low[d]!) low[d] = v;
      if (v > high[d]!) high[d] = v;
    }
  }
  const span = [0, 1, 2].map((d) => (n === 0 ? 1 : Math.floor((high[d]! - low[d]!) / size) + 1));
  const [nx, ny, nz] = span as [number, number, number];
  const room = 2 * n + 16;
  const out: PairList = { count: 0, i: scratchInt32('pair-i', room), j: scratchInt32('pair-j', room), d2: scratchFloat64('pair-d2', room) };
  const limits = { size2: size * size, slack, min2: min * min };
  if (nx * ny * nz <= 8 * n + 1024) denseScan(coords, n, reach, size, low, [nx, ny, nz], limits, out);
  else sparseScan(coords, n, reach, size, limits, out);
  return out;
}

interface Limits {
  /** Squared cell edge: pairs must be closer than this. */
  readonly size2: number;
  readonly slack: number;
  readonly min2: number;
}

/** Doubles the room of `out`, keeping its pairs. */
function grow(out: PairList): void {
  const room = 2 * out.count;
  const i = out.i.slice();
  const j = out.j.slice();
  const d2 = out.d2.slice();
  out.i = scratchInt32('pair-i', room);
  out.j = scratchInt32('pair-j', room);
  out.d2 = scratchFloat64('pair-d2', room);
  out.i.set(i);
  out.j.set(j);
  out.d2.set(d2);
}

/**
 * Points sorted by slot: `start[s]…start[s + 1]` index into `members` (ascending within a slot). Counts
 * become bucket ends, then points are placed from the back, which leaves each entry at its bucket start.
 */
function countingSort(slotOf: Int32Array, slots: number): { start: Int32Array; members: Int32Array } {
  const n = slotOf.length;
  const start = scratchInt32('grid-start', slots + 1).fill(0);
  for (let i = 0; i < n; i++) start[slotOf[i]!]!++;
  for (let s = 1; s <= slots; s++) start[s]! += start[s - 1]!;
  const members = scratchInt32('grid-members', n);
  for (let i = n - 1; i >= 0; i--) members[--start[slotOf[i]!]!] = i;
  return { start, members };
}

/** Cell-ordered copy of the points: members, their coordinates and reaches. */
interface Sorted {
  readonly members: Int32Array;
  readonly xyz: Float64Array;
  readonly reach: Float64Array;
}

// the 13 neighbour offsets (dx, dy, dz) that follow (0, 0, 0) in (dz, dy, dx) order: each cell pair once
const FORWARD = new Int32Array(39);
for (let dz = -1, f = 0; dz <= 1; dz++) {
  for (let dy = -1; dy <= 1; dy++) {
    for (let dx = -1; dx <= 1; dx++) {
      if (dz > 0 || (dz === 0 && (dy > 0 || (dy === 0 && dx > 0)))) FORWARD.set([dx, dy, dz], 3 * f++);
    }
  }
}

function denseScan(
  coords: Float64Array,
  n: number,
  reach: Float64Array,
  size: number,
  low: readonly number[],
  [nx, ny, nz]: readonly [number, number, number],
  limits: Limits,
  out: PairList,
): void {
  const slotOf = scratchInt32('grid-slot', n);
  for (let i = 0; i < n; i++) {
    const x = Math.min(nx - 1, Math.floor((coords[3 * i]! - low[0]!) / size));
    const y = Math.min(ny - 1, Math.floor((coords[3 * i + 1]! - low[1]!) / size));
    const z = Math.min(nz - 1, Math.floor((coords[3 * i + 2]! - low[2]!) / size));
    slotOf[i] = x + nx * (y + ny * z);
  }
  const { start, members } = countingSort(slotOf, nx * ny * nz);
  const xyz = scratchFloat64('grid-xyz', 3 * n);
  const sortedReach = scratchFloat64('grid-reach', n);
  for (let k = 0; k < n; k++) {
    const i = members[k]!;
    xyz[3 * k] = coords[3 * i]!;
    xyz[3 * k + 1] = coords[3 * i + 1]!;
    xyz[3 * k + 2] = coords[3 * i + 2]!;
    sortedReach[k] = reach[i]!;
  }
  const sorted: Sorted = { members, xyz, reach: sortedReach };
  for (let z = 0, s = 0; z < nz; z++) {
    for (let y = 0; y < ny; y++) {
      for (let x = 0; x < nx; x++, s++) {
        const k0 = start[s]!;
        const k1 = start[s + 1]!;
        if (k0 === k1) continue;
        scan(sorted, k0, k1, k0, k1, true, limits, out);
        for (let f = 0; f < 39; f += 3) {
          const tx = x + FORWARD[f]!;
          const ty = y + FORWARD[f + 1]!;
          const tz = z + FORWARD[f + 2]!;
          if (tx < 0 || tx >= nx || ty < 0 || ty >= ny || tz >= nz) continue;
          const t = tx + nx * (ty + ny * tz);
          if (start[t] !== start[t + 1]) scan(sorted, k0, k1, start[t]!, start[t + 1]!, false, limits, out);
        }
      }
    }
  }
}

/** Pairs between sorted points k0…k1 and m0…m1 (within one cell when `same`). */
function scan(sorted: Sorted, k0: number, k1: number, m0: number, m1: number, same: boolean, limits: Limits, out: PairList): void {
  const { members, xyz, reach } = sorted;
  const size2 = limits.size2;
  for (let k = k0; k < k1; k++) {
    const x = xyz[3 * k]!;
    const y = xyz[3 * k + 1]!;
    const z = xyz[3 * k + 2]!;
    for (let m = same ? k + 1 : m0; m < m1; m++) {
      const dx = xyz[3 * m]! - x;
      const dy = xyz[3 * m + 1]! - y;
      const dz = xyz[3 * m + 2]! - z;
      const d2 = dx * dx + dy * dy + dz * dz;
      if (d2 >= size2) continue;
      const limit = reach[k]! + reach[m]! + limits.slack;
      if (d2 < limits.min2 || d2 > limit * limit) continue;
      if (out.count === out.i.length) grow(out);
      const i = members[k]!;
      const j = members[m]!;
      out.i[out.count] = i < j ? i : j;
      out.j[out.count] = i < j ? j : i;
      out.d2[out.count++] = d2;
    }
  }
}

function sparseScan(coords: Float64Array, n: number, reach: Float64Array, size: number, limits: Limits, out: PairList): void {
  const distance2 = (i: number, j: number) =>
    (coords[3 * i]! - coords[3 * j]!) ** 2 + (coords[3 * i + 1]! - coords[3 * j + 1]!) ** 2 + (coords[3 * i + 2]! - coords[3 * j + 2]!) ** 2;
  const cellCoords = new Float64Array(3 * n);
  for (let k = 0; k < 3 * n; k++) cellCoords[k] = Math.floor(coords[k]! / size);
  const keyOf = (x: number, y: number, z: number) => `${x},${y},${z}`;
  const slotByKey = new Map<string, number>();
  const slotOf = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const key = keyOf(cellCoords[3 * i]!, cellCoords[3 * i + 1]!, cellCoords[3 * i + 2]!);
    let s = slotByKey.get(key);
    if (s === undefined) {
      s = slotByKey.size;
      slotByKey.set(key, s);
    }
    slotOf[i] = s;
  }
  const { start, members } = countingSort(slotOf, slotByKey.size);
  const seen: number[] = [];
  for (let i = 0; i < n; i++) {
    seen.length = 0;
    for (let dz = -1; dz <= 1; dz++) {
      for (let dy = -1; dy <= 1; dy++) {
        for (let dx = -1; dx <= 1; dx++) {
          const s = slotByKey.get(keyOf(cellCoords[3 * i]! + dx, cellCoords[3 * i + 1]! + dy, cellCoords[3 * i + 2]! + dz));
          // at huge coordinates x + 1 === x, so neighbouring keys can repeat: visit each cell once
          if (s === undefined || seen.includes(s)) continue;
          seen.push(s);
          for (let k = start[s]!; k < start[s + 1]!; k++) {
            const j = members[k]!;
            if (j <= i) continue;
            const d2 = distance2(i, j);
            const limit = reach[i]! + reach[j]! + limits.slack;
            if (d2 >= limits.size2 || d2 < limits.min2 || d2 > limit * limit) continue;
            if (out.count === out.i.length) grow(out);
            out.i[out.count] = i;
            out.j[out.count] = j;
            out.d2[out.count++] = d2;
          }
        }
      }
    }
  }
}
