// Loader for `/time-studies/:id`: the study with its scenario's organisation, and the caller's role there.
// A study of another organisation answers 404 exactly like a missing id.
import type { RequestHandler } from 'express';
import { idParamsSchema } from '../../shared/api/common';
import { roleIn } from '../access/membership';
import type { AppContext } from '../app-context';
import { TimeStudyEntity } from '../db/entities';
import { HttpError, notFound } from '../http/http-error';
import { currentUser } from '../http/request-context';
import { parseInput } from '../http/validate';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      timeStudy?: TimeStudyEntity;
    }
  }
}

export function loadTimeStudy({ ds }: AppContext): RequestHandler {
  return async (req, _res, next) => {
    const user = currentUser(req);
    const { id } = parseInput(idParamsSchema, { id: req.params.id }, 'params');
    const study = await ds
      .getRepository(TimeStudyEntity)
      .findOne({ where: { id }, relations: { scenario: { project: true } } });
    const organisationId = study?.scenario?.project?.organisationId;
    const role = organisationId ? await roleIn(ds, organisationId, user.id) : null;
    if (!study || !role) return next(notFound('The time study'));
    req.timeStudy = study;
    req.role = role;
    next();
  };
}

export function loadedTimeStudy(req: Express.Request): TimeStudyEntity {
  if (!req.timeStudy) throw new HttpError(500, 'internal', 'route is missing its time study loader');
  return req.timeStudy;
}
