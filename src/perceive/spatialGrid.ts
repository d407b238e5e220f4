/** Uniform spatial grid for finding near pairs of points in linear time. */

/** Finds the pairs of points closer than the cell edge. */
export interface SpatialGrid {
  /**
   * Calls `visit(i, j, d2)` once for every pair of points closer than the cell edge, with `i < j` and `d2`
   * the squared distance. The order of the calls is unspecified.
   */
  forEachNearPair(visit: (i: number, j: number, d2: number) => void): void;
}

/**
 * Builds a grid over `n` points (`coords` = x, y, z of point i at 3i…3i+2) with cubic cells of edge `cell`,
 * so every pair closer than `cell` lies in the same or adjacent cells. Points are stored cell by cell
 * (counting sort), with their coordinates copied in that order so the scan reads memory sequentially.
 * The cells of the bounding box are addressed directly when there are not many more of them than points
 * (any physical density); a sparse, far-flung box falls back to a map of occupied cells.
 * Building and scanning are linear in `n`.
 * @example spatialGrid(coords, n, 2.0).forEachNearPair((i, j, d2) => pairs.push([i, j]))
 */
export function spatialGrid(coords: Float64Array, n: number, cell: number): SpatialGrid {
  const size = Math.max(cell, 1e-6);
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
  return nx * ny * nz <= 8 * n + 1024 ? denseGrid(coords, n, size, low, nx, ny, nz) : sparseGrid(coords, n, size);
}

/** Points sorted by slot: `start[s]…start[s + 1]` index into `members`. */
function countingSort(slotOf: Int32Array, slots: number): { start: Int32Array; members: Int32Array } {
  const n = slotOf.length;
  const start = new Int32Array(slots + 1);
  for (let i = 0; i < n; i++) start[slotOf[i]! + 1]!++;
  for (let s = 0; s < slots; s++) start[s + 1]! += start[s]!;
  const fill = start.slice(0, slots);
  const members = new Int32Array(n);
  for (let i = 0; i < n; i++) members[fill[slotOf[i]!]!++] = i;
  return { start, members };
}

function denseGrid(
  coords: Float64Array,
  n: number,
  size: number,
  low: readonly number[],
  nx: number,
  ny: number,
  nz: number,
): SpatialGrid {
  const slotOf = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const x = Math.min(nx - 1, Math.floor((coords[3 * i]! - low[0]!) / size));
    const y = Math.min(ny - 1, Math.floor((coords[3 * i + 1]! - low[1]!) / size));
    const z = Math.min(nz - 1, Math.floor((coords[3 * i + 2]! - low[2]!) / size));
    slotOf[i] = x + nx * (y + ny * z);
  }
  const { start, members } = countingSort(slotOf, nx * ny * nz);
  const sorted = new Float64Array(3 * n);
  for (let k = 0; k < n; k++) sorted.set(coords.subarray(3 * members[k]!, 3 * members[k]! + 3), 3 * k);
  const limit2 = size * size;
  // the 13 neighbour offsets that follow (0, 0, 0) in (dz, dy, dx) order: each cell pair is scanned once
  const forward: [number, number, number][] = [];
  for (let dz = -1; dz <= 1; dz++) {
    for (let dy = -1; dy <= 1; dy++) {
      for (let dx = -1; dx <= 1; dx++) if (dz > 0 || (dz === 0 && (dy > 0 || (dy === 0 && dx > 0)))) forward.push([dx, dy, dz]);
    }
  }
  return {
    forEachNearPair(visit) {
      const scan = (k0: number, k1: number, m0: number, m1: number, same: boolean) => {
        for (let k = k0; k < k1; k++) {
          const x = sorted[3 * k]!;
          const y = sorted[3 * k + 1]!;
          const z = sorted[3 * k + 2]!;
          for (let m = same ? k + 1 : m0; m < m1; m++) {
            const dx = sorted[3 * m]! - x;
            const dy = sorted[3 * m + 1]! - y;
            const dz = sorted[3 * m + 2]! - z;
            const d2 = dx * dx + dy * dy + dz * dz;
            if (d2 >= limit2) continue;
            const i = members[k]!;
            const j = members[m]!;
            if (i < j) visit(i, j, d2);
            else visit(j, i, d2);
          }
        }
      };
      for (let z = 0; z < nz; z++) {
        for (let y = 0; y < ny; y++) {
          for (let x = 0; x < nx; x++) {
            const s = x + nx * (y + ny * z);
            if (start[s] === start[s + 1]) continue;
            scan(start[s]!, start[s + 1]!, 0, start[s + 1]!, true);
            for (const [dx, dy, dz] of forward) {
              const tx = x + dx;
              const ty = y + dy;
              const tz = z + dz;
              if (tx < 0 || tx >= nx || ty < 0 || ty >= ny || tz >= nz) continue;
              const t = tx + nx * (ty + ny * tz);
              if (start[t] !== start[t + 1]) scan(start[s]!, start[s + 1]!, start[t]!, start[t + 1]!, false);
            }
          }
        }
      }
    },
  };
}

function sparseGrid(coords: Float64Array, n: number, size: number): SpatialGrid {
  const limit2 = size * size;
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
  return {
    forEachNearPair(visit) {
      const seen: number[] = [];
      for (let i = 0; i < n; i++) {
        seen.length = 0;
        for (let dz = -1; dz <= 1; dz++) {
          for (let dy = -1; dy <= 1; dy++) {
            for (let dx = -1; dx <= 1; dx++) {
              const s = slotByKey.get(
                keyOf(cellCoords[3 * i]! + dx, cellCoords[3 * i + 1]! + dy, cellCoords[3 * i + 2]! + dz),
              );
              // at huge coordinates x + 1 === x, so neighbouring keys can repeat: visit each cell once
              if (s === undefined || seen.includes(s)) continue;
              seen.push(s);
              for (let k = start[s]!; k < start[s + 1]!; k++) {
                const j = members[k]!;
                if (j <= i) continue;
                const d2 = distance2(i, j);
                if (d2 < limit2) visit(i, j, d2);
              }
            }
          }
        }
      }
    },
  };
}
