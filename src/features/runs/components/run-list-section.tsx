// A run list with its loading, failure and empty states around the table. It owns the table's sort,
// filters and page, and asks the server for just that page.
import type { SortingState } from '@tanstack/react-table';
import { useState } from 'react';
import { LoadError } from '../../../components/load-error';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageSpinner } from '../../../components/ui/spinner';
import type { RunListScope } from '../../../lib/query-keys/runs';
import { useRunsPage } from '../api/get-runs';
import { anyFilter, NEWEST_FIRST, NO_FILTERS, runsRequestOf, type RunFilterValues } from '../utils/run-filters';
import { RunsTable } from './runs-table';

interface RunListSectionProps {
  scope: RunListScope;
  organisationId: string | undefined;
  caption: string;
}

export function RunListSection({ scope, organisationId, caption }: RunListSectionProps) {
  const [sorting, setSorting] = useState<SortingState>(NEWEST_FIRST);
  const [filters, setFilters] = useState<RunFilterValues>(NO_FILTERS);
  const [offset, setOffset] = useState(0);
  const runs = useRunsPage(scope, runsRequestOf(filters, sorting, offset));
  if (runs.isPending) return <PageSpinner label="Loading runs…" />;
  if (runs.isError) return <LoadError what="the runs" error={runs.error} onRetry={() => void runs.refetch()} />;
  if (runs.data.total === 0 && !anyFilter(filters)) {
    return (
      <EmptyState title="No runs yet">
        {'scenarioId' in scope
          ? 'Runs of this scenario appear here once an engineer or owner runs a revision.'
          : 'Runs of this project’s scenarios appear here once an engineer or owner runs one.'}
      </EmptyState>
    );
  }
  // A new sort or filter starts again at the first page.
  return (
    <RunsTable
      page={runs.data}
      organisationId={organisationId}
      showScenario={'projectId' in scope}
      caption={caption}
      sorting={sorting}
      onSortingChange={(next) => {
        setSorting(next);
        setOffset(0);
      }}
      filters={filters}
      onFiltersChange={(next) => {
        setFilters(next);
        setOffset(0);
      }}
      onOffsetChange={setOffset}
      loading={runs.isPlaceholderData}
    />
  );
}
