// The organisation's audit trail, newest first, for owners.
import express from 'express';
import { LessThan } from 'typeorm';
import { listAuditQuerySchema } from '../../shared/api/audit';
import { loadOrganisation } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { AuditEntryEntity } from '../db/entities';
import { loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { toAuditEntry } from '../mappers/organisations';

export function auditRouter(ctx: AppContext) {
  const router = express.Router();
  router.get(
    '/organisations/:id/audit',
    loadOrganisation(ctx),
    requireRole('owner'),
    validate({ query: listAuditQuerySchema }, async ({ query }, req, res) => {
      const entries = await ctx.ds.getRepository(AuditEntryEntity).find({
        where: { organisationId: loaded(req, 'organisation').id, ...(query.before ? { createdAt: LessThan(new Date(query.before)) } : {}) },
        relations: { actor: true },
        order: { createdAt: 'DESC' },
        take: query.limit,
      });
      res.json(entries.map(toAuditEntry));
    }),
  );
  return router;
}
