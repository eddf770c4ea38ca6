// A comparison of stored runs, kept only so it can be shared: the set of runs, in the order shown.
import { z } from 'zod';
import { isoDateSchema, uuidSchema } from './common';

export const COMPARISON_RUNS = { min: 2, max: 4 } as const;

export const createComparisonSchema = z.object({
  runIds: z
    .array(uuidSchema)
    .min(COMPARISON_RUNS.min, { message: `must name at least ${COMPARISON_RUNS.min} runs` })
    .max(COMPARISON_RUNS.max, { message: `must name at most ${COMPARISON_RUNS.max} runs` })
    .refine((ids) => new Set(ids).size === ids.length, { message: 'must not name a run twice' }),
});

export const comparisonSchema = z.object({
  id: uuidSchema,
  organisationId: uuidSchema,
  runIds: z.array(uuidSchema),
  createdAt: isoDateSchema,
});

export type CreateComparisonInput = z.input<typeof createComparisonSchema>;
export type Comparison = z.infer<typeof comparisonSchema>;
