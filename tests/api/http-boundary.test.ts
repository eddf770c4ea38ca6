// The edges of the HTTP layer: cross-origin mutations, security headers, and serving the built client.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { createApp } from '../../server/app';
import { ConfigError, loadConfig } from '../../server/config';
import { startServer } from '../../server/index';
import { useCleanDatabase } from './fixtures/database';
import { mailTo, tokenIn } from './fixtures/mail';
import { appFor, signUp, uniqueEmail } from './fixtures/app';

const db = useCleanDatabase();
const clientDir = mkdtempSync(join(tmpdir(), 'lanewright-client-'));
writeFileSync(join(clientDir, 'index.html'), '<!doctype html><title>Lanewright</title>');
writeFileSync(join(clientDir, 'app.js'), 'console.log(1)');

afterAll(() => rmSync(clientDir, { recursive: true, force: true }));

describe('cross-origin requests', () => {
  it('refuses a mutation whose Origin is another site, and changes nothing', async () => {
    const app = appFor(db());
    const { agent } = await signUp(app, 'origin');
    const res = await agent
      .post(apiRoutes.projects)
      .set('Origin', 'https://elsewhere.example')
      .send({ name: 'Forged' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect((await agent.get(apiRoutes.projects)).body).toEqual([]);
  });

  it('refuses a cross-origin sign-in and sign-out too', async () => {
    const app = appFor(db());
    const res = await request(app)
      .post(apiRoutes.signIn)
      .set('Origin', 'http://evil.example')
      .send({ email: uniqueEmail('x'), password: 'whatever-long' });
    expect(res.status).toBe(403);
  });

  it('allows the app’s own origin, the public origin, and requests without Origin', async () => {
    const app = appFor(db(), 'https://lanewright.example.test');
    const email = uniqueEmail('sameorigin');
    await request(app)
      .post(apiRoutes.signUp)
      .send({ email, password: 'long enough password', name: 'S', organisationName: 'S' });
    const signedUp = await request(app)
      .post(apiRoutes.signUpConfirm)
      .send({ token: tokenIn(await mailTo(email, /Finish creating/)) });
    // The cookie is Secure (https public origin), so supertest's plain-http agent would not send it.
    const cookie = String(signedUp.headers['set-cookie']).split(';')[0];
    const post = (origin: string | null, name: string) => {
      const call = request(app).post(apiRoutes.projects).set('Cookie', cookie).set('Host', 'localhost:3000');
      return (origin ? call.set('Origin', origin) : call).send({ name });
    };
    expect((await post('http://localhost:3000', 'Own')).status).toBe(201);
    expect((await post('https://lanewright.example.test', 'Public')).status).toBe(201);
    expect((await post(null, 'No origin')).status).toBe(201);
    expect((await post('http://localhost:3001', 'Other port')).status).toBe(403);
    const reads = await request(app)
      .get(apiRoutes.projects)
      .set('Cookie', cookie)
      .set('Origin', 'https://elsewhere.example');
    expect(reads.status).toBe(200);
    expect(reads.body).toHaveLength(3);
  });
});

describe('headers', () => {
  it('sends a content security policy that allows own scripts, blob workers and data/blob images', async () => {
    const res = await request(appFor(db())).get(apiRoutes.me);
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("worker-src 'self' blob:");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['cache-control']).toBe('no-store');
  });
});

describe('serving the client', () => {
  it('serves files, falls back to index.html for client routes, and keeps /api answers JSON', async () => {
    const app = createApp({ dataSource: db(), clientDir });
    expect((await request(app).get('/app.js')).text).toBe('console.log(1)');
    const deep = await request(app).get('/projects/123/scenarios');
    expect(deep.status).toBe(200);
    expect(deep.text).toContain('<title>Lanewright</title>');
    const missing = await request(app).get('/assets/gone-1234.js');
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not_found');
    const api = await request(app).get('/api/does-not-exist');
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
  });

  it('without a client folder, other paths answer a JSON 404', async () => {
    const res = await request(appFor(db())).get('/projects');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('startServer', () => {
  it('listens on the given host and port 0, answers, and closes', async () => {
    const server = await startServer({ dataSource: db(), port: 0, host: '127.0.0.1', fakeSmtpPort: 0 });
    try {
      expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
      const res = await fetch(`${server.url}${apiRoutes.me}`);
      expect(res.status).toBe(401);
      expect((await res.json()).error.code).toBe('unauthenticated');
    } finally {
      await server.close();
    }
    await expect(fetch(`${server.url}${apiRoutes.me}`)).rejects.toThrow();
  });
});

describe('configuration', () => {
  it('lists every bad setting by name', () => {
    let error: unknown;
    try {
      loadConfig({ PORT: 'eighty', PUBLIC_ORIGIN: 'not a url', LANEWRIGHT_DEMO: 'maybe', DATABASE_URL: 'mysql://x' });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const problems = (error as ConfigError).problems.map((p) => p.split(':')[0]);
    expect(problems.sort()).toEqual(['DATABASE_URL', 'LANEWRIGHT_DEMO', 'PORT', 'PUBLIC_ORIGIN']);
  });

  it('fills defaults and treats empty values as unset', () => {
    expect(loadConfig({ PORT: '', PUBLIC_ORIGIN: 'https://lanewright.example.test/path' })).toMatchObject({
      PORT: 3000,
      HOST: '127.0.0.1',
      LANEWRIGHT_DEMO: 'on',
      PUBLIC_ORIGIN: 'https://lanewright.example.test',
    });
  });
});
