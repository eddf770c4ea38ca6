// The audit page for owners: who created, changed, ran, shared, invited or deleted what, and failed
// sign-ins, filtered and paged on the server, with the same filter as a CSV download.
import { useState } from 'react';
import type { AuditFilter } from '../../../../shared/api/audit';
import type { UserRef } from '../../../../shared/api/common';
import { LoadError } from '../../../components/load-error';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { AUDIT_PAGE_SIZE, auditCsvHref, useAuditPage } from '../api/audit';
import { AuditFilters } from './audit-filters';
import { actionLabel, detailOf } from './describe-entry';

export function AuditPage({
  organisationId,
  organisationName,
  people,
}: {
  organisationId: string;
  organisationName: string;
  people: UserRef[];
}) {
  const [filter, setFilter] = useState<AuditFilter>({});
  const [page, setPage] = useState(1);
  const audit = useAuditPage(organisationId, filter, page);
  const pages = audit.data ? Math.max(1, Math.ceil(audit.data.total / AUDIT_PAGE_SIZE)) : 1;

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Audit trail"
        description={`Everything done in ${organisationName}, newest first, with sign-ins of its members (failed ones too).`}
        actions={
          <a className={buttonClasses('secondary')} href={auditCsvHref(organisationId, filter)} download>
            Download CSV
          </a>
        }
      />
      <Card className="flex flex-col gap-4">
        <AuditFilters
          filter={filter}
          people={people}
          onChange={(next) => {
            setFilter(next);
            setPage(1);
          }}
        />
        {audit.isPending && <PageSpinner label="Reading the audit trail…" />}
        {audit.isError && <LoadError what="the audit trail" error={audit.error} onRetry={() => void audit.refetch()} />}
        {audit.data && (
          <>
            <p className="text-sm text-ink-soft" aria-live="polite">
              {audit.data.total === 0
                ? 'Nothing matches this filter.'
                : `${audit.data.total} entr${audit.data.total === 1 ? 'y' : 'ies'}; page ${page} of ${pages}.`}
            </p>
            {audit.data.entries.length > 0 && (
              <Table caption="Audit trail">
                <thead>
                  <tr>
                    <Th>When</Th>
                    <Th>Who</Th>
                    <Th>Did</Th>
                    <Th>Kind</Th>
                    <Th>What</Th>
                  </tr>
                </thead>
                <tbody>
                  {audit.data.entries.map((entry) => (
                    <tr key={entry.id}>
                      <Td className="whitespace-nowrap">{formatDateTime(entry.createdAt)}</Td>
                      <Td>
                        {entry.actor
                          ? formatPerson(entry.actor)
                          : entry.action === 'sign-in-failed'
                            ? `someone (as ${String(entry.detail.email ?? '')})`
                            : 'a removed user'}
                      </Td>
                      <Td className={entry.action === 'sign-in-failed' ? 'font-semibold text-danger' : ''}>
                        {actionLabel(entry.action)}
                      </Td>
                      <Td>{entry.entity}</Td>
                      <Td className="break-all">{detailOf(entry)}</Td>
                    </tr>
                  ))}
                </tbody>
              </Table>
            )}
            {pages > 1 && (
              <nav aria-label="Audit pages" className="flex items-center gap-3">
                <Button variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
                  Newer
                </Button>
                <Button variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
                  Older
                </Button>
              </nav>
            )}
          </>
        )}
      </Card>
    </div>
  );
}
