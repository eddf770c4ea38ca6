// Stored simulation runs. The browser runs the engine and posts the result;
// the server keeps it tied to the exact revision it was computed from.
import { z } from 'zod';
import { runResultSchema, type RunResult } from '../results/run-result';
import { runSettingsSchema } from '../scenario/run-settings';
import { isoDateSchema, nameSchema, queryIntSchema, queryNumberSchema, userRefSchema, uuidSchema } from './common';
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

/** The most runs one page holds; the table asks for 25 by default. */
export const RUNS_PAGE_MAX = 100;
/** Deeper than any run history we expect; bounds the rows PostgreSQL skips for one request. */
export const RUNS_OFFSET_MAX = 100_000;
/** Stands for runs whose author's account was deleted, in the author filter. */
export const FORMER_MEMBER = 'former';

/** The columns the runs table sorts by; the server orders by the same, then by id, so pages never overlap. */
export const runSortSchema = z.enum(
  ['name', 'scenario', 'revision', 'author', 'createdAt', 'throughput', 'takt', 'carriers'],
  {
    message: 'must be one of name, scenario, revision, author, createdAt, throughput, takt, carriers',
  },
);

const authorFilterMessage = `must be a user id or "${FORMER_MEMBER}"`;

export const listRunsQuerySchema = z.object({
  revisionId: uuidSchema.optional(),
  createdBy: z
    .string({ message: authorFilterMessage })
    .refine((value) => value === FORMER_MEMBER || uuidSchema.safeParse(value).success, { message: authorFilterMessage })
    .optional(),
  revision: queryIntSchema(1, 2_147_483_647).optional(),
  carriers: queryIntSchema(0, 2_147_483_647).optional(),
  /** Runs made at or after this instant (the table sends the start of a day in the user's time zone). */
  since: z.iso.datetime({ offset: true, message: 'must be a date and time (ISO 8601, with a zone)' }).optional(),
  minThroughput: queryNumberSchema(0, 1e9).optional(),
  maxTakt: queryNumberSchema(0, 1e9).optional(),
  sort: runSortSchema.default('createdAt'),
  order: z.enum(['asc', 'desc'], { message: 'must be asc or desc' }).default('desc'),
  limit: queryIntSchema(1, RUNS_PAGE_MAX).default(25),
  offset: queryIntSchema(0, RUNS_OFFSET_MAX).default(0),
});

/** What the filter menus offer: the values the whole list (not just this page) holds. */
export const runFilterChoicesSchema = z.object({
  /** `id` null: runs by a member whose account is gone. */
  authors: z.array(z.object({ id: uuidSchema.nullable(), name: z.string() })),
  revisions: z.array(z.number().int()),
  carriers: z.array(z.number().int()),
});

export const runsPageSchema = z.object({
  items: z.array(runListItemSchema),
  /** Runs matching the filters, over every page. */
  total: z.number().int().nonnegative(),
  offset: z.number().int().nonnegative(),
  limit: z.number().int().positive(),
  choices: runFilterChoicesSchema,
});

export type RunSummary = z.infer<typeof runSummarySchema>;
export type RunListItem = z.infer<typeof runListItemSchema>;
export type RunDetail = z.infer<typeof runDetailSchema>;
export type RunSort = z.infer<typeof runSortSchema>;
/** The parsed query; the client sends any subset of it (the rest take their defaults). */
export type ListRunsQuery = z.infer<typeof listRunsQuerySchema>;
export type RunsPage = z.infer<typeof runsPageSchema>;
export type RunFilterChoices = z.infer<typeof runFilterChoicesSchema>;
export type CreateRunInput = z.infer<typeof createRunSchema>;
