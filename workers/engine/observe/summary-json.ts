// A replication summary as plain JSON (typed arrays become number lists) and back, for storing the
// blocks of a study and merging them later with combineBlocks. Numbers keep six significant digits:
// far finer than any interval a study reports, and it makes stored summaries about a third as long.
import type { ReplicationSummaryJson } from '../../../shared/studies/replication-summary-json';
import type { ReplicationBlock } from '../experiment';
import type { ReplicationSummary } from './replication-summary';

const SIGNIFICANT = 6;

function compact(x: number): number {
  if (x === 0 || !Number.isFinite(x)) return Number.isFinite(x) ? x : 0;
  return Number(x.toPrecision(SIGNIFICANT));
}

const list = (a: ArrayLike<number>) => Array.from(a, compact);
const triple = (t: [number, number, number]): [number, number, number] => [compact(t[0]), compact(t[1]), compact(t[2])];
const f64 = (a: number[]) => Float64Array.from(a);

export function toSummaryJson(s: ReplicationSummary): ReplicationSummaryJson {
  return {
    output: s.output,
    scrapped: s.scrapped,
    loaded: s.loaded,
    reworked: s.reworked,
    throughputPerHour: s.throughputPerHour,
    departuresPerHour: s.departuresPerHour,
    taktSeconds: s.taktSeconds,
    stationShares: list(s.stationShares),
    sole: list(s.sole),
    shifting: list(s.shifting),
    meanCycle: list(s.meanCycle),
    operationsPerHour: list(s.operationsPerHour),
    failuresPerHour: list(s.failuresPerHour),
    stationQueue: list(s.stationQueue),
    transferShares: list(s.transferShares),
    transferSole: list(s.transferSole),
    transferShifting: list(s.transferShifting),
    transferQueue: list(s.transferQueue),
    transferMovesPerHour: list(s.transferMovesPerHour),
    laneMean: list(s.laneMean),
    carrierShares: list(s.carrierShares),
    loop: triple(s.loop),
    lead: triple(s.lead),
    timeInLine: triple(s.timeInLine),
    leadHistogram: { binWidth: s.leadHistogram.binWidth, counts: Array.from(s.leadHistogram.counts) },
    wipMean: s.wipMean,
    wipSeries: list(s.wipSeries),
    laneHeat: s.laneHeat.map(list),
    stationTimeline: list(s.stationTimeline),
  };
}

export function fromSummaryJson(j: ReplicationSummaryJson): ReplicationSummary {
  return {
    ...j,
    stationShares: f64(j.stationShares),
    sole: f64(j.sole),
    shifting: f64(j.shifting),
    meanCycle: f64(j.meanCycle),
    operationsPerHour: f64(j.operationsPerHour),
    failuresPerHour: f64(j.failuresPerHour),
    stationQueue: f64(j.stationQueue),
    transferShares: f64(j.transferShares),
    transferSole: f64(j.transferSole),
    transferShifting: f64(j.transferShifting),
    transferQueue: f64(j.transferQueue),
    transferMovesPerHour: f64(j.transferMovesPerHour),
    laneMean: f64(j.laneMean),
    carrierShares: f64(j.carrierShares),
    leadHistogram: { binWidth: j.leadHistogram.binWidth, counts: f64(j.leadHistogram.counts) },
    wipSeries: f64(j.wipSeries),
    laneHeat: j.laneHeat.map(f64),
    stationTimeline: f64(j.stationTimeline),
  };
}

export type ReplicationBlockJson = { first: number; summaries: ReplicationSummaryJson[]; events: number[] };

export const blockToJson = (b: ReplicationBlock): ReplicationBlockJson => ({
  first: b.first,
  summaries: b.summaries.map(toSummaryJson),
  events: b.events,
});
export const blockFromJson = (b: ReplicationBlockJson): ReplicationBlock => ({
  first: b.first,
  summaries: b.summaries.map(fromSummaryJson),
  events: b.events,
});
