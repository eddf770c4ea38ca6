// Organisation membership management (owners only).
import { z } from 'zod';
import { isoDateSchema, uuidSchema } from './common';
import { roleSchema } from './roles';

export const memberSchema = z.object({
  userId: uuidSchema,
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: isoDateSchema,
  lastSignInAt: isoDateSchema.nullable(),
});

export const updateMemberSchema = z.object({ role: roleSchema });
export const memberParamsSchema = z.object({ id: uuidSchema, userId: uuidSchema });

export type Member = z.infer<typeof memberSchema>;
