// Running mean and variance of a stream of observations in constant memory, by Welford's update
// (B. P. Welford, Technometrics 4(3), 1962), which stays accurate when the values sit far from zero
// (cycle times late in a long run) where the sum-of-squares shortcut loses every digit.

export class Welford {
  private count = 0;
  private runningMean = 0;
  private squaredDeviations = 0;
  private low = Infinity;
  private high = -Infinity;

  push(x: number): void {
    this.count++;
    const delta = x - this.runningMean;
    this.runningMean += delta / this.count;
    this.squaredDeviations += delta * (x - this.runningMean);
    if (x < this.low) this.low = x;
    if (x > this.high) this.high = x;
  }

  reset(): void {
    this.count = 0;
    this.runningMean = 0;
    this.squaredDeviations = 0;
    this.low = Infinity;
    this.high = -Infinity;
  }

  get n(): number {
    return this.count;
  }

  /** NaN before the first observation, so an empty statistic is never mistaken for a zero. */
  get mean(): number {
    return this.count > 0 ? this.runningMean : Number.NaN;
  }

  /** Sample variance (divisor n - 1); zero for a single observation. */
  get variance(): number {
    if (this.count === 0) return Number.NaN;
    return this.count > 1 ? this.squaredDeviations / (this.count - 1) : 0;
  }

  get sd(): number {
    return Math.sqrt(this.variance);
  }

  get min(): number {
    return this.count > 0 ? this.low : Number.NaN;
  }

  get max(): number {
    return this.count > 0 ? this.high : Number.NaN;
  }
}
