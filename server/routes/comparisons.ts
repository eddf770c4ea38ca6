// Stored comparisons: a set of two to four runs, kept so a share link can point at it. Any member who may
// see every run may store one; asking again for the same runs answers with the same comparison. A run
// the caller may not see answers 404 like an unknown run; runs of two organisations answer 400.
import express from 'express';
import { createComparisonSchema, type Comparison } from '../../shared/api/comparisons';
import { roleIn } from '../access/membership';
import { requireSignedIn } from '../access/require-role';
import type { AppContext } from '../app-context';
import { organisationsOfRuns } from '../comparisons/comparison-runs';
import { ComparisonEntity } from '../db/entities';
import { badRequest, notFound } from '../http/http-error';
import { currentUser } from '../http/request-context';
import { validate } from '../http/validate';

const toComparison = (row: ComparisonEntity): Comparison => ({
  id: row.id,
  organisationId: row.organisationId,
  runIds: row.runIds,
  createdAt: row.createdAt.toISOString(),
});

export function comparisonsRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  router.post(
    '/comparisons',
    requireSignedIn,
    validate({ body: createComparisonSchema }, async ({ body }, req, res) => {
      const owners = await organisationsOfRuns(ds, body.runIds);
      const userId = currentUser(req).id;
      for (const organisationId of new Set(owners)) {
        if (!organisationId || !(await roleIn(ds, organisationId, userId))) throw notFound('A run of the comparison');
      }
      const other = owners.findIndex((owner) => owner !== owners[0]);
      if (other >= 0)
        throw badRequest('All runs of a comparison must belong to one organisation.', [
          { path: `runIds[${other}]`, message: 'belongs to another organisation than the first run' },
        ]);
      const organisationId = owners[0] as string;
      const runKey = body.runIds.join(',');
      // Two people comparing the same runs at once meet on the unique index, not in a second row.
      await ds
        .createQueryBuilder()
        .insert()
        .into(ComparisonEntity)
        .values({ organisationId, runIds: body.runIds, runKey })
        .orIgnore()
        .execute();
      const row = await ds.getRepository(ComparisonEntity).findOneByOrFail({ organisationId, runKey });
      res.json(toComparison(row));
    }),
  );

  return router;
}
