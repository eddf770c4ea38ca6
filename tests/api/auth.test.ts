// Sign-up, sign-in, sign-out and session lifetime against the real database.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { SessionEntity, UserEntity } from '../../server/db/entities';
import { useCleanDatabase } from './fixtures/database';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';

const db = useCleanDatabase();

function sessionCookie(res: request.Response): string {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('lanewright_session='));
  if (!cookie) throw new Error(`no session cookie in ${JSON.stringify(cookies)}`);
  return cookie;
}

describe('sign-up', () => {
  it('creates the user, an organisation they own, and a session', async () => {
    const app = appFor(db());
    const email = uniqueEmail('Founder').toUpperCase();
    const res = await request(app).post('/api/auth/sign-up').send({ email, password: PASSWORD, name: 'Ada Founder', organisationName: 'Founder Works' });
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe(email.toLowerCase());
    expect(res.body.memberships).toEqual([{ organisationId: expect.any(String), organisationName: 'Founder Works', role: 'owner' }]);
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const me = await request(app).get('/api/me').set('Cookie', cookie.split(';')[0]);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email.toLowerCase());
  });

  it('stores an argon2id hash, never the password', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'hashcheck');
    const user = await db().getRepository(UserEntity).findOneByOrFail({ email });
    expect(user.passwordHash.startsWith('$argon2id$')).toBe(true);
    expect(user.passwordHash).not.toContain(PASSWORD);
  });

  it('refuses a second account with the same e-mail in any letter case', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'twice');
    const res = await request(app).post('/api/auth/sign-up').send({ email: email.toUpperCase(), password: PASSWORD, name: 'Again', organisationName: 'Again' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields).toEqual([{ path: 'email', message: 'is already registered' }]);
  });

  it('marks the cookie Secure when the app is served over https', async () => {
    const app = appFor(db(), 'https://lanewright.example.test');
    const res = await request(app).post('/api/auth/sign-up').send({ email: uniqueEmail('secure'), password: PASSWORD, name: 'S', organisationName: 'S' });
    expect(res.status).toBe(201);
    expect(sessionCookie(res)).toMatch(/Secure/);
  });
});

describe('sign-in', () => {
  it('answers a wrong password and an unknown e-mail with the same 401 message', async () => {
    const app = appFor(db());
    const { email } = await signUp(app, 'signin');
    const wrong = await request(app).post('/api/auth/sign-in').send({ email, password: 'not the password' });
    const unknown = await request(app).post('/api/auth/sign-in').send({ email: uniqueEmail('nobody'), password: 'not the password' });
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
    for (let i = 0; i < 11; i += 1) statuses.push((await request(app).post('/api/auth/sign-in').send({ email, password: `guess-${i}` })).status);
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
    const res = await request(app).post('/api/auth/sign-up').send({ email: uniqueEmail('leaver'), password: PASSWORD, name: 'L', organisationName: 'L' });
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
    const res = await request(app).post('/api/auth/sign-up').send({ email: uniqueEmail('again'), password: PASSWORD, name: 'A', organisationName: 'A' });
    const before = sessionCookie(res).split(';')[0];
    const again = await request(app).post('/api/auth/sign-in').set('Cookie', before).send({ email: res.body.user.email, password: PASSWORD });
    expect(again.status).toBe(200);
    const after = sessionCookie(again).split(';')[0];
    expect(after).not.toBe(before);
    expect((await request(app).get('/api/me').set('Cookie', before)).status).toBe(401);
    expect((await request(app).get('/api/me').set('Cookie', after)).status).toBe(200);
  });

  it('answers 401 once the session has expired in the database', async () => {
    const app = appFor(db());
    const res = await request(app).post('/api/auth/sign-up').send({ email: uniqueEmail('expiring'), password: PASSWORD, name: 'E', organisationName: 'E' });
    const cookie = sessionCookie(res).split(';')[0];
    await db().getRepository(SessionEntity).update({ userId: res.body.user.id }, { expiresAt: new Date(Date.now() - 1000) });
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });

  it('extends a session that is past half its life and re-sends the cookie', async () => {
    const app = appFor(db());
    const res = await request(app).post('/api/auth/sign-up').send({ email: uniqueEmail('sliding'), password: PASSWORD, name: 'S', organisationName: 'S' });
    const cookie = sessionCookie(res).split(';')[0];
    const soon = new Date(Date.now() + 24 * 3600 * 1000);
    await db().getRepository(SessionEntity).update({ userId: res.body.user.id }, { expiresAt: soon });
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(sessionCookie(me)).toContain(cookie);
    const session = await db().getRepository(SessionEntity).findOneByOrFail({ userId: res.body.user.id });
    expect(session.expiresAt.getTime()).toBeGreaterThan(soon.getTime() + 20 * 24 * 3600 * 1000);
  });

  it('GET /api/me answers 401 without a session', async () => {
    const res = await request(appFor(db())).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual({ code: 'unauthenticated', message: expect.any(String), fields: [] });
  });
});
