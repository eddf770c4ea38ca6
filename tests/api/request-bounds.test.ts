// The work one request can cause is bounded: body limits per route that fit the largest legitimate
// document, lists bounded by the schema, and a validation answer that lists a bounded number of problems.
import { describe, expect, it } from 'vitest';
import { BODY_LIMITS } from '../../server/http/limits';
import { MAX_REPORTED_ISSUES } from '../../server/http/validate';
import { apiRoutes } from '../../shared/api/routes';
import { maximalScenario } from '../support/maximal-scenario';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { appFor, signUp } from './fixtures/app';

const db = useCleanDatabase();

async function projectOf(label: string) {
  const { agent } = await signUp(appFor(db()), label);
  const project = await agent.post(apiRoutes.projects).send({ name: 'Bounds' });
  return { agent, projectId: project.body.id as string };
}

describe('request bounds', () => {
  it('accepts a scenario with every list at its limit, and the route limit fits it without much slack', async () => {
    const { agent, projectId } = await projectOf('maximal');
    const document = maximalScenario();
    const bytes = Buffer.byteLength(JSON.stringify({ name: 'Maximal', document }));
    expect(bytes).toBeLessThan(BODY_LIMITS.scenario);
    expect(bytes).toBeGreaterThan(BODY_LIMITS.scenario * 0.6);
    const created = await agent.post(apiRoutes.projectScenarios(projectId)).send({ name: 'Maximal', document });
    expect(created.status, JSON.stringify(created.body).slice(0, 500)).toBe(201);
    const revision = await agent
      .post(apiRoutes.scenarioRevisions(created.body.id))
      .send({ document, message: 'again' });
    expect(revision.status).toBe(201);
  }, 60_000);

  it('a 5 MB list of a million wrong items answers 400 at once with a short error body', async () => {
    const { agent, projectId } = await projectOf('million');
    const document = stackedLoop() as { steps: { stations: unknown[] }[] };
    const body = JSON.stringify({ name: 'Flood', document }).replace(
      '"stations":[',
      `"stations":[${'0,'.repeat(2_500_000)}`,
    );
    expect(body.length).toBeGreaterThan(5_000_000);
    const started = performance.now();
    const res = await agent
      .post(apiRoutes.projectScenarios(projectId))
      .set('Content-Type', 'application/json')
      .send(body);
    const elapsed = performance.now() - started;
    expect(res.status).toBe(400);
    expect(res.body.error.fields.length).toBeLessThanOrEqual(MAX_REPORTED_ISSUES);
    expect(res.body.error.fields[0].path).toBe('document.steps[0].stations');
    expect(res.text.length).toBeLessThan(10_000);
    // Generous, for a shared machine: the unbounded version took 16 s and answered 184 MB.
    expect(elapsed).toBeLessThan(5_000);
  });

  it('a list of many wrong items where each item is checked reports at most the bounded number of problems', async () => {
    const { agent, projectId } = await projectOf('many');
    const document = stackedLoop() as { steps: { stations: { cycleTimeSeconds: unknown }[] }[] };
    document.steps[1].stations[0].cycleTimeSeconds = {
      kind: 'empirical',
      samples: Array.from({ length: 50_000 }, () => -1),
    };
    const res = await agent.post(apiRoutes.projectScenarios(projectId)).send({ name: 'Negative', document });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveLength(MAX_REPORTED_ISSUES);
    expect(res.body.error.message, res.body.error.message.slice(-200)).toMatch(
      /and 4998\d more problem\(s\) not listed/,
    );
  });

  it('small routes have a small limit: a 100 KB project name answers 413 naming the limit', async () => {
    const { agent } = await projectOf('small');
    const res = await agent.post(apiRoutes.projects).send({ name: 'x'.repeat(100 * 1024) });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain('64 KB');
  });

  it('refuses more stations than the line allows, naming the limit', async () => {
    const { agent, projectId } = await projectOf('stations');
    const document = maximalScenario() as { steps: { stations: Record<string, unknown>[] }[] };
    const extra = structuredClone(document.steps[5].stations[0]);
    document.steps[5].stations.push({ ...extra, id: 'one-too-many', positionMm: 4000 });
    const res = await agent.post(apiRoutes.projectScenarios(projectId)).send({ name: 'Too many', document });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/501 stations; at most 500/);
  }, 60_000);
});
