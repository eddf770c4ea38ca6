// Sign-up, sign-in, sign-out and "who am I". Wrong password and unknown e-mail answer the same 401 after
// the same amount of hashing work, so neither the message nor the timing reveals which accounts exist.
import express, { type Request, type Response } from 'express';
import { signInSchema, signUpSchema } from '../../shared/api/auth';
import { membershipsOf } from '../access/membership';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/record-audit';
import { hashPassword, verifyAgainstDecoy, verifyPassword } from '../auth/password';
import { passwordProblem } from '../auth/password-policy';
import { writeSessionCookie } from '../auth/session-cookie';
import { MembershipEntity, OrganisationEntity, UserEntity } from '../db/entities';
import { badRequest, conflict, unauthenticated } from '../http/http-error';
import { currentUser, type SignedInUser } from '../http/request-context';
import { validate } from '../http/validate';
import { toMe } from '../mappers/organisations';

export function authRouter(ctx: AppContext) {
  const { ds, auth, publicOrigin, signInLimiter } = ctx;
  const router = express.Router();

  async function startSession(req: Request, res: Response, user: SignedInUser, status: number) {
    // A new sign-in never keeps a session id that existed before it (no session fixation).
    if (req.sessionId) await auth.invalidateSession(req.sessionId);
    const session = await auth.createSession(user.id, {});
    writeSessionCookie(req, res, auth.createSessionCookie(session.id), publicOrigin);
    res.status(status).json(toMe(user, await membershipsOf(ds, user.id)));
  }

  router.post(
    '/auth/sign-up',
    validate({ body: signUpSchema }, async ({ body }, req, res) => {
      const weak = passwordProblem(body.password, body);
      if (weak) throw badRequest(`Choose another password: it ${weak.message}.`, [weak]);
      const passwordHash = await hashPassword(body.password);
      const user = await ds.transaction(async (manager) => {
        const taken = await manager.getRepository(UserEntity).existsBy({ email: body.email });
        if (taken) throw conflict('An account with this e-mail already exists; sign in instead.', [{ path: 'email', message: 'is already registered' }]);
        const created = await manager.getRepository(UserEntity).save({ email: body.email, name: body.name, passwordHash });
        const organisation = await manager.getRepository(OrganisationEntity).save({ name: body.organisationName });
        await manager.getRepository(MembershipEntity).insert({ organisationId: organisation.id, userId: created.id, role: 'owner' });
        await recordAudit(manager, { organisationId: organisation.id, actorId: created.id, action: 'create', entity: 'organisation', entityId: organisation.id, detail: { name: organisation.name } });
        return created;
      });
      await startSession(req, res, { id: user.id, email: user.email, name: user.name }, 201);
    }),
  );

  router.post(
    '/auth/sign-in',
    validate({ body: signInSchema }, async ({ body }, req, res) => {
      const address = req.ip ?? '';
      await signInLimiter.begin(body.email, address);
      const user = await ds.getRepository(UserEntity).findOneBy({ email: body.email });
      const valid = user ? await verifyPassword(user.passwordHash, body.password) : await verifyAgainstDecoy(body.password);
      if (!user || !valid) throw unauthenticated('The e-mail or password is incorrect.');
      await signInLimiter.succeeded(body.email, address);
      await recordAudit(ds.manager, { organisationId: null, actorId: user.id, action: 'sign-in', entity: 'user', entityId: user.id });
      await startSession(req, res, { id: user.id, email: user.email, name: user.name }, 200);
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

  return router;
}
