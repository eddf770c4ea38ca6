// Faults a queue of server studies must ride out, with real worker processes: a worker killed with
// SIGKILL in the middle of a job (its job is retried after its time limit by another worker), and
// PostgreSQL restarting under running workers (they reconnect by themselves). Either way the study
// completes with every job stored exactly once and the same figures as running it here.
import type { Express } from 'express';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { afterAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { studyDetailSchema, type CreateStudyInput, type StudyDetail } from '../../shared/api/studies';
import { runStudyLocally } from '../../workers/studies/run-study-locally';
import { createApp } from '../../server/app';
import { createDataSource } from '../../server/db/data-source';
import { StudyEntity, StudyJobFailureEntity, StudyJobResultEntity } from '../../server/db/entities';
import { runMigrations } from '../../server/db/migrate';
import { QUEUE_SCHEMA, QUEUES, startQueue, stopQueue } from '../../server/queue/queue-client';
import { createDatabase } from '../../server/setup/local-postgres';
import { startPrivatePostgres, type PrivatePostgres } from '../support/private-postgres';
import { requireDatabaseUrl } from '../support/test-database';
import { signUp, type Agent } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { mailbox, testMailer } from './fixtures/mail';
import { emptyQueue } from './fixtures/queue';
import { startWorkerProcess, type WorkerProcess } from '../../server/worker/worker-process';

/** Short, so a killed worker's job comes back soon; long enough for any one job here. */
const TIME_LIMIT_SECONDS = 8;
// Jobs long enough (a few tenths of a second each) that the killed worker is always in the middle of one.
const SETTINGS = { hours: 12, warmupMinutes: 1, replications: 8, seed: 5 };

const study = (revisionId: string, replications: number): CreateStudyInput => ({
  name: 'Carriers under faults',
  kind: 'carrierSizing',
  revisionId,
  settings: { ...SETTINGS, replications },
  blockSize: 1,
  runOn: 'server',
  points: [10, 14, 18].map((n) => ({
    label: `${n} carriers`,
    changes: [{ path: 'carriers.count', op: 'set', value: n }],
  })),
});

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** A signed-up engineer with a project and scenario on `app`, and a server study of 3 points × `replications` jobs. */
async function submitStudy(app: Express, replications: number): Promise<{ agent: Agent; study: StudyDetail }> {
  const { agent, organisationId } = await signUp(app, 'faults');
  const project = await agent.post('/api/projects').send({ name: 'Fault line', organisationId });
  const scenario = await agent
    .post(`/api/projects/${project.body.id}/scenarios`)
    .send({ name: 'Stacked', document: stackedLoop() });
  const res = await agent
    .post(apiRoutes.projectStudies(project.body.id))
    .send(study(scenario.body.latestRevision.id, replications));
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  return { agent, study: studyDetailSchema.parse(res.body) };
}

/** Reads straight from the database, riding over the moments it is down. */
async function jobsDone(ds: DataSource, studyId: string): Promise<number> {
  return ds
    .getRepository(StudyJobResultEntity)
    .countBy({ studyId })
    .catch(() => -1);
}

async function activeJobs(ds: DataSource): Promise<{ id: string }[]> {
  return ds.query(`SELECT id FROM ${QUEUE_SCHEMA}.job WHERE name = 'study-job' AND state = 'active'`);
}

async function waitUntil(what: string, check: () => Promise<boolean>, workers: WorkerProcess[], seconds = 150) {
  const deadline = Date.now() + seconds * 1_000;
  while (!(await check().catch(() => false))) {
    if (Date.now() > deadline)
      throw new Error(`${what} did not happen in ${seconds} s:\n${workers.map((w) => w.output()).join('\n---\n')}`);
    await sleep(250);
  }
}

/** Every job once, none failed, the study done, and the figures of the same jobs run here. */
async function expectCompleteOnce(ds: DataSource, agent: Agent, submitted: StudyDetail): Promise<void> {
  const rows = await ds.getRepository(StudyJobResultEntity).findBy({ studyId: submitted.id });
  const keys = rows.map((r) => `${r.pointIndex}:${r.first}`);
  expect(new Set(keys).size).toBe(keys.length);
  expect(keys).toHaveLength(submitted.jobCount);
  expect(await ds.getRepository(StudyJobFailureEntity).countBy({ studyId: submitted.id })).toBe(0);
  expect((await ds.getRepository(StudyEntity).findOneByOrFail({ id: submitted.id })).status).toBe('done');
  const detail = studyDetailSchema.parse((await agent.get(apiRoutes.study(submitted.id))).body);
  expect(detail.jobsDone).toBe(submitted.jobCount);
  const local = await runStudyLocally(detail, { [detail.revisionId]: stackedLoop() });
  expect(detail.results.map((r) => r.figures)).toEqual(local.results.map((r) => r.figures));
}

describe('a worker killed mid-study', () => {
  const db = useCleanDatabase();
  const workers: WorkerProcess[] = [];
  let boss: PgBoss | undefined;
  afterAll(async () => {
    await Promise.all(workers.map((w) => w.stop()));
    if (boss) await stopQueue(boss);
    await emptyQueue(db());
  });

  it('leaves its job to another worker after the time limit, and every job counts once', async () => {
    boss = await startQueue(requireDatabaseUrl(), { checkSeconds: 1 });
    await emptyQueue(db());
    const app = createApp({
      dataSource: db(),
      mailer: testMailer,
      mailbox,
      queue: { boss, timeLimitSeconds: TIME_LIMIT_SECONDS },
    });
    const { agent, study: submitted } = await submitStudy(app, SETTINGS.replications);
    const first = await startWorkerProcess(requireDatabaseUrl());
    workers.push(first);
    await waitUntil(
      'three results and a job in hand',
      async () => {
        if ((await jobsDone(db(), submitted.id)) < 3) return false;
        return (await activeJobs(db())).length > 0;
      },
      workers,
    );
    await first.kill();
    expect(first.child.signalCode).toBe('SIGKILL');
    // Read after the kill: what is still active now is what the dead worker held.
    const stranded = await activeJobs(db());
    expect(stranded.length, 'a job left in the killed worker’s hands').toBeGreaterThan(0);
    const held = stranded[0].id;
    const doneAtKill = await jobsDone(db(), submitted.id);
    expect(doneAtKill).toBeLessThan(submitted.jobCount);

    workers.push(await startWorkerProcess(requireDatabaseUrl()));
    await waitUntil(
      'the study finishing',
      async () => (await db().getRepository(StudyEntity).findOneByOrFail({ id: submitted.id })).status !== 'running',
      workers,
    );
    await expectCompleteOnce(db(), agent, submitted);
    // The job the killed worker held failed by its time limit and ran again: a retry, not a second result.
    const retried = await boss.getJobById(QUEUES.studyJob, held, { includeArchive: true });
    expect(retried?.retryCount).toBeGreaterThanOrEqual(1);
  }, 240_000);
});

describe('PostgreSQL restarting under running workers', () => {
  let cluster: PrivatePostgres | undefined;
  let ds: DataSource | undefined;
  let boss: PgBoss | undefined;
  const workers: WorkerProcess[] = [];
  afterAll(async () => {
    await Promise.all(workers.map((w) => w.stop()));
    if (boss) await stopQueue(boss).catch(() => undefined);
    if (ds?.isInitialized) await ds.destroy();
    await cluster?.remove();
  });

  it('the workers reconnect by themselves and the study completes, every job once', async () => {
    cluster = await startPrivatePostgres();
    const url = cluster.url('lanewright_restart');
    await createDatabase(url);
    ds = createDataSource(url);
    await ds.initialize();
    await runMigrations(ds);
    boss = await startQueue(url, { checkSeconds: 1, onError: () => undefined });
    const app = createApp({
      dataSource: ds,
      mailer: testMailer,
      mailbox,
      queue: { boss, timeLimitSeconds: TIME_LIMIT_SECONDS },
    });
    // Two workers on a machine that may be idle: jobs enough that the restart always falls mid-study.
    const { agent, study: submitted } = await submitStudy(app, 3 * SETTINGS.replications);
    workers.push(await startWorkerProcess(url), await startWorkerProcess(url));

    await waitUntil('three results', async () => (await jobsDone(ds!, submitted.id)) >= 3, workers);
    const beforeRestart = await jobsDone(ds, submitted.id);
    await cluster.restart(2_000);
    expect(beforeRestart).toBeLessThan(submitted.jobCount);

    await waitUntil(
      'the study finishing',
      async () => (await ds!.getRepository(StudyEntity).findOneByOrFail({ id: submitted.id })).status !== 'running',
      workers,
    );
    for (const worker of workers) {
      expect(worker.child.exitCode, worker.output()).toBeNull();
      // The outage reached them: their connections were cut, and they logged it in one line and went on.
      expect(worker.output()).toMatch(/terminat|ECONNREFUSED|Connection/i);
    }
    await expectCompleteOnce(ds, agent, submitted);
  }, 300_000);
});
