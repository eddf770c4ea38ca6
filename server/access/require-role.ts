// Role checks after a loader has resolved the caller's role in the entity's organisation. Members without
// the role get 403 (they can see the thing exists); non-members never reach here (the loader answered 404).
import type { RequestHandler } from 'express';
import { roleAllows, type Role } from '../../shared/api/roles';
import { forbidden, unauthenticated } from '../http/http-error';
import { loaded } from '../http/request-context';

const needs: Record<Role, string> = {
  viewer: 'a member of this organisation',
  engineer: 'an engineer or owner in this organisation',
  owner: 'an owner of this organisation',
};

export function requireRole(needed: Role): RequestHandler {
  return (req, _res, next) => {
    const role = loaded(req, 'role');
    if (!roleAllows(role, needed)) return next(forbidden(`Only ${needs[needed]} may do this; your role is ${role}.`));
    next();
  };
}

export const requireSignedIn: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};
