// /projects/:projectId/runs : every stored run of a project's scenarios, to compare and sort.
import { useParams } from 'react-router-dom';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { useProject } from '../../features/projects/api/get-project';
import { RunListSection } from '../../features/runs/components/run-list-section';

export function ProjectRunsRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);

  if (project.isPending) return <PageSpinner label="Loading the project…" />;
  if (project.isError) {
    if (isApiRequestError(project.error) && project.error.status === 404) return <NotFoundMessage what="project" />;
    return <LoadError what="the project" error={project.error} onRetry={() => void project.refetch()} />;
  }
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`Runs of ${project.data.name}`}
        trail={
          <Breadcrumbs
            items={[
              { label: 'Projects', to: '/' },
              { label: project.data.name, to: `/projects/${projectId}` },
              { label: 'Runs' },
            ]}
          />
        }
        description="Every saved run of this project's scenarios. Sort by any column; filter to compare like with like."
      />
      <RunListSection
        scope={{ projectId }}
        organisationId={project.data.organisationId}
        caption="Runs in this project"
      />
    </div>
  );
}
