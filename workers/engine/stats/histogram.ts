// Distribution of a non-negative observation (lead time, loop time, cycle time) in bounded memory:
// a fixed number of equal bins from zero whose width doubles, merging neighbours, whenever a value
// lands past the top. Memory is the bin array whatever the run length; mean, min and max are exact;
// quantiles are interpolated inside a bin, so their error is at most one bin width, which is at most
// 2 × max / binCount once the range has grown (under 1 % of the largest value with 256 bins).

export type HistogramSnapshot = {
  /** Width of each bin; bin i covers [i × binWidth, (i + 1) × binWidth). */
  binWidth: number;
  counts: Float64Array;
};

export class StreamingHistogram {
  private readonly counts: Float64Array;
  private readonly initialBinWidth: number;
  private binWidth: number;
  private count = 0;
  private sum = 0;
  private low = Infinity;
  private high = -Infinity;

  /**
   * @param initialBinWidth the finest resolution wanted; choose it near the expected values / binCount.
   * @param binCount an even number of bins (default 256).
   */
  constructor(initialBinWidth: number, binCount = 256) {
    if (!(initialBinWidth > 0) || !Number.isFinite(initialBinWidth)) {
      throw new RangeError(
        `StreamingHistogram: initialBinWidth must be a positive finite number, got ${initialBinWidth}`,
      );
    }
    if (!Number.isInteger(binCount) || binCount < 2 || binCount % 2 !== 0) {
      throw new RangeError(`StreamingHistogram: binCount must be an even whole number of at least 2, got ${binCount}`);
    }
    this.counts = new Float64Array(binCount);
    this.initialBinWidth = initialBinWidth;
    this.binWidth = initialBinWidth;
  }

  /** Adds one observation; negative values are counted in the first bin. */
  add(x: number): void {
    if (!Number.isFinite(x)) throw new RangeError(`StreamingHistogram: observation must be finite, got ${x}`);
    const bins = this.counts.length;
    while (x >= this.binWidth * bins) this.coarsen();
    this.counts[x > 0 ? Math.floor(x / this.binWidth) : 0]++;
    this.count++;
    this.sum += x;
    if (x < this.low) this.low = x;
    if (x > this.high) this.high = x;
  }

  private coarsen(): void {
    const c = this.counts;
    const half = c.length / 2;
    for (let i = 0; i < half; i++) c[i] = c[2 * i] + c[2 * i + 1];
    c.fill(0, half);
    this.binWidth *= 2;
  }

  /** Value below which a share p of the observations lie; NaN when empty. */
  quantile(p: number): number {
    if (this.count === 0) return Number.NaN;
    const target = Math.min(Math.max(p, 0), 1) * this.count;
    let below = 0;
    for (let i = 0; i < this.counts.length; i++) {
      const inBin = this.counts[i];
      if (inBin > 0 && below + inBin >= target) {
        const estimate = this.binWidth * (i + (target - below) / inBin);
        return Math.min(Math.max(estimate, this.low), this.high);
      }
      below += inBin;
    }
    return this.high;
  }

  get n(): number {
    return this.count;
  }

  get mean(): number {
    return this.count > 0 ? this.sum / this.count : Number.NaN;
  }

  get min(): number {
    return this.count > 0 ? this.low : Number.NaN;
  }

  get max(): number {
    return this.count > 0 ? this.high : Number.NaN;
  }

  get p50(): number {
    return this.quantile(0.5);
  }

  get p95(): number {
    return this.quantile(0.95);
  }

  /** A copy, safe to post to another thread while the run goes on. */
  snapshot(): HistogramSnapshot {
    return { binWidth: this.binWidth, counts: this.counts.slice() };
  }

  /** Forgets all observations (warm-up deletion) and returns to the finest resolution. */
  reset(): void {
    this.counts.fill(0);
    this.binWidth = this.initialBinWidth;
    this.count = 0;
    this.sum = 0;
    this.low = Infinity;
    this.high = -Infinity;
  }
}
