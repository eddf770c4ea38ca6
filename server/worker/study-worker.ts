// A study worker: engine threads fed from the queue. Any number of these, in any number of processes on
// any number of machines pointed at the same database, share a study's jobs; pg-boss hands each queued
// job to one of them at a time (FOR UPDATE SKIP LOCKED), and the results' unique key keeps a job that
// ran twice (after a crash or a time-out) from counting twice.
import type { DataSource } from 'typeorm';
import { pollQueue } from '../queue/poll-queue';
import { QUEUES, startQueue, stopQueue, type StudyJobMessage } from '../queue/queue-client';
import { startEngineThreads } from './engine-threads';
import { studyJobHandler } from './handle-study-job';
import { deadLetterHandler } from './record-dead-letter';

export interface StudyWorkerOptions {
  ds: DataSource;
  /** The same database as `ds`, for pg-boss's own connections. */
  url: string;
  /** Engine threads; one per core when unset. */
  threads?: number;
  /** How often expired jobs are failed for retry (see LANEWRIGHT_QUEUE_CHECK_SECONDS). */
  checkSeconds?: number;
  log?: (line: string) => void;
}

export interface StudyWorker {
  threads: number;
  stop(): Promise<void>;
}

export async function startStudyWorker(options: StudyWorkerOptions): Promise<StudyWorker> {
  const log = options.log ?? ((line: string) => console.log(`[lanewright] worker: ${line}`));
  const boss = await startQueue(options.url, {
    checkSeconds: options.checkSeconds,
    onError: (error) => log(`queue: ${error.message}`),
  });
  const engine = startEngineThreads(options.threads);
  const ctx = { ds: options.ds, boss, engine };
  const jobs = pollQueue<StudyJobMessage>(boss, {
    queue: QUEUES.studyJob,
    slots: engine.size,
    idleMs: 500,
    handle: studyJobHandler(ctx),
    onError: (error, job) =>
      log(
        `${job ? `job ${job.data.pointIndex}:${job.data.first} of study ${job.data.studyId}` : 'fetching'}: ${error.message}`,
      ),
  });
  const deadLetters = pollQueue<StudyJobMessage>(boss, {
    queue: QUEUES.studyJobDead,
    slots: 1,
    idleMs: 2_000,
    handle: deadLetterHandler(ctx),
    onError: (error) => log(`dead letter: ${error.message}`),
  });
  return {
    threads: engine.size,
    stop: async () => {
      // Ending the threads fails the jobs in hand at once, so they retry elsewhere without waiting for expiry.
      await Promise.all([jobs.stop(), deadLetters.stop(), engine.close()]);
      await stopQueue(boss);
    },
  };
}
