// /scenarios/:scenarioId : one scenario, its latest revision, its layout and its history.
import { useParams } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { Breadcrumbs } from '../../../components/ui/breadcrumbs';
import { TitledCard } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { isApiRequestError } from '../../../lib/api-client';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { useCanEdit } from '../../auth/hooks/use-can-edit';
import { useProject } from '../../projects/api/get-project';
import { NotFoundMessage } from '../../../components/not-found-message';
import { useRevisions } from '../api/get-revisions';
import { useScenario } from '../api/get-scenario';
import { EditorSlot } from '../components/editor-slot';
import { RevisionHistory } from '../components/revision-history';
import { ScenarioOverview } from '../components/scenario-overview';

export function ScenarioRoute() {
  const { scenarioId = '' } = useParams();
  const scenario = useScenario(scenarioId);
  const project = useProject(scenario.data?.projectId);
  const revisions = useRevisions(scenarioId);
  const mayEdit = useCanEdit(project.data?.organisationId);

  if (scenario.isPending) return <PageSpinner label="Loading the scenario…" />;
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
      <EditorSlot mayEdit={mayEdit} />
      <section aria-labelledby="overview-title" className="flex flex-col gap-4">
        <h2 id="overview-title" className="text-xl font-semibold">
          Layout overview
        </h2>
        <ScenarioOverview document={data.document} />
      </section>
      <TitledCard title="Revision history">
        {revisions.isPending && <PageSpinner label="Loading revisions…" />}
        {revisions.isError && <LoadError what="the revision history" error={revisions.error} onRetry={() => void revisions.refetch()} />}
        {revisions.data && <RevisionHistory revisions={revisions.data} latestNumber={latest.number} />}
      </TitledCard>
    </div>
  );
}
