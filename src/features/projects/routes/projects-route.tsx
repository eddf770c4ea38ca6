// / : the active organisation's projects, and the way to start a new one.
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { Button } from '../../../components/ui/button';
import { TitledCard } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { useCanEdit } from '../../../lib/session/use-can-edit';
import { useSession } from '../../../lib/session/session-context';
import { useProjects } from '../api/get-projects';
import { CreateProjectForm } from '../components/create-project-form';
import { ProjectList } from '../components/project-list';

export function ProjectsRoute() {
  const { activeMembership } = useSession();
  const organisationId = activeMembership?.organisationId;
  const projects = useProjects(organisationId);
  const mayCreate = useCanEdit(organisationId);
  const [creating, setCreating] = useState(false);
  const navigate = useNavigate();

  if (!activeMembership) {
    return (
      <EmptyState title="You are not in an organisation yet">
        Ask an owner of your organisation to add your e-mail address as a member, then sign in again.
      </EmptyState>
    );
  }

  const startButton = mayCreate && !creating && <Button onClick={() => setCreating(true)}>New project</Button>;

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title="Projects"
        description={`Line-design jobs of ${activeMembership.organisationName}. Each project holds the scenarios you compare.`}
        actions={projects.data && projects.data.length > 0 ? startButton : undefined}
      />
      {creating && organisationId && (
        <TitledCard title="New project" className="max-w-2xl">
          <CreateProjectForm
            organisationId={organisationId}
            onCancel={() => setCreating(false)}
            onCreated={(p) => navigate(`/projects/${p.id}`)}
          />
        </TitledCard>
      )}
      {projects.isPending && <PageSpinner label="Loading projects…" />}
      {projects.isError && (
        <LoadError what="the projects" error={projects.error} onRetry={() => void projects.refetch()} />
      )}
      {projects.data && projects.data.length === 0 && !creating && (
        <EmptyState title="No projects yet" action={startButton}>
          {mayCreate
            ? 'A project groups the layouts you compare for one line. Create one, then add a scenario from an example layout.'
            : 'Nobody has created a project here yet. Engineers and owners of your organisation can create one; you will see it here.'}
        </EmptyState>
      )}
      {projects.data && projects.data.length > 0 && <ProjectList projects={projects.data} />}
    </div>
  );
}
