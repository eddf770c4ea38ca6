// Projects: listed across the caller's organisations, created by engineers and owners.
import express from 'express';
import { In, type DataSource } from 'typeorm';
import { createProjectSchema, listProjectsQuerySchema, updateProjectSchema } from '../../shared/api/projects';
import { canEdit } from '../../shared/api/roles';
import { loadProject } from '../access/loaders';
import { membershipsOf, roleIn } from '../access/membership';
import { requireRole, requireSignedIn } from '../access/require-role';
import type { AppContext } from '../app-context';
import { audited } from '../audit/record-audit';
import { createOnce } from '../db/create-once';
import { ProjectEntity, ScenarioEntity } from '../db/entities';
import { forbidden, notFound } from '../http/http-error';
import { currentUser, loaded } from '../http/request-context';
import { validate } from '../http/validate';
import { toProject } from '../mappers/projects';

async function scenarioCounts(ds: DataSource, projectIds: string[]): Promise<Map<string, number>> {
  if (projectIds.length === 0) return new Map();
  const rows = await ds
    .getRepository(ScenarioEntity)
    .createQueryBuilder('s')
    .select('s.project_id', 'projectId')
    .addSelect('COUNT(*)::int', 'count')
    .where({ projectId: In(projectIds) })
    .groupBy('s.project_id')
    .getRawMany<{ projectId: string; count: number }>();
  return new Map(rows.map((r) => [r.projectId, r.count]));
}

async function projectView(ds: DataSource, id: string) {
  const project = await ds
    .getRepository(ProjectEntity)
    .findOneOrFail({ where: { id }, relations: { createdBy: true } });
  const counts = await scenarioCounts(ds, [id]);
  return toProject(project, counts.get(id) ?? 0);
}

export function projectsRouter(ctx: AppContext) {
  const { ds } = ctx;
  const router = express.Router();
  const projects = () => ds.getRepository(ProjectEntity);

  router.get(
    '/projects',
    requireSignedIn,
    validate({ query: listProjectsQuerySchema }, async ({ query }, req, res) => {
      const user = currentUser(req);
      const memberOf = (await membershipsOf(ds, user.id)).map((m) => m.organisationId);
      if (query.organisationId && !memberOf.includes(query.organisationId)) throw notFound('The organisation');
      const list = await projects().find({
        where: { organisationId: In(query.organisationId ? [query.organisationId] : memberOf) },
        relations: { createdBy: true },
        order: { updatedAt: 'DESC' },
      });
      const counts = await scenarioCounts(
        ds,
        list.map((p) => p.id),
      );
      res.json(list.map((p) => toProject(p, counts.get(p.id) ?? 0)));
    }),
  );

  router.post(
    '/projects',
    requireSignedIn,
    validate({ body: createProjectSchema }, async ({ body }, req, res) => {
      const user = currentUser(req);
      let organisationId = body.organisationId;
      if (organisationId) {
        const role = await roleIn(ds, organisationId, user.id);
        if (!role) throw notFound('The organisation');
        if (!canEdit(role)) throw forbidden(`Only an engineer or owner may create projects; your role is ${role}.`);
      } else {
        organisationId = (await membershipsOf(ds, user.id)).find((m) => canEdit(m.role))?.organisationId;
        if (!organisationId)
          throw forbidden('You are not an engineer or owner in any organisation, so you cannot create projects.');
      }
      const orgId = organisationId;
      const { clientId } = body;
      const { value: project, created } = await createOnce(
        () =>
          clientId
            ? projects().findOne({ where: { organisationId: orgId, clientId }, select: { id: true } })
            : Promise.resolve(null),
        () =>
          audited(
            ds,
            (manager) =>
              manager.getRepository(ProjectEntity).save({
                organisationId: orgId,
                name: body.name,
                description: body.description ?? '',
                clientId: clientId ?? null,
                createdById: user.id,
              }),
            (saved) => ({
              organisationId: orgId,
              actorId: user.id,
              action: 'create',
              entity: 'project',
              entityId: saved.id,
              detail: { name: saved.name },
            }),
          ),
      );
      res.status(created ? 201 : 200).json(await projectView(ds, project.id));
    }),
  );

  router.get('/projects/:id', loadProject(ctx), async (req, res) => {
    res.json(await projectView(ds, loaded(req, 'project').id));
  });

  router.patch(
    '/projects/:id',
    loadProject(ctx),
    requireRole('engineer'),
    validate({ body: updateProjectSchema }, async ({ body }, req, res) => {
      const project = loaded(req, 'project');
      await audited(ds, (manager) => manager.getRepository(ProjectEntity).update({ id: project.id }, body), {
        organisationId: project.organisationId,
        actorId: currentUser(req).id,
        action: 'update',
        entity: 'project',
        entityId: project.id,
        detail: { ...body },
      });
      res.json(await projectView(ds, project.id));
    }),
  );

  router.delete('/projects/:id', loadProject(ctx), requireRole('engineer'), async (req, res) => {
    const project = loaded(req, 'project');
    await audited(ds, (manager) => manager.getRepository(ProjectEntity).delete({ id: project.id }), {
      organisationId: project.organisationId,
      actorId: currentUser(req).id,
      action: 'delete',
      entity: 'project',
      entityId: project.id,
      detail: { name: project.name },
    });
    res.json({ ok: true });
  });

  return router;
}
