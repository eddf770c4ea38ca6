// PostgreSQL stopped and started again while saves are in flight: every save is answered (no hang), with
// 201 or a clear 503 carrying Retry-After (never a 500); every acknowledged save is stored whole and no
// refused one is stored at all; the server serves again once the database is back, without a restart; and
// the outage is logged as one line, not a stack trace per request. The database is a private cluster in a
// folder of this test's own, stopped and started with the project's own `postgres-cli.ts`.
import { randomUUID } from 'node:crypto';
import { execFile } from 'node:child_process';
import { join } from 'node:path';
import { promisify } from 'node:util';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { runMigrations } from '../../server/db/migrate';
import { projectRoot } from '../../server/setup/paths';
import { apiRoutes } from '../../shared/api/routes';
import { stackedLoop } from './fixtures/documents';
import { appFor } from './fixtures/app';
import { closeTestMail } from './fixtures/mail';
import { createPeople, freshContent, runBody, type Content, type People } from './fixtures/world';
import { makeClusterRoot, removeClusterRoot } from '../support/cluster-root';
import { freePort } from '../support/free-port';

const run = promisify(execFile);
const tsx = join(projectRoot, 'node_modules', '.bin', 'tsx');
const cli = join(projectRoot, 'server', 'setup', 'postgres-cli.ts');
const root = makeClusterRoot('outage');
let port = 0;

async function postgresCli(...args: string[]): Promise<string> {
  const { stdout } = await run(tsx, [cli, ...args, `--root=${root}`, `--port=${port}`], { cwd: projectRoot });
  return stdout;
}

let ds: DataSource;
let people: People;
let content: Content;

beforeAll(async () => {
  port = await freePort();
  const url = /DATABASE_URL=(\S+)/.exec(await postgresCli('start', 'lanewright_outage'))?.[1];
  if (!url) throw new Error('postgres-cli printed no DATABASE_URL');
  ds = createDataSource(url);
  await ds.initialize();
  await runMigrations(ds);
  people = await createPeople(appFor(ds));
  content = await freshContent(people);
}, 120_000);

afterAll(async () => {
  await ds?.destroy().catch(() => undefined);
  await postgresCli('stop').catch(() => undefined);
  await closeTestMail();
  removeClusterRoot(root);
}, 120_000);

interface Answer {
  kind: 'run' | 'revision';
  key: string;
  status: number;
  body: { id?: string; number?: number; error?: { code: string } };
  retryAfter?: string;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('PostgreSQL stopped and started while saves are in flight', () => {
  it('answers 201 or 503 with a retry hint, stores exactly what it acknowledged, and recovers by itself', async () => {
    const errors = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const agent = people.engineer.agent;
    const answers: Answer[] = [];
    let running = true;

    // Three savers of runs, each run with its own client run id, and one saver of revisions building on the
    // last revision it was told was saved. Every request must be answered within 20 s.
    const runSaver = async () => {
      while (running) {
        const body = runBody(content.revisionId);
        const res = await agent.post(apiRoutes.scenarioRuns(content.scenarioId)).timeout(20_000).send(body);
        answers.push({
          kind: 'run',
          key: body.clientRunId,
          status: res.status,
          body: res.body,
          retryAfter: res.headers['retry-after'],
        });
        if (res.status === 503) await sleep(100);
      }
    };
    let base = 1;
    const revisionSaver = async () => {
      while (running) {
        const message = `save ${randomUUID()}`;
        const res = await agent
          .post(apiRoutes.scenarioRevisions(content.scenarioId))
          .timeout(20_000)
          .send({ document: stackedLoop(), message, baseRevisionNumber: base });
        answers.push({
          kind: 'revision',
          key: message,
          status: res.status,
          body: res.body,
          retryAfter: res.headers['retry-after'],
        });
        if (res.status === 201) base = res.body.number;
        else await sleep(100);
      }
    };
    const savers = [runSaver(), runSaver(), runSaver(), revisionSaver()];

    await sleep(1_500);
    await postgresCli('stop');
    const stoppedAt = answers.length;
    await sleep(2_000);
    await postgresCli('start', 'lanewright_outage');
    const restartedAt = answers.length;
    // Saves go on until several have succeeded against the restarted database.
    const deadline = Date.now() + 30_000;
    while (answers.slice(restartedAt).filter((a) => a.status === 201).length < 4 && Date.now() < deadline)
      await sleep(200);
    running = false;
    await Promise.all(savers);
    const logged = errors.mock.calls.map((call) => call.map(String).join(' '));
    errors.mockRestore();

    expect(logged.filter((line) => line.startsWith('Unexpected server error'))).toEqual([]);
    expect(answers.filter((a) => a.status >= 500 && a.status !== 503)).toEqual([]);
    const statuses = new Set(answers.map((a) => a.status));
    expect([...statuses].sort()).toEqual([201, 503]);
    const refused = answers.filter((a) => a.status === 503);
    expect(refused.length).toBeGreaterThan(0);
    for (const answer of refused) {
      expect(answer.body.error?.code).toBe('unavailable');
      expect(answer.retryAfter).toBe('5');
    }
    expect(answers.slice(0, stoppedAt).some((a) => a.status === 201)).toBe(true);
    expect(answers.slice(restartedAt).filter((a) => a.status === 201).length).toBeGreaterThanOrEqual(4);

    // Acknowledged runs are stored, refused ones are not; each stored run has its audit row (one transaction).
    const storedRuns: { client_run_id: string; id: string; audited: boolean }[] = await ds.query(
      `SELECT run.client_run_id, run.id,
         EXISTS (SELECT 1 FROM audit_entries a WHERE a.entity = 'run' AND a.entity_id = run.id::text) AS audited
       FROM runs run WHERE run.scenario_id = $1`,
      [content.scenarioId],
    );
    const storedRunKeys = new Set(storedRuns.map((r) => r.client_run_id));
    for (const answer of answers.filter((a) => a.kind === 'run')) {
      expect(storedRunKeys.has(answer.key), `${answer.status} for run ${answer.key}`).toBe(answer.status === 201);
    }
    expect(storedRuns.every((r) => r.audited)).toBe(true);

    // Revisions: the acknowledged ones and no others, numbered without gaps, the latest one on the scenario.
    const storedRevisions: { message: string; number: number }[] = await ds.query(
      'SELECT message, number FROM scenario_revisions WHERE scenario_id = $1 ORDER BY number',
      [content.scenarioId],
    );
    const savedMessages = answers.filter((a) => a.kind === 'revision' && a.status === 201).map((a) => a.key);
    expect(storedRevisions.slice(1).map((r) => r.message)).toEqual(savedMessages);
    expect(storedRevisions.map((r) => r.number)).toEqual(storedRevisions.map((_, i) => i + 1));
    const [scenario] = await ds.query(
      `SELECT r.number FROM scenarios s JOIN scenario_revisions r ON r.id = s.latest_revision_id WHERE s.id = $1`,
      [content.scenarioId],
    );
    expect(scenario.number).toBe(storedRevisions.length);

    // One line about the outage, never a stack trace per request.
    expect(logged.some((line) => line.startsWith('Database unavailable'))).toBe(true);
    expect(logged.filter((line) => line.includes('\n    at '))).toEqual([]);
    expect(logged.length).toBeLessThanOrEqual(3);
  }, 120_000);
});
