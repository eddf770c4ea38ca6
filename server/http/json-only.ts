// Mutating requests that carry a body must send JSON; anything else would reach the handler as "no body"
// and give a confusing message.
import type { RequestHandler } from 'express';
import { HttpError } from './http-error';

export const requireJsonBody: RequestHandler = (req, _res, next) => {
  const hasBody = req.get('transfer-encoding') !== undefined || Number(req.get('content-length') ?? 0) > 0;
  if (!hasBody || req.is('application/json')) return next();
  next(
    new HttpError(
      415,
      'unsupported_media_type',
      `Send the request body as JSON with Content-Type: application/json (got ${req.get('content-type') ?? 'no Content-Type'}).`,
    ),
  );
};
