// /shared#<token>: what a share link opens, without signing in. It shows the shared run's results, the
// shared study's answer or the shared comparison of runs, and nothing around them: no navigation into the organisation, no control that
// changes anything.
import { useMemo } from 'react';
import { CompareView } from '../../features/compare/components/compare-view';
import { compareItemsOf, stepNamesOf } from './compare/use-comparison-data';
import { COMPARE_QUESTION } from './compare/question';
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

function SharedComparison({ runs }: { runs: Extract<SharedView, { kind: 'comparison' }>['runs'] }) {
  const items = useMemo(
    () =>
      compareItemsOf(
        runs.map((r) => r.run),
        runs.map((r) => r.document),
      ),
    [runs],
  );
  const stepNames = useMemo(() => stepNamesOf(runs.map((r) => r.document)), [runs]);
  // Prices are the organisation's own and stay with it: the visitor sees results, footprints and drawings.
  return (
    <>
      <PageHeader
        title="Compared layouts"
        description={`${runs.length} stored runs side by side, with 95 % intervals on their differences.`}
      />
      <CompareView
        items={items}
        stepNames={stepNames}
        question={COMPARE_QUESTION}
        costSection={null}
        withoutCosts="A shared link leaves the team's prices out, so costs are not compared."
      />
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
      {view.data.kind === 'run' && <SharedRun run={view.data.run} />}
      {view.data.kind === 'study' && <SharedStudy view={view.data} />}
      {view.data.kind === 'comparison' && <SharedComparison runs={view.data.runs} />}
    </div>
  );
}
