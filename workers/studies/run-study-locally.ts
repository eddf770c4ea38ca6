// Runs every job of a study definition in this process, one after another, and returns the study
// with its results as the API would show them. For tests, the command line and benchmarks; the
// browser spreads the same jobs over its worker pool instead.
import { studyJobs, type JobResult, type StudyDetail } from '../../shared/api/studies';
import { figuresOf } from '../../shared/studies/replication-summary-json';
import type { RunHooks } from '../engine';
import { runStudyJob } from './run-study-job';

export type LocalStudy = Pick<StudyDetail, 'id' | 'settings' | 'commonRandomNumbers' | 'blockSize' | 'points'>;

export async function runStudyLocally(
  study: LocalStudy,
  documents: Record<string, unknown>,
  hooks: RunHooks = {},
): Promise<LocalStudy & { results: JobResult[] }> {
  const results: JobResult[] = [];
  for (const job of studyJobs(study)) {
    const answer = await runStudyJob(documents[job.revisionId], job, hooks);
    if (answer.outcome === 'cancelled') break;
    const key = { pointIndex: job.pointIndex, first: job.first, count: job.count };
    results.push(
      answer.outcome === 'done'
        ? { ...key, outcome: 'done', message: null, figures: answer.block.summaries.map(figuresOf) }
        : { ...key, outcome: answer.outcome, message: answer.message, figures: [] },
    );
  }
  return { ...study, results };
}
