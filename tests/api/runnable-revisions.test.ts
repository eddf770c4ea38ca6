// The server keeps only documents the engine will run: the engine's static line checks on every save,
// refusing with the field path of each problem.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { appFor, signUp } from './fixtures/app';

const db = useCleanDatabase();

type Doc = { steps: { stations: unknown[] }[]; transfers: unknown[]; carriers: { count: number } };

async function scenarioOf(label: string) {
  const { agent } = await signUp(appFor(db()), label);
  const project = await agent.post(apiRoutes.projects).send({ name: 'Runnable' });
  const scenario = await agent
    .post(apiRoutes.projectScenarios(project.body.id))
    .send({ name: 'Loop', document: stackedLoop() });
  expect(scenario.status).toBe(201);
  return { agent, projectId: project.body.id as string, scenarioId: scenario.body.id as string };
}

const cases: [string, (d: Doc) => void, string, RegExp][] = [
  ['a step with no station', (d) => (d.steps[1].stations = []), 'document.steps[1].stations', /has no station/],
  [
    'a loop that does not close',
    (d) => (d.transfers = d.transfers.slice(0, 1)),
    'document.steps[0].stations[0].laneId',
    /loop must close/,
  ],
  ['more carriers than the track holds', (d) => (d.carriers.count = 2000), 'document.carriers.count', /do not fit/],
];

describe('saving a revision the engine would refuse', () => {
  it.each(cases)('refuses %s with its field path, and stores nothing', async (_, breakIt, path, message) => {
    const { agent, projectId, scenarioId } = await scenarioOf('runnable');
    const document = stackedLoop() as unknown as Doc;
    breakIt(document);
    const revision = await agent.post(apiRoutes.scenarioRevisions(scenarioId)).send({ document, message: 'broken' });
    expect(revision.status).toBe(400);
    expect(revision.body.error.fields).toContainEqual({ path, message: expect.stringMatching(message) });
    expect((await agent.get(apiRoutes.scenarioRevisions(scenarioId))).body).toHaveLength(1);
    const created = await agent.post(apiRoutes.projectScenarios(projectId)).send({ name: 'Broken', document });
    expect(created.status).toBe(400);
    expect(created.body.error.fields).toContainEqual({ path, message: expect.stringMatching(message) });
  });
});
