// The engine's summary of one finished replication as it crosses the network and sits in the database:
// typed arrays become plain number lists, so blocks read back from storage merge with the engine's
// combineBlocks into the run result of the whole experiment.
//
// The time series behind the heatmaps (WIP over time, lane occupancy, station states over time) are
// nearly the whole of a summary, and a result only ever shows their mean over the replications. So a
// block of replications carries them once, as the block's mean (BlockSeriesJson), and its replication
// summaries leave them out: a study job's result is about a ninth of the size it would be otherwise.
// Summaries stored before carry their own series, and still merge.
import { z } from 'zod';

/** Bounds that hold for any scenario the schema allows (stations, transfers, lanes, result bins). */
export const SUMMARY_LIMITS = {
  perStation: 40_000,
  perTransfer: 400,
  perLane: 200,
  seriesMax: 5_000,
  histogramBins: 1_000,
  timelineMax: 4_000_000,
  heatMax: 100_000,
} as const;

const finite = z.number({ error: 'must be a finite number' });
const list = (max: number) =>
  z.array(finite, { error: 'must be a list of numbers' }).max(max, `must hold at most ${max} numbers`);

const triple = z.tuple([finite, finite, finite], { error: 'must be three numbers (mean, median, 95th percentile)' });

/** The mean over a block's replications of the series its summaries leave out. */
export const blockSeriesJsonSchema = z.object({
  wipSeries: list(SUMMARY_LIMITS.seriesMax),
  laneHeat: z.array(list(SUMMARY_LIMITS.heatMax)).max(SUMMARY_LIMITS.perLane),
  stationTimeline: list(SUMMARY_LIMITS.timelineMax),
});

export const replicationSummaryJsonSchema = z.object({
  output: finite,
  scrapped: finite,
  loaded: finite,
  reworked: finite,
  throughputPerHour: finite,
  departuresPerHour: finite,
  taktSeconds: finite,
  stationShares: list(SUMMARY_LIMITS.perStation * 8),
  sole: list(SUMMARY_LIMITS.perStation),
  shifting: list(SUMMARY_LIMITS.perStation),
  meanCycle: list(SUMMARY_LIMITS.perStation),
  operationsPerHour: list(SUMMARY_LIMITS.perStation),
  failuresPerHour: list(SUMMARY_LIMITS.perStation),
  stationQueue: list(SUMMARY_LIMITS.perStation),
  /** Per connection, shares of time in each transfer state, connection-major. */
  transferShares: list(SUMMARY_LIMITS.perTransfer * 8),
  transferSole: list(SUMMARY_LIMITS.perTransfer),
  transferShifting: list(SUMMARY_LIMITS.perTransfer),
  transferQueue: list(SUMMARY_LIMITS.perTransfer),
  transferMovesPerHour: list(SUMMARY_LIMITS.perTransfer),
  laneMean: list(SUMMARY_LIMITS.perLane),
  carrierShares: list(64),
  loop: triple,
  lead: triple,
  timeInLine: triple,
  leadHistogram: z.object({ binWidth: finite, counts: list(SUMMARY_LIMITS.histogramBins) }),
  wipMean: finite,
  ...blockSeriesJsonSchema.partial().shape,
});

export type ReplicationSummaryJson = z.infer<typeof replicationSummaryJsonSchema>;

export type BlockSeriesJson = z.infer<typeof blockSeriesJsonSchema>;

export const SERIES_KEYS = ['wipSeries', 'laneHeat', 'stationTimeline'] as const;

/** Whether every summary of a block carries its own series (the form stored before blocks carried them once). */
export const summariesCarrySeries = (summaries: readonly ReplicationSummaryJson[]) =>
  summaries.every((s) => SERIES_KEYS.every((key) => s[key] !== undefined));

/** The few figures of one replication that study charts and decisions read; derived from the summary. */
export const replicationFiguresSchema = z.object({
  throughputPerHour: finite,
  wipMean: finite,
  leadMeanSeconds: finite,
  /** Share of the observed time each station (in scenario order) was the sole bottleneck. */
  bottleneckShares: list(SUMMARY_LIMITS.perStation),
});

export type ReplicationFigures = z.infer<typeof replicationFiguresSchema>;

export function figuresOf(summary: ReplicationSummaryJson): ReplicationFigures {
  return {
    throughputPerHour: summary.throughputPerHour,
    wipMean: summary.wipMean,
    leadMeanSeconds: summary.lead[0],
    bottleneckShares: summary.sole.map((s, i) => s + (summary.shifting[i] ?? 0)),
  };
}
