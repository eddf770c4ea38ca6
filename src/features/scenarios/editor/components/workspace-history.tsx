// The revision history under the workspace. Restoring makes a new revision and moves the draft's
// base to it; it waits until the draft is saved or discarded, so no typed work is overwritten.
import { LoadError } from '../../../../components/load-error';
import { TitledCard } from '../../../../components/ui/card';
import { ErrorBanner } from '../../../../components/ui/error-banner';
import { PageSpinner } from '../../../../components/ui/spinner';
import { useRevisions } from '../../api/get-revisions';
import { RevisionHistory } from '../../components/revision-history';
import { useRestoreRevision } from '../hooks/use-restore-revision';
import type { ScenarioDraft } from '../hooks/use-scenario-draft';

export function WorkspaceHistory({
  scenarioId,
  draft,
  mayEdit,
}: {
  scenarioId: string;
  draft: ScenarioDraft;
  mayEdit: boolean;
}) {
  const revisions = useRevisions(scenarioId);
  const { restore, restoring, error } = useRestoreRevision(scenarioId);
  const latestNumber = Math.max(draft.baseNumber, ...(revisions.data ?? []).map((r) => r.number));
  const onRestore = async (number: number) => {
    const made = await restore(number, latestNumber);
    if (made) draft.resetTo({ number: made.number, document: made.document });
  };
  return (
    <TitledCard title="Revision history" className="mt-6">
      {error && <ErrorBanner title="Not restored">{error}</ErrorBanner>}
      {revisions.isPending && <PageSpinner label="Loading revisions…" />}
      {revisions.isError && (
        <LoadError what="the revision history" error={revisions.error} onRetry={() => void revisions.refetch()} />
      )}
      {revisions.data && (
        <RevisionHistory
          scenarioId={scenarioId}
          revisions={revisions.data}
          latestNumber={latestNumber}
          onRestore={mayEdit ? (n) => void onRestore(n) : undefined}
          restoring={restoring}
          restoreBlocked={draft.hasDraft ? 'Save or discard your draft to restore an older revision.' : undefined}
        />
      )}
    </TitledCard>
  );
}
