// A server study's progress, as the server reports it: jobs done of all jobs, the time left at the
// workers' current pace, jobs that failed on every attempt with their reason, and Cancel or Resume.
// When the count moves, the study itself is read again so the charts fill in as results arrive.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import type { StudyDetail } from '../../../../shared/api/studies';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { formatDuration } from '../../../lib/format';
import { useStudyProgress } from '../api/get-study-progress';
import { studyKeys } from '../api/keys';
import { useUpdateStudy } from '../api/update-study';
import { StudyProgress } from './study-progress';

export function ServerStudyProgress({ study, mayRun }: { study: StudyDetail; mayRun: boolean }) {
  const progress = useStudyProgress(study.id);
  const update = useUpdateStudy(study.id);
  const queryClient = useQueryClient();
  const data = progress.data;
  const done = data?.jobsDone ?? study.jobsDone;
  const status = data?.status ?? study.status;

  useEffect(() => {
    if (data && (data.jobsDone !== study.jobsDone || data.status !== study.status))
      void queryClient.invalidateQueries({ queryKey: studyKeys.detail(study.id), exact: true });
  }, [data, study.jobsDone, study.status, study.id, queryClient]);

  const running = status === 'running';
  const failed = data?.failedJobs ?? [];
  return (
    <div className="flex flex-col gap-3">
      {(running || done < study.jobCount) && (
        <StudyProgress
          done={done}
          total={study.jobCount}
          running={running}
          place="on the server’s workers"
          remainingMs={data?.remainingMs ?? null}
          onCancel={mayRun && !update.isPending ? () => update.mutate({ status: 'cancelled' }) : undefined}
          onResume={mayRun && status === 'cancelled' ? () => update.mutate({ status: 'running' }) : undefined}
        />
      )}
      {running && data?.idleSeconds != null && (
        <p role="status" className="rounded-md border border-caution/40 p-3 text-sm" data-testid="workers-idle">
          No study worker has worked on this study for {formatDuration(data.idleSeconds)}: its jobs wait on the server’s
          queue. Whoever runs Lanewright for your team starts workers with <code>npm run worker</code> (
          <code>npm start</code> runs one too, unless it was started with LANEWRIGHT_WORKER=off). The study carries on
          by itself once a worker runs.
        </p>
      )}
      {update.error && <ErrorBanner title="The study was not changed">{update.error.message}</ErrorBanner>}
      {failed.length > 0 && (
        <section aria-labelledby="failed-jobs-title" className="rounded-md border border-caution/40 p-3 text-sm">
          <h3 id="failed-jobs-title" className="font-semibold">
            {failed.length} {failed.length === 1 ? 'job' : 'jobs'} failed on every attempt
          </h3>
          <ul className="mt-1 list-disc pl-5">
            {failed.map((f) => (
              <li key={`${f.pointIndex}:${f.first}`}>
                {study.points[f.pointIndex]?.label ?? `Point ${f.pointIndex + 1}`}, replications {f.first + 1}–
                {f.first + f.count}: {f.reason}
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
