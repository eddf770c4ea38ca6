// Read-only share links. The entity is generic by kind: a run, a study or a stored comparison of runs.
import { z } from 'zod';
import { isoDateSchema, userRefSchema, uuidSchema } from './common';
import { scenarioSchema } from '../scenario/scenario';
import { runDetailSchema } from './runs';
import { studyDetailSchema } from './studies';

export const shareKindSchema = z.enum(['run', 'study', 'comparison'], { message: 'must be run, study or comparison' });
export type ShareKind = z.infer<typeof shareKindSchema>;

export const SHARE_MAX_DAYS = 90;

export const createShareSchema = z.object({
  kind: shareKindSchema,
  subjectId: uuidSchema,
  expiresInDays: z
    .number({ message: 'must be a number' })
    .int({ message: 'must be a whole number of days' })
    .min(1, { message: 'must be at least 1 day' })
    .max(SHARE_MAX_DAYS, { message: `must be at most ${SHARE_MAX_DAYS} days` })
    .default(14),
});

export const listSharesQuerySchema = z.object({ kind: shareKindSchema, subjectId: uuidSchema });

export const shareStateSchema = z.enum(['active', 'expired', 'revoked']);

export const shareSchema = z.object({
  id: uuidSchema,
  kind: shareKindSchema,
  subjectId: uuidSchema,
  createdBy: userRefSchema.nullable(),
  createdAt: isoDateSchema,
  expiresAt: isoDateSchema,
  revokedAt: isoDateSchema.nullable(),
  lastOpenedAt: isoDateSchema.nullable(),
  state: shareStateSchema,
});

/** Only the answer to creating a link carries its address; the server keeps no way to show it again. */
export const createdShareSchema = shareSchema.extend({ url: z.string() });

/** What an anonymous visitor with the link receives: the shared thing and nothing around it. */
export const sharedViewSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('run'), expiresAt: isoDateSchema, organisationName: z.string(), run: runDetailSchema }),
  z.object({
    kind: z.literal('study'),
    expiresAt: isoDateSchema,
    organisationName: z.string(),
    study: studyDetailSchema,
    /** The scenario revision the study varies, which its charts draw on. */
    document: scenarioSchema,
  }),
  z.object({
    kind: z.literal('comparison'),
    expiresAt: isoDateSchema,
    organisationName: z.string(),
    /** The compared runs in the order shown, each with the scenario revision it was computed from. */
    runs: z.array(z.object({ run: runDetailSchema, document: scenarioSchema })),
  }),
]);

export type CreateShareInput = z.input<typeof createShareSchema>;
export type Share = z.infer<typeof shareSchema>;
export type CreatedShare = z.infer<typeof createdShareSchema>;
export type SharedView = z.infer<typeof sharedViewSchema>;
