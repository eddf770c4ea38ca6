// Stored simulation runs. The browser runs the engine and posts the result;
// the server keeps it tied to the exact revision it was computed from.
import { z } from 'zod';
import { runResultSchema, type RunResult } from '../results/run-result';
import { runSettingsSchema } from '../scenario/run-settings';
import { isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';
import { conveyorModeSchema } from './scenarios';

const intervalSchema = z.object({ mean: z.number(), ciLow: z.number(), ciHigh: z.number() });

/** Headline numbers kept in plain columns so run lists sort and filter without reading results. */
export const runSummarySchema = z.object({
  throughputPerHour: intervalSchema,
  taktSeconds: intervalSchema,
  annualOutput: intervalSchema,
  carriers: z.number().int().nonnegative(),
  bottleneckStationId: z.string().nullable(),
});

/** The headline block of a result, as stored beside a run and shown in run lists. */
export function runSummaryOf(result: RunResult): RunSummary {
  return {
    throughputPerHour: result.throughputPerHour,
    taktSeconds: result.taktSeconds,
    annualOutput: result.annualOutput,
    carriers: result.carriers.count,
    bottleneckStationId: result.bottleneckStationId,
  };
}

export const runListItemSchema = z.object({
  id: uuidSchema,
  scenarioId: uuidSchema,
  scenarioName: z.string(),
  revisionId: uuidSchema,
  revisionNumber: z.number().int().positive(),
  /** The run's revision's conveyor mode, so run lists can mark belt baseline runs. */
  conveyorMode: conveyorModeSchema,
  name: z.string(),
  seed: z.string(),
  engineVersion: z.string(),
  settings: runSettingsSchema,
  summary: runSummarySchema,
  /** True when the server computed the result itself; false for results a browser posted. */
  serverChecked: z.boolean(),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
});

export const runDetailSchema = runListItemSchema.extend({
  results: runResultSchema,
});

export const createRunSchema = z.object({
  /** Chosen by the client before the first attempt so a retried save never makes a second run. */
  clientRunId: uuidSchema,
  revisionId: uuidSchema,
  name: nameSchema.optional(),
  settings: runSettingsSchema,
  results: runResultSchema,
});

export const updateRunSchema = z.object({ name: nameSchema });

export const listRunsQuerySchema = z.object({
  revisionId: uuidSchema.optional(),
  createdBy: uuidSchema.optional(),
});

export type RunSummary = z.infer<typeof runSummarySchema>;
export type RunListItem = z.infer<typeof runListItemSchema>;
export type RunDetail = z.infer<typeof runDetailSchema>;
export type CreateRunInput = z.infer<typeof createRunSchema>;
