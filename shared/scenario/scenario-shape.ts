// The fields of a scenario document, before the checks across fields (references.ts) are applied.
import { z } from 'zod';
import { calendarSchema } from './calendar';
import { carriersSchema, conveyorSchema } from './carriers';
import { PROCESS_LIMITS, stepSchema } from './process';
import { deckSchema, laneSchema, linkSchema, TRACK_LIMITS, trackSchema, transferSchema } from './track';
import { positive } from './units';

export const SCENARIO_SCHEMA_VERSION = 1;

export const scenarioShapeSchema = z.object({
  schemaVersion: z.literal(SCENARIO_SCHEMA_VERSION, { error: `schemaVersion must be ${SCENARIO_SCHEMA_VERSION}` }),
  name: z
    .string({ error: 'name must be text' })
    .trim()
    .min(1, 'name is required')
    .max(120, 'name must be at most 120 characters'),
  description: z
    .string({ error: 'description must be text' })
    .max(2000, 'description must be at most 2000 characters')
    .default(''),
  track: trackSchema,
  decks: z
    .array(deckSchema, { error: 'decks must be a list' })
    .min(1, 'at least one deck is needed')
    .max(TRACK_LIMITS.decksMax),
  lanes: z
    .array(laneSchema, { error: 'lanes must be a list' })
    .min(1, 'at least one lane is needed')
    .max(TRACK_LIMITS.lanesMax),
  links: z.array(linkSchema, { error: 'links must be a list' }).max(TRACK_LIMITS.transfersMax).default([]),
  transfers: z.array(transferSchema, { error: 'transfers must be a list' }).max(TRACK_LIMITS.transfersMax).default([]),
  carriers: carriersSchema,
  /** In order; the first is the load step, the last the unload step. */
  steps: z
    .array(stepSchema, { error: 'steps must be a list' })
    .min(2, 'at least a load and an unload step are needed')
    .max(PROCESS_LIMITS.stepsMax, `at most ${PROCESS_LIMITS.stepsMax} steps`),
  calendar: calendarSchema,
  /** The takt the sales plan needs, for comparison with the achieved takt. */
  targetTaktSeconds: positive('targetTaktSeconds').optional(),
  conveyor: conveyorSchema.default({ kind: 'carriers' }),
});

export type ScenarioShape = z.infer<typeof scenarioShapeSchema>;
