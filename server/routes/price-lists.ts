// An organisation's price list. Every member reads it (the comparison prices bills of materials with
// it); owners and engineers replace it. A PUT replaces the whole list, so a retry changes nothing more.
import express from 'express';
import { savePriceListSchema } from '../../shared/api/price-lists';
import { loadOrganisation } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { PriceListEntity } from '../db/entities';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { toPriceList } from '../mappers/price-lists';

export function priceListsRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();
  const read = async (organisationId: string) => {
    const row = await ds
      .getRepository(PriceListEntity)
      .findOne({ where: { organisationId }, relations: { updatedBy: true } });
    return { priceList: row ? toPriceList(row) : null };
  };

  router.get('/organisations/:id/price-list', loadOrganisation(ctx), async (req, res) => {
    res.json(await read(loaded(req, 'organisation').id));
  });

  router.put(
    '/organisations/:id/price-list',
    loadOrganisation(ctx),
    requireRole('engineer'),
    validate({ body: savePriceListSchema }, async ({ body }, req, res) => {
      const organisation = loaded(req, 'organisation');
      const user = currentUser(req);
      await audited(
        ds,
        (manager) =>
          manager.getRepository(PriceListEntity).upsert(
            {
              organisationId: organisation.id,
              currency: body.currency,
              ...body.prices,
              note: body.note,
              invented: false,
              updatedById: user.id,
              updatedAt: new Date(),
            },
            ['organisationId'],
          ),
        {
          organisationId: organisation.id,
          actorId: user.id,
          action: 'update',
          entity: 'price-list',
          entityId: organisation.id,
          detail: { currency: body.currency },
        },
      );
      res.json(await read(organisation.id));
    }),
  );

  return router;
}
