// The result of one simulation experiment (all replications of one scenario revision under one set
// of run settings). The engine produces it, the client draws it, the server stores it. Arrays of
// numbers rather than objects per bin keep a stored result small whatever the run length.
import { z } from 'zod';
import { BREAK_MODES } from '../scenario/calendar';
import { PROCESS_LIMITS } from '../scenario/process';
import { RUN_LIMITS, runSettingsSchema } from '../scenario/run-settings';
import { TRACK_LIMITS } from '../scenario/track';

/**
 * Sizes a stored result may have, so a posted result cannot be made arbitrarily large. The engine writes
 * 96 time bins × 48 position bins per lane heatmap and fewer numbers everywhere else.
 */
export const RESULT_LIMITS = {
  textMax: 200,
  engineVersionMax: 40,
  numbersPerSeriesMax: 50_000,
} as const;

const text = () => z.string().max(RESULT_LIMITS.textMax, `must be at most ${RESULT_LIMITS.textMax} characters`);
const series = () =>
  z
    .array(z.number())
    .max(RESULT_LIMITS.numbersPerSeriesMax, `may hold at most ${RESULT_LIMITS.numbersPerSeriesMax} numbers`);
const listOf = <T extends z.ZodType>(item: T, max: number) => z.array(item).max(max, `may hold at most ${max} entries`);

/** Mean across replications with its two-sided 95 % Student t interval. */
export const intervalSchema = z.object({ mean: z.number(), ciLow: z.number(), ciHigh: z.number() });

export const STATION_STATES = ['processing', 'starved', 'blocked', 'down', 'onBreak'] as const;

export const stationResultSchema = z.object({
  id: text(),
  name: text(),
  stepId: text(),
  laneId: text(),
  /** Shares of observed time; the five add up to 1. */
  processing: z.number(),
  starved: z.number(),
  blocked: z.number(),
  down: z.number(),
  onBreak: z.number(),
  /** Share of time this station was the momentary bottleneck (sole + shifting). */
  bottleneckShare: z.number(),
  soleBottleneckShare: z.number(),
  shiftingBottleneckShare: z.number(),
  /** Mean of the sampled cycle times (work content, without waiting or repairs). */
  meanCycleSeconds: z.number(),
  /** Completed operations per hour of observed time. */
  operationsPerHour: z.number(),
  failuresPerHour: z.number(),
  /** Time-average number of carriers assigned to the station: at it or on their way. */
  meanQueue: z.number(),
});

export const transferResultSchema = z.object({
  id: text(),
  name: text(),
  kind: z.enum(['elevator', 'lateral', 'curve']),
  /** Share of time not idle: carrying, blocked or returning. Not a measure of work: see `busy`. */
  utilisation: z.number(),
  /** Share of time holding a carrier the destination lane has no room for. */
  blocked: z.number(),
  // The next four shares (with `blocked` they add up to 1) and the bottleneck share came with engine
  // 1.2.0; results stored before it lack them, and transferShares() derives what it can.
  /** Share of time carrying a carrier, from taking it in until it could be handed over. */
  carrying: z.number().optional(),
  /** Share of time travelling back empty after handing over (elevators and lateral transfers). */
  returning: z.number().optional(),
  /** Share of time waiting for a carrier. */
  idle: z.number().optional(),
  /** carrying + returning: the share of time the transfer works. */
  busy: z.number().optional(),
  /** Share of time this transfer was the momentary bottleneck (active-period method, as for stations). */
  bottleneckShare: z.number().optional(),
  /** Time-average number of carriers waiting on the feeding lane whose next hop is this transfer. */
  meanQueue: z.number(),
  movesPerHour: z.number(),
});

export const laneResultSchema = z.object({
  id: text(),
  name: text(),
  lengthMm: z.number(),
  /** Carriers it holds when full (accumulated at length plus gap). */
  capacity: z.number(),
  meanCarriers: z.number(),
});

export const summaryQuantilesSchema = z.object({ mean: z.number(), p50: z.number(), p95: z.number() });

export const histogramSchema = z.object({
  /** Bin i covers [i × binWidthSeconds, (i + 1) × binWidthSeconds). */
  binWidthSeconds: z.number(),
  counts: series(),
});

export const timeSeriesSchema = z.object({
  startSeconds: z.number(),
  binSeconds: z.number(),
  /** Mean over each time bin. */
  values: series(),
});

export const laneHeatmapSchema = z.object({
  laneId: text(),
  positionBins: z.number().int(),
  /** Time bin major: occupancy[t * positionBins + p] is the share of the bin's length covered by carriers. */
  occupancy: series(),
});

export const stationTimelineSchema = z.object({
  stationId: text(),
  /** Time bin major: shares[t * STATION_STATES.length + s] is the share of bin t spent in state s. */
  shares: series(),
});

export const heatmapsSchema = z.object({
  startSeconds: z.number(),
  binSeconds: z.number(),
  timeBins: z.number().int(),
  lanes: listOf(laneHeatmapSchema, TRACK_LIMITS.lanesMax),
  stationStates: listOf(z.enum(STATION_STATES), STATION_STATES.length),
  stations: listOf(stationTimelineSchema, PROCESS_LIMITS.stationsMax),
});

export const carrierResultSchema = z.object({
  count: z.number().int(),
  /** Time from one load completion to the next on the same carrier. */
  loopTimeSeconds: summaryQuantilesSchema,
  /** Shares of carrier time; the four add up to 1. */
  moving: z.number(),
  waiting: z.number(),
  working: z.number(),
  inTransfer: z.number(),
});

export const replicationResultSchema = z.object({
  replication: z.number().int(),
  throughputPerHour: z.number(),
  taktSeconds: z.number(),
  output: z.number(),
  scrapped: z.number(),
  /** Output parts only (load to unload), as `leadTimeSeconds`. */
  leadTimeMeanSeconds: z.number(),
  /** Output and scrapped parts per hour of observed time. */
  departuresPerHour: z.number(),
  /** Mean time from load to leaving (unload or scrap) over every part that left. */
  timeInLineMeanSeconds: z.number(),
  wipMean: z.number(),
  events: z.number(),
});

export const runResultSchema = z.object({
  engineVersion: z
    .string()
    .max(RESULT_LIMITS.engineVersionMax, `must be at most ${RESULT_LIMITS.engineVersionMax} characters`),
  seed: z.string().max(RUN_LIMITS.seedMaxLength, `must be at most ${RUN_LIMITS.seedMaxLength} characters`),
  settings: runSettingsSchema,
  scenarioName: text(),
  conveyor: z.enum(['carriers', 'belt']),
  observedHours: z.number(),
  throughputPerHour: intervalSchema,
  taktSeconds: intervalSchema,
  annualOutput: intervalSchema,
  targetTaktSeconds: z.number().nullable(),
  /** Scheduled working hours per year the annual output is based on. */
  hoursPerYear: z.number(),
  bottleneckStationId: text().nullable(),
  stations: listOf(stationResultSchema, PROCESS_LIMITS.stationsMax),
  transfers: listOf(transferResultSchema, TRACK_LIMITS.transfersMax),
  lanes: listOf(laneResultSchema, TRACK_LIMITS.lanesMax),
  /**
   * A transfer that held the line more often than any station (busy most of the time and rarely
   * blocked), or null when a station did. Absent in results stored before engine 1.2.0.
   */
  bottleneckTransferId: z.string().nullable().default(null),
  /** How the calendar's breaks applied (see calendarSchema.breakMode). Absent before engine 1.2.0. */
  breakMode: z.enum(BREAK_MODES).default('manualStations'),
  /** Minutes of breaks in each shift (0: none). Absent before engine 1.2.0. */
  breakMinutesPerShift: z.number().optional(),
  carriers: carrierResultSchema,
  /** Load completion to unload, over output parts only; scrapped parts are not in it. */
  leadTimeSeconds: summaryQuantilesSchema.extend({ histogram: histogramSchema }),
  /**
   * Load completion to leaving the line, over every part that left in the window: output (at unload)
   * and scrapped (at the inspection that rejected it). With `departuresPerHour` and `wip.mean` it
   * satisfies Little's law, WIP = departure rate × mean time in line; lead time × throughput does
   * not when parts are scrapped.
   */
  timeInLineSeconds: summaryQuantilesSchema,
  /** Output plus scrapped parts per hour of observed time (throughput counts output only). */
  departuresPerHour: intervalSchema,
  /** Time-average parts in line: from load completion until unload or scrap. */
  wip: z.object({ mean: z.number(), series: timeSeriesSchema }),
  parts: z.object({ loaded: z.number(), output: z.number(), scrapped: z.number(), reworked: z.number() }),
  heatmaps: heatmapsSchema,
  /** Events processed, all replications together. */
  events: z.number(),
  replications: listOf(replicationResultSchema, RUN_LIMITS.replicationsMax),
});

export type Interval = z.infer<typeof intervalSchema>;
export type StationState = (typeof STATION_STATES)[number];
export type StationResult = z.infer<typeof stationResultSchema>;
export type TransferResult = z.infer<typeof transferResultSchema>;
export type LaneResult = z.infer<typeof laneResultSchema>;
export type CarrierResult = z.infer<typeof carrierResultSchema>;
export type ReplicationResult = z.infer<typeof replicationResultSchema>;
export type RunResult = z.infer<typeof runResultSchema>;

export type TransferShares = {
  carrying: number | null;
  returning: number | null;
  blocked: number;
  idle: number;
  busy: number;
};

/**
 * The four time shares of a transfer and its busy share. Results stored before engine 1.2.0 recorded
 * only utilisation (not idle) and blocked: idle and busy follow from those, carrying and returning
 * apart do not (null).
 */
export function transferShares(t: TransferResult): TransferShares {
  const idle = t.idle ?? 1 - t.utilisation;
  return {
    carrying: t.carrying ?? null,
    returning: t.returning ?? null,
    blocked: t.blocked,
    idle,
    busy: t.busy ?? t.utilisation - t.blocked,
  };
}
