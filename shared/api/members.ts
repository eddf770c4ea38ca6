// Organisation membership management (owners only).
import { z } from 'zod';
import { emailSchema } from './auth';
import { isoDateSchema, uuidSchema } from './common';
import { roleSchema } from './roles';

export const memberSchema = z.object({
  userId: uuidSchema,
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: isoDateSchema,
});

export const addMemberSchema = z.object({ email: emailSchema, role: roleSchema });
export const updateMemberSchema = z.object({ role: roleSchema });
export const memberParamsSchema = z.object({ id: uuidSchema, userId: uuidSchema });

export type Member = z.infer<typeof memberSchema>;
export type AddMemberInput = z.infer<typeof addMemberSchema>;
