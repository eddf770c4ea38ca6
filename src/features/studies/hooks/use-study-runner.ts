// Runs a study's pending jobs on the shared worker pool and saves each result as it arrives. Progress
// is jobs done over jobs in the study, with time left from the pace of this session (finished jobs plus
// the fractions of those in flight). Cancel stops the work at once and marks the study cancelled;
// finished jobs stay saved, and Resume (or reopening a running study) carries on with the rest.
import { useQueryClient } from '@tanstack/react-query';
import * as Comlink from 'comlink';
import { useCallback, useEffect, useRef, useState } from 'react';
import {
  gridlockGuard,
  pendingJobs,
  type SaveJobResultInput,
  type StudyDetail,
  type StudyJob,
} from '../../../../shared/api/studies';
import type { Progress } from '../../../../workers/engine';
import { jobResultBody, type JobAnswer } from '../../../../workers/studies/run-study-job';
import { isCancelled, sharedEnginePool, type PoolSession } from '../../../lib/engine/engine-pool';
import { saveJobResult } from '../api/save-job-result';
import { studyKeys } from '../api/keys';
import { updateStudy } from '../api/update-study';

/** `held`: the reader cancelled here, so the page must not start the jobs again until they resume. */
export type RunnerState = {
  running: boolean;
  held: boolean;
  done: number;
  total: number;
  remainingMs: number | null;
  problem: string | null;
};

const MIN_ELAPSED_MS = 1_000;
const SAVE_ATTEMPTS = 3;
/**
 * The page shares the machine's cores with the workers: each redraw of the study's charts and each
 * progress redraw takes time from them. Charts follow the saved results every 2 s and the bar at
 * most four times a second, which reads as live and keeps the page's share small.
 */
const REFRESH_MS = 2_000;
const PROGRESS_REDRAW_MS = 250;

async function saveWithRetry(studyId: string, body: SaveJobResultInput): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await saveJobResult(studyId, body);
      return;
    } catch (error) {
      if (attempt >= SAVE_ATTEMPTS) throw error;
      await new Promise((resolve) => setTimeout(resolve, 500 * attempt));
    }
  }
}

export function useStudyRunner(study: StudyDetail | undefined, documents: Record<string, unknown> | undefined) {
  const queryClient = useQueryClient();
  const session = useRef<PoolSession | null>(null);
  const [state, setState] = useState<RunnerState>({
    running: false,
    held: false,
    done: 0,
    total: 0,
    remainingMs: null,
    problem: null,
  });

  const refresh = useRef<ReturnType<typeof setTimeout> | null>(null);
  const refreshSoon = useCallback(
    (id: string) => {
      if (refresh.current) return;
      refresh.current = setTimeout(() => {
        refresh.current = null;
        void queryClient.invalidateQueries({ queryKey: studyKeys.detail(id) });
      }, REFRESH_MS);
    },
    [queryClient],
  );

  const start = useCallback(() => {
    if (!study || !documents || session.current) return;
    const jobs = pendingJobs(study);
    const own = sharedEnginePool().session();
    session.current = own;
    const started = performance.now();
    const inFlight = new Map<number, number>();
    let finished = 0;
    let done = study.results.length;
    const guard = gridlockGuard(study);
    const skip = (job: StudyJob): JobAnswer | null => {
      const message = guard.skip(job);
      return message === null ? null : { outcome: 'skipped', message };
    };
    let drawn = 0;
    const update = (extra: Partial<RunnerState> = {}) => {
      drawn = performance.now();
      const elapsed = drawn - started;
      const work = finished + [...inFlight.values()].reduce((a, b) => a + b, 0);
      const remainingMs = elapsed >= MIN_ELAPSED_MS && work > 0 ? (elapsed / work) * (jobs.length - work) : null;
      setState((s) => ({ ...s, running: session.current === own, done, total: study.jobCount, remainingMs, ...extra }));
    };
    update({ problem: null, running: true });
    const runOne = async (job: StudyJob, k: number) => {
      const document = documents[job.revisionId];
      const answer: JobAnswer =
        document === undefined
          ? { outcome: 'invalid', message: 'the revision of this point could not be loaded' }
          : ((await own.submit(
              async (api) =>
                skip(job) ??
                api.runStudyJob(
                  document,
                  { changes: job.changes, settings: job.settings, first: job.first, count: job.count },
                  Comlink.proxy((p: Progress) => {
                    inFlight.set(k, p.fraction);
                    if (performance.now() - drawn >= PROGRESS_REDRAW_MS) update();
                  }),
                ),
            )) as JobAnswer);
      inFlight.delete(k);
      if (answer.outcome === 'cancelled' || own.isCancelled) return;
      guard.record(job, answer.outcome);
      await saveWithRetry(study.id, jobResultBody(job, answer));
      finished++;
      done++;
      update();
      refreshSoon(study.id);
    };
    void Promise.all(jobs.map((job, k) => runOne(job, k)))
      .catch((error: unknown) => {
        if (isCancelled(error)) return;
        own.cancel();
        update({ problem: error instanceof Error ? error.message : String(error) });
      })
      .finally(async () => {
        // Read the saved results before reporting the end, so the page never restarts finished jobs.
        await queryClient.refetchQueries({ queryKey: studyKeys.detail(study.id) }).catch(() => undefined);
        if (session.current === own) session.current = null;
        update({ running: false });
        void queryClient.invalidateQueries({ queryKey: studyKeys.lists() });
      });
  }, [study, documents, queryClient, refreshSoon]);

  const cancel = useCallback(async () => {
    session.current?.cancel();
    session.current = null;
    setState((s) => ({ ...s, running: false, held: true, remainingMs: null }));
    if (study) await updateStudy(study.id, { status: 'cancelled' });
    await queryClient.invalidateQueries({ queryKey: studyKeys.all });
  }, [study, queryClient]);

  const resume = useCallback(async () => {
    if (!study) return;
    await updateStudy(study.id, { status: 'running' });
    await queryClient.invalidateQueries({ queryKey: studyKeys.detail(study.id) });
    setState((s) => ({ ...s, held: false }));
  }, [study, queryClient]);

  // Leaving the page stops this tab's work; the study stays running and continues when reopened.
  useEffect(
    () => () => {
      session.current?.cancel();
      session.current = null;
      if (refresh.current) clearTimeout(refresh.current);
    },
    [],
  );

  return { ...state, start, cancel, resume };
}
