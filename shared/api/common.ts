// Identifiers, timestamps and route parameters shared by every resource.
import { z } from 'zod';

export const uuidSchema = z.uuid({ message: 'must be a valid id (UUID)' });
export const isoDateSchema = z.iso.datetime({ offset: true });

export const nameSchema = z
  .string({ message: 'must be text' })
  .trim()
  .min(1, { message: 'is required' })
  .max(120, { message: 'must be at most 120 characters' });

export const descriptionSchema = z
  .string({ message: 'must be text' })
  .max(2000, { message: 'must be at most 2000 characters' });

/** A whole number from a query string, within [min, max]; the messages name the bound that was crossed. */
export function queryIntSchema(min: number, max: number) {
  return z.coerce
    .number({ message: 'must be a number' })
    .int({ message: 'must be a whole number' })
    .min(min, { message: `must be at least ${min}` })
    .max(max, { message: `must be at most ${max}` });
}

/** A finite number from a query string, within [min, max]. */
export function queryNumberSchema(min: number, max: number) {
  return z.coerce
    .number({ message: 'must be a number' })
    .min(min, { message: `must be at least ${min}` })
    .max(max, { message: `must be at most ${max}` });
}

export const idParamsSchema = z.object({ id: uuidSchema });

export const userRefSchema = z.object({
  id: uuidSchema,
  name: z.string(),
  email: z.string(),
});

export type UserRef = z.infer<typeof userRefSchema>;

/** The answer to sign-out and to every DELETE: the body is JSON like every other response. */
export const okSchema = z.object({ ok: z.literal(true) });
export type Ok = z.infer<typeof okSchema>;
