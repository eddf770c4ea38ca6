// Read-only share links. Members who may edit the subject make and withdraw links; every member sees who
// made which. Anyone holding a valid link sees the subject (and only it) without signing in. Members of
// other organisations and unknown ids get the same 404.
import express from 'express';
import { z } from 'zod';
import { canEdit, type Role } from '../../shared/api/roles';
import { createShareSchema, listSharesQuerySchema } from '../../shared/api/shares';
import { idParamsSchema } from '../../shared/api/common';
import { linkTokenSchema } from '../../shared/api/tokens';
import { roleIn } from '../access/membership';
import { requireSignedIn } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { hashLinkToken, newLinkToken } from '../auth/link-tokens';
import { OrganisationEntity, ShareLinkEntity } from '../db/entities';
import { forbidden, HttpError, notFound } from '../http/http-error';
import { publicLink } from '../http/public-link';
import { currentUser } from '../http/request-context';
import { parseInput, validate } from '../http/validate';
import { toShare } from '../mappers/links';
import { shareSubjects } from '../shares/share-subjects';

/** Links listed per subject; older ones beyond this are not shown (they stay valid until they expire). */
export const SHARES_LISTED_MAX = 100;

const goneLink = () =>
  new HttpError(
    404,
    'not_found',
    'This shared link does not exist, has expired or was withdrawn. Ask whoever sent it for a new one.',
  );

export function sharesRouter(ctx: AppContext) {
  const { ds, publicOrigin } = ctx;
  const router = express.Router();

  /** The caller's role in the organisation owning the thing, or a 404 that says nothing more. */
  async function roleFor(
    organisationId: string | null,
    userId: string,
    what: string,
  ): Promise<{ organisationId: string; role: Role }> {
    const role = organisationId ? await roleIn(ds, organisationId, userId) : null;
    if (!organisationId || !role) throw notFound(what);
    return { organisationId, role };
  }
  const mayShare = (role: Role) => {
    if (!canEdit(role))
      throw forbidden(
        `Only an engineer or owner in this organisation may share or withdraw links; your role is ${role}.`,
      );
  };

  router.post(
    '/shares',
    requireSignedIn,
    validate({ body: createShareSchema }, async ({ body }, req, res) => {
      const subject = shareSubjects[body.kind];
      const user = currentUser(req);
      const { organisationId, role } = await roleFor(
        await subject.organisationOf(ds, body.subjectId),
        user.id,
        subject.what,
      );
      mayShare(role);
      const { token, hash } = newLinkToken();
      const saved = await audited(
        ds,
        (manager) =>
          manager.getRepository(ShareLinkEntity).save({
            organisationId,
            kind: body.kind,
            subjectId: body.subjectId,
            tokenHash: hash,
            createdById: user.id,
            expiresAt: new Date(Date.now() + body.expiresInDays * 86_400_000),
            revokedAt: null,
            lastOpenedAt: null,
          }),
        (row) => ({
          organisationId,
          actorId: user.id,
          action: 'share',
          entity: 'share',
          entityId: row.id,
          detail: { kind: body.kind, subjectId: body.subjectId, expiresInDays: body.expiresInDays },
        }),
      );
      const created = await ds
        .getRepository(ShareLinkEntity)
        .findOneOrFail({ where: { id: saved.id }, relations: { createdBy: true } });
      res.status(201).json({ ...toShare(created), url: publicLink(req, publicOrigin, `/shared#${token}`) });
    }),
  );

  router.get(
    '/shares',
    requireSignedIn,
    validate({ query: listSharesQuerySchema }, async ({ query }, req, res) => {
      const subject = shareSubjects[query.kind];
      await roleFor(await subject.organisationOf(ds, query.subjectId), currentUser(req).id, subject.what);
      const shares = await ds.getRepository(ShareLinkEntity).find({
        where: { kind: query.kind, subjectId: query.subjectId },
        relations: { createdBy: true },
        order: { createdAt: 'DESC' },
        take: SHARES_LISTED_MAX,
      });
      res.json(shares.map((share) => toShare(share)));
    }),
  );

  router.delete('/shares/:id', requireSignedIn, async (req, res) => {
    const { id } = parseInput(idParamsSchema, req.params, 'params');
    const share = await ds.getRepository(ShareLinkEntity).findOneBy({ id });
    const { role } = await roleFor(share?.organisationId ?? null, currentUser(req).id, 'The share link');
    mayShare(role);
    if (share && !share.revokedAt) {
      await audited(
        ds,
        (manager) => manager.getRepository(ShareLinkEntity).update({ id: share.id }, { revokedAt: new Date() }),
        {
          organisationId: share.organisationId,
          actorId: currentUser(req).id,
          action: 'share-revoke',
          entity: 'share',
          entityId: share.id,
          detail: { kind: share.kind, subjectId: share.subjectId },
        },
      );
    }
    res.json({ ok: true });
  });

  router.post(
    '/shared/view',
    validate({ body: z.object({ token: linkTokenSchema }) }, async ({ body }, _req, res) => {
      const share = await ds.getRepository(ShareLinkEntity).findOneBy({ tokenHash: hashLinkToken(body.token) });
      if (!share || share.revokedAt || share.expiresAt.getTime() <= Date.now()) throw goneLink();
      const subject = shareSubjects[share.kind];
      // A deleted subject makes the link as dead as a withdrawn one.
      if ((await subject.organisationOf(ds, share.subjectId)) !== share.organisationId) throw goneLink();
      await ds.getRepository(ShareLinkEntity).update({ id: share.id }, { lastOpenedAt: new Date() });
      const organisation = await ds.getRepository(OrganisationEntity).findOneByOrFail({ id: share.organisationId });
      res.set('X-Robots-Tag', 'noindex');
      res.json(
        await subject.view(ds, share.subjectId, {
          expiresAt: share.expiresAt.toISOString(),
          organisationName: organisation.name,
        }),
      );
    }),
  );

  return router;
}
