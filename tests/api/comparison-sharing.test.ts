// Share links to a comparison of runs: a comparison is stored once per set of runs; a visitor without an
// account gets every run's results and scenario and nothing that names their makers; a viewer may not
// share it, an engineer may; runs of two organisations or runs the caller cannot see are refused; the
// link can be withdrawn and dies with a deleted run; making and withdrawing it is audited.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { COMPARISON_RUNS } from '../../shared/api/comparisons';
import { apiRoutes } from '../../shared/api/routes';
import { sharedViewSchema } from '../../shared/api/shares';
import { appFor } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { expectMadeThenWithdrawn } from './fixtures/share-audit';
import { runBody, useOrganisation } from './fixtures/world';
import { stackedLoop } from './fixtures/documents';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

async function moreRuns(count: number): Promise<string[]> {
  const ids: string[] = [];
  for (let i = 0; i < count; i++) {
    const run = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send(runBody(org.content.revisionId));
    expect(run.status, JSON.stringify(run.body)).toBe(201);
    ids.push(run.body.id);
  }
  return ids;
}

async function storeComparison(runIds: string[]): Promise<string> {
  const res = await org.people.engineer.agent.post(apiRoutes.comparisons).send({ runIds });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.id;
}

const view = (token: string) => request(appFor(db())).post(apiRoutes.sharedView).send({ token });
const tokenOf = (url: string) => new URL(url).hash.slice(1);

describe('sharing a comparison of runs', () => {
  it('shows every run read-only to a visitor without an account, without their makers', async () => {
    const runIds = [org.content.runId, ...(await moreRuns(1))];
    const comparisonId = await storeComparison(runIds);
    // The same runs in the same order are the same comparison.
    expect(await storeComparison(runIds)).toBe(comparisonId);
    const made = await org.people.engineer.agent
      .post(apiRoutes.shares)
      .send({ kind: 'comparison', subjectId: comparisonId, expiresInDays: 7 });
    expect(made.status, JSON.stringify(made.body)).toBe(201);

    const res = await view(tokenOf(made.body.url));
    expect(res.status).toBe(200);
    const shared = sharedViewSchema.parse(res.body);
    if (shared.kind !== 'comparison') throw new Error(`expected a comparison, got ${shared.kind}`);
    expect(shared.runs.map((r) => r.run.id)).toEqual(runIds);
    expect(shared.runs.every((r) => r.run.createdBy === null)).toBe(true);
    expect(shared.runs[0].document.steps.length).toBeGreaterThan(0);
    expect(JSON.stringify(res.body)).not.toContain(org.people.engineer.email);
    expect(res.headers['set-cookie']).toBeUndefined();

    const listed = await org.people.viewer.agent
      .get(apiRoutes.shares)
      .query({ kind: 'comparison', subjectId: comparisonId });
    expect(listed.status).toBe(200);
    expect(listed.body.map((s: { id: string }) => s.id)).toEqual([made.body.id]);
  });

  it('any member may store a comparison, a viewer may not share it; an outsider gets 404 for both', async () => {
    const runIds = [org.content.runId, ...(await moreRuns(1))];
    const asViewer = await org.people.viewer.agent.post(apiRoutes.comparisons).send({ runIds });
    expect(asViewer.status).toBe(200);
    const asOwner = await org.people.owner.agent.post(apiRoutes.comparisons).send({ runIds });
    expect(asOwner.body.id).toBe(asViewer.body.id);
    const body = { kind: 'comparison', subjectId: asViewer.body.id, expiresInDays: 7 };
    expect((await org.people.viewer.agent.post(apiRoutes.shares).send(body)).status).toBe(403);
    expect((await org.people.outsider.agent.post(apiRoutes.shares).send(body)).status).toBe(404);
    const outsider = await org.people.outsider.agent.post(apiRoutes.comparisons).send({ runIds });
    expect(outsider.status).toBe(404);
    expect(outsider.body.error.message).toBe('A run of the comparison was not found.');
    expect((await request(appFor(db())).post(apiRoutes.comparisons).send({ runIds })).status).toBe(401);
  });

  it('refuses runs of two organisations, naming the run that differs', async () => {
    // The engineer also owns the organisation made at sign-up, so can see runs in both.
    const own = org.people.engineer;
    const project = await own.agent
      .post(apiRoutes.projects)
      .send({ name: 'Own line', organisationId: own.organisationId });
    const scenario = await own.agent
      .post(apiRoutes.projectScenarios(project.body.id))
      .send({ name: 'Own', document: stackedLoop() });
    const run = await own.agent
      .post(apiRoutes.scenarioRuns(scenario.body.id))
      .send(runBody(scenario.body.latestRevision.id));
    expect(run.status, JSON.stringify(run.body)).toBe(201);

    const res = await own.agent.post(apiRoutes.comparisons).send({ runIds: [org.content.runId, run.body.id] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('All runs of a comparison must belong to one organisation.');
    expect(res.body.error.fields).toEqual([
      { path: 'runIds[1]', message: 'belongs to another organisation than the first run' },
    ]);
  });

  it(`takes ${COMPARISON_RUNS.min} to ${COMPARISON_RUNS.max} different runs, saying what is wrong otherwise`, async () => {
    const extra = await moreRuns(COMPARISON_RUNS.max);
    const four = [org.content.runId, ...extra.slice(0, COMPARISON_RUNS.max - 1)];
    await storeComparison(four);
    const tooMany = await org.people.engineer.agent
      .post(apiRoutes.comparisons)
      .send({ runIds: [org.content.runId, ...extra] });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields).toEqual([{ path: 'runIds', message: 'must name at most 4 runs' }]);
    const one = await org.people.engineer.agent.post(apiRoutes.comparisons).send({ runIds: [org.content.runId] });
    expect(one.body.error.fields).toEqual([{ path: 'runIds', message: 'must name at least 2 runs' }]);
    const twice = await org.people.engineer.agent
      .post(apiRoutes.comparisons)
      .send({ runIds: [org.content.runId, org.content.runId] });
    expect(twice.body.error.fields).toEqual([{ path: 'runIds', message: 'must not name a run twice' }]);
    const notId = await org.people.engineer.agent
      .post(apiRoutes.comparisons)
      .send({ runIds: [org.content.runId, 'nope'] });
    expect(notId.status).toBe(400);
    expect(notId.body.error.fields[0].path).toBe('runIds[1]');
  });

  it('a withdrawn link and a link whose run was deleted answer the same 404; both steps are audited', async () => {
    const [second] = await moreRuns(1);
    const comparisonId = await storeComparison([org.content.runId, second]);
    const share = { kind: 'comparison', subjectId: comparisonId };
    const first = await org.people.engineer.agent.post(apiRoutes.shares).send(share);
    const other = await org.people.engineer.agent.post(apiRoutes.shares).send(share);
    expect((await org.people.owner.agent.delete(apiRoutes.share(first.body.id))).status).toBe(200);
    const withdrawn = await view(tokenOf(first.body.url));
    expect(withdrawn.status).toBe(404);
    expect((await view(tokenOf(other.body.url))).status).toBe(200);
    expect((await org.people.engineer.agent.delete(apiRoutes.run(second))).status).toBe(200);
    const gone = await view(tokenOf(other.body.url));
    expect(gone.status).toBe(404);
    expect(gone.body).toEqual(withdrawn.body);

    await expectMadeThenWithdrawn(org.people, first.body.id, { kind: 'comparison', subjectId: comparisonId });
  });
});
