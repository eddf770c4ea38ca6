// Sign-up, sign-in, sign-out and "who am I". Nothing here tells a visitor whether an address has an
// account: wrong password and unknown e-mail answer the same 401 after the same hashing work, and sign-up
// always answers "check your mailbox" (a new address gets a link that finishes the account, a registered
// one a note saying so).
import express from 'express';
import { SIGN_UP_LINK_HOURS, confirmSignUpSchema } from '../../shared/api/account';
import { signInSchema, signUpSchema } from '../../shared/api/auth';
import { membershipsOf } from '../access/membership';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/record-audit';
import { issueToken, invalidLink, mayMailAnotherLink, spendToken } from '../auth/one-time-tokens';
import { hashPassword, verifyAgainstDecoy, verifyPassword } from '../auth/password';
import { refuseWeakPassword } from '../auth/password-policy';
import { writeSessionCookie } from '../auth/session-cookie';
import { startSession } from '../auth/start-session';
import { MembershipEntity, OrganisationEntity, UserEntity } from '../db/entities';
import { alreadyRegisteredMail, signUpMail } from '../mail/messages';
import { sendInBackground } from '../mail/mailer';
import { unauthenticated } from '../http/http-error';
import { publicLink } from '../http/public-link';
import { currentUser } from '../http/request-context';
import { validate } from '../http/validate';
import { toMe } from '../mappers/organisations';

export const SIGN_UP_ANSWER = {
  message: 'Check your mailbox: we sent a link to finish creating your account. It can take a minute to arrive.',
};

export function authRouter(ctx: AppContext) {
  const { ds, auth, publicOrigin, signInLimiter, mailer } = ctx;
  const router = express.Router();

  router.post(
    '/auth/sign-up',
    validate({ body: signUpSchema }, async ({ body }, req, res) => {
      refuseWeakPassword(body.password, body);
      const existing = await ds.getRepository(UserEntity).findOneBy({ email: body.email });
      const mayMail = await mayMailAnotherLink(ds, 'sign-up', body.email);
      if (existing) {
        // The same hashing work as a real sign-up, so the time taken does not tell either.
        await verifyAgainstDecoy(body.password);
        if (mayMail) {
          await issueToken(ds.manager, {
            purpose: 'sign-up',
            email: body.email,
            userId: existing.id,
            lifetimeMs: 0,
            spent: true,
          });
          sendInBackground(
            mailer,
            alreadyRegisteredMail(
              body.email,
              publicLink(req, publicOrigin, '/sign-in'),
              publicLink(req, publicOrigin, '/forgot-password'),
            ),
          );
        }
      } else {
        const passwordHash = await hashPassword(body.password);
        if (mayMail) {
          const payload = { name: body.name, organisationName: body.organisationName, passwordHash };
          const token = await issueToken(ds.manager, {
            purpose: 'sign-up',
            email: body.email,
            payload,
            lifetimeMs: SIGN_UP_LINK_HOURS * 3_600_000,
          });
          sendInBackground(mailer, signUpMail(body.email, publicLink(req, publicOrigin, `/sign-up/finish#${token}`)));
        }
      }
      res.status(202).json(SIGN_UP_ANSWER);
    }),
  );

  router.post(
    '/auth/sign-up/confirm',
    validate({ body: confirmSignUpSchema }, async ({ body }, req, res) => {
      const user = await ds.transaction(async (manager) => {
        const link = await spendToken(manager, 'sign-up', body.token);
        const { name, organisationName, passwordHash } = link.payload;
        // A spent notice row or an address registered meanwhile (through an invitation) finishes nothing.
        if (
          !name ||
          !organisationName ||
          !passwordHash ||
          (await manager.getRepository(UserEntity).existsBy({ email: link.email }))
        )
          throw invalidLink();
        const created = await manager.getRepository(UserEntity).save({ email: link.email, name, passwordHash });
        const organisation = await manager.getRepository(OrganisationEntity).save({ name: organisationName });
        await manager
          .getRepository(MembershipEntity)
          .insert({ organisationId: organisation.id, userId: created.id, role: 'owner' });
        await recordAudit(manager, {
          organisationId: organisation.id,
          actorId: created.id,
          action: 'create',
          entity: 'organisation',
          entityId: organisation.id,
          detail: { name: organisation.name },
        });
        return created;
      });
      await startSession(ctx, req, res, { id: user.id, email: user.email, name: user.name }, 201);
    }),
  );

  router.post(
    '/auth/sign-in',
    validate({ body: signInSchema }, async ({ body }, req, res) => {
      const address = req.ip ?? '';
      await signInLimiter.begin(body.email, address);
      const user = await ds.getRepository(UserEntity).findOneBy({ email: body.email });
      const valid = user
        ? await verifyPassword(user.passwordHash, body.password)
        : await verifyAgainstDecoy(body.password);
      if (!user || !valid) {
        // Kept for the audit page: against a known account its id, so that account's organisations see it.
        await recordAudit(ds.manager, {
          organisationId: null,
          actorId: null,
          action: 'sign-in-failed',
          entity: 'user',
          entityId: user?.id ?? body.email,
          detail: { email: body.email, address: req.ip ?? '' },
        });
        throw unauthenticated('The e-mail or password is incorrect.');
      }
      await signInLimiter.succeeded(body.email, address);
      await recordAudit(ds.manager, {
        organisationId: null,
        actorId: user.id,
        action: 'sign-in',
        entity: 'user',
        entityId: user.id,
      });
      await startSession(ctx, req, res, { id: user.id, email: user.email, name: user.name }, 200);
    }),
  );

  router.post('/auth/sign-out', async (req, res) => {
    if (req.sessionId) await auth.invalidateSession(req.sessionId);
    writeSessionCookie(req, res, auth.createBlankSessionCookie(), publicOrigin);
    res.json({ ok: true });
  });

  router.get('/me', async (req, res) => {
    const user = currentUser(req);
    res.json(toMe(user, await membershipsOf(ds, user.id)));
  });

  router.get('/auth/session', async (req, res) => {
    res.json({ me: req.user ? toMe(req.user, await membershipsOf(ds, req.user.id)) : null });
  });

  return router;
}
