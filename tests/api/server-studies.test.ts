// Studies on the server over the API and a real worker process: a study submitted to the server runs to
// the end with every job stored once and the same figures as running it here, and mails its author;
// progress, cancel and resume of queued jobs; jobs that fail on every attempt are recorded with their
// reason; the organisation's limits at their edge and one past it.
import { afterEach, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import {
  SERVER_STUDY_LIMITS,
  studyDetailSchema,
  studyProgressSchema,
  type CreateStudyInput,
  type StudyDetail,
  type StudyProgress,
} from '../../shared/api/studies';
import { runStudyLocally } from '../../workers/studies/run-study-locally';
import { StudyJobResultEntity } from '../../server/db/entities';
import { saveJobResult } from '../../server/studies/save-job-result';
import { QUEUES } from '../../server/queue/queue-client';
import { queueJobId } from '../../server/queue/study-jobs';
import { requireDatabaseUrl } from '../support/test-database';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { mailTo } from './fixtures/mail';
import { emptyQueue, useQueue } from './fixtures/queue';
import { startWorkerProcess, type WorkerProcess } from '../../server/worker/worker-process';
import { ACTORS, useOrganisation, type Actor } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const queue = useQueue(db, { timeLimitSeconds: 30 });
const org = useOrganisation(db, { app: () => queue().app });

const SETTINGS = { hours: 0.1, warmupMinutes: 1, replications: 3, seed: 11 };

function serverStudy(extra: Partial<CreateStudyInput> = {}): CreateStudyInput {
  return {
    name: 'Fleet size on the server',
    kind: 'carrierSizing',
    revisionId: org.content.revisionId,
    settings: SETTINGS,
    blockSize: 2,
    runOn: 'server',
    points: [12, 16].map((n) => ({
      label: `${n} carriers`,
      changes: [{ path: 'carriers.count', op: 'set', value: n }],
    })),
    ...extra,
  };
}

async function create(extra: Partial<CreateStudyInput> = {}): Promise<StudyDetail> {
  const res = await org.people.engineer.agent
    .post(apiRoutes.projectStudies(org.content.projectId))
    .send(serverStudy(extra));
  expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
  return studyDetailSchema.parse(res.body);
}

async function progressOf(id: string): Promise<StudyProgress> {
  const res = await org.people.viewer.agent.get(apiRoutes.studyProgress(id));
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return studyProgressSchema.parse(res.body);
}

async function waitForEnd(id: string, worker: WorkerProcess, seconds = 90): Promise<StudyProgress> {
  const deadline = Date.now() + seconds * 1_000;
  for (;;) {
    const progress = await progressOf(id);
    if (progress.status !== 'running') return progress;
    if (Date.now() > deadline) throw new Error(`the study did not finish in ${seconds} s:\n${worker.output()}`);
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
}

const workers: WorkerProcess[] = [];
afterEach(async () => {
  await Promise.all(workers.splice(0).map((w) => w.stop()));
  await emptyQueue(db());
  // Each test starts with no server study of the organisation running, whatever the last one left.
  await db().query("UPDATE studies SET status = 'cancelled' WHERE status = 'running'");
});

describe('a study on the server', () => {
  it('runs to the end on a worker process, each job stored once with the figures of a local run, and mails its author', async () => {
    const since = Date.now();
    const study = await create();
    expect(study.runOn).toBe('server');
    expect(study.jobCount).toBe(4);
    const before = await progressOf(study.id);
    expect(before).toMatchObject({ status: 'running', jobsDone: 0, jobCount: 4, failedJobs: [] });

    workers.push(await startWorkerProcess(requireDatabaseUrl()));
    const end = await waitForEnd(study.id, workers[0]);
    expect(end).toMatchObject({ status: 'done', jobsDone: 4, failedJobs: [], remainingMs: null });
    expect(end.finishedAt).not.toBeNull();

    const rows = await db().getRepository(StudyJobResultEntity).findBy({ studyId: study.id });
    expect(rows.map((r) => `${r.pointIndex}:${r.first}`).sort()).toEqual(['0:0', '0:2', '1:0', '1:2']);
    // The engine is deterministic for a seed, so the server's figures equal a run of the same jobs here.
    const detail = studyDetailSchema.parse((await org.people.viewer.agent.get(apiRoutes.study(study.id))).body);
    const local = await runStudyLocally(detail, { [org.content.revisionId]: stackedLoop() });
    expect(detail.results.map((r) => r.figures)).toEqual(local.results.map((r) => r.figures));

    const mail = await mailTo(org.people.engineer.email, /^Study finished: Fleet size on the server/, since);
    expect(mail.text).toContain('4 of 4 jobs have a result');
    expect(mail.text).toContain(`/studies/${study.id}`);
  }, 120_000);

  it('records a job that fails on every attempt with its reason, and the study still finishes', async () => {
    const study = await create({ settings: { ...SETTINGS, replications: 1 }, blockSize: 1 });
    // Without its point the second job fails on every attempt, as a job whose worker keeps dying would.
    await db().query('DELETE FROM study_points WHERE study_id = $1 AND index = 1', [study.id]);
    workers.push(await startWorkerProcess(requireDatabaseUrl()));
    const deadline = Date.now() + 90_000;
    let progress = await progressOf(study.id);
    while (progress.failedJobs.length === 0 && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 500));
      progress = await progressOf(study.id);
    }
    expect(progress.failedJobs).toHaveLength(1);
    expect(progress.failedJobs[0]).toMatchObject({ pointIndex: 1, first: 0 });
    expect(progress.failedJobs[0].reason).toMatch(/^failed 3 times; last: point 1 of the study does not exist/);
    expect(progress.jobsDone).toBe(1);
    expect(progress.status).toBe('failedPoints');
    expect(await db().getRepository(StudyJobResultEntity).countBy({ studyId: study.id })).toBe(1);
  }, 120_000);

  it('skips carrier counts above one already found to gridlock, as the browser does', async () => {
    const study = await create();
    // As if a worker had found 12 carriers to gridlock: the 16-carrier point is not worth running.
    await saveJobResult(
      db(),
      study.id,
      { pointIndex: 0, first: 0, count: 2, outcome: 'gridlock', message: 'gridlock at t=300.0 s' },
      null,
    );
    workers.push(await startWorkerProcess(requireDatabaseUrl()));
    const end = await waitForEnd(study.id, workers[0]);
    expect(end).toMatchObject({ status: 'failedPoints', jobsDone: 4 });
    const rows = await db().getRepository(StudyJobResultEntity).findBy({ studyId: study.id });
    const outcomes = Object.fromEntries(rows.map((r) => [`${r.pointIndex}:${r.first}`, r.outcome]));
    expect(outcomes).toEqual({ '0:0': 'gridlock', '0:2': 'done', '1:0': 'skipped', '1:2': 'skipped' });
    expect(rows.find((r) => r.pointIndex === 1)?.message).toBe(
      'not run: 12 carriers already gridlock this track, and more carriers only lock it sooner',
    );
  }, 120_000);

  it('says when no worker has held one of its jobs for over a minute', async () => {
    const study = await create();
    expect((await progressOf(study.id)).idleSeconds).toBeNull();
    // Queued two minutes ago, and no worker running.
    await db().query("UPDATE studies SET queued_at = now() - interval '2 minutes' WHERE id = $1", [study.id]);
    expect((await progressOf(study.id)).idleSeconds).toBeGreaterThanOrEqual(120);
    // A worker takes a job (pg-boss marks it active): the study is no longer idle, however long that job takes.
    const [held] = await queue().boss.fetch(QUEUES.studyJob);
    expect(held).toBeDefined();
    expect((await progressOf(study.id)).idleSeconds).toBeNull();
  });

  it('shows its progress to members only', async () => {
    const study = await create();
    const expected: Record<Actor, number> = { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 };
    for (const actor of ACTORS)
      expect((await org.people.as(actor).get(apiRoutes.studyProgress(study.id))).status, actor).toBe(expected[actor]);
  });

  it('cancel takes its queued jobs off the queue and resume queues the rest under a new round', async () => {
    const study = await create();
    const { boss } = queue();
    const first = queueJobId(study.id, 1, { pointIndex: 0, first: 0 });
    expect((await boss.getJobById(QUEUES.studyJob, first))?.state).toBe('created');

    const cancelled = await org.people.engineer.agent.patch(apiRoutes.study(study.id)).send({ status: 'cancelled' });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    expect((await boss.getJobById(QUEUES.studyJob, first))?.state).toBe('cancelled');

    const resumed = await org.people.engineer.agent.patch(apiRoutes.study(study.id)).send({ status: 'running' });
    expect(resumed.status).toBe(200);
    const again = queueJobId(study.id, 2, { pointIndex: 0, first: 0 });
    expect((await boss.getJobById(QUEUES.studyJob, again))?.state).toBe('created');
    expect((await boss.getJobById(QUEUES.studyJob, first))?.state).toBe('cancelled');
  });
});

describe('limits of server studies', () => {
  const max = SERVER_STUDY_LIMITS.concurrentPerOrganisation;

  it(`an organisation runs at most ${max} server studies at once; one past answers 409 naming the limit`, async () => {
    const made = [];
    for (let i = 0; i < max; i++) made.push(await create({ name: `Study ${i + 1}` }));
    const refused = await org.people.engineer.agent
      .post(apiRoutes.projectStudies(org.content.projectId))
      .send(serverStudy({ name: 'One too many' }));
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain(`the most it may run at once (${max})`);
    expect(refused.body.error.fields).toEqual([{ path: 'runOn', message: expect.stringContaining(`at most ${max}`) }]);
    // Studies in the browser are not counted.
    const inBrowser = await org.people.engineer.agent
      .post(apiRoutes.projectStudies(org.content.projectId))
      .send(serverStudy({ runOn: 'browser' }));
    expect(inBrowser.status).toBe(201);

    await org.people.engineer.agent.patch(apiRoutes.study(made[0].id)).send({ status: 'cancelled' });
    await create({ name: 'Now there is room' });
    // Resuming the cancelled one would make one too many again.
    const resume = await org.people.engineer.agent.patch(apiRoutes.study(made[0].id)).send({ status: 'running' });
    expect(resume.status).toBe(409);
    expect(resume.body.error.message).toContain(`(${max})`);
  });

  it(`a server study may have ${SERVER_STUDY_LIMITS.jobsMax} jobs; one more point's worth is refused with the limit`, async () => {
    const points = Array.from({ length: 400 }, (_, i) => ({ label: `Point ${i + 1}`, changes: [] }));
    const atLimit = await create({
      name: 'Largest',
      settings: { hours: 0.01, warmupMinutes: 0, replications: SERVER_STUDY_LIMITS.jobsMax / 400, seed: 1 },
      blockSize: 1,
      points,
    });
    expect(atLimit.jobCount).toBe(SERVER_STUDY_LIMITS.jobsMax);
    const last = queueJobId(atLimit.id, 1, { pointIndex: 399, first: SERVER_STUDY_LIMITS.jobsMax / 400 - 1 });
    expect((await queue().boss.getJobById(QUEUES.studyJob, last))?.state).toBe('created');

    const past = await org.people.engineer.agent.post(apiRoutes.projectStudies(org.content.projectId)).send(
      serverStudy({
        settings: { hours: 0.01, warmupMinutes: 0, replications: SERVER_STUDY_LIMITS.jobsMax / 400 + 1, seed: 1 },
        blockSize: 1,
        points,
      }),
    );
    expect(past.status).toBe(400);
    expect(past.body.error.fields).toEqual([
      {
        path: 'blockSize',
        message: expect.stringContaining(`at most ${SERVER_STUDY_LIMITS.jobsMax} are allowed on the server`),
      },
    ]);
  }, 60_000);
});
