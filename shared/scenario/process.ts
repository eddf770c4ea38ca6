// The process a part goes through, in order: load, process and inspect steps, unload. Each step is
// served by one or more stations at positions on lanes; a dispatch rule picks among them. "pooled"
// decides where the routes to the stations part, with the queues as they are then; the other rules
// fix the station when the carrier leaves the previous step.
import { z } from 'zod';
import { distributionSchema } from './distribution';
import { statedMean } from './distribution-parameters';
import { idSchema, labelSchema, nonNegative, share } from './units';

export const DISPATCH_RULES = ['pooled', 'firstFree', 'shortestQueue', 'roundRobin'] as const;
/** New steps, and documents written before the rule existed that leave it out, pool their stations. */
export const DEFAULT_DISPATCH = 'pooled' satisfies (typeof DISPATCH_RULES)[number];
export const STEP_KINDS = ['load', 'process', 'inspect', 'unload'] as const;
export const STATION_OPERATIONS = ['automatic', 'manual'] as const;

/** A station that fails after less than this much work on average is a typing mistake (our choice). */
export const PROCESS_LIMITS = {
  stepsMax: 200,
  stationsPerStepMax: 100,
  /** Stations of the whole line, all steps together. */
  stationsMax: 500,
  /** Measured times in empirical distributions of the whole line, all stations together. */
  empiricalSamplesTotalMax: 200_000,
} as const;

export const FAILURE_LIMITS = { meanTimeBetweenFailuresMinSeconds: 1 } as const;

export const failureSchema = z.object({
  /** Operating (processing) time between the end of one repair and the next failure. */
  timeBetweenFailuresSeconds: distributionSchema.refine(
    // The mean as stated (a normal's own mean, before truncation at min lifts it slightly): this guards
    // against typing minutes or hours where seconds belong.
    (d) => statedMean(d) >= FAILURE_LIMITS.meanTimeBetweenFailuresMinSeconds,
    `the mean time between failures must be at least ${FAILURE_LIMITS.meanTimeBetweenFailuresMinSeconds} s of work; check that it is in seconds`,
  ),
  timeToRepairSeconds: distributionSchema,
});

export const stationSchema = z.object({
  id: idSchema,
  name: labelSchema,
  laneId: idSchema,
  /** Where the carrier's front stops for work, measured from the lane's start along its direction. */
  positionMm: nonNegative('positionMm'),
  cycleTimeSeconds: distributionSchema,
  failures: failureSchema.optional(),
  operation: z
    .enum(STATION_OPERATIONS, { error: `operation must be one of ${STATION_OPERATIONS.join(', ')}` })
    .default('automatic'),
  /** A manual station whose operators take the calendar's breaks does no work during them. */
  pausesForBreaks: z.boolean({ error: 'pausesForBreaks must be true or false' }).default(false),
});

const stepBase = {
  id: idSchema,
  name: labelSchema,
  stations: z
    .array(stationSchema, { error: 'stations must be a list' })
    .max(PROCESS_LIMITS.stationsPerStepMax, `a step may have at most ${PROCESS_LIMITS.stationsPerStepMax} stations`),
  dispatch: z
    .enum(DISPATCH_RULES, { error: `dispatch must be one of ${DISPATCH_RULES.join(', ')}` })
    .default(DEFAULT_DISPATCH),
};

export const loadStepSchema = z.object({ ...stepBase, kind: z.literal('load') });
export const processStepSchema = z.object({ ...stepBase, kind: z.literal('process') });
export const unloadStepSchema = z.object({ ...stepBase, kind: z.literal('unload') });
export const inspectStepSchema = z.object({
  ...stepBase,
  kind: z.literal('inspect'),
  /** Share of inspected parts scrapped here; the carrier goes on empty to be loaded again. */
  rejectShare: share('rejectShare').default(0),
  /** Share of inspected parts sent back to reworkStepId, which is then done again with every step after it. */
  reworkShare: share('reworkShare').default(0),
  reworkStepId: idSchema.optional(),
});

export const stepSchema = z.discriminatedUnion(
  'kind',
  [loadStepSchema, processStepSchema, inspectStepSchema, unloadStepSchema],
  {
    error: `kind must be one of ${STEP_KINDS.join(', ')}`,
  },
);

export type DispatchRule = (typeof DISPATCH_RULES)[number];
export type StepKind = (typeof STEP_KINDS)[number];
export type Failure = z.infer<typeof failureSchema>;
export type Station = z.infer<typeof stationSchema>;
export type Step = z.infer<typeof stepSchema>;
export type InspectStep = z.infer<typeof inspectStepSchema>;
