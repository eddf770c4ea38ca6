// /scenarios/:scenarioId : the scenario workspace (draft editor, live drawing, line balance, history)
// with the run panel for the latest saved revision and the scenario's runs.
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import type { FieldIssue } from '../../../shared/api/errors';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { formatDateTime, formatPerson } from '../../lib/format';
import { ScenarioWorkspace } from '../../features/scenarios/editor/components/scenario-workspace';
import { useProject } from '../../features/projects/api/get-project';
import { RunPanel } from '../../features/runs/components/run-panel';
import { ScenarioRuns } from '../../features/runs/components/scenario-runs';
import { useScenario } from '../../features/scenarios/api/get-scenario';
import { useEditPermission } from '../../features/scenarios/hooks/use-edit-permission';
import { stationStudies } from './station-studies';

export function ScenarioRoute() {
  const { scenarioId = '' } = useParams();
  const scenario = useScenario(scenarioId);
  const project = useProject(scenario.data?.projectId);
  const organisationId = project.data?.organisationId;
  const { ready, mayEdit } = useEditPermission(organisationId);
  const [engineIssues, setEngineIssues] = useState<FieldIssue[]>([]);

  if (!ready || scenario.isPending || (scenario.data && project.isPending))
    return <PageSpinner label="Loading the scenario…" />;
  if (scenario.isError) {
    if (isApiRequestError(scenario.error) && scenario.error.status === 404) return <NotFoundMessage what="scenario" />;
    return <LoadError what="the scenario" error={scenario.error} onRetry={() => void scenario.refetch()} />;
  }
  const { data } = scenario;
  const latest = data.latestRevision;

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={data.name}
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: project.data?.name ?? 'Project', to: `/projects/${data.projectId}` },
              { label: data.name },
            ]}
          />
        }
        description={
          <>
            {data.description && <p>{data.description}</p>}
            <p className="mt-2 text-sm">
              Revision {latest.number}, saved by {formatPerson(latest.createdBy)} on {formatDateTime(latest.createdAt)}
              {latest.message ? `: “${latest.message}”` : ''}
            </p>
          </>
        }
      />
      <div>
        <ScenarioWorkspace
          key={`${data.id}:${mayEdit}`}
          scenario={data}
          mayEdit={mayEdit}
          engineIssues={engineIssues}
          stationStudies={stationStudies}
        />
      </div>
      <RunPanel
        scenarioId={data.id}
        organisationId={organisationId}
        revision={{ id: latest.id, number: latest.number, document: data.document }}
        onScenarioIssues={setEngineIssues}
        openResultWhenSaved={false}
      />
      <ScenarioRuns scenarioId={data.id} organisationId={organisationId} />
    </div>
  );
}
