// Collects the statistics of one replication from the model's reports: time shares per station,
// carrier and transfer, counts, lead times (output parts), times in line (every part that leaves),
// loop times, WIP, and the binned series behind the heatmaps.
// Memory is fixed at construction (entities × bins); nothing grows with the run length.
//
// Transfers take part in the bottleneck analysis beside the stations: a transfer is active while
// carrying or returning empty, inactive while idle (starved) or holding a carrier it cannot hand over
// (blocked), exactly as a station is. So a transfer that is busy most of the time and rarely blocked
// has the longest active periods and is found as the bottleneck; one that is mostly blocked is not.
import { StreamingHistogram } from '../stats/histogram';
import { BottleneckTracker } from './bottleneck';
import {
  PH_EXIT,
  PH_MOVING,
  PH_QUEUED,
  PH_STATION,
  ST_BLOCKED,
  ST_STARVED,
  TR_CARRYING,
  TR_IDLE,
  TR_RETURNING,
  TRANSFER_STATE_COUNT,
  type Observer,
} from './observer';
import { Levels, ObservationWindow } from './window';

export const STATE_COUNT = 5;
export const CARRIER_SHARES = 4;
export const TRANSFER_STATES = TRANSFER_STATE_COUNT;

/** What the recorder needs to know of the line: how many of each entity, and lane lengths. */
export type RecordedLine = {
  stationCount: number;
  carrierCount: number;
  connCount: number;
  laneCount: number;
  laneLengthMm: ArrayLike<number>;
};

/** Carrier phase to the shares reported: moving, waiting, working, in transfer. */
function carrierShare(phase: number): number {
  if (phase === PH_MOVING) return 0;
  if (phase === PH_QUEUED || phase === PH_EXIT) return 1;
  return phase === PH_STATION ? 2 : 3;
}

export class Recorder implements Observer {
  readonly window: ObservationWindow;
  readonly stationTime: Float64Array;
  readonly stationTimeline: Float64Array;
  readonly cycleSum: Float64Array;
  readonly cycleCount: Float64Array;
  readonly operations: Float64Array;
  readonly failures: Float64Array;
  readonly stationAssignedLevels: Levels;
  readonly carrierTime = new Float64Array(CARRIER_SHARES);
  readonly transferTime: Float64Array;
  readonly transferMoves: Float64Array;
  readonly transferQueueLevels: Levels;
  readonly laneLevels: Levels;
  readonly wipLevel: Levels;
  readonly wipSeries: Float64Array;
  readonly laneHeat: Float64Array[];
  /** Output parts only: load to unload. */
  readonly leadTimes = new StreamingHistogram(1, 128);
  /** Every part that leaves, output or scrapped: the W of Little's law for the WIP recorded here. */
  readonly timesInLine = new StreamingHistogram(1, 128);
  readonly loopTimes = new StreamingHistogram(1, 128);
  readonly bottleneck: BottleneckTracker;
  readonly samplesPerBin: number;
  loadedCount = 0;
  outputCount = 0;
  scrappedCount = 0;
  reworkedCount = 0;
  private readonly sState: Int8Array;
  private readonly sSince: Float64Array;
  /** Carriers in each share now, and since when. */
  private readonly shareCount = new Float64Array(CARRIER_SHARES);
  private readonly shareSince = new Float64Array(CARRIER_SHARES);
  private readonly tState: Int8Array;
  private readonly tSince: Float64Array;

  /**
   * @param bridgeSeconds inactive gaps up to this long do not end an active period in the bottleneck
   * analysis: the time a queued carrier needs to move in (see BottleneckTracker).
   */
  constructor(
    private readonly line: RecordedLine,
    warmupSeconds: number,
    endSeconds: number,
    timeBins: number,
    readonly positionBins: number,
    bridgeSeconds: number,
    samplesPerBin = 8,
  ) {
    const w = new ObservationWindow(warmupSeconds, endSeconds, timeBins);
    this.window = w;
    this.samplesPerBin = samplesPerBin;
    const s = line.stationCount;
    this.stationTime = new Float64Array(s * STATE_COUNT);
    this.stationTimeline = new Float64Array(s * timeBins * STATE_COUNT);
    this.cycleSum = new Float64Array(s);
    this.cycleCount = new Float64Array(s);
    this.operations = new Float64Array(s);
    this.failures = new Float64Array(s);
    this.stationAssignedLevels = new Levels(w, s);
    this.sState = new Int8Array(s).fill(ST_STARVED);
    this.sSince = new Float64Array(s);
    this.transferTime = new Float64Array(line.connCount * TRANSFER_STATES);
    this.transferMoves = new Float64Array(line.connCount);
    this.transferQueueLevels = new Levels(w, line.connCount);
    this.tState = new Int8Array(line.connCount).fill(TR_IDLE);
    this.tSince = new Float64Array(line.connCount);
    this.laneLevels = new Levels(w, line.laneCount);
    this.wipLevel = new Levels(w, 1);
    this.wipSeries = new Float64Array(timeBins);
    this.laneHeat = Array.from({ length: line.laneCount }, () => new Float64Array(timeBins * positionBins));
    this.bottleneck = new BottleneckTracker(w, s + line.connCount, bridgeSeconds);
  }

  stationState(station: number, state: number, t: number): void {
    const old = this.sState[station];
    const since = this.sSince[station];
    this.stationTime[station * STATE_COUNT + old] += this.window.overlap(since, t);
    this.window.spread(this.stationTimeline, station * this.window.bins * STATE_COUNT + old, STATE_COUNT, since, t, 1);
    this.sState[station] = state;
    this.sSince[station] = t;
    this.bottleneck.setActive(station, state !== ST_STARVED && state !== ST_BLOCKED, t);
  }

  carrierPhases(from: number, to: number, count: number, t: number): void {
    if (from >= 0) this.shareChange(carrierShare(from), -count, t);
    this.shareChange(carrierShare(to), count, t);
  }

  private shareChange(share: number, delta: number, t: number): void {
    this.carrierTime[share] += this.shareCount[share] * this.window.overlap(this.shareSince[share], t);
    this.shareCount[share] += delta;
    this.shareSince[share] = t;
  }

  transferState(conn: number, state: number, t: number): void {
    this.transferTime[conn * TRANSFER_STATES + this.tState[conn]] += this.window.overlap(this.tSince[conn], t);
    this.tState[conn] = state;
    this.tSince[conn] = t;
    this.bottleneck.setActive(this.line.stationCount + conn, state === TR_CARRYING || state === TR_RETURNING, t);
  }

  transferQueue(conn: number, delta: number, t: number): void {
    this.transferQueueLevels.add(conn, delta, t);
  }

  stationAssigned(station: number, assigned: number, t: number): void {
    this.stationAssignedLevels.set(station, assigned, t);
  }

  laneCarriers(lane: number, count: number, t: number): void {
    this.laneLevels.set(lane, count, t);
  }

  wip(count: number, t: number): void {
    const old = this.wipLevel.current(0);
    this.window.spread(this.wipSeries, 0, 1, this.wipLevel.lastChange(0), t, old);
    this.wipLevel.set(0, count, t);
  }

  cycleSampled(station: number, seconds: number): void {
    this.cycleSum[station] += seconds;
    this.cycleCount[station]++;
  }

  operationDone(station: number, t: number): void {
    if (this.window.contains(t)) this.operations[station]++;
  }

  failure(station: number, t: number): void {
    if (this.window.contains(t)) this.failures[station]++;
  }

  transferMove(conn: number, t: number): void {
    if (this.window.contains(t)) this.transferMoves[conn]++;
  }

  loaded(t: number, loopSeconds: number): void {
    if (!this.window.contains(t)) return;
    this.loadedCount++;
    if (loopSeconds >= 0) this.loopTimes.add(loopSeconds);
  }

  output(t: number, leadSeconds: number): void {
    if (!this.window.contains(t)) return;
    this.outputCount++;
    this.leadTimes.add(leadSeconds);
    this.timesInLine.add(leadSeconds);
  }

  scrapped(t: number, inLineSeconds: number): void {
    if (!this.window.contains(t)) return;
    this.scrappedCount++;
    this.timesInLine.add(inLineSeconds);
  }

  reworked(t: number): void {
    if (this.window.contains(t)) this.reworkedCount++;
  }

  /** One snapshot sample of a carrier covering [tailMm, headMm] of a lane, for the space-time heatmap. */
  laneOccupancy(lane: number, tailMm: number, headMm: number, t: number): void {
    const bins = this.positionBins;
    const binMm = this.line.laneLengthMm[lane] / bins;
    const row = this.window.binOf(t) * bins;
    const heat = this.laneHeat[lane];
    const weight = 1 / (this.samplesPerBin * binMm);
    const first = Math.max(0, Math.floor(tailMm / binMm));
    const last = Math.min(bins - 1, Math.floor(headMm / binMm));
    for (let p = first; p <= last; p++) {
      const covered = Math.min(headMm, (p + 1) * binMm) - Math.max(tailMm, p * binMm);
      if (covered > 0) heat[row + p] += covered * weight;
    }
  }

  /** Closes every open interval at the end of the window. */
  finish(): void {
    const end = this.window.end;
    for (let s = 0; s < this.sState.length; s++) this.stationState(s, this.sState[s], end);
    for (let share = 0; share < CARRIER_SHARES; share++) this.shareChange(share, 0, end);
    for (let k = 0; k < this.tState.length; k++) this.transferState(k, this.tState[k], end);
    this.wip(this.wipLevel.current(0), end);
    this.bottleneck.finish(end);
  }
}
