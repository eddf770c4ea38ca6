// Stored runs: idempotent saves on the client's run id, revisions that must belong to the scenario, lists
// that leave the bulky results out, and cascades when projects and users go.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { runDetailSchema, runListItemSchema } from '../../shared/api/runs';
import {
  AuditEntryEntity,
  RunEntity,
  ScenarioEntity,
  ScenarioRevisionEntity,
  UserEntity,
} from '../../server/db/entities';
import { JSON_BODY_LIMIT_BYTES } from '../../server/http/limits';
import { useCleanDatabase } from './fixtures/database';
import { appFor, signUp } from './fixtures/app';
import { stackedLoop } from './fixtures/documents';
import { makeRunResult, runSettings } from './fixtures/run-result';
import { addMember, freshContent, runBody, useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

describe('saving runs', () => {
  it('a retried save returns the same run with 200 instead of making a second one', async () => {
    const body = runBody(org.content.revisionId);
    const first = await org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body);
    const retry = await org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body);
    expect(first.status).toBe(201);
    expect(retry.status).toBe(200);
    expect(retry.body).toEqual(first.body);
    expect(await db().getRepository(RunEntity).countBy({ clientRunId: body.clientRunId })).toBe(1);
  });

  it('simultaneous attempts with one client run id store one run', async () => {
    const body = runBody(org.content.revisionId);
    const answers = await Promise.all(
      Array.from({ length: 4 }, () =>
        org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
  });

  it('reusing a client run id for another revision answers 409', async () => {
    const body = runBody(org.content.revisionId);
    await org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body);
    const second = await org.people.engineer.agent
      .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
      .send({ document: stackedLoop() });
    const res = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send({ ...body, revisionId: second.body.id });
    expect(res.status).toBe(409);
    expect(res.body.error.fields[0].path).toBe('clientRunId');
  });

  it('refuses a revision of another scenario', async () => {
    const other = await freshContent(org.people);
    const res = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send(runBody(other.revisionId));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: 'revisionId', message: 'is not a revision of this scenario' }]);
  });

  it('refuses settings that differ from the ones inside the results', async () => {
    const res = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send({ ...runBody(org.content.revisionId), settings: runSettings({ replications: 7 }) });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe('settings');
  });

  it('stores seed, engine version and headline numbers from the results', async () => {
    const results = makeRunResult({ seed: 'line-42', replications: 3 });
    const res = await org.people.engineer.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send({ clientRunId: randomUUID(), revisionId: org.content.revisionId, settings: results.settings, results });
    expect(res.status).toBe(201);
    const item = runListItemSchema.parse(res.body);
    expect(item).toMatchObject({
      seed: 'line-42',
      engineVersion: results.engineVersion,
      revisionNumber: 1,
      scenarioName: 'Stacked',
      name: 'Stacked, revision 1',
    });
    expect(item.summary).toEqual({
      throughputPerHour: results.throughputPerHour,
      taktSeconds: results.taktSeconds,
      annualOutput: results.annualOutput,
      carriers: results.carriers.count,
      bottleneckStationId: results.bottleneckStationId,
    });
    const row = await db().getRepository(RunEntity).findOneByOrFail({ id: item.id });
    expect(row.throughputPerHourMean).toBe(results.throughputPerHour.mean);
    expect(row.taktSecondsMean).toBe(results.taktSeconds.mean);
    expect(row.carriers).toBe(results.carriers.count);
  });

  it('accepts the result of a long run of a large layout (heatmaps at full precision) within the body limit', async () => {
    const results = makeRunResult({ replications: 10 }, { lanes: 8, stations: 40, timeBins: 240, positionBins: 100 });
    const body = { clientRunId: randomUUID(), revisionId: org.content.revisionId, settings: results.settings, results };
    expect(JSON.stringify(body).length).toBeLessThan(JSON_BODY_LIMIT_BYTES);
    const res = await org.people.engineer.agent.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(body);
    expect(res.status).toBe(201);
    const detail = await org.people.viewer.agent.get(apiRoutes.run(res.body.id));
    expect(runDetailSchema.parse(detail.body).results.heatmaps.lanes[7].occupancy).toEqual(
      results.heatmaps.lanes[7].occupancy,
    );
  });
});

describe('reading runs', () => {
  it('lists leave results out; the detail has them', async () => {
    const list = await org.people.viewer.agent.get(apiRoutes.scenarioRuns(org.content.scenarioId));
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    expect(list.body.items[0]).not.toHaveProperty('results');
    runListItemSchema.parse(list.body.items[0]);
    const detail = await org.people.viewer.agent.get(apiRoutes.run(org.content.runId));
    expect(runDetailSchema.parse(detail.body).results.engineVersion).toBe('0.1.0-test');
  });

  it('project run lists filter by revision and author', async () => {
    const second = await org.people.engineer.agent
      .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
      .send({ document: stackedLoop() });
    const byOwner = await org.people.owner.agent
      .post(apiRoutes.scenarioRuns(org.content.scenarioId))
      .send(runBody(second.body.id));
    expect(byOwner.status).toBe(201);
    const all = await org.people.viewer.agent.get(apiRoutes.projectRuns(org.content.projectId));
    expect(all.body.items.map((r: { id: string }) => r.id).sort()).toEqual([org.content.runId, byOwner.body.id].sort());
    const ofRevision = await org.people.viewer.agent
      .get(apiRoutes.projectRuns(org.content.projectId))
      .query({ revisionId: second.body.id });
    expect(ofRevision.body.items.map((r: { id: string }) => r.id)).toEqual([byOwner.body.id]);
    const ofEngineer = await org.people.viewer.agent
      .get(apiRoutes.scenarioRuns(org.content.scenarioId))
      .query({ createdBy: org.people.engineer.id });
    expect(ofEngineer.body.items.map((r: { id: string }) => r.id)).toEqual([org.content.runId]);
  });

  it('the author renames a run', async () => {
    const res = await org.people.engineer.agent
      .patch(apiRoutes.run(org.content.runId))
      .send({ name: '  Twenty carriers  ' });
    expect(res.status).toBe(200);
    expect(res.body.name).toBe('Twenty carriers');
  });
});

describe('cascades', () => {
  it('deleting a project removes its scenarios, revisions and runs', async () => {
    expect((await org.people.engineer.agent.delete(apiRoutes.project(org.content.projectId))).status).toBe(200);
    expect(await db().getRepository(ScenarioEntity).countBy({ projectId: org.content.projectId })).toBe(0);
    expect(await db().getRepository(ScenarioRevisionEntity).countBy({ scenarioId: org.content.scenarioId })).toBe(0);
    expect(await db().getRepository(RunEntity).countBy({ id: org.content.runId })).toBe(0);
    expect((await org.people.engineer.agent.get(apiRoutes.run(org.content.runId))).status).toBe(404);
  });

  it('deleting a user keeps their audit rows with no actor, and their work with no author', async () => {
    const app = appFor(db());
    const leaver = await signUp(app, 'leaver');
    await addMember(org.people.owner.agent, org.people.organisationId, leaver, 'engineer');
    const renamed = await leaver.agent
      .patch(apiRoutes.project(org.content.projectId))
      .send({ description: 'Checked by the leaver' });
    expect(renamed.status).toBe(200);
    await db().getRepository(UserEntity).delete({ id: leaver.id });
    const rows = await db()
      .getRepository(AuditEntryEntity)
      .findBy({ entityId: org.content.projectId, action: 'update' });
    expect(rows).toHaveLength(1);
    expect(rows[0].actorId).toBeNull();
    const audit = await org.people.owner.agent.get(apiRoutes.audit(org.people.organisationId));
    expect(
      audit.body.entries.find(
        (e: { entityId: string; action: string }) => e.entityId === org.content.projectId && e.action === 'update',
      ).actor,
    ).toBeNull();
  });
});
