// Invitations to an organisation: sent by owners, accepted through a single-use e-mailed link.
import { z } from 'zod';
import { emailSchema, meSchema, passwordSchema } from './auth';
import { isoDateSchema, nameSchema, userRefSchema, uuidSchema } from './common';
import { roleSchema } from './roles';
import { linkTokenSchema } from './tokens';

/** How long an invitation link stays valid after it was (re)sent. */
export const INVITATION_LIFETIME_DAYS = 7;

export const inviteMemberSchema = z.object({ email: emailSchema, role: roleSchema });

export const invitationStateSchema = z.enum(['pending', 'expired']);

/** A pending invitation as owners see it in the members page. */
export const invitationSchema = z.object({
  id: uuidSchema,
  email: z.string(),
  role: roleSchema,
  invitedBy: userRefSchema.nullable(),
  state: invitationStateSchema,
  sentAt: isoDateSchema,
  expiresAt: isoDateSchema,
});

export const invitationParamsSchema = z.object({ id: uuidSchema, invitationId: uuidSchema });

/** What the link's holder sees before accepting. */
export const invitationPreviewSchema = z.object({
  organisationName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedByName: z.string().nullable(),
  expiresAt: isoDateSchema,
  /** The holder of the link owns this address, so telling them whether it has an account reveals nothing. */
  accountExists: z.boolean(),
});

/** Signed in: only the token. New to Lanewright: also a name and a password for the new account. */
export const acceptInvitationSchema = z.object({
  token: linkTokenSchema,
  name: nameSchema.optional(),
  password: passwordSchema.optional(),
});

export const acceptedInvitationSchema = z.object({ organisationId: uuidSchema, me: meSchema });

export type InviteMemberInput = z.infer<typeof inviteMemberSchema>;
export type Invitation = z.infer<typeof invitationSchema>;
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
export type AcceptedInvitation = z.infer<typeof acceptedInvitationSchema>;
