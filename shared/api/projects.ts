// Projects group the scenarios of one line-design job inside an organisation.
import { z } from 'zod';
import { descriptionSchema, isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';

export const projectSchema = z.object({
  id: uuidSchema,
  organisationId: uuidSchema,
  name: z.string(),
  description: z.string(),
  scenarioCount: z.number().int().nonnegative(),
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
});

export const createProjectSchema = z.object({
  name: nameSchema,
  description: descriptionSchema.optional(),
  /** Defaults to the caller's first organisation where they may edit. */
  organisationId: uuidSchema.optional(),
  /** Chosen by the client before the first attempt, so a retried create returns the first project (200). */
  clientId: uuidSchema.optional(),
});

export const updateProjectSchema = z
  .object({ name: nameSchema, description: descriptionSchema })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'nothing to change: send name or description' });

export const listProjectsQuerySchema = z.object({ organisationId: uuidSchema.optional() });

export type Project = z.infer<typeof projectSchema>;
export type CreateProjectInput = z.infer<typeof createProjectSchema>;
export type UpdateProjectInput = z.infer<typeof updateProjectSchema>;
