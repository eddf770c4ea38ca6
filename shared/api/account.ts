// Password resets by e-mail, finishing a sign-up from its e-mailed link, and a signed-in user's own
// password and sessions.
import { z } from 'zod';
import { emailSchema, passwordSchema, PASSWORD_MAX_LENGTH } from './auth';
import { linkTokenSchema } from './tokens';

/** A reset link is valid this long after it was asked for. */
export const PASSWORD_RESET_MINUTES = 30;
/** A sign-up link is valid this long. */
export const SIGN_UP_LINK_HOURS = 24;

export const requestPasswordResetSchema = z.object({ email: emailSchema });

export const resetPasswordSchema = z.object({ token: linkTokenSchema, password: passwordSchema });

export const confirmSignUpSchema = z.object({ token: linkTokenSchema });

export const changePasswordSchema = z.object({
  currentPassword: z.string({ message: 'must be text' }).min(1, { message: 'is required' }).max(PASSWORD_MAX_LENGTH),
  newPassword: passwordSchema,
});

/** The one answer to "send me a link": the same whether or not the address has an account. */
export const checkYourMailSchema = z.object({ message: z.string() });

export const signedOutOthersSchema = z.object({ ended: z.number().int().nonnegative() });

export type RequestPasswordResetInput = z.infer<typeof requestPasswordResetSchema>;
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
export type CheckYourMail = z.infer<typeof checkYourMailSchema>;
