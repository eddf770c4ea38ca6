// Refuses state-changing requests sent from another site. Browsers add `Origin` to cross-site requests, so a
// present Origin that is neither the public origin nor the request's own host is a forgery attempt; requests
// without Origin (curl, server-to-server) carry no ambient cookie risk from a browser page.
import type { Request, RequestHandler } from 'express';
import { forbidden } from './http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

function ownOrigin(req: Request): string | null {
  const host = req.get('host');
  return host ? `${req.protocol}://${host}` : null;
}

export function refuseCrossOriginMutations(publicOrigin?: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    if (origin === undefined) return next();
    if (origin === publicOrigin || origin === ownOrigin(req)) return next();
    next(forbidden(`Requests from ${origin} may not change data here; use Lanewright at its own address.`));
  };
}
