// The audit trail: who created, changed, ran or deleted what.
import { z } from 'zod';
import { isoDateSchema, userRefSchema, uuidSchema } from './common';

export const auditActionSchema = z.enum(['create', 'update', 'delete', 'run', 'restore', 'sign-in', 'member-add', 'member-update', 'member-remove']);
export const auditEntitySchema = z.enum(['organisation', 'member', 'project', 'scenario', 'revision', 'run', 'user', 'price-list']);

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

/** Newest first; pass the last entry's `createdAt` as `before` to read the next page. */
export const listAuditQuerySchema = z.object({
  limit: z.coerce
    .number({ message: 'must be a number' })
    .int({ message: 'must be a whole number' })
    .min(1, { message: 'must be at least 1' })
    .max(AUDIT_PAGE_MAX, { message: `must be at most ${AUDIT_PAGE_MAX}` })
    .default(50),
  before: isoDateSchema.optional(),
});

export type ListAuditQuery = z.infer<typeof listAuditQuerySchema>;
