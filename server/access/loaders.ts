// Loader middleware: parse the `:id` parameter, load the entity, and resolve the caller's role in the
// organisation that owns it. Anything the caller may not see answers 404, exactly like a missing id, so
// ids of other organisations reveal nothing.
import type { Request, RequestHandler } from 'express';
import { idParamsSchema } from '../../shared/api/common';
import type { AppContext } from '../app-context';
import { OrganisationEntity, ProjectEntity, RunEntity, ScenarioEntity, StudyEntity } from '../db/entities';
import { notFound } from '../http/http-error';
import { currentUser } from '../http/request-context';
import { parseInput } from '../http/validate';
import { roleIn } from './membership';

type Finder = (
  ctx: AppContext,
  id: string,
) => Promise<{ organisationId: string; attach: (req: Request) => void } | null>;

function loader(what: string, find: Finder) {
  return (ctx: AppContext): RequestHandler =>
    async (req, _res, next) => {
      const user = currentUser(req);
      const { id } = parseInput(idParamsSchema, { id: req.params.id }, 'params');
      const found = await find(ctx, id);
      const role = found ? await roleIn(ctx.ds, found.organisationId, user.id) : null;
      if (!found || !role) return next(notFound(what));
      found.attach(req);
      req.role = role;
      next();
    };
}

export const loadOrganisation = loader('The organisation', async ({ ds }, id) => {
  const organisation = await ds.getRepository(OrganisationEntity).findOneBy({ id });
  return organisation && { organisationId: organisation.id, attach: (req) => (req.organisation = organisation) };
});

export const loadProject = loader('The project', async ({ ds }, id) => {
  const project = await ds.getRepository(ProjectEntity).findOne({ where: { id }, relations: { createdBy: true } });
  return project && { organisationId: project.organisationId, attach: (req) => (req.project = project) };
});

export const loadScenario = loader('The scenario', async ({ ds }, id) => {
  const scenario = await ds
    .getRepository(ScenarioEntity)
    .findOne({ where: { id }, relations: { project: true, createdBy: true } });
  return scenario?.project
    ? { organisationId: scenario.project.organisationId, attach: (req) => (req.scenario = scenario) }
    : null;
});

export const loadRun = loader('The run', async ({ ds }, id) => {
  const run = await ds.getRepository(RunEntity).findOne({ where: { id }, relations: { scenario: { project: true } } });
  const organisationId = run?.scenario?.project?.organisationId;
  return run && organisationId ? { organisationId, attach: (req) => (req.run = run) } : null;
});

export const loadStudy = loader('The study', async ({ ds }, id) => {
  const study = await ds.getRepository(StudyEntity).findOne({ where: { id }, relations: { project: true } });
  return study?.project ? { organisationId: study.project.organisationId, attach: (req) => (req.study = study) } : null;
});
