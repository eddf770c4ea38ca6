// The web server's side of a finished server study: the worker that settled it queued a notice, and
// this process, which holds the mailer, mails the author when the study took long enough to be worth a
// mail. A failed send fails the notice, and the queue retries it.
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { StudyEntity, StudyJobFailureEntity, StudyJobResultEntity } from '../db/entities';
import type { Mailer } from '../mail/mailer';
import { studyFinishedMail } from '../mail/messages';
import { pollQueue, type Poller } from '../queue/poll-queue';
import { QUEUES, type StudyFinishedMessage } from '../queue/queue-client';

export interface FinishNoticeOptions {
  ds: DataSource;
  boss: PgBoss;
  mailer: Mailer;
  /** Where users reach the app, for the link in the mail. */
  origin: string;
  /** Studies that took less than this are not mailed about: their author is most likely still watching. */
  mailAfterMinutes: number;
}

function describeTime(ms: number): string {
  const minutes = Math.max(1, Math.round(ms / 60_000));
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${minutes % 60} min`;
}

export function startFinishNotices(options: FinishNoticeOptions): Poller {
  const { ds } = options;
  return pollQueue<StudyFinishedMessage>(options.boss, {
    queue: QUEUES.studyFinished,
    slots: 2,
    idleMs: 2_000,
    handle: async (job) => {
      const study = await ds
        .getRepository(StudyEntity)
        .findOne({ where: { id: job.data.studyId }, relations: { createdBy: true } });
      if (!study?.createdBy || !study.finishedAt) return { mailed: false };
      const took = study.finishedAt.getTime() - (study.queuedAt ?? study.createdAt).getTime();
      if (took < options.mailAfterMinutes * 60_000) return { mailed: false };
      const jobsDone = await ds.getRepository(StudyJobResultEntity).countBy({ studyId: study.id });
      const failedJobs = await ds.getRepository(StudyJobFailureEntity).countBy({ studyId: study.id });
      await options.mailer.send(
        studyFinishedMail(study.createdBy.email, {
          studyName: study.name,
          outcome: study.status === 'done' ? 'every point has its result' : 'some points have no result',
          jobsDone,
          jobCount: study.jobCount,
          failedJobs,
          took: describeTime(took),
          link: new URL(`/studies/${study.id}`, options.origin).toString(),
        }),
      );
      return { mailed: true };
    },
  });
}
