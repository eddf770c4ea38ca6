// /projects/:projectId : a project and its scenarios. It composes the projects
// and scenarios features, so it lives with the app rather than in either.
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { Button, ButtonLink } from '../../components/ui/button';
import { TitledCard } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { useCanEdit } from '../../lib/session/use-can-edit';
import { useProject } from '../../features/projects/api/get-project';
import { useScenarios } from '../../features/scenarios/api/get-scenarios';
import { CreateScenarioForm } from '../../features/scenarios/components/create-scenario-form';
import { ScenarioList } from '../../features/scenarios/components/scenario-list';

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  const scenarios = useScenarios(projectId);
  const mayEdit = useCanEdit(project.data?.organisationId);
  const [creating, setCreating] = useState(false);
  const navigate = useNavigate();

  if (project.isPending) return <PageSpinner label="Loading the project…" />;
  if (project.isError) {
    if (isApiRequestError(project.error) && project.error.status === 404) return <NotFoundMessage what="project" />;
    return <LoadError what="the project" error={project.error} onRetry={() => void project.refetch()} />;
  }

  const startButton = mayEdit && !creating && <Button onClick={() => setCreating(true)}>New scenario</Button>;

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={project.data.name}
        trail={
          <Link className="underline underline-offset-4 hover:text-ink" to="/">
            ← All projects
          </Link>
        }
        description={project.data.description || undefined}
        actions={
          <>
            <ButtonLink to={`/projects/${projectId}/runs`}>All runs</ButtonLink>
            <ButtonLink to={`/projects/${projectId}/studies`}>Studies</ButtonLink>
            {scenarios.data && scenarios.data.length > 1 && (
              <ButtonLink to={`/projects/${projectId}/compare`}>Compare layouts</ButtonLink>
            )}
            {scenarios.data && scenarios.data.length > 0 ? startButton : null}
          </>
        }
      />
      {creating && (
        <TitledCard title="New scenario" className="max-w-2xl">
          <CreateScenarioForm
            projectId={projectId}
            existing={scenarios.data ?? []}
            onCancel={() => setCreating(false)}
            onCreated={(scenario) => navigate(`/scenarios/${scenario.id}`)}
          />
        </TitledCard>
      )}
      <section aria-labelledby="scenarios-title" className="flex flex-col gap-4">
        <h2 id="scenarios-title" className="text-xl font-semibold">
          Scenarios
        </h2>
        {scenarios.isPending && <PageSpinner label="Loading scenarios…" />}
        {scenarios.isError && (
          <LoadError what="the scenarios" error={scenarios.error} onRetry={() => void scenarios.refetch()} />
        )}
        {scenarios.data && scenarios.data.length === 0 && !creating && (
          <EmptyState title="No scenarios yet" action={startButton}>
            {mayEdit
              ? 'A scenario is one layout of the line: track, carriers, stations and shifts. Start from an example layout and adapt it, then run it to see throughput.'
              : 'Nobody has added a scenario to this project yet. Engineers and owners can add one; it will appear here.'}
          </EmptyState>
        )}
        {scenarios.data && scenarios.data.length > 0 && <ScenarioList scenarios={scenarios.data} />}
      </section>
    </div>
  );
}
