// Scenarios of a project. Creating one writes its first revision in the same transaction, so a scenario
// always has content.
import express from 'express';
import { createScenarioSchema, updateScenarioSchema } from '../../shared/api/scenarios';
import { loadProject, loadScenario } from '../access/loaders';
import { requireRole } from '../access/require-role';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/record-audit';
import { ScenarioEntity } from '../db/entities';
import { createScenarioWithFirstRevision } from '../scenarios/create-scenario';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { scenarioDetail, scenarioSummaries } from './scenario-queries';

export function scenariosRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();

  router.get('/projects/:id/scenarios', loadProject(ctx), async (req, res) => {
    const project = loaded(req, 'project');
    const scenarios = await ds.getRepository(ScenarioEntity).find({ where: { projectId: project.id }, relations: { createdBy: true }, order: { updatedAt: 'DESC' } });
    res.json(await scenarioSummaries(ds, scenarios));
  });

  router.post(
    '/projects/:id/scenarios',
    loadProject(ctx),
    requireRole('engineer'),
    validate({ body: createScenarioSchema }, async ({ body }, req, res) => {
      const project = loaded(req, 'project');
      const user = currentUser(req);
      const scenarioId = await ds.transaction(async (manager) => {
        const scenario = await createScenarioWithFirstRevision(manager, { projectId: project.id, name: body.name, description: body.description ?? '', document: body.document, message: 'Created', createdById: user.id });
        await recordAudit(manager, { organisationId: project.organisationId, actorId: user.id, action: 'create', entity: 'scenario', entityId: scenario.id, detail: { name: scenario.name, projectId: project.id } });
        return scenario.id;
      });
      res.status(201).json(await scenarioDetail(ds, scenarioId));
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
      const user = currentUser(req);
      await ds.transaction(async (manager) => {
        await manager.getRepository(ScenarioEntity).update({ id: scenario.id }, body);
        await recordAudit(manager, { organisationId: scenario.project?.organisationId ?? null, actorId: user.id, action: 'update', entity: 'scenario', entityId: scenario.id, detail: { ...body } });
      });
      res.json(await scenarioDetail(ds, scenario.id));
    }),
  );

  router.delete('/scenarios/:id', loadScenario(ctx), requireRole('engineer'), async (req, res) => {
    const scenario = loaded(req, 'scenario');
    const user = currentUser(req);
    await ds.transaction(async (manager) => {
      await manager.getRepository(ScenarioEntity).delete({ id: scenario.id });
      await recordAudit(manager, { organisationId: scenario.project?.organisationId ?? null, actorId: user.id, action: 'delete', entity: 'scenario', entityId: scenario.id, detail: { name: scenario.name } });
    });
    res.json({ ok: true });
  });

  return router;
}
