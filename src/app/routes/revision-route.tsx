// /scenarios/:scenarioId/revisions/:number : one saved revision, read-only, with its drawing and
// line balance. People who may edit can restore it, which saves its document as a new revision.
import { FormProvider, useForm } from 'react-hook-form';
import { Link, useNavigate, useParams } from 'react-router-dom';
import type { Revision } from '../../../shared/api/scenarios';
import type { ScenarioInput } from '../../../shared/scenario/scenario';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { ErrorBanner } from '../../components/ui/error-banner';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { formatDateTime, formatPerson } from '../../lib/format';
import { useProject } from '../../features/projects/api/get-project';
import { useScenarioRevision } from '../../features/scenarios/api/get-revision';
import { useScenario } from '../../features/scenarios/api/get-scenario';
import { useEditPermission } from '../../features/scenarios/hooks/use-edit-permission';
import { ScenarioOverview } from '../../features/scenarios/components/scenario-overview';
import { ImportExport } from '../../features/scenarios/editor/components/import-export';
import { WorkspaceBody } from '../../features/scenarios/editor/components/workspace-body';
import { useRestoreRevision } from '../../features/scenarios/editor/hooks/use-restore-revision';
import { stationStudies } from './station-studies';

function ReadOnlyRevision({ revision }: { revision: Revision }) {
  const form = useForm<ScenarioInput>({ defaultValues: revision.document });
  return (
    <FormProvider {...form}>
      <WorkspaceBody readOnly scenarioId={revision.scenarioId} stationStudies={stationStudies} />
    </FormProvider>
  );
}

export function RevisionRoute() {
  const { scenarioId = '', number = '' } = useParams();
  const revisionNumber = Number(number);
  const valid = Number.isInteger(revisionNumber) && revisionNumber > 0;
  const scenario = useScenario(scenarioId);
  const revision = useScenarioRevision(scenarioId, valid ? revisionNumber : 0);
  const project = useProject(scenario.data?.projectId);
  const { ready, mayEdit } = useEditPermission(project.data?.organisationId);
  const { restore, restoring, error } = useRestoreRevision(scenarioId);
  const navigate = useNavigate();

  if (!valid) return <NotFoundMessage what="revision" />;
  if (!ready || scenario.isPending || revision.isPending) return <PageSpinner label="Loading the revision…" />;
  for (const query of [scenario, revision]) {
    if (query.isError) {
      if (isApiRequestError(query.error) && query.error.status === 404) return <NotFoundMessage what="revision" />;
      return <LoadError what="the revision" error={query.error} onRetry={() => void query.refetch()} />;
    }
  }
  if (!scenario.data || !revision.data) return null;
  const latestNumber = scenario.data.latestRevision.number;
  const isLatest = revisionNumber === latestNumber;
  const onRestore = async () => {
    if (await restore(revisionNumber, latestNumber)) navigate(`/scenarios/${scenarioId}`);
  };

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`${scenario.data.name}, revision ${revisionNumber}`}
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: project.data?.name ?? 'Project', to: `/projects/${scenario.data.projectId}` },
              { label: scenario.data.name, to: `/scenarios/${scenarioId}` },
              { label: `Revision ${revisionNumber}` },
            ]}
          />
        }
        description={
          <p className="text-sm">
            Saved by {formatPerson(revision.data.createdBy)} on {formatDateTime(revision.data.createdAt)}
            {revision.data.message ? `: “${revision.data.message}”` : ''}.{' '}
            {isLatest ? 'This is the latest revision.' : `The latest is revision ${latestNumber}.`}
          </p>
        }
        actions={
          <Link
            to={`/scenarios/${scenarioId}`}
            className="text-sm font-semibold text-accent-strong underline underline-offset-4"
          >
            Back to the scenario
          </Link>
        }
      />
      <Card aria-label="Revision actions" className="flex flex-col gap-3">
        <p className="text-sm text-ink-soft">
          Saved revisions never change. Restoring saves this document again as a new revision with the note “Restored
          revision {revisionNumber}”.
        </p>
        {error && <ErrorBanner title="Not restored">{error}</ErrorBanner>}
        <div className="flex flex-wrap gap-3">
          {mayEdit && !isLatest && (
            <Button onClick={() => void onRestore()} pending={restoring !== null} pendingLabel="Restoring…">
              Restore revision {revisionNumber}
            </Button>
          )}
          <ImportExport exportDocument={() => ({ document: revision.data.document, revisionNumber })} />
        </div>
      </Card>
      <ReadOnlyRevision key={revision.data.id} revision={revision.data} />
      <ScenarioOverview document={revision.data.document} />
    </div>
  );
}
