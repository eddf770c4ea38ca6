// A run list with its loading, failure and empty states around the table.
import { LoadError } from '../../../components/load-error';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageSpinner } from '../../../components/ui/spinner';
import { useRuns } from '../api/get-runs';
import type { RunListScope } from '../../../lib/query-keys/runs';
import { RunsTable } from './runs-table';

interface RunListSectionProps {
  scope: RunListScope;
  organisationId: string | undefined;
  caption: string;
}

export function RunListSection({ scope, organisationId, caption }: RunListSectionProps) {
  const runs = useRuns(scope);
  if (runs.isPending) return <PageSpinner label="Loading runs…" />;
  if (runs.isError) return <LoadError what="the runs" error={runs.error} onRetry={() => void runs.refetch()} />;
  if (runs.data.length === 0) {
    return (
      <EmptyState title="No runs yet">
        {'scenarioId' in scope
          ? 'Runs of this scenario appear here once an engineer or owner runs a revision.'
          : 'Runs of this project’s scenarios appear here once an engineer or owner runs one.'}
      </EmptyState>
    );
  }
  return (
    <RunsTable runs={runs.data} organisationId={organisationId} showScenario={'projectId' in scope} caption={caption} />
  );
}
