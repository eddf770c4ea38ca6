// Password resets by e-mail, and a signed-in user's own password and sessions. Asking for a reset answers
// the same whether or not the address has an account; a reset ends every session of that user.
import express from 'express';
import { IsNull, Not } from 'typeorm';
import {
  changePasswordSchema,
  PASSWORD_RESET_MINUTES,
  requestPasswordResetSchema,
  resetPasswordSchema,
} from '../../shared/api/account';
import type { AppContext } from '../app-context';
import { audited, recordAudit } from '../audit/record-audit';
import { issueToken, mayMailAnotherLink, peekToken, spendToken } from '../auth/one-time-tokens';
import { hashPassword, verifyPassword } from '../auth/password';
import { refuseWeakPassword } from '../auth/password-policy';
import { OneTimeTokenEntity, SessionEntity, UserEntity } from '../db/entities';
import { badRequest } from '../http/http-error';
import { publicLink } from '../http/public-link';
import { currentUser } from '../http/request-context';
import { validate } from '../http/validate';
import { sendInBackground } from '../mail/mailer';
import { passwordResetMail } from '../mail/messages';

export const RESET_ANSWER = {
  message:
    'If an account uses this address, a link to choose a new password is on its way. It is valid for 30 minutes.',
};

export function accountRouter(ctx: AppContext) {
  const { ds, publicOrigin, mailer } = ctx;
  const router = express.Router();

  router.post(
    '/auth/password-reset/request',
    validate({ body: requestPasswordResetSchema }, async ({ body }, req, res) => {
      const user = await ds.getRepository(UserEntity).findOneBy({ email: body.email });
      if (user && (await mayMailAnotherLink(ds, 'password-reset', user.email))) {
        const token = await issueToken(ds.manager, {
          purpose: 'password-reset',
          email: user.email,
          userId: user.id,
          lifetimeMs: PASSWORD_RESET_MINUTES * 60_000,
        });
        sendInBackground(
          mailer,
          passwordResetMail(user.email, publicLink(req, publicOrigin, `/reset-password#${token}`)),
        );
      }
      res.status(202).json(RESET_ANSWER);
    }),
  );

  router.post(
    '/auth/password-reset',
    validate({ body: resetPasswordSchema }, async ({ body }, _req, res) => {
      const pending = await peekToken(ds, 'password-reset', body.token);
      const owner = await ds.getRepository(UserEntity).findOneBy({ id: pending.userId! });
      refuseWeakPassword(body.password, { email: pending.email, name: owner?.name });
      const passwordHash = await hashPassword(body.password);
      await ds.transaction(async (manager) => {
        const link = await spendToken(manager, 'password-reset', body.token);
        const userId = link.userId!;
        await manager.getRepository(UserEntity).update({ id: userId }, { passwordHash });
        // Every session ends (whoever knew the old password is out) and older reset links die with it.
        await manager.getRepository(SessionEntity).delete({ userId });
        await manager
          .getRepository(OneTimeTokenEntity)
          .update({ userId, purpose: 'password-reset', usedAt: IsNull() }, { usedAt: new Date() });
        await recordAudit(manager, {
          organisationId: null,
          actorId: userId,
          action: 'password-reset',
          entity: 'user',
          entityId: userId,
        });
      });
      res.json({ ok: true });
    }),
  );

  router.post(
    '/account/password',
    validate({ body: changePasswordSchema }, async ({ body }, req, res) => {
      const me = currentUser(req);
      const user = await ds.getRepository(UserEntity).findOneByOrFail({ id: me.id });
      if (!(await verifyPassword(user.passwordHash, body.currentPassword))) {
        throw badRequest('The current password is not right.', [
          { path: 'currentPassword', message: 'is not your current password' },
        ]);
      }
      refuseWeakPassword(body.newPassword, user, 'newPassword');
      const passwordHash = await hashPassword(body.newPassword);
      const ended = await audited(
        ds,
        async (manager) => {
          await manager.getRepository(UserEntity).update({ id: me.id }, { passwordHash });
          const result = await manager
            .getRepository(SessionEntity)
            .delete({ userId: me.id, id: Not(req.sessionId ?? '') });
          return result.affected ?? 0;
        },
        { organisationId: null, actorId: me.id, action: 'password-change', entity: 'user', entityId: me.id },
      );
      res.json({ ended });
    }),
  );

  router.delete('/account/other-sessions', async (req, res) => {
    const me = currentUser(req);
    const result = await ds.getRepository(SessionEntity).delete({ userId: me.id, id: Not(req.sessionId ?? '') });
    res.json({ ended: result.affected ?? 0 });
  });

  return router;
}
