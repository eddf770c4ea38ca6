// One engine thread of a worker process: runs a study job (the point's changes on its revision's
// document, then its block of replications) and returns the outcome as plain data. The thread knows
// nothing of the queue or the database; it is the same job function the browser's Web Workers run.
import { runStudyJob, type StudyJobInput, type StudyJobOutcome } from '../../workers/studies/run-study-job';

export type EngineTask = { document: unknown; job: StudyJobInput };

export default function runTask(task: EngineTask): Promise<StudyJobOutcome> {
  return runStudyJob(task.document, task.job);
}
