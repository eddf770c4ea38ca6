// The job queue: pg-boss on the application's own PostgreSQL, in a schema of its own that pg-boss creates
// and migrates itself when it starts. Three queues: study jobs (retried, with a time limit, then
// dead-lettered), their dead letters, and the notices of finished studies that the web server mails.
import PgBoss from 'pg-boss';

export const QUEUE_SCHEMA = 'lanewright_queue';

export const QUEUES = {
  studyJob: 'study-job',
  studyJobDead: 'study-job-dead',
  studyFinished: 'study-finished',
} as const;

/** Attempts after the first; a job failing all three goes to the dead-letter queue. */
export const JOB_RETRIES = 2;
/** Seconds before the first retry; pg-boss doubles it (with jitter) for each further one. */
export const RETRY_DELAY_SECONDS = 2;

/** One job as it travels through the queue: its key in the study and the queue round it belongs to. */
export type StudyJobMessage = { studyId: string; round: number; pointIndex: number; first: number; count: number };
export type StudyFinishedMessage = { studyId: string };

export interface QueueOptions {
  /** Connections in pg-boss's own pool. */
  connections?: number;
  /** How often expired jobs (held by a worker that died) are failed so they retry; pg-boss's maintenance. */
  checkSeconds?: number;
  /** Whether this process takes part in maintenance (expiry, archiving); any number may, one at a time. */
  supervise?: boolean;
  /** Where pg-boss's background errors go (a lost connection while PostgreSQL restarts, say). */
  onError?: (error: Error) => void;
}

async function ensureQueue(boss: PgBoss, name: string, options: Omit<PgBoss.Queue, 'name'>): Promise<void> {
  if (await boss.getQueue(name)) return;
  try {
    await boss.createQueue(name, { name, ...options });
  } catch (error) {
    // Another process created it between the look and the creation.
    if (!(await boss.getQueue(name))) throw error;
  }
}

/** Starts pg-boss on `url` (creating or migrating its schema) and makes sure Lanewright's queues exist. */
export async function startQueue(url: string, options: QueueOptions = {}): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: url,
    schema: QUEUE_SCHEMA,
    application_name: 'lanewright-queue',
    max: options.connections ?? 4,
    supervise: options.supervise ?? true,
    schedule: false,
    maintenanceIntervalSeconds: options.checkSeconds ?? 30,
  });
  boss.on('error', options.onError ?? ((error) => console.error(`[lanewright] job queue: ${error.message}`)));
  await boss.start();
  await ensureQueue(boss, QUEUES.studyJobDead, { retryLimit: 0 });
  await ensureQueue(boss, QUEUES.studyJob, {
    retryLimit: JOB_RETRIES,
    retryDelay: RETRY_DELAY_SECONDS,
    retryBackoff: true,
    deadLetter: QUEUES.studyJobDead,
  });
  await ensureQueue(boss, QUEUES.studyFinished, { retryLimit: 5, retryDelay: 30 });
  return boss;
}

/** Creates or migrates the queue's schema and stops again: for `npm run migrate` and test set-up. */
export async function prepareQueueSchema(url: string): Promise<void> {
  const boss = await startQueue(url, { connections: 1, supervise: false });
  await boss.stop({ graceful: false, wait: true });
}

export async function stopQueue(boss: PgBoss): Promise<void> {
  await boss.stop({ graceful: false, wait: true, timeout: 5_000 });
}
