// Reads one finished replication's recorder into plain numbers (shares, rates, series) ready to be
// averaged across replications. Shares are of the observation window (warm-up excluded).
import type { CompiledLine } from '../model/compile';
import type { StreamingHistogram } from '../stats/histogram';
import { CARRIER_SHARES, type Recorder } from './recorder';

export type ReplicationSummary = {
  output: number;
  scrapped: number;
  loaded: number;
  reworked: number;
  throughputPerHour: number;
  /** Output and scrapped parts per hour: the departure rate that goes with WIP in Little's law. */
  departuresPerHour: number;
  taktSeconds: number;
  stationShares: Float64Array;
  sole: Float64Array;
  shifting: Float64Array;
  meanCycle: Float64Array;
  operationsPerHour: Float64Array;
  failuresPerHour: Float64Array;
  stationQueue: Float64Array;
  /** Per connection, shares of time in each transfer state (TR_* order), connection-major. */
  transferShares: Float64Array;
  transferSole: Float64Array;
  transferShifting: Float64Array;
  transferQueue: Float64Array;
  transferMovesPerHour: Float64Array;
  laneMean: Float64Array;
  carrierShares: Float64Array;
  loop: [number, number, number];
  lead: [number, number, number];
  timeInLine: [number, number, number];
  leadHistogram: { binWidth: number; counts: Float64Array };
  wipMean: number;
  wipSeries: Float64Array;
  laneHeat: Float64Array[];
  stationTimeline: Float64Array;
};

const orZero = (x: number) => (Number.isFinite(x) ? x : 0);
const quantiles = (h: StreamingHistogram): [number, number, number] => [orZero(h.mean), orZero(h.p50), orZero(h.p95)];

export function summarizeReplication(line: CompiledLine, r: Recorder): ReplicationSummary {
  const w = r.window;
  const seconds = w.length;
  const hours = seconds / 3600;
  const S = line.stationCount;
  const C = line.connCount;
  const perHour = (x: number) => x / hours;
  const stationShares = r.stationTime.map((x) => x / seconds);
  const carrierTotal = seconds * line.carrierCount;
  const timeline = r.stationTimeline.map((x) => x / w.binSeconds);
  return {
    output: r.outputCount,
    scrapped: r.scrappedCount,
    loaded: r.loadedCount,
    reworked: r.reworkedCount,
    throughputPerHour: perHour(r.outputCount),
    departuresPerHour: perHour(r.outputCount + r.scrappedCount),
    taktSeconds: r.outputCount > 0 ? seconds / r.outputCount : seconds,
    stationShares,
    sole: r.bottleneck.sole.slice(0, S).map((x) => x / seconds),
    shifting: r.bottleneck.shifting.slice(0, S).map((x) => x / seconds),
    meanCycle: Float64Array.from({ length: S }, (_, s) => (r.cycleCount[s] > 0 ? r.cycleSum[s] / r.cycleCount[s] : 0)),
    operationsPerHour: r.operations.map(perHour),
    failuresPerHour: r.failures.map(perHour),
    stationQueue: Float64Array.from({ length: S }, (_, s) => r.stationAssignedLevels.mean(s)),
    transferShares: r.transferTime.map((x) => x / seconds),
    transferSole: r.bottleneck.sole.slice(S, S + C).map((x) => x / seconds),
    transferShifting: r.bottleneck.shifting.slice(S, S + C).map((x) => x / seconds),
    transferQueue: Float64Array.from({ length: C }, (_, k) => r.transferQueueLevels.mean(k)),
    transferMovesPerHour: r.transferMoves.map(perHour),
    laneMean: Float64Array.from({ length: line.laneCount }, (_, l) => r.laneLevels.mean(l)),
    carrierShares: Float64Array.from({ length: CARRIER_SHARES }, (_, i) => r.carrierTime[i] / carrierTotal),
    loop: quantiles(r.loopTimes),
    lead: quantiles(r.leadTimes),
    timeInLine: quantiles(r.timesInLine),
    leadHistogram: r.leadTimes.snapshot(),
    wipMean: r.wipLevel.mean(0),
    wipSeries: r.wipSeries.map((x) => x / w.binSeconds),
    laneHeat: r.laneHeat,
    stationTimeline: timeline,
  };
}
