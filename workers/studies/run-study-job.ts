// Runs one job of a study: the point's changes applied to its revision's document, then the job's
// block of replications. Anything a point can get wrong (a changed field outside its schema, more
// carriers than the track holds, a gridlock) comes back as an outcome with its reason, so a study
// goes on with its other points. Plain data in and out: a Web Worker, Node or a server process runs it.
import type { SaveJobResultInput, StudyJob } from '../../shared/api/studies';
import { applyPointChanges } from '../../shared/studies/point-changes';
import { ENGINE_VERSION, InvalidInputError, isSimulationStopped, runReplicationRange, type RunHooks } from '../engine';
import { blockToJson, type ReplicationBlockJson } from '../engine/observe/summary-json';

export type StudyJobOutcome =
  | { outcome: 'done'; engineVersion: string; block: ReplicationBlockJson }
  | { outcome: 'invalid' | 'stopped' | 'gridlock'; message: string }
  | { outcome: 'cancelled' };

/** The job as it travels to a runner: the study's job plus the revision's document it needs. */
export type StudyJobInput = Pick<StudyJob, 'changes' | 'settings' | 'first' | 'count'>;

export async function runStudyJob(
  document: unknown,
  job: StudyJobInput,
  hooks: RunHooks = {},
): Promise<StudyJobOutcome> {
  const changed = applyPointChanges(document, job.changes);
  if (!changed.ok) return { outcome: 'invalid', message: `${changed.path}: ${changed.message}` };
  try {
    const block = await runReplicationRange(
      changed.document,
      job.settings,
      { first: job.first, count: job.count },
      hooks,
    );
    return { outcome: 'done', engineVersion: ENGINE_VERSION, block: blockToJson(block) };
  } catch (e) {
    if (e instanceof InvalidInputError)
      return { outcome: 'invalid', message: e.issues.map((i) => `${i.path}: ${i.message}`).join('; ') };
    if (isSimulationStopped(e))
      return e.reason === 'cancelled'
        ? { outcome: 'cancelled' }
        : { outcome: e.reason === 'gridlock' ? 'gridlock' : 'stopped', message: e.message };
    throw e;
  }
}

/** A job's answer: the engine's, or `skipped` for a carrier count above one that gridlocked. */
export type JobAnswer = StudyJobOutcome | { outcome: 'skipped'; message: string };

/** The body that stores a finished job's outcome, as the browser posts it and the server's workers save it. */
export function jobResultBody(
  key: Pick<StudyJob, 'pointIndex' | 'first' | 'count'>,
  answer: Exclude<JobAnswer, { outcome: 'cancelled' }>,
): SaveJobResultInput {
  const base = { pointIndex: key.pointIndex, first: key.first, count: key.count };
  return answer.outcome === 'done'
    ? {
        ...base,
        outcome: 'done',
        engineVersion: answer.engineVersion,
        summaries: answer.block.summaries,
        series: answer.block.series,
        events: answer.block.events,
      }
    : { ...base, outcome: answer.outcome, message: answer.message.slice(0, 2_000) };
}
