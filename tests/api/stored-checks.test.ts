// What the server keeps is checked and computed once: time-study values in a plausible range with the
// analysis stored at upload, retry-safe creation of projects and scenarios, and bounded stored runs that
// say whether the server checked them.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { TIME_STUDY_LIMITS } from '../../shared/api/time-studies';
import { RESULT_LIMITS } from '../../shared/results/run-result';
import { ProjectEntity, RunEntity, ScenarioEntity, TimeStudyEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { runBody, useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

const uploadCsv = (content: string) =>
  org.people.engineer.agent
    .post(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
    .field('stationId', 'PR')
    .attach('file', Buffer.from(content), 'times.csv');

describe('time studies', () => {
  it('refuses a value of 1e308 (and anything over a day) with the row and a unit hint', async () => {
    const res = await uploadCsv('cycle_s\n9.1\n1e308\n9.3\n');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/row 3/i);
    expect(res.body.error.message).toMatch(/one day/);
    const justOver = await uploadCsv(`cycle_s\n9.1\n${TIME_STUDY_LIMITS.maxSeconds + 1}\n`);
    expect(justOver.status).toBe(400);
    const atLimit = await uploadCsv(`cycle_s\n9.1\n${TIME_STUDY_LIMITS.maxSeconds}\n`);
    expect(atLimit.status).toBe(201);
    expect(Number.isFinite(atLimit.body.mean)).toBe(true);
  });

  it('stores the analysis at upload and reads it back without recomputing', async () => {
    const res = await uploadCsv(`cycle_s\n${Array.from({ length: 200 }, (_, i) => 9 + (i % 7) * 0.1).join('\n')}\n`);
    expect(res.status).toBe(201);
    const stored = await db()
      .getRepository(TimeStudyEntity)
      .findOneOrFail({ where: { id: res.body.id }, select: { id: true, analysis: true } });
    expect(stored.analysis).toEqual(res.body.analysis);
    // A marker written into the stored analysis comes back: the read used the column, not a recomputation.
    const marked = { ...stored.analysis!, summary: { ...stored.analysis!.summary, max: 123.456 } };
    await db().getRepository(TimeStudyEntity).update({ id: res.body.id }, { analysis: marked });
    const read = await org.people.viewer.agent.get(apiRoutes.timeStudy(res.body.id));
    expect(read.body.analysis.summary.max).toBe(123.456);
  });

  it('computes and stores the analysis on first read for a study stored before the column existed', async () => {
    const res = await uploadCsv('cycle_s\n9\n10\n11\n');
    await db().getRepository(TimeStudyEntity).update({ id: res.body.id }, { analysis: null });
    const read = await org.people.viewer.agent.get(apiRoutes.timeStudy(res.body.id));
    expect(read.body.analysis).toEqual(res.body.analysis);
    const stored = await db()
      .getRepository(TimeStudyEntity)
      .findOneOrFail({ where: { id: res.body.id }, select: { id: true, analysis: true } });
    expect(stored.analysis).toEqual(res.body.analysis);
  });
});

describe('retry-safe creation', () => {
  it('a project created twice with one client id exists once; the retry answers 200 with the same project', async () => {
    const clientId = randomUUID();
    const body = { name: 'Retried line', organisationId: org.people.organisationId, clientId };
    const [a, b] = await Promise.all([
      org.people.engineer.agent.post(apiRoutes.projects).send(body),
      org.people.engineer.agent.post(apiRoutes.projects).send(body),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body.id).toBe(b.body.id);
    const again = await org.people.engineer.agent.post(apiRoutes.projects).send(body);
    expect(again.status).toBe(200);
    expect(await db().getRepository(ProjectEntity).countBy({ clientId })).toBe(1);
  });

  it('a scenario created twice with one client id exists once', async () => {
    const clientId = randomUUID();
    const body = { name: 'Retried scenario', document: stackedLoop(), clientId };
    const first = await org.people.engineer.agent.post(apiRoutes.projectScenarios(org.content.projectId)).send(body);
    const retry = await org.people.engineer.agent.post(apiRoutes.projectScenarios(org.content.projectId)).send(body);
    expect([first.status, retry.status]).toEqual([201, 200]);
    expect(retry.body.id).toBe(first.body.id);
    expect(await db().getRepository(ScenarioEntity).countBy({ clientId })).toBe(1);
  });

  it('without a client id every create makes a new one, as before', async () => {
    const body = { name: 'Twice', organisationId: org.people.organisationId };
    const a = await org.people.engineer.agent.post(apiRoutes.projects).send(body);
    const b = await org.people.engineer.agent.post(apiRoutes.projects).send(body);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).not.toBe(b.body.id);
  });
});

describe('stored runs', () => {
  it('records that a browser-posted result was not checked by the server', async () => {
    const res = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send(runBody(org.content.revisionId));
    expect(res.status).toBe(201);
    expect(res.body.serverChecked).toBe(false);
    expect((await db().getRepository(RunEntity).findOneByOrFail({ id: res.body.id })).serverChecked).toBe(false);
  });

  it.each([
    ['seed', (b: ReturnType<typeof runBody>) => (b.results.seed = 'x'.repeat(65)), 'results.seed'],
    [
      'engine version',
      (b: ReturnType<typeof runBody>) => (b.results.engineVersion = 'v'.repeat(RESULT_LIMITS.engineVersionMax + 1)),
      'results.engineVersion',
    ],
    [
      'a series',
      (b: ReturnType<typeof runBody>) =>
        (b.results.wip.series.values = new Array(RESULT_LIMITS.numbersPerSeriesMax + 1).fill(1)),
      'results.wip.series.values',
    ],
    [
      'a station name',
      (b: ReturnType<typeof runBody>) => (b.results.stations[0].name = 'n'.repeat(RESULT_LIMITS.textMax + 1)),
      'results.stations[0].name',
    ],
  ])('refuses a %s over its size limit', async (_, grow, path) => {
    const body = runBody(org.content.revisionId);
    grow(body);
    const res = await org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain(path);
  });
});
