// Time average of a piecewise-constant signal (queue length, WIP, carriers on a lane, a station's
// state as 0/1): the value holds from one update to the next. reset() starts a fresh observation
// window at the end of the warm-up while keeping the current value.

export class TimeWeightedMean {
  private start: number;
  private lastTime: number;
  private value: number;
  private area = 0;
  private peak: number;

  constructor(startTime = 0, initialValue = 0) {
    this.start = startTime;
    this.lastTime = startTime;
    this.value = initialValue;
    this.peak = initialValue;
  }

  /** The signal takes `value` from time `t` on. Times must not go backwards. */
  update(t: number, value: number): void {
    this.area += this.value * (t - this.lastTime);
    this.lastTime = t;
    this.value = value;
    if (value > this.peak) this.peak = value;
  }

  /** Mean over [start, tEnd]; the current value is counted up to tEnd. NaN for an empty window. */
  mean(tEnd: number): number {
    const span = tEnd - this.start;
    if (!(span > 0)) return Number.NaN;
    return (this.area + this.value * (tEnd - this.lastTime)) / span;
  }

  /** Discards everything before `t` (warm-up deletion); the signal keeps its present value. */
  reset(t: number): void {
    this.start = t;
    this.lastTime = t;
    this.area = 0;
    this.peak = this.value;
  }

  get current(): number {
    return this.value;
  }

  /** Highest value held since the start or the last reset. */
  get max(): number {
    return this.peak;
  }
}
