// Invitations: owners invite by e-mail with a role, list, resend and revoke; the person joins only by
// opening the single-use link and accepting. Whether the address has an account is never told to the
// inviter: the answer and the mail are the same either way.
import express, { type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { acceptInvitationSchema, invitationParamsSchema, inviteMemberSchema } from '../../shared/api/invitations';
import { linkTokenSchema } from '../../shared/api/tokens';
import { membershipsOf } from '../access/membership';
import { loadOrganisation } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { newLinkToken } from '../auth/link-tokens';
import { startSession } from '../auth/start-session';
import { InvitationEntity, MembershipEntity, UserEntity } from '../db/entities';
import { conflict, notFound } from '../http/http-error';
import { publicLink } from '../http/public-link';
import { currentUser, loaded } from '../http/request-context';
import { parseInput, validate } from '../http/validate';
import { acceptInvitation } from '../invitations/accept-invitation';
import {
  freshInvitationToken,
  INVITATION_LIFETIME_MS,
  pendingInvitations,
  usableInvitation,
} from '../invitations/invitation-queries';
import { sendInBackground } from '../mail/mailer';
import { invitationMail } from '../mail/messages';
import { toInvitation } from '../mappers/links';
import { toMe } from '../mappers/organisations';

export function invitationsRouter(ctx: AppContext) {
  const { ds, mailer, publicOrigin } = ctx;
  const router = express.Router();

  const mailInvitation = (req: Request, invitation: InvitationEntity, token: string, organisationName: string) =>
    sendInBackground(
      mailer,
      invitationMail(invitation.email, {
        organisationName,
        inviterName: currentUser(req).name,
        role: invitation.role,
        link: publicLink(req, publicOrigin, `/invitations/accept#${token}`),
      }),
    );
  const reload = (id: string) =>
    ds.getRepository(InvitationEntity).findOneOrFail({ where: { id }, relations: { invitedBy: true } });

  const loadInvitation: RequestHandler = async (req, res, next) => {
    const { invitationId } = parseInput(invitationParamsSchema, req.params, 'params');
    const invitation = await ds
      .getRepository(InvitationEntity)
      .findOne({ where: { id: invitationId, organisationId: loaded(req, 'organisation').id } });
    if (!invitation || invitation.acceptedAt || invitation.revokedAt) return next(notFound('The invitation'));
    res.locals.invitation = invitation;
    next();
  };
  const invitationOf = (res: express.Response) => res.locals.invitation as InvitationEntity;
  const auditOf = (req: Request, invitation: InvitationEntity, action: 'invite-resend' | 'invite-revoke') => ({
    organisationId: invitation.organisationId,
    actorId: currentUser(req).id,
    action,
    entity: 'invitation' as const,
    entityId: invitation.id,
    detail: { email: invitation.email },
  });

  router.get('/organisations/:id/invitations', loadOrganisation(ctx), requireRole('owner'), async (req, res) => {
    res.json(
      (await pendingInvitations(ds, loaded(req, 'organisation').id)).map((invitation) => toInvitation(invitation)),
    );
  });

  router.post(
    '/organisations/:id/invitations',
    loadOrganisation(ctx),
    requireRole('owner'),
    validate({ body: inviteMemberSchema }, async ({ body }, req, res) => {
      const organisation = loaded(req, 'organisation');
      // Members are on the owner's page already, so saying so reveals nothing about accounts.
      const member = await ds
        .getRepository(MembershipEntity)
        .exists({ where: { organisationId: organisation.id, user: { email: body.email } }, relations: { user: true } });
      if (member)
        throw conflict(`${body.email} is already a member; change their role instead.`, [
          { path: 'email', message: 'is already a member' },
        ]);
      const pending = (await pendingInvitations(ds, organisation.id)).some(
        (invitation) => invitation.email === body.email,
      );
      if (pending)
        throw conflict(`${body.email} already has an invitation; resend or revoke it below.`, [
          { path: 'email', message: 'is already invited' },
        ]);
      const { token, hash } = newLinkToken();
      const now = Date.now();
      const saved = await audited(
        ds,
        (manager) =>
          manager.getRepository(InvitationEntity).save({
            organisationId: organisation.id,
            email: body.email,
            role: body.role,
            tokenHash: hash,
            invitedById: currentUser(req).id,
            sentAt: new Date(now),
            expiresAt: new Date(now + INVITATION_LIFETIME_MS),
            acceptedAt: null,
            revokedAt: null,
          }),
        (row) => ({
          organisationId: organisation.id,
          actorId: currentUser(req).id,
          action: 'invite',
          entity: 'invitation',
          entityId: row.id,
          detail: { email: body.email, role: body.role },
        }),
      );
      mailInvitation(req, saved, token, organisation.name);
      res.status(201).json(toInvitation(await reload(saved.id)));
    }),
  );

  router.post(
    '/organisations/:id/invitations/:invitationId/resend',
    loadOrganisation(ctx),
    requireRole('owner'),
    loadInvitation,
    async (req, res) => {
      const invitation = invitationOf(res);
      const token = await audited(
        ds,
        (manager) => freshInvitationToken(manager, invitation.id),
        auditOf(req, invitation, 'invite-resend'),
      );
      mailInvitation(req, invitation, token, loaded(req, 'organisation').name);
      res.json(toInvitation(await reload(invitation.id)));
    },
  );

  router.delete(
    '/organisations/:id/invitations/:invitationId',
    loadOrganisation(ctx),
    requireRole('owner'),
    loadInvitation,
    async (req, res) => {
      const invitation = invitationOf(res);
      await audited(
        ds,
        (manager) => manager.getRepository(InvitationEntity).update({ id: invitation.id }, { revokedAt: new Date() }),
        auditOf(req, invitation, 'invite-revoke'),
      );
      res.json({ ok: true });
    },
  );

  router.post(
    '/invitations/preview',
    validate({ body: z.object({ token: linkTokenSchema }) }, async ({ body }, _req, res) => {
      const invitation = await usableInvitation(ds.manager, body.token, false);
      res.json({
        organisationName: invitation.organisation?.name ?? '',
        email: invitation.email,
        role: invitation.role,
        invitedByName: invitation.invitedBy?.name ?? null,
        expiresAt: invitation.expiresAt.toISOString(),
        // Only the holder of the link sees this, and they own the address.
        accountExists: await ds.getRepository(UserEntity).existsBy({ email: invitation.email }),
      });
    }),
  );

  router.post(
    '/invitations/accept',
    validate({ body: acceptInvitationSchema }, async ({ body }, req, res) => {
      const accepted = await acceptInvitation(ds, body, req.user);
      if (accepted.isNew)
        return startSession(ctx, req, res, accepted.user, 201, (me) => ({
          organisationId: accepted.organisationId,
          me,
        }));
      res.json({
        organisationId: accepted.organisationId,
        me: toMe(accepted.user, await membershipsOf(ds, accepted.user.id)),
      });
    }),
  );

  return router;
}
