// Shifting-bottleneck detection by the active-period method (Roser, Nakano & Tanaka, "A Practical
// Bottleneck Detection Method", Winter Simulation Conference 2001, and "Shifting Bottleneck
// Detection", WSC 2002). A station is active while it is not waiting for another part of the line:
// processing, down, or paused for a break; starved and blocked are inactive. At every instant the
// momentary bottleneck is the station whose current active period is the longest. Where the
// periods of two consecutive bottlenecks overlap, the bottleneck is shifting, and that overlap counts
// for both; the rest of a bottleneck's time is sole.
//
// The timeline is resolved online up to the earliest start of a still-running active period (before
// it, every period is complete), so memory holds only the periods since then. Should that list pass
// MAX_PENDING (one station active for very long while others cycle), running periods are treated as
// ending now; this bounds memory at a small cost in accuracy.
//
// The work per report does not grow with the number of stations: stations that went inactive wait
// in a first-in first-out list (they go inactive in time order) until their bridge runs out, and the
// sweep keeps the periods covering the current instant in a heap ordered by length.
import type { ObservationWindow } from './window';

const MAX_PENDING = 2_000;
/** Completed periods collected before the timeline is resolved (larger batches sort less often; memory stays under MAX_PENDING). */
const MIN_BATCH = 256;

/**
 * Sorts order[0..n) by keys[order[i]], keeping equal keys in their present order (a bottom-up merge
 * sort through scratch). Written out rather than a sort with a comparator callback, which costs a
 * call into JavaScript per comparison. Needed only after a forced resolve; see sweep.
 */
function sortByKey(order: Int32Array, n: number, keys: Float64Array, scratch: Int32Array): void {
  let from = order;
  let to = scratch;
  for (let width = 1; width < n; width *= 2) {
    for (let lo = 0; lo < n; lo += 2 * width) {
      const mid = lo + width < n ? lo + width : n;
      const hi = lo + 2 * width < n ? lo + 2 * width : n;
      let i = lo;
      let j = mid;
      let k = lo;
      while (i < mid && j < hi) to[k++] = keys[from[j]] < keys[from[i]] ? from[j++] : from[i++];
      while (i < mid) to[k++] = from[i++];
      while (j < hi) to[k++] = from[j++];
    }
    const t = from;
    from = to;
    to = t;
  }
  if (from !== order) order.set(from.subarray(0, n));
}

export class BottleneckTracker {
  private readonly activeSince: Float64Array;
  /** When a station still in an active period went inactive (-1: it has not). */
  private readonly idleSince: Float64Array;
  /** Completed periods not yet resolved: station, start, end; the first pCount entries are used. */
  private pStation = new Int32Array(256);
  private pStart = new Float64Array(256);
  private pEnd = new Float64Array(256);
  private pCount = 0;
  private settled: number;
  private resolveAt = MIN_BATCH;
  /** Stations in the order they went inactive, with the time they did; entries of stations active again are skipped. */
  private idleStation = new Int32Array(64);
  private idleTime = new Float64Array(64);
  private idleHead = 0;
  private idleCount = 0;
  /** Pending periods in order of their end, and a max-heap of those that may cover the sweep's instant. */
  private byEnd = new Int32Array(32);
  private heap = new Int32Array(32);
  private heapSize = 0;
  private scratch = new Int32Array(32);
  /** The sweep's runs, found from the boundary backwards: period, and the span it is the bottleneck. */
  private runPeriod = new Int32Array(64);
  private runFrom = new Float64Array(64);
  private runTo = new Float64Array(64);
  /** The segment being extended (kept in fields, not an object: one is made per bottleneck change); station -1: none. */
  private heldStation = -1;
  private heldPeriodStart = 0;
  private heldPeriodEnd = 0;
  private heldFrom = 0;
  private heldTo = 0;
  /** Start and end of the overlap between the held segment's period and its predecessor's. */
  private heldOverlapFrom = 0;
  private heldOverlapTo = 0;
  readonly sole: Float64Array;
  readonly shifting: Float64Array;

  /**
   * @param bridgeSeconds inactive gaps up to this long do not end an active period: the time a
   * carrier queued right behind needs to move in. Without it, the in-feed gap of every cycle would
   * hand the bottleneck to whichever station happens to be working at that moment.
   */
  constructor(
    readonly window: ObservationWindow,
    stationCount: number,
    readonly bridgeSeconds = 0,
  ) {
    this.activeSince = new Float64Array(stationCount).fill(-1);
    this.idleSince = new Float64Array(stationCount).fill(-1);
    this.sole = new Float64Array(stationCount);
    this.shifting = new Float64Array(stationCount);
    this.settled = 0;
  }

  setActive(station: number, active: boolean, t: number): void {
    this.closeStale(t);
    const isActive = this.activeSince[station] >= 0 && this.idleSince[station] < 0;
    if (active === isActive) return;
    if (!active) {
      this.idleSince[station] = t;
      this.pushIdle(station, t);
      return;
    }
    if (this.idleSince[station] >= 0) {
      if (t - this.idleSince[station] <= this.bridgeSeconds) {
        this.idleSince[station] = -1;
        return;
      }
      this.close(station);
    }
    this.activeSince[station] = t;
  }

  /** Ends the period of a station that went inactive; the period ran to when it did. */
  private close(station: number): void {
    const start = this.activeSince[station];
    const end = this.idleSince[station];
    this.activeSince[station] = -1;
    this.idleSince[station] = -1;
    if (end > start) {
      this.addPeriod(station, start, end);
    }
  }

  private addPeriod(station: number, start: number, end: number): void {
    if (this.pCount === this.pStation.length) {
      const n = 2 * this.pCount;
      const stations = new Int32Array(n);
      stations.set(this.pStation);
      const starts = new Float64Array(n);
      starts.set(this.pStart);
      const ends = new Float64Array(n);
      ends.set(this.pEnd);
      this.pStation = stations;
      this.pStart = starts;
      this.pEnd = ends;
    }
    this.pStation[this.pCount] = station;
    this.pStart[this.pCount] = start;
    this.pEnd[this.pCount++] = end;
  }

  private pushIdle(station: number, t: number): void {
    const capacity = this.idleStation.length;
    if (this.idleCount === capacity) {
      const stations = new Int32Array(2 * capacity);
      const times = new Float64Array(2 * capacity);
      for (let i = 0; i < capacity; i++) {
        stations[i] = this.idleStation[(this.idleHead + i) % capacity];
        times[i] = this.idleTime[(this.idleHead + i) % capacity];
      }
      this.idleStation = stations;
      this.idleTime = times;
      this.idleHead = 0;
    }
    let at = this.idleHead + this.idleCount++;
    if (at >= this.idleStation.length) at -= this.idleStation.length;
    this.idleStation[at] = station;
    this.idleTime[at] = t;
  }

  /** Ends the periods of stations inactive for longer than the bridge, oldest first. */
  private closeStale(t: number): void {
    let closed = false;
    while (this.idleCount > 0) {
      const since = this.idleTime[this.idleHead];
      if (!(t - since > this.bridgeSeconds)) break;
      const station = this.idleStation[this.idleHead];
      if (++this.idleHead === this.idleStation.length) this.idleHead = 0;
      this.idleCount--;
      if (this.idleSince[station] !== since) continue;
      this.close(station);
      closed = true;
    }
    if (!closed) return;
    if (this.pCount > MAX_PENDING) this.resolve(t, true);
    else if (this.pCount > this.resolveAt) this.resolve(t, false);
  }

  /** Resolves the timeline up to t (forced: running periods end at t). */
  resolve(t: number, force: boolean): void {
    let boundary = t;
    if (force) {
      for (let s = 0; s < this.activeSince.length; s++) {
        if (this.idleSince[s] >= 0) {
          this.close(s);
          continue;
        }
        const since = this.activeSince[s];
        if (since >= 0 && t > since) {
          this.addPeriod(s, since, t);
          this.activeSince[s] = t;
        }
      }
    } else {
      for (let s = 0; s < this.activeSince.length; s++)
        if (this.activeSince[s] >= 0 && this.activeSince[s] < boundary) boundary = this.activeSince[s];
    }
    if (boundary <= this.settled) return;
    this.sweep(boundary);
    this.settled = boundary;
    let kept = 0;
    for (let i = 0; i < this.pCount; i++) {
      if (this.pEnd[i] <= boundary) continue;
      this.pStation[kept] = this.pStation[i];
      this.pStart[kept] = this.pStart[i];
      this.pEnd[kept] = this.pEnd[i];
      kept++;
    }
    this.pCount = kept;
    // Periods that stay pending (behind a long-running one) are re-read by each sweep; growing the
    // trigger with them (four times their number) keeps the work per period constant and small.
    this.resolveAt = Math.max(MIN_BATCH, 4 * kept);
  }

  /** Closes every running period at the end of the run and attributes the last segment. */
  finish(t: number): void {
    this.resolve(t, true);
    if (this.heldStation >= 0) this.attribute(Infinity, -Infinity);
    this.heldStation = -1;
  }

  /**
   * Finds the momentary bottleneck between the settled time and the boundary: at each instant the
   * longest period covering it (ties to the lower station index). It only changes where a period
   * that outranks the current one begins to cover (going backwards: at its end) or where the current
   * one stops covering (its start), so the sweep walks backwards from the boundary: periods join the
   * heap in order of their end and leave it, once on top, when they start at or after the instant.
   * Periods are added in the order stations went inactive, so their ends are already in order and
   * nothing is sorted (except after a forced resolve, which adds running periods out of order).
   * The runs found are then attributed forwards, in time order.
   */
  private sweep(boundary: number): void {
    const n = this.pCount;
    if (this.byEnd.length < n || this.runPeriod.length < 2 * n + 1) {
      this.byEnd = new Int32Array(2 * n);
      this.heap = new Int32Array(2 * n);
      this.scratch = new Int32Array(2 * n);
      this.runPeriod = new Int32Array(4 * n + 2);
      this.runFrom = new Float64Array(4 * n + 2);
      this.runTo = new Float64Array(4 * n + 2);
    }
    const starts = this.pStart;
    const ends = this.pEnd;
    const order = this.byEnd;
    let inOrder = true;
    order[0] = 0;
    for (let i = 1; i < n; i++) {
      order[i] = i;
      if (ends[i] < ends[i - 1]) inOrder = false;
    }
    if (!inOrder) sortByKey(order, n, ends, this.scratch);
    const settled = this.settled;
    const heap = this.heap;
    const runPeriod = this.runPeriod;
    const runFrom = this.runFrom;
    this.heapSize = 0;
    let next = n - 1;
    let runs = 0;
    // Each step covers [a, x): nothing ends inside it, and the best period covers all of it.
    for (let x = boundary; x > settled;) {
      while (next >= 0 && ends[order[next]] >= x) this.heapPush(order[next--]);
      while (this.heapSize > 0 && starts[heap[0]] >= x) this.heapPop();
      let a = next >= 0 && ends[order[next]] > settled ? ends[order[next]] : settled;
      if (this.heapSize > 0) {
        const best = heap[0];
        if (starts[best] > a) a = starts[best];
        if (runs > 0 && runPeriod[runs - 1] === best) runFrom[runs - 1] = a;
        else {
          runPeriod[runs] = best;
          runFrom[runs] = a;
          this.runTo[runs++] = x;
        }
      }
      x = a;
    }
    for (let r = runs - 1; r >= 0; r--) {
      const p = runPeriod[r];
      this.extend(this.pStation[p], starts[p], ends[p], runFrom[r], this.runTo[r]);
    }
  }

  /** Period i outranks period j: longer, or as long and of a lower station index. */
  private outranks(i: number, j: number): boolean {
    const li = this.pEnd[i] - this.pStart[i];
    const lj = this.pEnd[j] - this.pStart[j];
    return li > lj || (li === lj && this.pStation[i] < this.pStation[j]);
  }

  private heapPush(i: number): void {
    const heap = this.heap;
    let at = this.heapSize++;
    while (at > 0) {
      const parent = (at - 1) >> 1;
      if (!this.outranks(i, heap[parent])) break;
      heap[at] = heap[parent];
      at = parent;
    }
    heap[at] = i;
  }

  private heapPop(): void {
    const heap = this.heap;
    const last = heap[--this.heapSize];
    let at = 0;
    for (;;) {
      let child = 2 * at + 1;
      if (child >= this.heapSize) break;
      if (child + 1 < this.heapSize && this.outranks(heap[child + 1], heap[child])) child++;
      if (!this.outranks(heap[child], last)) break;
      heap[at] = heap[child];
      at = child;
    }
    heap[at] = last;
  }

  private extend(station: number, periodStart: number, periodEnd: number, from: number, to: number): void {
    const held = this.heldStation;
    if (held === station && this.heldPeriodStart === periodStart) {
      this.heldTo = to;
      return;
    }
    let overlapFrom = Infinity;
    let overlapTo = -Infinity;
    if (held >= 0) {
      overlapFrom = Math.max(this.heldPeriodStart, periodStart, this.heldFrom);
      overlapTo = Math.min(this.heldPeriodEnd, periodEnd);
      if (overlapTo > overlapFrom) {
        const both = this.window.overlap(overlapFrom, overlapTo);
        this.shifting[held] += both;
        if (station !== held) this.shifting[station] += both;
      }
      this.attribute(overlapFrom, overlapTo);
    }
    this.heldStation = station;
    this.heldPeriodStart = periodStart;
    this.heldPeriodEnd = periodEnd;
    this.heldFrom = from;
    this.heldTo = to;
    this.heldOverlapFrom = overlapFrom;
    this.heldOverlapTo = overlapTo;
  }

  /** Sole time of the held segment, now finished: its time minus what lies in the overlaps on either side. */
  private attribute(nextFrom: number, nextTo: number): void {
    const before = this.inSegment(this.heldOverlapFrom, this.heldOverlapTo);
    const after = this.inSegment(nextFrom, nextTo);
    const both = this.inSegment(Math.max(this.heldOverlapFrom, nextFrom), Math.min(this.heldOverlapTo, nextTo));
    this.sole[this.heldStation] += Math.max(0, this.window.overlap(this.heldFrom, this.heldTo) - before - after + both);
  }

  private inSegment(a: number, b: number): number {
    return this.window.overlap(Math.max(a, this.heldFrom), Math.min(b, this.heldTo));
  }
}
