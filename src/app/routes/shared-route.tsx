// /shared#<token>: what a share link opens, without signing in. It shows the shared run's results or the
// shared study's answer and nothing around them: no navigation into the organisation, no control that
// changes anything.
import { useMemo } from 'react';
import type { SharedView } from '../../../shared/api/shares';
import { ErrorBanner } from '../../components/ui/error-banner';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { RunMetadata } from '../../features/results/components/run-metadata';
import { RunResultSections } from '../../features/results/components/run-result-sections';
import { useSharedView } from '../../features/sharing/api/shares';
import { SharedViewBanner } from '../../features/sharing/components/shared-view-banner';
import { StudyView } from '../../features/studies/components/study-view';
import { IncompleteLink } from '../../components/incomplete-link';
import { useLinkToken } from '../../lib/use-link-token';

function SharedRun({ run }: { run: Extract<SharedView, { kind: 'run' }>['run'] }) {
  const fileBase = useMemo(() => `shared-run-${run.id.slice(0, 8)}`, [run]);
  return (
    <>
      <PageHeader
        title={run.name}
        description={`${run.scenarioName}, revision ${run.revisionNumber}, seed ${run.seed}: ${run.settings.replications} replication${run.settings.replications === 1 ? '' : 's'} of ${run.settings.hours} h after ${run.settings.warmupMinutes} min warm-up.`}
      />
      <RunResultSections result={run.results} fileBase={fileBase} />
      <RunMetadata run={run} readOnlyView />
    </>
  );
}

function SharedStudy({ view }: { view: Extract<SharedView, { kind: 'study' }> }) {
  // No jobs run here (mayRun false): the visitor sees what the organisation's study has found so far.
  return (
    <>
      <PageHeader title={view.study.name} />
      <StudyView study={view.study} scenario={view.document} documents={{}} mayRun={false} />
    </>
  );
}

export function SharedRoute() {
  const token = useLinkToken();
  const view = useSharedView(token);

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
  return (
    <div className="flex flex-col gap-8 overflow-x-clip">
      <SharedViewBanner organisationName={view.data.organisationName} expiresAt={view.data.expiresAt} />
      {view.data.kind === 'run' ? <SharedRun run={view.data.run} /> : <SharedStudy view={view.data} />}
    </div>
  );
}
