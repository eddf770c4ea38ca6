// A project's "updated" time follows the work in it, and saving a revision under a new scenario name
// renames the scenario everywhere it is listed.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { runBody, useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db);

const pause = () => new Promise((resolve) => setTimeout(resolve, 15));

describe('project activity', () => {
  it('moves the project’s updated time on a new scenario, revision, run and rename', async () => {
    const engineer = org.people.engineer.agent;
    const updated = async () =>
      Date.parse((await engineer.get(apiRoutes.project(org.content.projectId))).body.updatedAt as string);
    const steps: [string, () => Promise<{ status: number }>][] = [
      [
        'new scenario',
        () =>
          engineer
            .post(apiRoutes.projectScenarios(org.content.projectId))
            .send({ name: 'Second layout', document: stackedLoop() }),
      ],
      [
        'new revision',
        () => engineer.post(apiRoutes.scenarioRevisions(org.content.scenarioId)).send({ document: stackedLoop() }),
      ],
      [
        'new run',
        () => engineer.post(apiRoutes.scenarioRuns(org.content.scenarioId)).send(runBody(org.content.revisionId)),
      ],
      ['rename', () => engineer.patch(apiRoutes.scenario(org.content.scenarioId)).send({ name: 'Renamed' })],
    ];
    for (const [what, step] of steps) {
      const before = await updated();
      await pause();
      const res = await step();
      expect(res.status, what).toBeLessThan(300);
      expect(await updated(), what).toBeGreaterThan(before);
    }
  });

  it('renames the scenario when a revision is saved under a new document name', async () => {
    const engineer = org.people.engineer.agent;
    const document = { ...stackedLoop(), name: 'Stacked loop, two presses' };
    expect((await engineer.post(apiRoutes.scenarioRevisions(org.content.scenarioId)).send({ document })).status).toBe(
      201,
    );
    expect((await engineer.get(apiRoutes.scenario(org.content.scenarioId))).body.name).toBe(
      'Stacked loop, two presses',
    );
    const list = await engineer.get(apiRoutes.projectScenarios(org.content.projectId));
    expect(list.body.map((s: { name: string }) => s.name)).toContain('Stacked loop, two presses');
  });
});
