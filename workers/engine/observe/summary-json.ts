// A block of replication summaries as plain JSON (typed arrays become number lists) and back, for
// storing the blocks of a study and merging them later with combineBlocks. Numbers keep six
// significant digits: far finer than any interval a study reports, and it makes stored summaries
// about a third as long. The heatmap series travel once per block, as the block's mean (see
// shared/studies/replication-summary-json.ts); reading a block back gives every replication that
// mean, so the mean over all replications is what it would have been.
import type { BlockSeriesJson, ReplicationSummaryJson } from '../../../shared/studies/replication-summary-json';
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

/** A replication's summary without its series (they travel once per block). */
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
  };
}

/** Element-wise mean of equally long series. */
function meanOf(series: ArrayLike<number>[]): number[] {
  const out = new Array<number>(series[0].length).fill(0);
  for (const a of series) for (let i = 0; i < out.length; i++) out[i] += a[i];
  return out.map((x) => compact(x / series.length));
}

function blockSeries(summaries: ReplicationSummary[]): BlockSeriesJson {
  return {
    wipSeries: meanOf(summaries.map((s) => s.wipSeries)),
    laneHeat: summaries[0].laneHeat.map((_, lane) => meanOf(summaries.map((s) => s.laneHeat[lane]))),
    stationTimeline: meanOf(summaries.map((s) => s.stationTimeline)),
  };
}

/** A summary read back; its series are its own when stored with it (the older form), else its block's. */
export function fromSummaryJson(j: ReplicationSummaryJson, block?: BlockSeriesJson): ReplicationSummary {
  const series = j.wipSeries && j.laneHeat && j.stationTimeline ? (j as BlockSeriesJson) : block;
  if (!series) throw new Error('a replication summary without series needs its block series');
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
    wipSeries: f64(series.wipSeries),
    laneHeat: series.laneHeat.map(f64),
    stationTimeline: f64(series.stationTimeline),
  };
}

/** `series` is absent only in blocks stored before blocks carried their series once. */
export type ReplicationBlockJson = {
  first: number;
  summaries: ReplicationSummaryJson[];
  events: number[];
  series?: BlockSeriesJson;
};

export const blockToJson = (b: ReplicationBlock): ReplicationBlockJson => ({
  first: b.first,
  summaries: b.summaries.map(toSummaryJson),
  events: b.events,
  series: blockSeries(b.summaries),
});

export const blockFromJson = (b: ReplicationBlockJson): ReplicationBlock => ({
  first: b.first,
  summaries: b.summaries.map((s) => fromSummaryJson(s, b.series)),
  events: b.events,
});
