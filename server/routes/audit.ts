// The organisation's audit trail for owners: filtered and paged on the server, and the same filter as a
// CSV download (bounded; narrow the filter for more).
import express from 'express';
import { AUDIT_EXPORT_MAX, auditFilterSchema, listAuditQuerySchema } from '../../shared/api/audit';
import { loadOrganisation } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { auditCsv } from '../audit/audit-csv';
import { auditQuery } from '../audit/audit-query';
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
      const [entries, total] = await auditQuery(ctx.ds, loaded(req, 'organisation').id, query)
        .skip((query.page - 1) * query.pageSize)
        .take(query.pageSize)
        .getManyAndCount();
      res.json({ entries: entries.map(toAuditEntry), total, page: query.page, pageSize: query.pageSize });
    }),
  );

  router.get(
    '/organisations/:id/audit.csv',
    loadOrganisation(ctx),
    requireRole('owner'),
    validate({ query: auditFilterSchema }, async ({ query }, req, res) => {
      const organisation = loaded(req, 'organisation');
      const entries = await auditQuery(ctx.ds, organisation.id, query).take(AUDIT_EXPORT_MAX).getMany();
      const day = new Date().toISOString().slice(0, 10);
      res.set('Content-Type', 'text/csv; charset=utf-8');
      res.set('Content-Disposition', `attachment; filename="lanewright-audit-${day}.csv"`);
      res.send(auditCsv(entries));
    }),
  );
  return router;
}
