// /shared#<token>: what a share link opens, without signing in. It shows the shared run's results and
// nothing around them: no navigation into the organisation, no control that changes anything.
import { useMemo } from 'react';
import { ErrorBanner } from '../../components/ui/error-banner';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { RunMetadata } from '../../features/results/components/run-metadata';
import { RunResultSections } from '../../features/results/components/run-result-sections';
import { useSharedView } from '../../features/sharing/api/shares';
import { SharedViewBanner } from '../../features/sharing/components/shared-view-banner';
import { IncompleteLink } from '../../components/incomplete-link';
import { useLinkToken } from '../../lib/use-link-token';

export function SharedRoute() {
  const token = useLinkToken();
  const view = useSharedView(token);
  const run = view.data?.kind === 'run' ? view.data.run : undefined;
  const fileBase = useMemo(() => (run ? `shared-run-${run.id.slice(0, 8)}` : 'shared'), [run]);

  if (!token) {
    return <IncompleteLink from="the message you were sent" />;
  }
  if (view.isPending) return <PageSpinner label="Opening the shared view…" />;
  if (view.isError) {
    return (
      <ErrorBanner title="Nothing to show">
        <p>{view.error.message}</p>
      </ErrorBanner>
    );
  }
  if (!run) return null;
  return (
    <div className="flex flex-col gap-8 overflow-x-clip">
      <SharedViewBanner organisationName={view.data.organisationName} expiresAt={view.data.expiresAt} />
      <PageHeader
        title={run.name}
        description={`${run.scenarioName}, revision ${run.revisionNumber}, seed ${run.seed}: ${run.settings.replications} replication${run.settings.replications === 1 ? '' : 's'} of ${run.settings.hours} h after ${run.settings.warmupMinutes} min warm-up.`}
      />
      <RunResultSections result={run.results} fileBase={fileBase} />
      <RunMetadata run={run} readOnlyView />
    </div>
  );
}
