// /studies/:studyId : one study. It composes the studies feature with the scenario revision its jobs
// run, the project that says whether the reader may run them, and its read-only share links.
import { Link, useParams } from 'react-router-dom';
import type { StudyDetail } from '../../../shared/api/studies';
import { LoadError } from '../../components/load-error';
import { NotFoundMessage } from '../../components/not-found-message';
import { PageHeader } from '../../components/ui/page-header';
import { PageSpinner } from '../../components/ui/spinner';
import { isApiRequestError } from '../../lib/api-client';
import { useCanEdit } from '../../lib/session/use-can-edit';
import { useProject } from '../../features/projects/api/get-project';
import { SharePanel } from '../../features/sharing/components/share-panel';
import { useScenarioRevision } from '../../features/scenarios/api/get-revision';
import { useStudy } from '../../features/studies/api/get-study';
import { StudyView } from '../../features/studies/components/study-view';

export function StudyRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const project = useProject(study.data?.projectId);
  const mayRun = useCanEdit(project.data?.organisationId);

  if (study.isPending) return <PageSpinner label="Loading the study…" />;
  if (study.isError) {
    if (isApiRequestError(study.error) && study.error.status === 404) return <NotFoundMessage what="study" />;
    return <LoadError what="the study" error={study.error} onRetry={() => void study.refetch()} />;
  }
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={study.data.name}
        trail={
          <Link
            className="underline underline-offset-4 hover:text-ink"
            to={`/projects/${study.data.projectId}/studies`}
          >
            ← All studies{project.data ? ` of ${project.data.name}` : ''}
          </Link>
        }
      />
      <StudyWithScenario study={study.data} mayRun={mayRun} />
      <SharePanel kind="study" subjectId={study.data.id} mayShare={mayRun} />
    </div>
  );
}

function StudyWithScenario({ study, mayRun }: { study: StudyDetail; mayRun: boolean }) {
  const revision = useScenarioRevision(study.scenarioId, study.revisionNumber);
  if (revision.isError)
    return <LoadError what="the scenario revision" error={revision.error} onRetry={() => void revision.refetch()} />;
  if (revision.isPending) return <PageSpinner label="Loading the scenario…" />;
  return (
    <StudyView
      study={study}
      scenario={revision.data.document}
      documents={{ [study.revisionId]: revision.data.document }}
      mayRun={mayRun}
    />
  );
}
