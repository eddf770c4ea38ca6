// What middleware puts on the request: the signed-in user, their role where a loader resolved one, and
// the loaded entity. Accessors throw when a route forgot the middleware, rather than returning undefined.
import type { Request } from 'express';
import type { Role } from '../../shared/api/roles';
import type { OrganisationEntity, ProjectEntity, RunEntity, ScenarioEntity, StudyEntity } from '../db/entities';
import { HttpError, unauthenticated } from './http-error';

export interface SignedInUser {
  id: string;
  email: string;
  name: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: SignedInUser;
      sessionId?: string;
      /** The caller's role in the organisation that owns the loaded entity. */
      role?: Role;
      organisation?: OrganisationEntity;
      project?: ProjectEntity;
      scenario?: ScenarioEntity;
      run?: RunEntity;
      study?: StudyEntity;
    }
  }
}

export function currentUser(req: Request): SignedInUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}

export function loaded<K extends 'organisation' | 'project' | 'scenario' | 'run' | 'study' | 'role'>(
  req: Request,
  key: K,
): NonNullable<Request[K]> {
  const value = req[key];
  if (value === undefined || value === null) throw new HttpError(500, 'internal', `route is missing its ${key} loader`);
  return value as NonNullable<Request[K]>;
}
