// A server study's progress for the study page: jobs done from the stored results (never a counter),
// the jobs that failed on every attempt with their reason, and the time left from the pace of the
// latest results, which reflects however many workers are pulling jobs right now.
import { MoreThanOrEqual, type DataSource } from 'typeorm';
import type { StudyProgress } from '../../shared/api/studies';
import { StudyJobFailureEntity, StudyJobResultEntity, type StudyEntity } from '../db/entities';
import { iso } from '../mappers/common';
import { QUEUE_SCHEMA, QUEUES } from '../queue/queue-client';

/** Results the pace is taken from: enough to smooth over jobs of unequal length, few enough to follow changes. */
const PACE_WINDOW = 24;
/** Quiet longer than this, with no job held by a worker, is reported as idle. */
export const IDLE_AFTER_SECONDS = 60;

/** Jobs of the study a worker holds right now (pg-boss marks a fetched job active until it completes). */
async function heldJobs(ds: DataSource, studyId: string): Promise<number> {
  const rows: { n: number }[] = await ds.query(
    `SELECT count(*)::int AS n FROM "${QUEUE_SCHEMA}".job WHERE name = $1 AND state = 'active' AND data->>'studyId' = $2`,
    [QUEUES.studyJob, studyId],
  );
  return rows[0]?.n ?? 0;
}

export async function studyProgress(ds: DataSource, study: StudyEntity): Promise<StudyProgress> {
  const results = ds.getRepository(StudyJobResultEntity);
  const jobsDone = await results.countBy({ studyId: study.id });
  const failures = await ds
    .getRepository(StudyJobFailureEntity)
    .find({ where: { studyId: study.id }, order: { pointIndex: 'ASC', first: 'ASC' } });
  const remaining = study.jobCount - jobsDone - failures.length;
  let remainingMs: number | null = null;
  let idleSeconds: number | null = null;
  if (study.status === 'running' && remaining > 0) {
    const latest = await results.find({
      select: { id: true, createdAt: true },
      where: { studyId: study.id, ...(study.queuedAt && { createdAt: MoreThanOrEqual(study.queuedAt) }) },
      order: { createdAt: 'DESC' },
      take: PACE_WINDOW,
    });
    // With a full window the pace runs from its oldest result; before that, from when the round was queued.
    const full = latest.length === PACE_WINDOW;
    const since = full ? latest.at(-1)!.createdAt : (study.queuedAt ?? study.createdAt);
    const finished = full ? latest.length - 1 : latest.length;
    const span = Date.now() - since.getTime();
    if (finished > 0 && span > 0) remainingMs = Math.round((remaining * span) / finished);
    const quiet = Math.floor(
      (Date.now() - (latest[0]?.createdAt ?? study.queuedAt ?? study.createdAt).getTime()) / 1000,
    );
    if (quiet > IDLE_AFTER_SECONDS && (await heldJobs(ds, study.id)) === 0) idleSeconds = quiet;
  }
  return {
    status: study.status,
    jobCount: study.jobCount,
    jobsDone,
    failedJobs: failures.map((f) => ({
      pointIndex: f.pointIndex,
      first: f.first,
      count: f.count,
      reason: f.reason,
      failedAt: iso(f.failedAt),
    })),
    remainingMs,
    idleSeconds,
    finishedAt: study.finishedAt ? iso(study.finishedAt) : null,
  };
}
