// Runs every job of a study definition in this process, one after another, and returns the study
// with its results as the API would show them. For tests, the command line and benchmarks; the
// browser spreads the same jobs over its worker pool instead.
import { gridlockGuard, studyJobs, type JobResult, type StudyDetail } from '../../shared/api/studies';
import { figuresOf } from '../../shared/studies/replication-summary-json';
import type { RunHooks } from '../engine';
import { runStudyJob } from './run-study-job';

export type LocalStudy = Pick<StudyDetail, 'id' | 'settings' | 'commonRandomNumbers' | 'blockSize' | 'points'> &
  Partial<Pick<StudyDetail, 'kind'>>;

export async function runStudyLocally(
  study: LocalStudy,
  documents: Record<string, unknown>,
  hooks: RunHooks = {},
): Promise<LocalStudy & { results: JobResult[] }> {
  const results: JobResult[] = [];
  const guard = gridlockGuard({ kind: study.kind ?? 'sweep', points: study.points, results });
  for (const job of studyJobs(study)) {
    const key = { pointIndex: job.pointIndex, first: job.first, count: job.count };
    const skipped = guard.skip(job);
    if (skipped !== null) {
      results.push({ ...key, outcome: 'skipped', message: skipped, figures: [] });
      continue;
    }
    const answer = await runStudyJob(documents[job.revisionId], job, hooks);
    if (answer.outcome === 'cancelled') break;
    guard.record(job, answer.outcome);
    results.push(
      answer.outcome === 'done'
        ? { ...key, outcome: 'done', message: null, figures: answer.block.summaries.map(figuresOf) }
        : { ...key, outcome: answer.outcome, message: answer.message, figures: [] },
    );
  }
  return { ...study, results };
}
