// The result of one simulation experiment (all replications of one scenario revision under one set
// of run settings). The engine produces it, the client draws it, the server stores it. Arrays of
// numbers rather than objects per bin keep a stored result small whatever the run length.
import { z } from 'zod';
import { BREAK_MODES } from '../scenario/calendar';
import { runSettingsSchema } from '../scenario/run-settings';

/** Mean across replications with its two-sided 95 % Student t interval. */
export const intervalSchema = z.object({ mean: z.number(), ciLow: z.number(), ciHigh: z.number() });

export const STATION_STATES = ['processing', 'starved', 'blocked', 'down', 'onBreak'] as const;

export const stationResultSchema = z.object({
  id: z.string(),
  name: z.string(),
  stepId: z.string(),
  laneId: z.string(),
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
  id: z.string(),
  name: z.string(),
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
  id: z.string(),
  name: z.string(),
  lengthMm: z.number(),
  /** Carriers it holds when full (accumulated at length plus gap). */
  capacity: z.number(),
  meanCarriers: z.number(),
});

export const summaryQuantilesSchema = z.object({ mean: z.number(), p50: z.number(), p95: z.number() });

export const histogramSchema = z.object({
  /** Bin i covers [i × binWidthSeconds, (i + 1) × binWidthSeconds). */
  binWidthSeconds: z.number(),
  counts: z.array(z.number()),
});

export const timeSeriesSchema = z.object({
  startSeconds: z.number(),
  binSeconds: z.number(),
  /** Mean over each time bin. */
  values: z.array(z.number()),
});

export const laneHeatmapSchema = z.object({
  laneId: z.string(),
  positionBins: z.number().int(),
  /** Time bin major: occupancy[t * positionBins + p] is the share of the bin's length covered by carriers. */
  occupancy: z.array(z.number()),
});

export const stationTimelineSchema = z.object({
  stationId: z.string(),
  /** Time bin major: shares[t * STATION_STATES.length + s] is the share of bin t spent in state s. */
  shares: z.array(z.number()),
});

export const heatmapsSchema = z.object({
  startSeconds: z.number(),
  binSeconds: z.number(),
  timeBins: z.number().int(),
  lanes: z.array(laneHeatmapSchema),
  stationStates: z.array(z.enum(STATION_STATES)),
  stations: z.array(stationTimelineSchema),
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
  engineVersion: z.string(),
  seed: z.string(),
  settings: runSettingsSchema,
  scenarioName: z.string(),
  conveyor: z.enum(['carriers', 'belt']),
  observedHours: z.number(),
  throughputPerHour: intervalSchema,
  taktSeconds: intervalSchema,
  annualOutput: intervalSchema,
  targetTaktSeconds: z.number().nullable(),
  /** Scheduled working hours per year the annual output is based on. */
  hoursPerYear: z.number(),
  bottleneckStationId: z.string().nullable(),
  /**
   * A transfer that held the line more often than any station (busy most of the time and rarely
   * blocked), or null when a station did. Absent in results stored before engine 1.2.0.
   */
  bottleneckTransferId: z.string().nullable().default(null),
  /** How the calendar's breaks applied (see calendarSchema.breakMode). Absent before engine 1.2.0. */
  breakMode: z.enum(BREAK_MODES).default('manualStations'),
  /** Minutes of breaks in each shift (0: none). Absent before engine 1.2.0. */
  breakMinutesPerShift: z.number().optional(),
  stations: z.array(stationResultSchema),
  transfers: z.array(transferResultSchema),
  lanes: z.array(laneResultSchema),
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
  replications: z.array(replicationResultSchema),
});

export type Interval = z.infer<typeof intervalSchema>;
export type StationState = (typeof STATION_STATES)[number];
export type StationResult = z.infer<typeof stationResultSchema>;
export type TransferResult = z.infer<typeof transferResultSchema>;
export type LaneResult = z.infer<typeof laneResultSchema>;
export type CarrierResult = z.infer<typeof carrierResultSchema>;
export type ReplicationResult = z.infer<typeof replicationResultSchema>;
export type RunResult = z.infer<typeof runResultSchema>;

export type TransferShares = { carrying: number | null; returning: number | null; blocked: number; idle: number; busy: number };

/**
 * The four time shares of a transfer and its busy share. Results stored before engine 1.2.0 recorded
 * only utilisation (not idle) and blocked: idle and busy follow from those, carrying and returning
 * apart do not (null).
 */
export function transferShares(t: TransferResult): TransferShares {
  const idle = t.idle ?? 1 - t.utilisation;
  return { carrying: t.carrying ?? null, returning: t.returning ?? null, blocked: t.blocked, idle, busy: t.busy ?? t.utilisation - t.blocked };
}
