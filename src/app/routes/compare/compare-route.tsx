// /projects/:projectId/compare?runs=a,b : two to four layouts side by side. Scenarios are run here
// with one seed and stored, then compared as runs; stored runs can be picked directly.
import { useCallback } from 'react';
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { ButtonLink } from '../../../components/ui/button';
import { Breadcrumbs } from '../../../components/ui/breadcrumbs';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { useCanEdit } from '../../../lib/session/use-can-edit';
import { CompareSetup } from '../../../features/compare/components/compare-setup';
import { CompareView } from '../../../features/compare/components/compare-view';
import { COMPARE_LIMITS } from '../../../features/compare/utils/comparison';
import { useStoredComparison } from '../../../features/compare/api/store-comparison';
import { SharePanel } from '../../../features/sharing/components/share-panel';
import { useRunsPage } from '../../../features/runs/api/get-runs';
import { RUNS_PAGE_MAX } from '../../../../shared/api/runs';
import { useScenarios } from '../../../features/scenarios/api/get-scenarios';
import { CostSection } from './cost-section';
import { COMPARE_QUESTION } from './question';
import { parseRunIds, useComparisonData } from './use-comparison-data';
import { useScenarioRuns } from './use-scenario-runs';

export function CompareRoute() {
  const { projectId = '' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const askedFor = parseRunIds(search.get('runs'));
  const runIds = askedFor.slice(0, COMPARE_LIMITS.max);
  const data = useComparisonData(projectId, runIds);
  const scenarios = useScenarios(projectId);
  // The newest runs to pick from; a comparison of older runs is reached through the runs table.
  const runs = useRunsPage({ projectId }, { limit: RUNS_PAGE_MAX });
  const organisationId = data.project.data?.organisationId;
  const mayEdit = useCanEdit(organisationId);
  const showRuns = useCallback(
    (ids: string[]) => navigate(`/projects/${projectId}/compare?runs=${ids.join(',')}`),
    [navigate, projectId],
  );
  const scenarioRuns = useScenarioRuns(showRuns);
  const comparing = runIds.length >= COMPARE_LIMITS.min;
  // Stored only once every run has loaded, so a run that failed to load is not asked for twice.
  const stored = useStoredComparison(runIds, comparing && Boolean(data.items));

  if (data.project.isPending) return <PageSpinner label="Loading the project…" />;
  if (data.project.isError)
    return <LoadError what="the project" error={data.project.error} onRetry={() => void data.project.refetch()} />;

  return (
    <div className="flex flex-col gap-8 overflow-x-clip">
      <PageHeader
        title="Compare layouts"
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: data.project.data.name, to: `/projects/${projectId}` },
              { label: 'Compare' },
            ]}
          />
        }
        description="Throughput, takt, output, WIP and lead time of two to four layouts with 95 % intervals on their differences, what each costs and how much floor it takes."
        actions={
          <>
            <ButtonLink to={`/projects/${projectId}/compare/studies`}>Compare studies</ButtonLink>
            {comparing && data.items && (
              <ButtonLink to={`/projects/${projectId}/compare/report?runs=${runIds.join(',')}`}>
                Printable report
              </ButtonLink>
            )}
          </>
        }
      />
      <CompareSetup
        runs={runs.data?.items ?? []}
        scenarios={(scenarios.data ?? []).map((s) => ({
          id: s.id,
          name: s.name,
          latestRevisionNumber: s.latestRevision.number,
        }))}
        selectedRunIds={runIds}
        mayRun={mayEdit}
        progress={scenarioRuns.progress}
        problem={scenarioRuns.problem}
        onCompareRuns={showRuns}
        onRunScenarios={(ids, settings) =>
          void scenarioRuns.start(
            (scenarios.data ?? [])
              .filter((s) => ids.includes(s.id))
              .map((s) => ({ id: s.id, name: s.name, latestRevisionNumber: s.latestRevision.number })),
            settings,
          )
        }
        onCancel={scenarioRuns.cancel}
      />
      {askedFor.length > COMPARE_LIMITS.max && (
        <p className="text-sm font-medium text-caution">
          The address names {askedFor.length} runs; a comparison holds at most {COMPARE_LIMITS.max}, so the first{' '}
          {COMPARE_LIMITS.max} are shown.
        </p>
      )}
      {comparing && data.failed && <LoadError what="a run of the comparison" error={data.failed} />}
      {comparing && !data.failed && !data.items && <PageSpinner label="Loading the runs…" />}
      {comparing && data.items && organisationId && (
        <CompareView
          items={data.items}
          stepNames={data.stepNames}
          costs={data.pricing.costs}
          question={COMPARE_QUESTION}
          costSection={
            <CostSection
              organisationId={organisationId}
              priceList={data.priceList}
              scenarios={data.pricing.scenarios}
              mayEdit={mayEdit}
            />
          }
        />
      )}
      {comparing && stored.isError && <LoadError what="the comparison's share links" error={stored.error} />}
      {comparing && data.items && stored.data && (
        <SharePanel kind="comparison" subjectId={stored.data.id} mayShare={mayEdit} />
      )}
    </div>
  );
}
