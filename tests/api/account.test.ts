// Password reset by e-mail and a signed-in user's own password and sessions: the same answer for any
// address, hashed single-use links that expire in 30 minutes, and a reset that ends every session.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { LINKS_PER_ADDRESS_PER_HOUR } from '../../server/auth/one-time-tokens';
import { hashLinkToken } from '../../server/auth/link-tokens';
import { OneTimeTokenEntity, SessionEntity } from '../../server/db/entities';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { mailbox, mailTo, tokenIn } from './fixtures/mail';

const db = useCleanDatabase();
const NEW_PASSWORD = 'a quite different passphrase';

async function askForReset(email: string) {
  const since = Date.now();
  const res = await request(appFor(db())).post(apiRoutes.passwordResetRequest).send({ email });
  expect(res.status).toBe(202);
  return { res, token: async () => tokenIn(await mailTo(email, /new Lanewright password/, since)) };
}

describe('forgot password', () => {
  it('answers a registered and an unknown address identically, and mails only the registered one', async () => {
    const { email } = await signUp(appFor(db()), 'forgetful');
    const unknownEmail = uniqueEmail('nobody');
    const known = await askForReset(email);
    const unknown = await askForReset(unknownEmail);
    expect(unknown.res.status).toBe(known.res.status);
    expect(unknown.res.body).toEqual(known.res.body);
    expect(unknown.res.headers['content-type']).toBe(known.res.headers['content-type']);
    await known.token();
    // Give a stray mail time to arrive before saying none came.
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(mailbox.list().some((mail) => mail.to.includes(unknownEmail))).toBe(false);
  });

  it('stores the token hashed, valid for 30 minutes', async () => {
    const { email } = await signUp(appFor(db()), 'hashed');
    const token = await (await askForReset(email)).token();
    const row = await db().getRepository(OneTimeTokenEntity).findOneByOrFail({ email, purpose: 'password-reset' });
    expect(row.tokenHash).toBe(hashLinkToken(token));
    expect(JSON.stringify(await db().query('SELECT * FROM one_time_tokens'))).not.toContain(token);
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeGreaterThan(29.9 * 60_000);
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeLessThan(30.1 * 60_000);
  });

  it('sets the new password once, ends every session, and the old password stops working', async () => {
    const app = appFor(db());
    const person = await signUp(app, 'resetter');
    const second = request.agent(app);
    expect((await second.post(apiRoutes.signIn).send({ email: person.email, password: PASSWORD })).status).toBe(200);
    const token = await (await askForReset(person.email)).token();

    const reset = await request(app).post(apiRoutes.passwordReset).send({ token, password: NEW_PASSWORD });
    expect(reset.status).toBe(200);
    expect(await db().getRepository(SessionEntity).countBy({ userId: person.id })).toBe(0);
    expect((await person.agent.get(apiRoutes.me)).status).toBe(401);
    expect((await second.get(apiRoutes.me)).status).toBe(401);

    expect(
      (await request(app).post(apiRoutes.passwordReset).send({ token, password: 'yet another passphrase' })).status,
    ).toBe(400);
    expect((await request(app).post(apiRoutes.signIn).send({ email: person.email, password: PASSWORD })).status).toBe(
      401,
    );
    expect(
      (await request(app).post(apiRoutes.signIn).send({ email: person.email, password: NEW_PASSWORD })).status,
    ).toBe(200);
  });

  it('refuses an expired link, and an older link once a newer one was used', async () => {
    const { email } = await signUp(appFor(db()), 'expired');
    const older = await (await askForReset(email)).token();
    const newer = await (await askForReset(email)).token();
    await db()
      .getRepository(OneTimeTokenEntity)
      .update({ tokenHash: hashLinkToken(newer) }, { expiresAt: new Date(Date.now() - 1) });
    const late = await request(appFor(db()))
      .post(apiRoutes.passwordReset)
      .send({ token: newer, password: NEW_PASSWORD });
    expect(late.status).toBe(400);
    expect(late.body.error.fields).toEqual([{ path: 'token', message: 'is no longer valid' }]);
    const newest = await (await askForReset(email)).token();
    expect(
      (await request(appFor(db())).post(apiRoutes.passwordReset).send({ token: newest, password: NEW_PASSWORD }))
        .status,
    ).toBe(200);
    expect(
      (await request(appFor(db())).post(apiRoutes.passwordReset).send({ token: older, password: NEW_PASSWORD })).status,
    ).toBe(400);
  });

  it(`mails at most ${LINKS_PER_ADDRESS_PER_HOUR} links an hour to one address, answering the same throughout`, async () => {
    const { email } = await signUp(appFor(db()), 'flooded');
    const answers = [];
    for (let i = 0; i <= LINKS_PER_ADDRESS_PER_HOUR; i += 1) answers.push((await askForReset(email)).res.body);
    expect(new Set(answers.map((a) => JSON.stringify(a))).size).toBe(1);
    expect(await db().getRepository(OneTimeTokenEntity).countBy({ email, purpose: 'password-reset' })).toBe(
      LINKS_PER_ADDRESS_PER_HOUR,
    );
  });

  it('a reset with a too-short password says which field is wrong and spends nothing', async () => {
    const { email } = await signUp(appFor(db()), 'short');
    const token = await (await askForReset(email)).token();
    const res = await request(appFor(db())).post(apiRoutes.passwordReset).send({ token, password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['password']);
    expect(
      (await request(appFor(db())).post(apiRoutes.passwordReset).send({ token, password: NEW_PASSWORD })).status,
    ).toBe(200);
  });
});

describe('signed-in password and sessions', () => {
  it('changing the password needs the current one and signs out the other sessions only', async () => {
    const app = appFor(db());
    const person = await signUp(app, 'changer');
    const elsewhere = request.agent(app);
    await elsewhere.post(apiRoutes.signIn).send({ email: person.email, password: PASSWORD });

    const wrong = await person.agent
      .post(apiRoutes.accountPassword)
      .send({ currentPassword: 'not it at all', newPassword: NEW_PASSWORD });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual([{ path: 'currentPassword', message: 'is not your current password' }]);

    const changed = await person.agent
      .post(apiRoutes.accountPassword)
      .send({ currentPassword: PASSWORD, newPassword: NEW_PASSWORD });
    expect(changed.status).toBe(200);
    expect(changed.body).toEqual({ ended: 1 });
    expect((await person.agent.get(apiRoutes.me)).status).toBe(200);
    expect((await elsewhere.get(apiRoutes.me)).status).toBe(401);
  });

  it('signs out every other session on request', async () => {
    const app = appFor(db());
    const person = await signUp(app, 'many');
    const others = [request.agent(app), request.agent(app)];
    for (const agent of others) await agent.post(apiRoutes.signIn).send({ email: person.email, password: PASSWORD });
    const res = await person.agent.delete(apiRoutes.accountOtherSessions);
    expect(res.body).toEqual({ ended: 2 });
    for (const agent of others) expect((await agent.get(apiRoutes.me)).status).toBe(401);
    expect((await person.agent.get(apiRoutes.me)).status).toBe(200);
    expect((await request(app).delete(apiRoutes.accountOtherSessions)).status).toBe(401);
    expect(
      (
        await request(app)
          .post(apiRoutes.accountPassword)
          .send({ currentPassword: PASSWORD, newPassword: NEW_PASSWORD })
      ).status,
    ).toBe(401);
  });
});
