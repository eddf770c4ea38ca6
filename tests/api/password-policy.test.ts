// New passwords: the most common ones and ones built on the user's own e-mail are refused with a clear
// message; the demo accounts, seeded with their known password, still sign in.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../../server/db/seed/demo';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { appFor, PASSWORD, signUp, uniqueEmail } from './fixtures/app';
import { mailTo, tokenIn } from './fixtures/mail';

const db = useCleanDatabase();

const signUpWith = (password: string, email = uniqueEmail('policy')) =>
  request(appFor(db()))
    .post(apiRoutes.signUp)
    .send({ email, password, name: 'Pat Example', organisationName: 'Policy works' });

describe('password policy', () => {
  // Common passwords of 10+ characters, as found at the top of public leaked-password frequency lists
  // (zxcvbn's common-password dictionary is built from such lists).
  it.each(['password123', '1234567890', 'qwertyuiop', 'iloveyou123', 'Password1!'])(
    'refuses the common password %s',
    async (password) => {
      const res = await signUpWith(password);
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual([{ path: 'password', message: expect.stringMatching(/commonly used/) }]);
      expect(res.body.error.message).toMatch(/^Choose another password/);
    },
  );

  it('refuses the user’s own e-mail address, whole or as its name part', async () => {
    const email = uniqueEmail('pat.example');
    for (const password of [email, `${email}!`, `${email.split('@')[0]}-2026`]) {
      const res = await signUpWith(password, email);
      expect(res.status, password).toBe(400);
      expect(res.body.error.fields[0].message).toMatch(/e-mail/);
    }
  });

  it('accepts an unrelated phrase', async () => {
    expect((await signUpWith(PASSWORD)).status).toBe(202);
  });

  it('a password reset refuses a common password and one built on the address, and the link stays usable', async () => {
    const app = appFor(db());
    const person = await signUp(app, 'resetting.person');
    const since = Date.now();
    expect((await request(app).post(apiRoutes.passwordResetRequest).send({ email: person.email })).status).toBe(202);
    const token = tokenIn(await mailTo(person.email, /new Lanewright password/, since));
    for (const password of ['password123', `${person.email.split('@')[0]}-2026`]) {
      const res = await request(app).post(apiRoutes.passwordReset).send({ token, password });
      expect(res.status, password).toBe(400);
      expect(res.body.error.fields).toEqual([{ path: 'password', message: expect.any(String) }]);
    }
    expect(
      (await request(app).post(apiRoutes.passwordReset).send({ token, password: 'unrelated words, ten of them' }))
        .status,
    ).toBe(200);
  });

  it('changing the password on the account page refuses a common one under the field newPassword', async () => {
    const person = await signUp(appFor(db()), 'changing.person');
    for (const newPassword of ['iloveyou123', `${person.email}!`]) {
      const res = await person.agent.post(apiRoutes.accountPassword).send({ currentPassword: PASSWORD, newPassword });
      expect(res.status, newPassword).toBe(400);
      expect(res.body.error.fields).toEqual([{ path: 'newPassword', message: expect.any(String) }]);
    }
    const ok = await person.agent
      .post(apiRoutes.accountPassword)
      .send({ currentPassword: PASSWORD, newPassword: 'unrelated words, ten of them' });
    expect(ok.status).toBe(200);
  });

  it('accepting an invitation with a new account refuses a common password and keeps the invitation usable', async () => {
    const owner = await signUp(appFor(db()), 'inviting.owner');
    const email = uniqueEmail('invited.person');
    const since = Date.now();
    const invited = await owner.agent.post(apiRoutes.invitations(owner.organisationId)).send({ email, role: 'viewer' });
    expect(invited.status).toBe(201);
    const token = tokenIn(await mailTo(email, /^Join /, since));
    const app = appFor(db());
    const weak = await request(app)
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Invited Person', password: 'qwertyuiop' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields).toEqual([{ path: 'password', message: expect.stringMatching(/commonly used/) }]);
    const named = await request(app)
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Invited Person', password: 'Invited Person' });
    expect(named.status).toBe(400);
    const accepted = await request(app)
      .post(apiRoutes.invitationAccept)
      .send({ token, name: 'Invited Person', password: PASSWORD });
    expect(accepted.status).toBe(201);
  });

  it('the demo accounts keep their known password: seeding does not go through the sign-up check', async () => {
    await seedDemo(db());
    const res = await request(appFor(db()))
      .post(apiRoutes.signIn)
      .send({ email: DEMO_ACCOUNTS[0].email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
  });
});
