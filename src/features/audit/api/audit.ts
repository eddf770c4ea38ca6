// One filtered page of the audit trail, and the address of the same filter as CSV.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { auditPageSchema, type AuditFilter } from '../../../../shared/api/audit';
import { apiRoutes } from '../../../../shared/api/routes';
import { api } from '../../../lib/api-client';
import { auditKeys } from './keys';

export const AUDIT_PAGE_SIZE = 50;

const queryOf = (filter: AuditFilter): Record<string, string | undefined> => ({ ...filter });

export const useAuditPage = (organisationId: string, filter: AuditFilter, page: number) =>
  useQuery({
    queryKey: auditKeys.page(organisationId, filter, page),
    queryFn: ({ signal }) =>
      api.get(apiRoutes.audit(organisationId), auditPageSchema, {
        signal,
        query: { ...queryOf(filter), page: String(page), pageSize: String(AUDIT_PAGE_SIZE) },
      }),
    placeholderData: keepPreviousData,
  });

export function auditCsvHref(organisationId: string, filter: AuditFilter): string {
  const params = new URLSearchParams(
    Object.entries(queryOf(filter)).filter((entry): entry is [string, string] => Boolean(entry[1])),
  );
  const text = params.toString();
  return text ? `${apiRoutes.auditCsv(organisationId)}?${text}` : apiRoutes.auditCsv(organisationId);
}
