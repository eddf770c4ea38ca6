// A study job that failed on every attempt arrives here from the dead-letter queue with the last
// attempt's error. It is recorded on its study once (unless a late attempt stored a result after all),
// and the study settles, so a study with jobs that cannot run still finishes and says why.
import type PgBoss from 'pg-boss';
import { STUDY_LIMITS } from '../../shared/api/studies';
import { StudyEntity, StudyJobFailureEntity, StudyJobResultEntity } from '../db/entities';
import { JOB_RETRIES, type StudyJobMessage } from '../queue/queue-client';
import { settle, type StudyJobContext } from './handle-study-job';

/** pg-boss keeps a thrown error as `{message}` and a time-out as `{value: {message}}`. */
function reasonOf(output: unknown): string {
  const o = output as { message?: unknown; value?: { message?: unknown } } | null;
  const message =
    typeof o?.message === 'string' ? o.message : typeof o?.value?.message === 'string' ? o.value.message : null;
  const attempts = `failed ${JOB_RETRIES + 1} times`;
  if (!message) return `${attempts}; the worker running it stopped without a reason`;
  if (message.includes('job failed by timeout'))
    return `${attempts}; last: no answer within the time limit (the worker running it stopped, or the job took too long)`;
  return `${attempts}; last: ${message}`.slice(0, STUDY_LIMITS.messageMaxLength);
}

export function deadLetterHandler(ctx: Pick<StudyJobContext, 'ds' | 'boss'>) {
  return async (job: PgBoss.JobWithMetadata<StudyJobMessage>): Promise<{ recorded: boolean }> => {
    const message = job.data;
    const study = await ctx.ds.getRepository(StudyEntity).findOneBy({ id: message.studyId });
    if (!study || study.queueRound !== message.round) return { recorded: false };
    const key = { studyId: study.id, pointIndex: message.pointIndex, first: message.first };
    if (await ctx.ds.getRepository(StudyJobResultEntity).existsBy(key)) return { recorded: false };
    await ctx.ds
      .getRepository(StudyJobFailureEntity)
      .createQueryBuilder()
      .insert()
      .values({ ...key, count: message.count, reason: reasonOf(job.output) })
      .orIgnore()
      .execute();
    if (study.status === 'running') await settle(ctx, study);
    return { recorded: true };
  };
}
