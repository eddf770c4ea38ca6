// Stored runs. Saving is idempotent on the client's run id: a retried save returns the first run (200)
// instead of creating a second (201). Renaming and deleting are for owners and the run's author.
import express, { type Request, type RequestHandler } from 'express';
import { createRunSchema, listRunsQuerySchema, updateRunSchema } from '../../shared/api/runs';
import { canEdit } from '../../shared/api/roles';
import { loadProject, loadRun, loadScenario } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited, type AuditInput } from '../audit/record-audit';
import { RunEntity, ScenarioRevisionEntity } from '../db/entities';
import { isUniqueViolation } from '../db/query-errors';
import { badRequest, conflict, forbidden } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { touchProject } from '../projects/touch-project';
import { summariseRun } from '../runs/summarise-run';
import { listRunsPage, runDetail, runListItem } from './run-queries';

const requireRunAuthorOrOwner: RequestHandler = (req, _res, next) => {
  const role = loaded(req, 'role');
  const run = loaded(req, 'run');
  if (role === 'owner' || (canEdit(role) && run.createdById === currentUser(req).id)) return next();
  next(forbidden('Only the run’s author or an organisation owner may rename or delete this run.'));
};

function runAudit(req: Request, action: 'update' | 'delete', detail: Record<string, unknown>): AuditInput {
  const run = loaded(req, 'run');
  return {
    organisationId: run.scenario?.project?.organisationId ?? null,
    actorId: currentUser(req).id,
    action,
    entity: 'run',
    entityId: run.id,
    detail,
  };
}

export function runsRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();
  const runs = () => ds.getRepository(RunEntity);

  router.get(
    '/projects/:id/runs',
    loadProject(ctx),
    validate({ query: listRunsQuerySchema }, async ({ query }, req, res) => {
      res.json(await listRunsPage(ds, { projectId: loaded(req, 'project').id }, query));
    }),
  );

  router.get(
    '/scenarios/:id/runs',
    loadScenario(ctx),
    validate({ query: listRunsQuerySchema }, async ({ query }, req, res) => {
      res.json(await listRunsPage(ds, { scenarioId: loaded(req, 'scenario').id }, query));
    }),
  );

  router.post(
    '/scenarios/:id/runs',
    loadScenario(ctx),
    requireRole('engineer'),
    validate({ body: createRunSchema }, async ({ body }, req, res) => {
      const scenario = loaded(req, 'scenario');
      const user = currentUser(req);
      const findExisting = () =>
        runs().findOne({
          where: { scenarioId: scenario.id, clientRunId: body.clientRunId },
          select: { id: true, revisionId: true },
        });
      const answerRetry = async (existing: { id: string; revisionId: string }) => {
        if (existing.revisionId !== body.revisionId) {
          throw conflict('This clientRunId was already used for a run of another revision; choose a new clientRunId.', [
            { path: 'clientRunId', message: 'is already used by another run' },
          ]);
        }
        res.status(200).json(await runListItem(ds, existing.id));
      };
      const existing = await findExisting();
      if (existing) return answerRetry(existing);
      const revision = await ds
        .getRepository(ScenarioRevisionEntity)
        .findOne({ where: { id: body.revisionId, scenarioId: scenario.id }, select: { id: true, number: true } });
      if (!revision)
        throw badRequest('The revision does not belong to this scenario.', [
          { path: 'revisionId', message: 'is not a revision of this scenario' },
        ]);
      const { summary, seed, engineVersion } = summariseRun(body.settings, body.results);
      try {
        // The answer is read inside the transaction, so a save is either committed and answered 201 or
        // (database lost before COMMIT) answered 503 with nothing stored.
        const item = await audited(
          ds,
          async (manager) => {
            const saved = await manager.getRepository(RunEntity).save({
              scenarioId: scenario.id,
              revisionId: revision.id,
              clientRunId: body.clientRunId,
              name: body.name ?? `${scenario.name}, revision ${revision.number}`,
              settings: body.settings,
              seed,
              engineVersion,
              throughputPerHourMean: summary.throughputPerHour.mean,
              taktSecondsMean: summary.taktSeconds.mean,
              carriers: summary.carriers,
              summary,
              results: body.results,
              createdById: user.id,
            });
            await touchProject(manager, scenario.projectId);
            return runListItem(manager, saved.id);
          },
          (saved) => ({
            organisationId: scenario.project?.organisationId ?? null,
            actorId: user.id,
            action: 'run',
            entity: 'run',
            entityId: saved.id,
            detail: { scenarioId: scenario.id, revisionNumber: revision.number },
          }),
        );
        res.status(201).json(item);
      } catch (error) {
        // Two attempts raced past the first lookup; the loser answers like any retry.
        const winner = isUniqueViolation(error) ? await findExisting() : null;
        if (!winner) throw error;
        await answerRetry(winner);
      }
    }),
  );

  router.get('/runs/:id', loadRun(ctx), async (req, res) => {
    res.json(await runDetail(ds, loaded(req, 'run').id));
  });

  router.patch(
    '/runs/:id',
    loadRun(ctx),
    requireRunAuthorOrOwner,
    validate({ body: updateRunSchema }, async ({ body }, req, res) => {
      const run = loaded(req, 'run');
      await audited(
        ds,
        (manager) => manager.getRepository(RunEntity).update({ id: run.id }, { name: body.name }),
        runAudit(req, 'update', { name: body.name }),
      );
      res.json(await runListItem(ds, run.id));
    }),
  );

  router.delete('/runs/:id', loadRun(ctx), requireRunAuthorOrOwner, async (req, res) => {
    const run = loaded(req, 'run');
    await audited(
      ds,
      (manager) => manager.getRepository(RunEntity).delete({ id: run.id }),
      runAudit(req, 'delete', { name: run.name }),
    );
    res.json({ ok: true });
  });

  return router;
}
