// What a worker does with one queued job: drop it when its study is gone, cancelled or on a later queue
// round; skip the engine when the job already has a result (a retry after a crash between saving and
// completing); skip a carrier count above one that gridlocked; otherwise run it on an engine thread
// within its time limit and store the result once.
// The study that this result completes sends its finish notice from here.
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { pointSeed } from '../../shared/api/studies';
import { jobResultBody, type StudyJobOutcome } from '../../workers/studies/run-study-job';
import { ScenarioRevisionEntity, StudyEntity, StudyJobResultEntity, StudyPointEntity } from '../db/entities';
import { QUEUES, type StudyFinishedMessage, type StudyJobMessage } from '../queue/queue-client';
import { saveJobResult } from '../studies/save-job-result';
import { settleStatus } from '../studies/study-queries';
import type { EngineThreads } from './engine-threads';
import { gridlockSkip } from './gridlock-skip';

export type JobHandled = {
  handled: 'dropped' | 'known' | 'skipped' | 'ran';
  outcome?: StudyJobOutcome['outcome'];
};

/** Revisions never change, so their documents are kept; a bounded map is enough for a study's few revisions. */
const DOCUMENTS_KEPT = 32;

export interface StudyJobContext {
  ds: DataSource;
  boss: PgBoss;
  engine: EngineThreads;
}

export function studyJobHandler(ctx: StudyJobContext) {
  const documents = new Map<string, unknown>();
  const documentOf = async (revisionId: string): Promise<unknown> => {
    if (!documents.has(revisionId)) {
      const revision = await ctx.ds.getRepository(ScenarioRevisionEntity).findOneByOrFail({ id: revisionId });
      if (documents.size >= DOCUMENTS_KEPT) documents.delete(documents.keys().next().value!);
      documents.set(revisionId, revision.document);
    }
    return documents.get(revisionId);
  };

  return async (job: PgBoss.Job<StudyJobMessage>): Promise<JobHandled> => {
    const message = job.data;
    const study = await ctx.ds.getRepository(StudyEntity).findOneBy({ id: message.studyId });
    if (!study || study.status !== 'running' || study.queueRound !== message.round) return { handled: 'dropped' };
    const key = { studyId: study.id, pointIndex: message.pointIndex, first: message.first };
    if (await ctx.ds.getRepository(StudyJobResultEntity).existsBy(key)) {
      await settle(ctx, study);
      return { handled: 'known' };
    }
    const point = await ctx.ds
      .getRepository(StudyPointEntity)
      .findOneBy({ studyId: study.id, index: message.pointIndex });
    if (!point) throw new Error(`point ${message.pointIndex} of the study does not exist`);
    const skipped = await gridlockSkip(ctx.ds, study, point);
    if (skipped !== null) {
      await saveJobResult(
        ctx.ds,
        study.id,
        jobResultBody(message, { outcome: 'skipped', message: skipped }),
        study.createdById,
      );
      await settle(ctx, study);
      return { handled: 'skipped' };
    }
    const settings = { ...study.settings, seed: pointSeed(study.settings, study.commonRandomNumbers, point.index) };
    const limit = AbortSignal.timeout(Math.max(1, job.expireInSeconds - 1) * 1_000);
    const outcome = await ctx.engine
      .run(
        {
          document: await documentOf(point.revisionId),
          job: { changes: point.changes, settings, first: message.first, count: message.count },
        },
        limit,
      )
      .catch((error: unknown) => {
        if (limit.aborted) throw new Error(`the job ran past its time limit of ${job.expireInSeconds} s`);
        throw error;
      });
    if (outcome.outcome === 'cancelled') throw new Error('the engine was stopped before the job finished');
    await saveJobResult(ctx.ds, study.id, jobResultBody(message, outcome), study.createdById);
    await settle(ctx, study);
    return { handled: 'ran', outcome: outcome.outcome };
  };
}

/** Settles the study's status; the one caller that finished it queues the finish notice. */
export async function settle(ctx: Pick<StudyJobContext, 'ds' | 'boss'>, study: StudyEntity): Promise<void> {
  const { finishedNow } = await settleStatus(ctx.ds, study);
  if (finishedNow) {
    const notice: StudyFinishedMessage = { studyId: study.id };
    await ctx.boss.send(QUEUES.studyFinished, notice);
  }
}
