// Query keys of the audit feature: one organisation's trail, then one filtered page of it.
import type { AuditFilter } from '../../../../shared/api/audit';

export const auditKeys = {
  all: ['audit'] as const,
  organisation: (organisationId: string) => [...auditKeys.all, organisationId] as const,
  page: (organisationId: string, filter: AuditFilter, page: number) =>
    [...auditKeys.organisation(organisationId), filter, page] as const,
};
