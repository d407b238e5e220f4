/** Uniform spatial grid for finding near pairs of points in linear time. */

/** Pairs of points that may lie within one cell edge of each other. */
export interface SpatialGrid {
  /** Calls `visit(i, j)` with `i < j` once for every pair of points in the same or adjacent cells. */
  forEachNearPair(visit: (i: number, j: number) => void): void;
}

/**
 * Builds a grid over `n` points (`coords` = x, y, z of point i at 3i…3i+2) with cubic cells of edge `cell`,
 * so every pair closer than `cell` lies in the same or adjacent cells. Only occupied cells are stored (a map
 * from cell key to slot), so a sparse box costs nothing; building and scanning are linear in `n` for
 * physical densities.
 * @example spatialGrid(coords, n, 2.0).forEachNearPair((i, j) => candidates.push([i, j]))
 */
export function spatialGrid(coords: Float64Array, n: number, cell: number): SpatialGrid {
  const size = Math.max(cell, 1e-6);
  const ix = new Float64Array(n);
  const iy = new Float64Array(n);
  const iz = new Float64Array(n);
  const low = [Infinity, Infinity, Infinity];
  const high = [-Infinity, -Infinity, -Infinity];
  const cells = [ix, iy, iz];
  for (let i = 0; i < n; i++) {
    for (let d = 0; d < 3; d++) {
      const v = Math.floor(coords[3 * i + d]! / size);
      cells[d]![i] = v;
      low[d] = Math.min(low[d]!, v);
      high[d] = Math.max(high[d]!, v);
    }
  }
  // one number per cell (exact while the padded box has < 2^52 cells), else a string for absurd extents
  const nx = high[0]! - low[0]! + 3;
  const ny = high[1]! - low[1]! + 3;
  const nz = high[2]! - low[2]! + 3;
  const numeric = nx * ny * nz < 2 ** 52;
  const keyOf = numeric
    ? (x: number, y: number, z: number): number | string =>
        x - low[0]! + 1 + nx * (y - low[1]! + 1 + ny * (z - low[2]! + 1))
    : (x: number, y: number, z: number): number | string => `${x},${y},${z}`;

  const slot = new Map<number | string, number>();
  const cellOfAtom = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const key = keyOf(ix[i]!, iy[i]!, iz[i]!);
    let s = slot.get(key);
    if (s === undefined) {
      s = slot.size;
      slot.set(key, s);
    }
    cellOfAtom[i] = s;
  }
  // atoms stored cell by cell (counting sort)
  const start = new Int32Array(slot.size + 1);
  for (let i = 0; i < n; i++) start[cellOfAtom[i]! + 1]!++;
  for (let s = 0; s < slot.size; s++) start[s + 1]! += start[s]!;
  const fill = start.slice(0, slot.size);
  const members = new Int32Array(n);
  for (let i = 0; i < n; i++) members[fill[cellOfAtom[i]!]!++] = i;

  return {
    forEachNearPair(visit) {
      for (let i = 0; i < n; i++) {
        for (let dx = -1; dx <= 1; dx++) {
          for (let dy = -1; dy <= 1; dy++) {
            for (let dz = -1; dz <= 1; dz++) {
              const s = slot.get(keyOf(ix[i]! + dx, iy[i]! + dy, iz[i]! + dz));
              if (s === undefined) continue;
              for (let k = start[s]!; k < start[s + 1]!; k++) {
                const j = members[k]!;
                if (j > i) visit(i, j);
              }
            }
          }
        }
      }
    },
  };
}
