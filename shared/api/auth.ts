// Sign-up, sign-in and the signed-in user's view of themselves.
import { z } from 'zod';
import { nameSchema, uuidSchema } from './common';
import { roleSchema } from './roles';

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;

export const emailSchema = z
  .string({ message: 'must be text' })
  .trim()
  .toLowerCase()
  .max(254, { message: 'must be at most 254 characters' })
  .pipe(z.email({ message: 'must be an e-mail address such as name@example.com' }));

export const passwordSchema = z
  .string({ message: 'must be text' })
  .min(PASSWORD_MIN_LENGTH, { message: `must be at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(PASSWORD_MAX_LENGTH, { message: `must be at most ${PASSWORD_MAX_LENGTH} characters` });

export const signUpSchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  name: nameSchema,
  organisationName: nameSchema,
});

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ message: 'must be text' }).min(1, { message: 'is required' }).max(PASSWORD_MAX_LENGTH),
});

export const membershipSchema = z.object({
  organisationId: uuidSchema,
  organisationName: z.string(),
  role: roleSchema,
});

export const meSchema = z.object({
  user: z.object({ id: uuidSchema, email: z.string(), name: z.string() }),
  memberships: z.array(membershipSchema),
});

/**
 * The session check every page makes on load: who is signed in, or `me: null` for a visitor. Nobody
 * signed in is an ordinary answer (200), not an error, so a visitor's browser logs no failed request.
 */
export const sessionSchema = z.object({ me: meSchema.nullable() });

export type SignUpInput = z.infer<typeof signUpSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
export type Membership = z.infer<typeof membershipSchema>;
export type Me = z.infer<typeof meSchema>;
export type Session = z.infer<typeof sessionSchema>;
