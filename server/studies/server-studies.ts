// Studies that run on the server: the organisation's limit on concurrent ones, and queueing a round of
// jobs (at creation, and again on resume for the jobs still without a result). Checks and queueing run
// in the caller's transaction; an advisory lock per organisation makes the count and the insert one step,
// so two requests at once cannot both take the last free place.
import type PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { SERVER_STUDY_LIMITS } from '../../shared/api/studies';
import { StudyEntity, StudyJobFailureEntity, StudyJobResultEntity } from '../db/entities';
import { conflict } from '../http/http-error';
import { cancelStudyJobs, enqueueStudyJobs, type JobKey } from '../queue/study-jobs';

/** What the web server needs to queue studies: the started queue and the time limit of one job. */
export interface StudyQueueHandle {
  boss: PgBoss;
  timeLimitSeconds: number;
}

type Planned = Pick<StudyEntity, 'pointCount' | 'blockSize' | 'settings'>;

/** Every job key of a study, in point order. */
export function jobKeys(study: Planned): JobKey[] {
  const { replications } = study.settings;
  const keys: JobKey[] = [];
  for (let pointIndex = 0; pointIndex < study.pointCount; pointIndex++)
    for (let first = 0; first < replications; first += study.blockSize)
      keys.push({ pointIndex, first, count: Math.min(study.blockSize, replications - first) });
  return keys;
}

export async function assertServerStudyAllowed(manager: EntityManager, organisationId: string): Promise<void> {
  await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`lanewright-server-studies:${organisationId}`]);
  const running = await manager
    .getRepository(StudyEntity)
    .createQueryBuilder('study')
    .innerJoin('study.project', 'project')
    .where('project.organisationId = :organisationId', { organisationId })
    .andWhere("study.runOn = 'server' AND study.status = 'running'")
    .getCount();
  const max = SERVER_STUDY_LIMITS.concurrentPerOrganisation;
  if (running >= max)
    throw conflict(
      `Your organisation already runs ${running} studies on the server, the most it may run at once (${max}). ` +
        'Wait for one to finish, cancel one, or run this study in the browser.',
      [{ path: 'runOn', message: `at most ${max} server studies of an organisation may run at once` }],
    );
}

/** Keys of the study's jobs that have no result yet. */
async function pendingKeys(manager: EntityManager, study: StudyEntity): Promise<JobKey[]> {
  const done = await manager
    .getRepository(StudyJobResultEntity)
    .find({ select: { pointIndex: true, first: true }, where: { studyId: study.id } });
  const have = new Set(done.map((r) => `${r.pointIndex}:${r.first}`));
  return jobKeys(study).filter((k) => !have.has(`${k.pointIndex}:${k.first}`));
}

/** Queues the study's jobs without a result under a new round, forgetting earlier failures. */
export async function queueStudyRound(
  manager: EntityManager,
  queue: StudyQueueHandle,
  study: StudyEntity,
): Promise<{ round: number; jobs: number }> {
  const round = study.queueRound + 1;
  await manager.getRepository(StudyJobFailureEntity).delete({ studyId: study.id });
  const jobs = await pendingKeys(manager, study);
  await manager.getRepository(StudyEntity).update({ id: study.id }, { queueRound: round, queuedAt: new Date() });
  await enqueueStudyJobs(queue.boss, manager, {
    studyId: study.id,
    round,
    jobs,
    timeLimitSeconds: queue.timeLimitSeconds,
  });
  return { round, jobs: jobs.length };
}

/** Takes the current round's unfinished jobs off the queue (a cancelled or deleted study). */
export async function unqueueStudy(manager: EntityManager, queue: StudyQueueHandle, study: StudyEntity): Promise<void> {
  await cancelStudyJobs(queue.boss, study.id, study.queueRound, await pendingKeys(manager, study));
}
