// Putting a server study's jobs on the queue and taking them off again. Queue ids are derived from the
// study, its queue round and the job's key, so cancelling needs no stored list of ids, and enqueueing the
// same round twice adds nothing (pg-boss inserts with ON CONFLICT DO NOTHING). The insert goes through
// the caller's transaction, so a study exists with its jobs queued or not at all.
import { createHash } from 'node:crypto';
import type PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { QUEUES, type StudyJobMessage } from './queue-client';

export type JobKey = { pointIndex: number; first: number; count: number };

/** A name-based UUID (version 5 layout, SHA-1) for one job of one round of a study. */
export function queueJobId(studyId: string, round: number, key: { pointIndex: number; first: number }): string {
  const hash = createHash('sha1').update(`lanewright-study-job:${studyId}:${round}:${key.pointIndex}:${key.first}`);
  const bytes = hash.digest().subarray(0, 16);
  bytes[6] = (bytes[6] & 0x0f) | 0x50;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** pg-boss's statements run on the caller's TypeORM transaction. */
function inTransaction(manager: EntityManager): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const runner = manager.queryRunner;
      if (!runner) throw new Error('enqueueing study jobs needs a transaction');
      const result = await runner.query(text, values, true);
      return { rows: result.records };
    },
  };
}

export interface EnqueueInput {
  studyId: string;
  round: number;
  jobs: JobKey[];
  /** Seconds one attempt may run before it counts as failed. */
  timeLimitSeconds: number;
}

/** Inserts in slices, so one statement's JSON stays small even for the largest studies. */
const SLICE = 2_000;

export async function enqueueStudyJobs(boss: PgBoss, manager: EntityManager, input: EnqueueInput): Promise<void> {
  const db = inTransaction(manager);
  for (let start = 0; start < input.jobs.length; start += SLICE) {
    const slice = input.jobs.slice(start, start + SLICE).map((job) => {
      const data: StudyJobMessage = { studyId: input.studyId, round: input.round, ...job };
      return {
        id: queueJobId(input.studyId, input.round, job),
        name: QUEUES.studyJob,
        data,
        expireInSeconds: input.timeLimitSeconds,
      };
    });
    await boss.insert(slice, { db });
  }
}

/** Cancels the round's jobs that have not finished; ones a worker is running finish or are dropped there. */
export async function cancelStudyJobs(
  boss: PgBoss,
  studyId: string,
  round: number,
  jobs: Pick<JobKey, 'pointIndex' | 'first'>[],
): Promise<void> {
  for (let start = 0; start < jobs.length; start += SLICE) {
    const ids = jobs.slice(start, start + SLICE).map((job) => queueJobId(studyId, round, job));
    if (ids.length > 0) await boss.cancel(QUEUES.studyJob, ids);
  }
}
