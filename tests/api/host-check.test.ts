// Host header allow-list: a foreign name pointed at the server (DNS rebinding) is refused before any route.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';

const db = useCleanDatabase();

describe('host names', () => {
  it('refuses a request whose Host is not a configured name, with the usual error shape', async () => {
    const app = createApp({ dataSource: db() });
    const res = await request(app).get(apiRoutes.me).set('Host', 'rebound.attacker.example:3000');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    expect(res.body.error.fields).toEqual([{ path: 'Host', message: 'is not an allowed host name' }]);
    expect(res.body.error.message).toContain('ALLOWED_HOSTS');
  });

  it('answers loopback names, the public origin’s host and configured names', async () => {
    const config = loadConfig({ ALLOWED_HOSTS: 'lanewright.lan, Planner.Example.test' });
    const app = createApp({
      dataSource: db(),
      publicOrigin: 'https://lines.example.test',
      allowedHosts: config.ALLOWED_HOSTS,
      listenHost: '192.0.2.10',
    });
    for (const host of [
      'localhost:3000',
      '127.0.0.1',
      '[::1]:8080',
      'lines.example.test',
      'lanewright.lan:3000',
      'planner.example.test',
      '192.0.2.10:3000',
    ]) {
      const res = await request(app).get(apiRoutes.me).set('Host', host);
      expect(res.status, host).toBe(401);
    }
    for (const host of ['', 'evil.example', 'lanewright.lan.evil.example', 'localhost.evil.example']) {
      expect((await request(app).get(apiRoutes.me).set('Host', host)).status, host).toBe(400);
    }
  });

  it('reads TRUST_PROXY as off, a hop count or a list of subnets', () => {
    expect(loadConfig({}).TRUST_PROXY).toBe(false);
    expect(loadConfig({ TRUST_PROXY: '2' }).TRUST_PROXY).toBe(2);
    expect(loadConfig({ TRUST_PROXY: 'loopback, 10.0.0.0/8' }).TRUST_PROXY).toEqual(['loopback', '10.0.0.0/8']);
    expect(() => loadConfig({ TRUST_PROXY: 'yes please' })).toThrow(/TRUST_PROXY/);
  });
});
