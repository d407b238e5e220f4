/**
 * Down-sampling of long series for plotting in fixed memory: consecutive samples are gathered in buckets of
 * 1, 2, 4 … samples; when the buckets run out, neighbours merge pairwise and the bucket size doubles. Each
 * bucket keeps the first and last x, the minimum and maximum of every series (non-finite values skipped), a
 * histogram of every series over fixed bins (when binning is given) and how many of its samples fell in each
 * category (shape). A plot then shows a million-frame series at a few hundred columns: the min/max envelope
 * keeps every spike, the histograms give the density of each column (and a wrapping angle such as φ, whose
 * min/max says nothing once it crosses 0/360, still reads as where it spends its time).
 */

/** Fixed bins of one series: `bins` equal intervals from `min` to `max` (values outside go to the end bins). */
export interface SeriesBinning {
  readonly min: number;
  readonly max: number;
  readonly bins: number;
}

/** One bucket, as read back. */
export interface SeriesBucket {
  readonly xFirst: number;
  readonly xLast: number;
  readonly samples: number;
  /** Per series: [min, max], or null when the bucket had no finite value of that series. */
  readonly ranges: readonly ([number, number] | null)[];
  /** Per series: counts per bin (empty when the series has no binning). */
  readonly histograms: readonly (readonly number[])[];
  /** Index of the category with the most samples (lowest index on ties). */
  readonly majority: number;
}

/**
 * Bucketed min/max series with per-bucket histograms.
 * @example const b = new SeriesBuckets(2, 512, 10, [{ min: 0, max: 180, bins: 36 }, { min: 0, max: 360, bins: 72 }]); b.add(1, [theta, phi], shapeIndex); b.buckets()
 */
export class SeriesBuckets {
  private size = 1;
  private used = 0;
  private fill = 0;
  private readonly xFirst: Float64Array;
  private readonly xLast: Float64Array;
  private readonly samples: Uint32Array;
  private readonly min: Float64Array;
  private readonly max: Float64Array;
  private readonly cats: Uint32Array;
  /** Bins of all series per bucket, series after series. */
  private readonly hist: Uint32Array;
  /** First bin of each series inside a bucket's block, and the block length. */
  private readonly binStart: number[] = [];
  private readonly binsPerBucket: number;
  readonly binning: readonly (SeriesBinning | null)[];

  /**
   * @param series number of series per sample
   * @param capacity most buckets kept (even, ≥ 2); the result has between capacity/2 and capacity buckets
   * @param categories number of categories (sample categories are 0 … categories − 1)
   * @param binning per series: fixed bins for its histogram, or null for none. Default none.
   */
  constructor(readonly series: number, readonly capacity: number, readonly categories: number, binning: readonly (SeriesBinning | null)[] = []) {
    if (capacity < 2 || capacity % 2 !== 0) throw new RangeError('capacity must be even and at least 2');
    this.binning = Array.from({ length: series }, (_, s) => binning[s] ?? null);
    let start = 0;
    for (const b of this.binning) {
      if (b && (!Number.isInteger(b.bins) || b.bins < 1 || !(b.max > b.min))) throw new RangeError('binning needs max > min and a whole number of bins');
      this.binStart.push(start);
      start += b?.bins ?? 0;
    }
    this.binsPerBucket = start;
    this.xFirst = new Float64Array(capacity);
    this.xLast = new Float64Array(capacity);
    this.samples = new Uint32Array(capacity);
    this.min = new Float64Array(capacity * series).fill(Infinity);
    this.max = new Float64Array(capacity * series).fill(-Infinity);
    this.cats = new Uint32Array(capacity * categories);
    this.hist = new Uint32Array(capacity * start);
  }

  /** Adds one sample at `x` (non-decreasing) with one value per series and its category. */
  add(x: number, values: ArrayLike<number>, category: number): void {
    if (this.used === 0 || this.fill === this.size) {
      if (this.used === this.capacity) this.halve();
      const b = this.used++;
      this.xFirst[b] = x;
      this.fill = 0;
    }
    const b = this.used - 1;
    this.xLast[b] = x;
    this.samples[b]!++;
    this.fill++;
    const S = this.series;
    for (let s = 0; s < S; s++) {
      const v = values[s]!;
      if (!Number.isFinite(v)) continue;
      if (v < this.min[b * S + s]!) this.min[b * S + s] = v;
      if (v > this.max[b * S + s]!) this.max[b * S + s] = v;
      const bin = this.binning[s];
      if (bin) {
        let k = Math.floor(((v - bin.min) / (bin.max - bin.min)) * bin.bins);
        if (k < 0) k = 0;
        else if (k >= bin.bins) k = bin.bins - 1;
        this.hist[b * this.binsPerBucket + this.binStart[s]! + k]!++;
      }
    }
    this.cats[b * this.categories + category]!++;
  }

  /** Merges buckets pairwise; the bucket size doubles. */
  private halve(): void {
    const S = this.series;
    const C = this.categories;
    const H = this.binsPerBucket;
    const half = this.capacity / 2;
    for (let i = 0; i < half; i++) {
      const a = 2 * i, b = a + 1;
      this.xFirst[i] = this.xFirst[a]!;
      this.xLast[i] = this.xLast[b]!;
      this.samples[i] = this.samples[a]! + this.samples[b]!;
      for (let s = 0; s < S; s++) {
        this.min[i * S + s] = Math.min(this.min[a * S + s]!, this.min[b * S + s]!);
        this.max[i * S + s] = Math.max(this.max[a * S + s]!, this.max[b * S + s]!);
      }
      for (let c = 0; c < C; c++) this.cats[i * C + c] = this.cats[a * C + c]! + this.cats[b * C + c]!;
      for (let h = 0; h < H; h++) this.hist[i * H + h] = this.hist[a * H + h]! + this.hist[b * H + h]!;
    }
    this.min.fill(Infinity, half * S);
    this.max.fill(-Infinity, half * S);
    this.samples.fill(0, half);
    this.cats.fill(0, half * C);
    this.hist.fill(0, half * H);
    this.used = half;
    this.size *= 2;
    this.fill = this.size;
  }

  /** The buckets so far, in x order. */
  buckets(): SeriesBucket[] {
    const S = this.series;
    const C = this.categories;
    const H = this.binsPerBucket;
    return Array.from({ length: this.used }, (_, b) => {
      let majority = 0;
      for (let c = 1; c < C; c++) if (this.cats[b * C + c]! > this.cats[b * C + majority]!) majority = c;
      const ranges = Array.from({ length: S }, (_, s): [number, number] | null => {
        const lo = this.min[b * S + s]!;
        const hi = this.max[b * S + s]!;
        return lo <= hi ? [lo, hi] : null;
      });
      const histograms = this.binning.map((bin, s) => {
        const from = b * H + this.binStart[s]!;
        return bin ? Array.from(this.hist.subarray(from, from + bin.bins)) : [];
      });
      return { xFirst: this.xFirst[b]!, xLast: this.xLast[b]!, samples: this.samples[b]!, ranges, histograms, majority };
    });
  }
}
