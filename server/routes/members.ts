// Organisation members. Every member may see the list; owners re-role and remove members (people join
// through invitations); anyone may leave. An organisation always keeps at least one owner, so it can never
// be left unmanageable.
import express, { type Request, type RequestHandler } from 'express';
import type { EntityManager } from 'typeorm';
import { memberParamsSchema, updateMemberSchema } from '../../shared/api/members';
import { loadOrganisation } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited, type AuditInput } from '../audit/record-audit';
import { MembershipEntity } from '../db/entities';
import { conflict, notFound } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { parseInput, validate } from '../http/validate';
import { toMember } from '../mappers/organisations';

/** Locks the organisation's owner rows so two owners cannot demote each other at the same moment. */
async function assertAnotherOwnerRemains(
  manager: EntityManager,
  { organisationId, userId }: MembershipEntity,
): Promise<void> {
  const owners = await manager
    .getRepository(MembershipEntity)
    .find({ where: { organisationId, role: 'owner' }, lock: { mode: 'pessimistic_write' } });
  if (owners.length === 1 && owners[0].userId === userId) {
    throw conflict('An organisation needs at least one owner; make another member an owner first.', [
      { path: 'role', message: 'cannot change for the last owner' },
    ]);
  }
}

function memberAudit(
  req: Request,
  membership: MembershipEntity,
  action: 'member-update' | 'member-remove' | 'member-leave',
  detail: Record<string, unknown>,
): AuditInput {
  return {
    organisationId: membership.organisationId,
    actorId: currentUser(req).id,
    action,
    entity: 'member',
    entityId: membership.userId,
    detail,
  };
}

export function membersRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  const loadMember: RequestHandler = async (req, res, next) => {
    const { userId } = parseInput(memberParamsSchema, req.params, 'params');
    const membership = await ds
      .getRepository(MembershipEntity)
      .findOne({ where: { organisationId: loaded(req, 'organisation').id, userId }, relations: { user: true } });
    if (!membership) return next(notFound('The member'));
    res.locals.membership = membership;
    next();
  };
  const memberOf = (res: express.Response) => res.locals.membership as MembershipEntity;

  router.get('/organisations/:id/members', loadOrganisation(ctx), async (req, res) => {
    const members = await ds.getRepository(MembershipEntity).find({
      where: { organisationId: loaded(req, 'organisation').id },
      relations: { user: true },
      order: { createdAt: 'ASC' },
    });
    res.json(members.map(toMember));
  });

  router.patch(
    '/organisations/:id/members/:userId',
    loadOrganisation(ctx),
    requireRole('owner'),
    loadMember,
    validate({ body: updateMemberSchema }, async ({ body }, req, res) => {
      const membership = memberOf(res);
      const key = { organisationId: membership.organisationId, userId: membership.userId };
      await audited(
        ds,
        async (manager) => {
          if (membership.role === 'owner' && body.role !== 'owner')
            await assertAnotherOwnerRemains(manager, membership);
          await manager.getRepository(MembershipEntity).update(key, { role: body.role });
        },
        memberAudit(req, membership, 'member-update', { from: membership.role, to: body.role }),
      );
      res.json(toMember({ ...membership, role: body.role }));
    }),
  );

  router.delete(
    '/organisations/:id/members/:userId',
    loadOrganisation(ctx),
    requireRole('owner'),
    loadMember,
    async (req, res) => {
      const membership = memberOf(res);
      await audited(
        ds,
        async (manager) => {
          if (membership.role === 'owner') await assertAnotherOwnerRemains(manager, membership);
          await manager
            .getRepository(MembershipEntity)
            .delete({ organisationId: membership.organisationId, userId: membership.userId });
        },
        memberAudit(req, membership, 'member-remove', { email: membership.user?.email, role: membership.role }),
      );
      res.json({ ok: true });
    },
  );

  router.delete('/organisations/:id/membership', loadOrganisation(ctx), async (req, res) => {
    const membership = await ds.getRepository(MembershipEntity).findOneOrFail({
      where: { organisationId: loaded(req, 'organisation').id, userId: currentUser(req).id },
      relations: { user: true },
    });
    await audited(
      ds,
      async (manager) => {
        if (membership.role === 'owner') await assertAnotherOwnerRemains(manager, membership);
        await manager
          .getRepository(MembershipEntity)
          .delete({ organisationId: membership.organisationId, userId: membership.userId });
      },
      memberAudit(req, membership, 'member-leave', { email: membership.user?.email, role: membership.role }),
    );
    res.json({ ok: true });
  });

  return router;
}
