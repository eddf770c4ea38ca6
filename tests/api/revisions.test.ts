// Scenario revisions are immutable snapshots: saves add revision n+1, stale saves are refused, and no
// route or query can change a stored revision.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { ScenarioRevisionEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { sideBySideLoop, stackedLoop } from './fixtures/documents';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

describe('scenario revisions', () => {
  it('a new save makes revision number + 1 and moves the scenario to it', async () => {
    const engineer = org.people.engineer.agent;
    const changed = sideBySideLoop();
    const saved = await engineer
      .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
      .send({ document: changed, message: 'Side by side instead', baseRevisionNumber: 1 });
    expect(saved.status).toBe(201);
    expect(saved.body).toMatchObject({
      number: 2,
      message: 'Side by side instead',
      scenarioId: org.content.scenarioId,
      createdBy: { id: org.people.engineer.id },
    });
    expect(saved.body.document.name).toBe(changed.name);

    const scenario = await engineer.get(apiRoutes.scenario(org.content.scenarioId));
    expect(scenario.body.latestRevision.number).toBe(2);
    expect(scenario.body.document.name).toBe(changed.name);

    const first = await engineer.get(apiRoutes.scenarioRevision(org.content.scenarioId, 1));
    expect(first.status).toBe(200);
    expect(first.body.document.name).toBe(stackedLoop().name);

    const list = await engineer.get(apiRoutes.scenarioRevisions(org.content.scenarioId));
    expect(list.body.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(list.body[0]).not.toHaveProperty('document');
  });

  it('a save based on an older revision answers 409 and stores nothing', async () => {
    const engineer = org.people.engineer.agent;
    expect(
      (
        await engineer
          .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
          .send({ document: stackedLoop(), baseRevisionNumber: 1 })
      ).status,
    ).toBe(201);
    const stale = await org.people.owner.agent
      .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
      .send({ document: sideBySideLoop(), baseRevisionNumber: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.fields).toEqual([
      { path: 'baseRevisionNumber', message: 'is 1 but the latest revision is 2' },
    ]);
    expect(await db().getRepository(ScenarioRevisionEntity).countBy({ scenarioId: org.content.scenarioId })).toBe(2);
  });

  it('concurrent saves get consecutive numbers, never the same one', async () => {
    const saves = await Promise.all(
      Array.from({ length: 5 }, () =>
        org.people.engineer.agent
          .post(apiRoutes.scenarioRevisions(org.content.scenarioId))
          .send({ document: stackedLoop() }),
      ),
    );
    expect(saves.map((s) => s.status)).toEqual([201, 201, 201, 201, 201]);
    expect(saves.map((s) => s.body.number).sort()).toEqual([2, 3, 4, 5, 6]);
  });

  it('no route changes or deletes a revision', async () => {
    const path = apiRoutes.scenarioRevision(org.content.scenarioId, 1);
    for (const method of ['put', 'patch', 'delete'] as const) {
      const res = await org.people.owner.agent[method](path).send({ document: sideBySideLoop(), message: 'rewritten' });
      expect(res.status).toBe(404);
    }
    const after = await org.people.owner.agent.get(path);
    expect(after.body.document.name).toBe(stackedLoop().name);
    expect(after.body.message).toBe('Created');
  });

  it('the database refuses to change a stored revision even outside the API', async () => {
    const repo = db().getRepository(ScenarioRevisionEntity);
    await expect(
      repo.update({ scenarioId: org.content.scenarioId, number: 1 }, { message: 'rewritten' }),
    ).rejects.toThrow(/immutable/);
    await expect(repo.update({ scenarioId: org.content.scenarioId, number: 1 }, { number: 7 })).rejects.toThrow(
      /immutable/,
    );
  });

  it('a missing revision number answers 404', async () => {
    const res = await org.people.viewer.agent.get(apiRoutes.scenarioRevision(org.content.scenarioId, 99));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
