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
import type { ObservationWindow } from './window';

const MAX_PENDING = 2_000;
/** Completed periods collected before the timeline is resolved. */
const MIN_BATCH = 64;

type Segment = { station: number; periodStart: number; periodEnd: number; from: number; to: number };

export class BottleneckTracker {
  private readonly activeSince: Float64Array;
  /** When a station still in an active period went inactive (-1: it has not). */
  private readonly idleSince: Float64Array;
  private pStation: number[] = [];
  private pStart: number[] = [];
  private pEnd: number[] = [];
  private settled: number;
  private cuts = new Float64Array(64);
  private resolveAt = MIN_BATCH;
  /** No station has been idle since before this (Infinity: none is idle); skips needless scans. */
  private oldestIdle = Infinity;
  private nextSame = new Int32Array(32);
  private readonly covering: Int32Array;
  private held: Segment | null = null;
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
    this.covering = new Int32Array(stationCount);
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
      if (t < this.oldestIdle) this.oldestIdle = t;
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
      this.pStation.push(station);
      this.pStart.push(start);
      this.pEnd.push(end);
    }
  }

  private closeStale(t: number): void {
    if (!(t - this.oldestIdle > this.bridgeSeconds)) return;
    let closed = false;
    let oldest = Infinity;
    for (let s = 0; s < this.idleSince.length; s++) {
      const idle = this.idleSince[s];
      if (idle < 0) continue;
      if (t - idle > this.bridgeSeconds) {
        this.close(s);
        closed = true;
      } else if (idle < oldest) oldest = idle;
    }
    this.oldestIdle = oldest;
    if (!closed) return;
    if (this.pStation.length > MAX_PENDING) this.resolve(t, true);
    else if (this.pStation.length > this.resolveAt) this.resolve(t, false);
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
          this.pStation.push(s);
          this.pStart.push(since);
          this.pEnd.push(t);
          this.activeSince[s] = t;
        }
      }
    } else {
      for (let s = 0; s < this.activeSince.length; s++) if (this.activeSince[s] >= 0 && this.activeSince[s] < boundary) boundary = this.activeSince[s];
    }
    if (boundary <= this.settled) return;
    this.sweep(boundary);
    this.settled = boundary;
    let kept = 0;
    for (let i = 0; i < this.pStation.length; i++) {
      if (this.pEnd[i] <= boundary) continue;
      this.pStation[kept] = this.pStation[i];
      this.pStart[kept] = this.pStart[i];
      this.pEnd[kept] = this.pEnd[i];
      kept++;
    }
    this.pStation.length = kept;
    this.pStart.length = kept;
    this.pEnd.length = kept;
    // Periods that stay pending (behind a long-running one) are re-read by each sweep; growing the
    // trigger with them keeps the work per period constant.
    this.resolveAt = Math.max(MIN_BATCH, 2 * kept);
  }

  /** Closes every running period at the end of the run and attributes the last segment. */
  finish(t: number): void {
    this.resolve(t, true);
    if (this.held) this.attribute(this.held, Infinity, -Infinity);
    this.held = null;
  }

  /**
   * Walks the cut points (period starts and ends) between the settled time and the boundary. A
   * station's periods are disjoint and close in order, so each station keeps a pointer to its first
   * period not yet over; at most one period per station covers any instant.
   */
  private sweep(boundary: number): void {
    const n = this.pStation.length;
    if (this.cuts.length < 2 * n + 2) {
      this.cuts = new Float64Array(4 * n + 4);
      this.nextSame = new Int32Array(2 * n + 2);
    }
    const cuts = this.cuts;
    let count = 0;
    cuts[count++] = this.settled;
    cuts[count++] = boundary;
    for (let i = 0; i < n; i++) {
      if (this.pStart[i] > this.settled && this.pStart[i] < boundary) cuts[count++] = this.pStart[i];
      if (this.pEnd[i] > this.settled && this.pEnd[i] < boundary) cuts[count++] = this.pEnd[i];
    }
    const points = cuts.subarray(0, count).sort();
    const pointer = this.covering.fill(-1);
    for (let i = n - 1; i >= 0; i--) {
      const st = this.pStation[i];
      this.nextSame[i] = pointer[st];
      pointer[st] = i;
    }
    const starts = this.pStart;
    const ends = this.pEnd;
    for (let k = 0; k + 1 < count; k++) {
      const a = points[k];
      const b = points[k + 1];
      if (b <= a) continue;
      let best = -1;
      let bestLen = -1;
      for (let st = 0; st < pointer.length; st++) {
        let i = pointer[st];
        while (i >= 0 && ends[i] <= a) i = this.nextSame[i];
        pointer[st] = i;
        if (i < 0 || starts[i] > a) continue;
        const len = ends[i] - starts[i];
        if (len > bestLen) {
          best = i;
          bestLen = len;
        }
      }
      if (best >= 0) this.extend(this.pStation[best], starts[best], ends[best], a, b);
    }
  }

  private extend(station: number, periodStart: number, periodEnd: number, from: number, to: number): void {
    const h = this.held;
    if (h && h.station === station && h.periodStart === periodStart) {
      h.to = to;
      return;
    }
    let overlapFrom = Infinity;
    let overlapTo = -Infinity;
    if (h) {
      overlapFrom = Math.max(h.periodStart, periodStart, h.from);
      overlapTo = Math.min(h.periodEnd, periodEnd);
      if (overlapTo > overlapFrom) {
        const both = this.window.overlap(overlapFrom, overlapTo);
        this.shifting[h.station] += both;
        if (station !== h.station) this.shifting[station] += both;
      }
      this.attribute(h, overlapFrom, overlapTo);
    }
    this.held = { station, periodStart, periodEnd, from, to };
    this.heldOverlapFrom = overlapFrom;
    this.heldOverlapTo = overlapTo;
  }

  /** Sole time of a finished segment: its time minus what lies in the overlaps on either side. */
  private attribute(h: Segment, nextFrom: number, nextTo: number): void {
    const before = this.inSegment(h, this.heldOverlapFrom, this.heldOverlapTo);
    const after = this.inSegment(h, nextFrom, nextTo);
    const both = this.inSegment(h, Math.max(this.heldOverlapFrom, nextFrom), Math.min(this.heldOverlapTo, nextTo));
    this.sole[h.station] += Math.max(0, this.window.overlap(h.from, h.to) - before - after + both);
  }

  private inSegment(h: Segment, a: number, b: number): number {
    return this.window.overlap(Math.max(a, h.from), Math.min(b, h.to));
  }
}
