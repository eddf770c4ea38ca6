// /projects/:projectId/studies : a project's studies and the form to make one. It composes the
// projects, scenarios and studies features (the form needs a scenario's latest document).
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
import { useScenarioRevision } from '../../features/scenarios/api/get-revision';
import { useScenarios } from '../../features/scenarios/api/get-scenarios';
import { useStudies } from '../../features/studies/api/get-studies';
import { CreateStudyForm, type ScenarioChoice } from '../../features/studies/components/create-study-form';
import { StudyList } from '../../features/studies/components/study-list';

export function ProjectStudiesRoute() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  const studies = useStudies(projectId);
  const scenarios = useScenarios(projectId);
  const mayEdit = useCanEdit(project.data?.organisationId);
  const [creating, setCreating] = useState(false);
  const [picked, setPicked] = useState('');
  const navigate = useNavigate();
  const choices = (scenarios.data ?? []).map((s) => ({
    id: s.id,
    name: s.name,
    revisionId: s.latestRevision.id,
    revisionNumber: s.latestRevision.number,
  }));
  const chosen = choices.find((c) => c.id === picked) ?? choices[0];

  if (project.isPending) return <PageSpinner label="Loading the project…" />;
  if (project.isError) {
    if (isApiRequestError(project.error) && project.error.status === 404) return <NotFoundMessage what="project" />;
    return <LoadError what="the project" error={project.error} onRetry={() => void project.refetch()} />;
  }
  const startButton = mayEdit && !creating && choices.length > 0 && (
    <Button onClick={() => setCreating(true)}>New study</Button>
  );

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`Studies of ${project.data.name}`}
        trail={
          <Link className="underline underline-offset-4 hover:text-ink" to={`/projects/${projectId}`}>
            ← {project.data.name}
          </Link>
        }
        description="A study runs one scenario many times over, at several carrier counts or settings, and answers with a chart and a recommendation."
        // The empty state carries the button while there are no studies, so the page never shows two.
        actions={
          (studies.data?.length ?? 0) > 0 ? (
            <>
              {(studies.data?.length ?? 0) > 1 && (
                <ButtonLink to={`/projects/${projectId}/compare/studies`}>Compare studies</ButtonLink>
              )}
              {startButton}
            </>
          ) : undefined
        }
      />
      {creating && chosen && (
        <TitledCard title="New study" className="max-w-3xl">
          <NewStudy
            projectId={projectId}
            choices={choices}
            chosen={chosen}
            onPick={setPicked}
            onCancel={() => setCreating(false)}
            onCreated={(id) => navigate(`/studies/${id}`)}
          />
        </TitledCard>
      )}
      {studies.isPending && <PageSpinner label="Loading studies…" />}
      {studies.isError && <LoadError what="the studies" error={studies.error} onRetry={() => void studies.refetch()} />}
      {studies.data && studies.data.length === 0 && !creating && (
        <EmptyState title="No studies yet" action={startButton || undefined}>
          {choices.length === 0
            ? 'Add a scenario to the project first; a study runs one of its scenarios many times over.'
            : mayEdit
              ? 'Size the carrier fleet, sweep a setting, or rank which station is worth speeding up.'
              : 'Nobody has made a study in this project yet. Engineers and owners can.'}
        </EmptyState>
      )}
      {studies.data && studies.data.length > 0 && <StudyList studies={studies.data} />}
    </div>
  );
}

interface NewStudyProps {
  projectId: string;
  choices: ScenarioChoice[];
  chosen: ScenarioChoice;
  onPick: (id: string) => void;
  onCancel: () => void;
  onCreated: (studyId: string) => void;
}

function NewStudy({ projectId, choices, chosen, onPick, onCancel, onCreated }: NewStudyProps) {
  const revision = useScenarioRevision(chosen.id, chosen.revisionNumber);
  return (
    <CreateStudyForm
      projectId={projectId}
      scenarios={choices}
      scenarioId={chosen.id}
      onScenarioChange={onPick}
      scenario={revision.data?.document}
      onCancel={onCancel}
      onCreated={(study) => onCreated(study.id)}
    />
  );
}
