// Scenario and run lists say which revisions model the belt conveyor baseline, from a stored column
// (lists never read documents), and the migration that adds the column fills it for revisions saved
// before it.
import { afterAll, describe, expect, it } from 'vitest';
import beltBaseline from '../../shared/examples/belt-baseline.json';
import { apiRoutes } from '../../shared/api/routes';
import { createDataSource } from '../../server/db/data-source';
import { runMigrations } from '../../server/db/migrate';
import { migrations } from '../../server/db/migrations';
import { createDatabase, databaseName, dropDatabase, withDatabase } from '../../server/setup/databases';
import { requireDatabaseUrl } from '../support/test-database';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { runBody, useOrganisation } from './fixtures/world';

const db = useCleanDatabase();

describe('conveyor mode in lists', () => {
  const org = useOrganisation(db, { contentPerTest: false });

  it('the scenario list, the revision list and the run lists give each revision’s conveyor mode', async () => {
    const engineer = org.people.engineer.agent;
    const { projectId, scenarioId } = org.content;
    const belt = await engineer
      .post(apiRoutes.projectScenarios(projectId))
      .send({ name: 'Belt baseline', document: structuredClone(beltBaseline) });
    expect(belt.status, JSON.stringify(belt.body)).toBe(201);
    expect(belt.body.latestRevision.conveyorMode).toBe('belt');
    const run = await engineer.post(apiRoutes.scenarioRuns(belt.body.id)).send(runBody(belt.body.latestRevision.id));
    expect(run.status, JSON.stringify(run.body)).toBe(201);
    expect(run.body.conveyorMode).toBe('belt');

    const scenarios = await engineer.get(apiRoutes.projectScenarios(projectId));
    const modes = Object.fromEntries(
      scenarios.body.map((s: { id: string; latestRevision: { conveyorMode: string } }) => [
        s.id,
        s.latestRevision.conveyorMode,
      ]),
    );
    expect(modes).toEqual({ [scenarioId]: 'carriers', [belt.body.id]: 'belt' });

    const runs = await engineer.get(apiRoutes.projectRuns(projectId));
    expect(runs.status).toBe(200);
    const runModes = (runs.body.items ?? runs.body).map((r: { scenarioId: string; conveyorMode: string }) => [
      r.scenarioId,
      r.conveyorMode,
    ]);
    expect(runModes).toEqual(
      expect.arrayContaining([
        [scenarioId, 'carriers'],
        [belt.body.id, 'belt'],
      ]),
    );

    // A new revision that switches to the belt changes the mode of the scenario's latest revision only.
    const switched = stackedLoop();
    switched.conveyor = { kind: 'belt', speedMmPerS: 250, stopAndLocateSeconds: 1.5, pitchMm: 400 };
    const saved = await engineer.post(apiRoutes.scenarioRevisions(scenarioId)).send({ document: switched });
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    expect(saved.body.conveyorMode).toBe('belt');
    const history = await engineer.get(apiRoutes.scenarioRevisions(scenarioId));
    expect(history.body.map((r: { number: number; conveyorMode: string }) => [r.number, r.conveyorMode])).toEqual([
      [2, 'belt'],
      [1, 'carriers'],
    ]);
  });
});

const emptyUrl = withDatabase(requireDatabaseUrl(), `${databaseName(requireDatabaseUrl())}_modes_${process.pid}`);

afterAll(async () => {
  await dropDatabase(emptyUrl);
});

describe('the conveyor-mode migration', () => {
  it('fills the column for revisions stored before it, from each document', async () => {
    await dropDatabase(emptyUrl);
    await createDatabase(emptyUrl);
    const ds = createDataSource(emptyUrl);
    try {
      await runMigrations(ds);
      // Back to the schema just before the column: later migrations first, then this one.
      const index = migrations.findIndex((m) => m.name === 'ConveyorMode1796230000000');
      expect(index).toBeGreaterThan(0);
      for (let undo = migrations.length - index; undo > 0; undo--) await ds.undoLastMigration({ transaction: 'each' });
      const [{ id: organisationId }] = await ds.query(`INSERT INTO organisations (name) VALUES ('Older') RETURNING id`);
      const [{ id: projectId }] = await ds.query(
        `INSERT INTO projects (organisation_id, name) VALUES ($1, 'Older line') RETURNING id`,
        [organisationId],
      );
      const [{ id: scenarioId }] = await ds.query(
        `INSERT INTO scenarios (project_id, name) VALUES ($1, 'Older scenario') RETURNING id`,
        [projectId],
      );
      const documents = [stackedLoop(), structuredClone(beltBaseline), { ...stackedLoop(), conveyor: undefined }];
      for (const [i, document] of documents.entries())
        await ds.query(`INSERT INTO scenario_revisions (scenario_id, number, document) VALUES ($1, $2, $3)`, [
          scenarioId,
          i + 1,
          JSON.stringify(document),
        ]);

      await runMigrations(ds);
      const rows = await ds.query(`SELECT number, conveyor_mode FROM scenario_revisions ORDER BY number`);
      // A document without a conveyor uses the schema's default, independent carriers.
      expect(rows).toEqual([
        { number: 1, conveyor_mode: 'carriers' },
        { number: 2, conveyor_mode: 'belt' },
        { number: 3, conveyor_mode: 'carriers' },
      ]);
    } finally {
      if (ds.isInitialized) await ds.destroy();
    }
  });
});
