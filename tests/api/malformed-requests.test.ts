// Requests that once reached the database or the body parser unchecked: each answers 400 with the usual
// error shape and a field path, and nothing is stored.
import { gzipSync } from 'node:zlib';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { stackedLoop } from './fixtures/documents';
import { appFor, signUp } from './fixtures/app';

const db = useCleanDatabase();

function expectBadRequest(res: request.Response, path?: string) {
  expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(400);
  expect(res.body.error.code).toBe('bad_request');
  if (path !== undefined) expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain(path);
}

describe('malformed requests answer 400, never 500', () => {
  it('a body labelled gzip that is not gzip', async () => {
    const { agent } = await signUp(appFor(db()), 'gzip');
    const res = await agent
      .post(apiRoutes.projects)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send('{"name":"Plain"}');
    expectBadRequest(res);
    expect(res.body.error.message).toMatch(/gzip/);
    // A real gzip body still works.
    const real = await agent
      .post(apiRoutes.projects)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .serialize((body: Buffer) => body as unknown as string)
      .send(gzipSync('{"name":"Zipped"}'));
    expect(real.status, JSON.stringify(real.body)).toBe(201);
  });

  it('bad percent-encoding in a path id', async () => {
    const { agent } = await signUp(appFor(db()), 'percent');
    for (const path of ['/api/projects/%C0%AF', '/api/runs/%E0%A4%A', '/api/scenarios/%ZZ/revisions'])
      expectBadRequest(await agent.get(path), 'address');
  });

  it('a NUL character in a text field, with its path', async () => {
    const { agent } = await signUp(appFor(db()), 'nul');
    expectBadRequest(await agent.post(apiRoutes.projects).send({ name: 'Line\u0000one' }), 'name');
    const project = await agent.post(apiRoutes.projects).send({ name: 'Line' });
    const document = stackedLoop();
    (document as { name: string }).name = 'Doc\u0000';
    expectBadRequest(
      await agent.post(apiRoutes.projectScenarios(project.body.id)).send({ name: 'S', document }),
      'document.name',
    );
    expectBadRequest(
      await agent.post(apiRoutes.signIn).send({ email: 'a\u0000@example.test', password: 'whatever long' }),
      'email',
    );
  });

  it('a lone surrogate in text kept in a JSON column', async () => {
    const { agent } = await signUp(appFor(db()), 'surrogate');
    const project = await agent.post(apiRoutes.projects).send({ name: 'Line' });
    // Written by hand: JSON.stringify would escape the lone surrogate as \ud800, which is the case we test.
    const body = JSON.stringify({ name: 'S', document: stackedLoop() }).replace('"name":"S"', '"name":"S\\ud800x"');
    const res = await agent
      .post(apiRoutes.projectScenarios(project.body.id))
      .set('Content-Type', 'application/json')
      .send(body);
    expectBadRequest(res, 'name');
    const document = stackedLoop();
    (document as { description?: string }).description = 'half \udc00 pair';
    expectBadRequest(
      await agent.post(apiRoutes.projectScenarios(project.body.id)).send({ name: 'S', document }),
      'document.description',
    );
  });

  it('integers above the database range in the path and in the body', async () => {
    const { agent } = await signUp(appFor(db()), 'range');
    const project = await agent.post(apiRoutes.projects).send({ name: 'Line' });
    const scenario = await agent
      .post(apiRoutes.projectScenarios(project.body.id))
      .send({ name: 'S', document: stackedLoop() });
    expect(scenario.status).toBe(201);
    expectBadRequest(await agent.get(`/api/scenarios/${scenario.body.id}/revisions/2147483648`), 'number');
    expectBadRequest(await agent.get(`/api/scenarios/${scenario.body.id}/revisions/99999999999999999999`), 'number');
    expectBadRequest(
      await agent
        .post(apiRoutes.scenarioRevisions(scenario.body.id))
        .send({ document: stackedLoop(), baseRevisionNumber: 2 ** 31 }),
      'baseRevisionNumber',
    );
  });
});
