// The observation window (warm-up end to run end) split into equal time bins. Everything a recorder
// accumulates is clipped to the window, which is how warm-up deletion works: whatever happened
// before the warm-up ended never reaches a statistic.
export class ObservationWindow {
  readonly binSeconds: number;

  constructor(
    readonly start: number,
    readonly end: number,
    readonly bins: number,
  ) {
    this.binSeconds = (end - start) / bins;
  }

  get length(): number {
    return this.end - this.start;
  }

  contains(t: number): boolean {
    return t >= this.start && t <= this.end;
  }

  /** Length of [a, b) inside the window. */
  overlap(a: number, b: number): number {
    const lo = a > this.start ? a : this.start;
    const hi = b < this.end ? b : this.end;
    return hi > lo ? hi - lo : 0;
  }

  binOf(t: number): number {
    const k = Math.floor((t - this.start) / this.binSeconds);
    return k < 0 ? 0 : k >= this.bins ? this.bins - 1 : k;
  }

  /** Adds weight × (time of [a, b) in each bin) to target[offset + bin × stride]. */
  spread(target: Float64Array, offset: number, stride: number, a: number, b: number, weight: number): void {
    const lo = a > this.start ? a : this.start;
    const hi = b < this.end ? b : this.end;
    if (!(hi > lo)) return;
    const first = this.binOf(lo);
    const last = this.binOf(hi);
    for (let k = first; k <= last; k++) {
      const binStart = this.start + k * this.binSeconds;
      const from = lo > binStart ? lo : binStart;
      const binEnd = k === this.bins - 1 ? this.end : binStart + this.binSeconds;
      const to = hi < binEnd ? hi : binEnd;
      if (to > from) target[offset + k * stride] += (to - from) * weight;
    }
  }
}

/** Time-weighted levels of many signals at once (queue lengths, carriers on a lane), clipped to the window. */
export class Levels {
  private readonly value: Float64Array;
  private readonly since: Float64Array;
  private readonly area: Float64Array;

  constructor(
    private readonly window: ObservationWindow,
    count: number,
  ) {
    this.value = new Float64Array(count);
    this.since = new Float64Array(count);
    this.area = new Float64Array(count);
  }

  set(i: number, value: number, t: number): void {
    this.area[i] += this.value[i] * this.window.overlap(this.since[i], t);
    this.value[i] = value;
    this.since[i] = t;
  }

  add(i: number, delta: number, t: number): void {
    this.set(i, this.value[i] + delta, t);
  }

  current(i: number): number {
    return this.value[i];
  }

  lastChange(i: number): number {
    return this.since[i];
  }

  /** Time average over the window; call once the run has reached the window's end. */
  mean(i: number): number {
    const area = this.area[i] + this.value[i] * this.window.overlap(this.since[i], this.window.end);
    return this.window.length > 0 ? area / this.window.length : 0;
  }
}
