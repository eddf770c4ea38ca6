// Scenarios and their immutable revisions. Every save makes a new revision;
// a scenario points at its latest one.
import { z } from 'zod';
import { scenarioSchema } from '../scenario/scenario';
import { descriptionSchema, isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';

/** Whether a revision models independent carriers or the belt conveyor baseline (`conveyor.kind`). */
export const conveyorModeSchema = z.enum(['carriers', 'belt']);

export const revisionSummarySchema = z.object({
  id: uuidSchema,
  scenarioId: uuidSchema,
  number: z.number().int().positive(),
  message: z.string(),
  conveyorMode: conveyorModeSchema,
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
});

export const revisionSchema = revisionSummarySchema.extend({
  document: scenarioSchema,
});

export const scenarioSummarySchema = z.object({
  id: uuidSchema,
  projectId: uuidSchema,
  name: z.string(),
  description: z.string(),
  latestRevision: revisionSummarySchema,
  runCount: z.number().int().nonnegative(),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
});

export const scenarioDetailSchema = scenarioSummarySchema.extend({
  document: scenarioSchema,
});

export const createScenarioSchema = z.object({
  name: nameSchema,
  description: descriptionSchema.optional(),
  document: scenarioSchema,
  /** Chosen by the client before the first attempt, so a retried create returns the first scenario (200). */
  clientId: uuidSchema.optional(),
});

export const updateScenarioSchema = z
  .object({ name: nameSchema, description: descriptionSchema })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'nothing to change: send name or description' });

export const REVISION_MESSAGE_MAX = 500;

/** Revision numbers are stored as PostgreSQL integers, so the largest is 2^31 - 1. */
export const revisionNumberSchema = z
  .number({ message: 'must be a revision number' })
  .int({ message: 'must be a whole number' })
  .positive({ message: 'must be 1 or more' })
  .max(2_147_483_647, { message: 'must be at most 2147483647' });

export const createRevisionSchema = z.object({
  document: scenarioSchema,
  message: z
    .string()
    .max(REVISION_MESSAGE_MAX, { message: `must be at most ${REVISION_MESSAGE_MAX} characters` })
    .optional(),
  /** The revision number the editor started from; a mismatch answers 409 so no edit is silently lost. */
  baseRevisionNumber: revisionNumberSchema.optional(),
});

export const revisionParamsSchema = z.object({
  id: uuidSchema,
  number: z.coerce.number({ message: 'must be a revision number' }).pipe(revisionNumberSchema),
});

export type ConveyorMode = z.infer<typeof conveyorModeSchema>;
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;
export type Revision = z.infer<typeof revisionSchema>;
export type ScenarioSummary = z.infer<typeof scenarioSummarySchema>;
export type ScenarioDetail = z.infer<typeof scenarioDetailSchema>;
export type CreateScenarioInput = z.infer<typeof createScenarioSchema>;
export type CreateRevisionInput = z.infer<typeof createRevisionSchema>;
