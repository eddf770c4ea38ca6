// A fetch loop over one queue with a fixed number of slots. pg-boss's own `work` completes jobs without
// awaiting the result, so a completion that fails while PostgreSQL restarts would surface as an unhandled
// rejection; here every queue call is awaited and a failure only logs: a job left active is failed by the
// queue's expiry and retried, and every handler is idempotent.
import { setTimeout as sleep } from 'node:timers/promises';
import type PgBoss from 'pg-boss';

export interface PollOptions<T> {
  queue: string;
  slots: number;
  /** Wait between fetches while the queue is empty. */
  idleMs?: number;
  handle: (job: PgBoss.JobWithMetadata<T>) => Promise<unknown>;
  onError?: (error: Error, job?: PgBoss.JobWithMetadata<T>) => void;
}

export interface Poller {
  /** Stops fetching and waits for the jobs in hand. */
  stop(): Promise<void>;
}

const asError = (e: unknown) => (e instanceof Error ? e : new Error(String(e)));

export function pollQueue<T>(boss: PgBoss, options: PollOptions<T>): Poller {
  const report =
    options.onError ?? ((error: Error) => console.error(`[lanewright] ${options.queue}: ${error.message}`));
  const inHand = new Set<Promise<void>>();
  let stopping = false;
  let wake: (() => void) | null = null;

  const settle = async (job: PgBoss.JobWithMetadata<T>) => {
    try {
      const output = await options.handle(job);
      await boss.complete(options.queue, job.id, output && typeof output === 'object' ? output : undefined);
    } catch (error) {
      const err = asError(error);
      report(err, job);
      await boss.fail(options.queue, job.id, { message: err.message }).catch((e: unknown) => report(asError(e), job));
    }
  };

  const loop = async () => {
    while (!stopping) {
      if (inHand.size >= options.slots) {
        await Promise.race(inHand);
        continue;
      }
      let jobs: PgBoss.JobWithMetadata<T>[] = [];
      try {
        jobs = await boss.fetch<T>(options.queue, {
          batchSize: options.slots - inHand.size,
          includeMetadata: true,
        });
      } catch (error) {
        report(asError(error));
      }
      for (const job of jobs) {
        const running: Promise<void> = settle(job).finally(() => {
          inHand.delete(running);
          wake?.();
        });
        inHand.add(running);
      }
      if (jobs.length === 0 && !stopping) {
        const idle = new AbortController();
        wake = () => idle.abort();
        await sleep(options.idleMs ?? 1_000, undefined, { signal: idle.signal }).catch(() => undefined);
        wake = null;
      }
    }
  };
  const looping = loop();
  return {
    stop: async () => {
      stopping = true;
      wake?.();
      await looping;
      await Promise.all(inHand);
    },
  };
}
