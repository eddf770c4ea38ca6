// The audit trail: who created, changed, ran, shared, invited or deleted what, and sign-ins that failed.
import { z } from 'zod';
import { isoDateSchema, queryIntSchema, userRefSchema, uuidSchema } from './common';

export const auditActionSchema = z.enum([
  'create',
  'update',
  'delete',
  'run',
  'restore',
  'sign-in',
  'sign-in-failed',
  'password-reset',
  'password-change',
  'member-add',
  'member-update',
  'member-remove',
  'member-leave',
  'invite',
  'invite-resend',
  'invite-revoke',
  'share',
  'share-revoke',
]);
export const auditEntitySchema = z.enum([
  'organisation',
  'member',
  'invitation',
  'project',
  'scenario',
  'revision',
  'run',
  'study',
  'time-study',
  'share',
  'user',
  'price-list',
]);

export const auditEntrySchema = z.object({
  id: uuidSchema,
  organisationId: uuidSchema.nullable(),
  actor: userRefSchema.nullable(),
  action: auditActionSchema,
  entity: auditEntitySchema,
  entityId: z.string(),
  detail: z.record(z.string(), z.unknown()),
  createdAt: isoDateSchema,
});

export type AuditEntry = z.infer<typeof auditEntrySchema>;
export type AuditAction = z.infer<typeof auditActionSchema>;
export type AuditEntity = z.infer<typeof auditEntitySchema>;

export const AUDIT_PAGE_MAX = 200;
/** A CSV export holds at most this many rows; narrow the filter for more. */
export const AUDIT_EXPORT_MAX = 10_000;

const dayOrInstant = z.union([z.iso.date(), isoDateSchema], {
  message: 'must be a date (YYYY-MM-DD) or a date and time',
});

/** Filters shared by the page and the CSV export; `to` includes the whole day when it is a date. */
const auditFilterFields = z.object({
  actorId: uuidSchema.optional(),
  entity: auditEntitySchema.optional(),
  action: auditActionSchema.optional(),
  from: dayOrInstant.optional(),
  to: dayOrInstant.optional(),
});

export function startOf(value: string): number {
  return Date.parse(value.length === 10 ? `${value}T00:00:00Z` : value);
}

export function endOf(value: string): number {
  return value.length === 10 ? Date.parse(`${value}T00:00:00Z`) + 86_400_000 : Date.parse(value);
}

const rangeInOrder = (f: { from?: string; to?: string }) => !f.from || !f.to || startOf(f.from) < endOf(f.to);
const rangeMessage = { message: 'must not be before "from"', path: ['to'] };

export const auditFilterSchema = auditFilterFields.refine(rangeInOrder, rangeMessage);

export const listAuditQuerySchema = auditFilterFields
  .extend({
    page: queryIntSchema(1, 100_000).default(1),
    pageSize: queryIntSchema(1, AUDIT_PAGE_MAX).default(50),
  })
  .refine(rangeInOrder, rangeMessage);

export const auditPageSchema = z.object({
  entries: z.array(auditEntrySchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});

export type AuditFilter = z.infer<typeof auditFilterSchema>;
export type ListAuditQuery = z.infer<typeof listAuditQuerySchema>;
export type AuditPage = z.infer<typeof auditPageSchema>;
