// Scenarios of a project. Creating one writes its first revision in the same transaction, so a scenario
// always has content.
import express from 'express';
import { createScenarioSchema, updateScenarioSchema } from '../../shared/api/scenarios';
import { loadProject, loadScenario } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { createOnce } from '../db/create-once';
import { ScenarioEntity } from '../db/entities';
import { assertRunnable } from '../scenarios/check-document';
import { touchProject } from '../projects/touch-project';
import { createScenarioWithFirstRevision } from '../scenarios/create-scenario';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { scenarioDetail, scenarioSummaries } from './scenario-queries';

export function scenariosRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  router.get('/projects/:id/scenarios', loadProject(ctx), async (req, res) => {
    const project = loaded(req, 'project');
    const scenarios = await ds
      .getRepository(ScenarioEntity)
      .find({ where: { projectId: project.id }, relations: { createdBy: true }, order: { updatedAt: 'DESC' } });
    res.json(await scenarioSummaries(ds, scenarios));
  });

  router.post(
    '/projects/:id/scenarios',
    loadProject(ctx),
    requireRole('engineer'),
    validate({ body: createScenarioSchema }, async ({ body }, req, res) => {
      assertRunnable(body.document);
      const project = loaded(req, 'project');
      const user = currentUser(req);
      const { clientId } = body;
      const { value: scenario, created } = await createOnce(
        () =>
          clientId
            ? ds
                .getRepository(ScenarioEntity)
                .findOne({ where: { projectId: project.id, clientId }, select: { id: true } })
            : Promise.resolve(null),
        () =>
          audited(
            ds,
            (manager) =>
              createScenarioWithFirstRevision(manager, {
                projectId: project.id,
                name: body.name,
                description: body.description ?? '',
                document: body.document,
                message: 'Created',
                createdById: user.id,
                clientId: clientId ?? null,
              }),
            (saved) => ({
              organisationId: project.organisationId,
              actorId: user.id,
              action: 'create',
              entity: 'scenario',
              entityId: saved.id,
              detail: { name: saved.name, projectId: project.id },
            }),
          ),
      );
      res.status(created ? 201 : 200).json(await scenarioDetail(ds, scenario.id));
    }),
  );

  router.get('/scenarios/:id', loadScenario(ctx), async (req, res) => {
    res.json(await scenarioDetail(ds, loaded(req, 'scenario').id));
  });

  router.patch(
    '/scenarios/:id',
    loadScenario(ctx),
    requireRole('engineer'),
    validate({ body: updateScenarioSchema }, async ({ body }, req, res) => {
      const scenario = loaded(req, 'scenario');
      await audited(
        ds,
        async (manager) => {
          await manager.getRepository(ScenarioEntity).update({ id: scenario.id }, body);
          await touchProject(manager, scenario.projectId);
        },
        {
          organisationId: scenario.project?.organisationId ?? null,
          actorId: currentUser(req).id,
          action: 'update',
          entity: 'scenario',
          entityId: scenario.id,
          detail: { ...body },
        },
      );
      res.json(await scenarioDetail(ds, scenario.id));
    }),
  );

  router.delete('/scenarios/:id', loadScenario(ctx), requireRole('engineer'), async (req, res) => {
    const scenario = loaded(req, 'scenario');
    await audited(
      ds,
      async (manager) => {
        await manager.getRepository(ScenarioEntity).delete({ id: scenario.id });
        await touchProject(manager, scenario.projectId);
      },
      {
        organisationId: scenario.project?.organisationId ?? null,
        actorId: currentUser(req).id,
        action: 'delete',
        entity: 'scenario',
        entityId: scenario.id,
        detail: { name: scenario.name },
      },
    );
    res.json({ ok: true });
  });

  return router;
}
