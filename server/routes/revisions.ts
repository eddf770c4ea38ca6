// Revision history of a scenario. Revisions are only ever added: no route changes or deletes one. Saving
// from a stale base answers 409 so two editors never silently overwrite each other.
import express from 'express';
import { createRevisionSchema, revisionParamsSchema } from '../../shared/api/scenarios';
import { loadScenario } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/record-audit';
import { ScenarioEntity, ScenarioRevisionEntity } from '../db/entities';
import { conflict, notFound } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { toRevision, toRevisionSummary } from '../mappers/scenarios';
import { assertRunnable } from '../scenarios/check-document';
import { touchProject } from '../projects/touch-project';
import { latestRevisionIdOf, revisionSummaryColumns } from './scenario-queries';

export function revisionsRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();
  const revisions = () => ds.getRepository(ScenarioRevisionEntity);

  router.get('/scenarios/:id/revisions', loadScenario(ctx), async (req, res) => {
    const list = await revisions().find({
      where: { scenarioId: loaded(req, 'scenario').id },
      select: revisionSummaryColumns,
      relations: { createdBy: true },
      order: { number: 'DESC' },
    });
    res.json(list.map(toRevisionSummary));
  });

  router.get(
    '/scenarios/:id/revisions/:number',
    loadScenario(ctx),
    validate({ params: revisionParamsSchema }, async ({ params }, req, res) => {
      const revision = await revisions().findOne({
        where: { scenarioId: loaded(req, 'scenario').id, number: params.number },
        relations: { createdBy: true },
      });
      if (!revision) throw notFound(`Revision ${params.number}`);
      res.json(toRevision(revision));
    }),
  );

  router.post(
    '/scenarios/:id/revisions',
    loadScenario(ctx),
    requireRole('engineer'),
    validate({ body: createRevisionSchema }, async ({ body }, req, res) => {
      assertRunnable(body.document);
      const scenario = loaded(req, 'scenario');
      const user = currentUser(req);
      // The answer is read inside the transaction: a save the database loses before COMMIT answers 503 and
      // stores nothing, and one it commits is answered without another round trip that could fail.
      const saved = await ds.transaction(async (manager) => {
        // The row lock serialises concurrent saves of one scenario, so numbers never collide.
        const locked = await manager
          .getRepository(ScenarioEntity)
          .findOneOrFail({ where: { id: scenario.id }, lock: { mode: 'pessimistic_write' } });
        const latest = await manager
          .getRepository(ScenarioRevisionEntity)
          .findOneOrFail({ where: { id: latestRevisionIdOf(locked) }, select: { id: true, number: true } });
        if (body.baseRevisionNumber !== undefined && body.baseRevisionNumber !== latest.number) {
          throw conflict(
            `This scenario was saved as revision ${latest.number} since you opened revision ${body.baseRevisionNumber}; reload it and apply your changes again.`,
            [
              {
                path: 'baseRevisionNumber',
                message: `is ${body.baseRevisionNumber} but the latest revision is ${latest.number}`,
              },
            ],
          );
        }
        const revision = await manager.getRepository(ScenarioRevisionEntity).save({
          scenarioId: scenario.id,
          number: latest.number + 1,
          document: body.document,
          message: body.message ?? '',
          createdById: user.id,
        });
        // A name changed in the document renames the scenario; an unchanged one leaves a scenario named
        // apart from its document (a copy, the demo's short names) as it was.
        const previous = await manager
          .getRepository(ScenarioRevisionEntity)
          .createQueryBuilder('r')
          .select("r.document->>'name'", 'name')
          .where('r.id = :id', { id: latest.id })
          .getRawOne<{ name: string | null }>();
        const renamed = previous?.name !== body.document.name;
        await manager
          .getRepository(ScenarioEntity)
          .update(
            { id: scenario.id },
            { latestRevisionId: revision.id, ...(renamed ? { name: body.document.name } : {}) },
          );
        await touchProject(manager, locked.projectId);
        await recordAudit(manager, {
          organisationId: scenario.project?.organisationId ?? null,
          actorId: user.id,
          action: 'create',
          entity: 'revision',
          entityId: revision.id,
          detail: { scenarioId: scenario.id, number: revision.number },
        });
        return manager
          .getRepository(ScenarioRevisionEntity)
          .findOneOrFail({ where: { id: revision.id }, relations: { createdBy: true } });
      });
      res.status(201).json(toRevision(saved));
    }),
  );

  return router;
}
