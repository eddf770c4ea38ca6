// /runs/:runId : one stored run's results, exactly as the engine produced them, with the revision,
// seed and settings that repeat it, and exports for every table and chart.
import { useQuery } from '@tanstack/react-query';
import { useMemo, type ReactNode } from 'react';
import type { RunDetail } from '../../../shared/api/runs';
import { useNavigate, useParams } from 'react-router-dom';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { ButtonLink } from '../../components/ui/button';
import { Card, CardTitle } from '../../components/ui/card';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { useProject } from '../../features/projects/api/get-project';
import { useScenarioRevision } from '../../features/scenarios/api/get-revision';
import { useRun } from '../../features/runs/api/get-run';
import { RunRowActions } from '../../features/runs/components/run-row-actions';
import { useRunPermissions } from '../../features/runs/hooks/use-run-permissions';
import { scenarioQueryOptions } from '../../features/scenarios/api/get-scenario';
import { ControlsExport } from '../../features/results/components/controls-export';
import { RunMetadata } from '../../features/results/components/run-metadata';
import { RunResultSections } from '../../features/results/components/run-result-sections';

interface RunRouteProps {
  /** Extra panels below the run's description, composed by the app (sharing, for one). */
  renderAside?: (run: RunDetail, organisationId: string | undefined) => ReactNode;
}

export function RunRoute({ renderAside }: RunRouteProps = {}) {
  const { runId = '' } = useParams();
  const navigate = useNavigate();
  const run = useRun(runId);
  const scenarioId = run.data?.scenarioId ?? '';
  const scenario = useQuery({ ...scenarioQueryOptions(scenarioId), enabled: scenarioId !== '' });
  const project = useProject(scenario.data?.projectId);
  const revision = useScenarioRevision(scenarioId, run.data?.revisionNumber);
  const { mayChange } = useRunPermissions(project.data?.organisationId);
  const stepNames = useMemo(
    () => (revision.data ? new Map(revision.data.document.steps.map((step) => [step.id, step.name])) : undefined),
    [revision.data],
  );

  if (run.isPending) return <PageSpinner label="Loading the run…" />;
  if (run.isError) {
    if (isApiRequestError(run.error) && run.error.status === 404) return <NotFoundMessage what="run" />;
    return <LoadError what="the run" error={run.error} onRetry={() => void run.refetch()} />;
  }
  const { data } = run;
  const result = data.results;
  const fileBase = `run-${data.id.slice(0, 8)}`;

  // Clipped sideways: the charts' screen-reader tables are positioned off-layout and would otherwise
  // widen the page on a phone.
  return (
    <div className="flex flex-col gap-8 overflow-x-clip">
      <PageHeader
        title={data.name}
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              ...(scenario.data
                ? [
                    {
                      label: project.data ? `Runs of ${project.data.name}` : 'Project runs',
                      to: `/projects/${scenario.data.projectId}/runs`,
                    },
                  ]
                : []),
              { label: data.scenarioName, to: `/scenarios/${data.scenarioId}` },
              { label: 'Run' },
            ]}
          />
        }
        description={`Revision ${data.revisionNumber}, seed ${data.seed}: ${data.settings.replications} replication${data.settings.replications === 1 ? '' : 's'} of ${data.settings.hours} h after ${data.settings.warmupMinutes} min warm-up.`}
        actions={
          <>
            <ButtonLink variant="secondary" to={`/runs/${data.id}/playback`} data-watch-run>
              Watch the line run
            </ButtonLink>
            <RunRowActions
              run={data}
              mayRerun={false}
              mayDelete={mayChange(data)}
              onDeleted={() => navigate(`/scenarios/${data.scenarioId}`, { replace: true })}
            />
          </>
        }
      />
      <RunResultSections result={result} stepNames={stepNames} fileBase={fileBase} />
      <RunMetadata run={data} />
      {renderAside?.(data, project.data?.organisationId)}
      <Card aria-labelledby="exports-title" className="flex flex-col gap-3">
        <CardTitle id="exports-title">Exports</CardTitle>
        <p className="text-sm text-ink-soft">
          Every table above has a CSV button, every chart PNG, SVG and CSV buttons in its corner.
        </p>
        <ControlsExport
          document={revision.data?.document}
          loading={revision.isPending}
          failed={revision.isError}
          fileBase={fileBase}
        />
      </Card>
    </div>
  );
}
