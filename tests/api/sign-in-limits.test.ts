// Sign-in attempt limits: counted before the password check, per account and per source address, and kept
// in PostgreSQL so two server processes (two apps on one database here) share them.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { DEFAULT_SIGN_IN_LIMITS } from '../../server/auth/rate-limit';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';
import { createApp } from '../../server/app';

const db = useCleanDatabase();
const { perAccount, perAddress } = DEFAULT_SIGN_IN_LIMITS;

describe('sign-in attempt limits', () => {
  it('300 attempts sent together: at most the limit reach the password check, the right password among the rest is refused', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'flooded');
    // The right password sits in the middle of the burst, well past the limit in any fair ordering.
    const attempts = Array.from({ length: 300 }, (_, i) => (i === 150 ? PASSWORD : `wrong-guess-${i}`));
    const answers = await Promise.all(
      attempts.map((password) => request(app).post(apiRoutes.signIn).send({ email, password })),
    );
    const statuses = answers.map((a) => a.status);
    const checked = statuses.filter((s) => s !== 429).length;
    expect(checked).toBeLessThanOrEqual(perAccount);
    expect(statuses.filter((s) => s === 429)).toHaveLength(300 - checked);
    // Whatever order they arrived in, at most `perAccount` passwords were checked, so at most one 200.
    expect(statuses.filter((s) => s === 200).length).toBeLessThanOrEqual(1);
    const later = await request(app).post(apiRoutes.signIn).send({ email, password: PASSWORD });
    expect(later.status).toBe(429);
    expect(later.body.error.code).toBe('rate_limited');
    expect(Number(later.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('a second server process on the same database sees the same counts', async () => {
    const first = appFor(db());
    const second = createApp({ dataSource: db() });
    const { email } = await signUp(first, 'shared');
    for (let i = 0; i < perAccount; i += 1)
      expect(
        (
          await request(first)
            .post(apiRoutes.signIn)
            .send({ email, password: `nope-${i}` })
        ).status,
      ).toBe(401);
    expect((await request(second).post(apiRoutes.signIn).send({ email, password: PASSWORD })).status).toBe(429);
  });

  it('a right password gives its attempt back, so the owner is not locked out by their own sign-ins', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'regular');
    for (let i = 0; i < perAccount + 5; i += 1)
      expect((await request(app).post(apiRoutes.signIn).send({ email, password: PASSWORD })).status).toBe(200);
  });

  it('limits one source address across many accounts', async () => {
    const app = appFor(db());
    const answers: number[] = [];
    for (let batch = 0; batch < (perAddress + 10) / 10; batch += 1) {
      const results = await Promise.all(
        Array.from({ length: 10 }, () =>
          request(app)
            .post(apiRoutes.signIn)
            .send({ email: uniqueEmail('sprayed'), password: 'not-the-password' }),
        ),
      );
      answers.push(...results.map((r) => r.status));
    }
    expect(answers.filter((s) => s === 401)).toHaveLength(perAddress);
    expect(answers.filter((s) => s === 429).length).toBeGreaterThanOrEqual(10);
  });

  it('counts per forwarded address only behind a trusted proxy', async () => {
    const trusting = createApp({ dataSource: db(), trustProxy: ['loopback'] });
    const email = uniqueEmail('proxied');
    const from = (address: string) =>
      request(trusting)
        .post(apiRoutes.signIn)
        .set('X-Forwarded-For', address)
        .send({ email, password: 'not-the-password' });
    // Each client behind the proxy has its own address budget, but the account budget is shared.
    for (let i = 0; i < perAccount; i += 1) expect((await from(`203.0.113.${i + 1}`)).status).toBe(401);
    expect((await from('203.0.113.200')).status).toBe(429);
  });
});
