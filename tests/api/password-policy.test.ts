// New passwords: the most common ones and ones built on the user's own e-mail are refused with a clear
// message; the demo accounts, seeded with their known password, still sign in.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../../server/db/seed/demo';
import { apiRoutes } from '../../shared/api/routes';
import { useCleanDatabase } from './fixtures/database';
import { appFor, PASSWORD, uniqueEmail } from './fixtures/app';

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

  it('the demo accounts keep their known password: seeding does not go through the sign-up check', async () => {
    await seedDemo(db());
    const res = await request(appFor(db()))
      .post(apiRoutes.signIn)
      .send({ email: DEMO_ACCOUNTS[0].email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
  });
});
