// Sign-up, sign-in, sign-out and session lifetime against the real database.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { sessionSchema } from '../../shared/api/auth';
import { apiRoutes } from '../../shared/api/routes';
import { hashLinkToken } from '../../server/auth/link-tokens';
import { OneTimeTokenEntity, SessionEntity, UserEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';
import { mailTo, tokenIn } from './fixtures/mail';

const db = useCleanDatabase();

function sessionCookie(res: request.Response): string {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('lanewright_session='));
  if (!cookie) throw new Error(`no session cookie in ${JSON.stringify(cookies)}`);
  return cookie;
}

/** Asks to sign up, then opens the e-mailed link; returns the answer to the link (session cookie and all). */
async function finishedSignUp(
  app: Express,
  email: string,
  name = 'Ada Founder',
  organisationName = 'Founder Works',
): Promise<request.Response> {
  const since = Date.now();
  const asked = await request(app)
    .post('/api/auth/sign-up')
    .send({ email, password: PASSWORD, name, organisationName });
  expect(asked.status, JSON.stringify(asked.body)).toBe(202);
  return request(app)
    .post('/api/auth/sign-up/confirm')
    .send({ token: tokenIn(await mailTo(email.toLowerCase(), /Finish creating/, since)) });
}

describe('sign-up', () => {
  it('finishes from the e-mailed link with the user, an organisation they own, and a session', async () => {
    const app = appFor(db());
    const email = uniqueEmail('Founder').toUpperCase();
    const res = await finishedSignUp(app, email);
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe(email.toLowerCase());
    expect(res.body.memberships).toEqual([
      { organisationId: expect.any(String), organisationName: 'Founder Works', role: 'owner' },
    ]);
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const me = await request(app).get('/api/me').set('Cookie', cookie.split(';')[0]);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email.toLowerCase());
  });

  it('makes no account before the link is opened, and the link works once', async () => {
    const app = appFor(db());
    const email = uniqueEmail('once');
    const since = Date.now();
    await request(app)
      .post('/api/auth/sign-up')
      .send({ email, password: PASSWORD, name: 'Once', organisationName: 'Once' });
    const token = tokenIn(await mailTo(email, /Finish creating/, since));
    expect(await db().getRepository(UserEntity).existsBy({ email })).toBe(false);
    const stored = await db().getRepository(OneTimeTokenEntity).findOneByOrFail({ email, purpose: 'sign-up' });
    expect(stored.tokenHash).toBe(hashLinkToken(token));
    expect(JSON.stringify(stored)).not.toContain(token);
    expect((await request(app).post('/api/auth/sign-up/confirm').send({ token })).status).toBe(201);
    const again = await request(app).post('/api/auth/sign-up/confirm').send({ token });
    expect(again.status).toBe(400);
    expect(again.body.error.fields).toEqual([{ path: 'token', message: 'is no longer valid' }]);
  });

  it('stores an argon2id hash, never the password', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'hashcheck');
    const user = await db().getRepository(UserEntity).findOneByOrFail({ email });
    expect(user.passwordHash.startsWith('$argon2id$')).toBe(true);
    expect(user.passwordHash).not.toContain(PASSWORD);
  });

  it('answers a registered address exactly like a new one, and mails its owner instead', async () => {
    const app = appFor(db());
    const { email, id } = await signUp(app, 'twice');
    const since = Date.now();
    const taken = await request(app)
      .post('/api/auth/sign-up')
      .send({ email: email.toUpperCase(), password: PASSWORD, name: 'Again', organisationName: 'Again' });
    const fresh = await request(app)
      .post('/api/auth/sign-up')
      .send({ email: uniqueEmail('fresh'), password: PASSWORD, name: 'Again', organisationName: 'Again' });
    expect(taken.status).toBe(202);
    expect(fresh.status).toBe(202);
    expect(taken.body).toEqual(fresh.body);
    expect(taken.headers['set-cookie']).toBeUndefined();
    const notice = await mailTo(email, /already have a Lanewright account/, since);
    expect(notice.links.some((link) => link.includes('#'))).toBe(false);
    expect(await db().getRepository(UserEntity).countBy({ email })).toBe(1);
    expect((await db().getRepository(UserEntity).findOneByOrFail({ email })).id).toBe(id);
  });

  it('marks the cookie Secure when the app is served over https', async () => {
    const app = appFor(db(), 'https://lanewright.example.test');
    const res = await finishedSignUp(app, uniqueEmail('secure'));
    expect(res.status).toBe(201);
    expect(sessionCookie(res)).toMatch(/Secure/);
  });
});

describe('sign-in', () => {
  it('answers a wrong password and an unknown e-mail with the same 401 message', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'signin');
    const wrong = await request(app).post('/api/auth/sign-in').send({ email, password: 'not the password' });
    const unknown = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('unauthenticated');
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('signs in with the right password and accepts any letter case in the e-mail', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'right');
    const res = await request(app).post('/api/auth/sign-in').send({ email: email.toUpperCase(), password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(email);
    const me = await request(app).get('/api/me').set('Cookie', sessionCookie(res).split(';')[0]);
    expect(me.status).toBe(200);
  });

  it('slows down repeated failures for one e-mail', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'guessed');
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1)
      statuses.push(
        (
          await request(app)
            .post('/api/auth/sign-in')
            .send({ email, password: `guess-${i}` })
        ).status,
      );
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    const limited = await request(app).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('rate_limited');
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
  });
});

describe('sessions', () => {
  it('sign-out invalidates the session on the server, so the old cookie no longer works', async () => {
    const app = appFor(db());
    const res = await finishedSignUp(app, uniqueEmail('leaver'));
    const cookie = sessionCookie(res).split(';')[0];
    const out = await request(app).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(200);
    expect(out.body).toEqual({ ok: true });
    expect(await db().getRepository(SessionEntity).countBy({ userId: res.body.user.id })).toBe(0);
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
  });

  it('signing in again replaces the session the browser already had', async () => {
    const app = appFor(db());
    const res = await finishedSignUp(app, uniqueEmail('again'));
    const before = sessionCookie(res).split(';')[0];
    const again = await request(app)
      .post('/api/auth/sign-in')
      .set('Cookie', before)
      .send({ email: res.body.user.email, password: PASSWORD });
    expect(again.status).toBe(200);
    const after = sessionCookie(again).split(';')[0];
    expect(after).not.toBe(before);
    expect((await request(app).get('/api/me').set('Cookie', before)).status).toBe(401);
    expect((await request(app).get('/api/me').set('Cookie', after)).status).toBe(200);
  });

  it('answers 401 once the session has expired in the database', async () => {
    const app = appFor(db());
    const res = await finishedSignUp(app, uniqueEmail('expiring'));
    const cookie = sessionCookie(res).split(';')[0];
    await db()
      .getRepository(SessionEntity)
      .update({ userId: res.body.user.id }, { expiresAt: new Date(Date.now() - 1000) });
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });

  it('extends a session that is past half its life and re-sends the cookie', async () => {
    const app = appFor(db());
    const res = await finishedSignUp(app, uniqueEmail('sliding'));
    const cookie = sessionCookie(res).split(';')[0];
    const soon = new Date(Date.now() + 24 * 3600 * 1000);
    await db().getRepository(SessionEntity).update({ userId: res.body.user.id }, { expiresAt: soon });
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(sessionCookie(me)).toContain(cookie);
    const session = await db().getRepository(SessionEntity).findOneByOrFail({ userId: res.body.user.id });
    expect(session.expiresAt.getTime()).toBeGreaterThan(soon.getTime() + 20 * 24 * 3600 * 1000);
  });

  it('the session check answers a visitor 200 with nobody, and a signed-in user with who they are', async () => {
    const app = appFor(db());
    const visitor = await request(app).get(apiRoutes.session);
    expect(visitor.status).toBe(200);
    expect(visitor.body).toEqual({ me: null });
    const res = await finishedSignUp(app, uniqueEmail('session'));
    const signedIn = await request(app).get(apiRoutes.session).set('Cookie', sessionCookie(res).split(';')[0]);
    expect(signedIn.status).toBe(200);
    expect(sessionSchema.parse(signedIn.body).me?.user.id).toBe(res.body.user.id);
  });

  it('GET /api/me answers 401 without a session', async () => {
    const res = await request(appFor(db())).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual({ code: 'unauthenticated', message: expect.any(String), fields: [] });
  });
});
