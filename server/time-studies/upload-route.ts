// The one API route that takes multipart bodies. The API's JSON-only guard steps aside for it, and only
// for it, so every other route still refuses a body that is not JSON.
import type { Request, RequestHandler } from 'express';

const UPLOAD_PATH = /^\/scenarios\/[^/]+\/time-studies\/?$/;

export function isTimeStudyUpload(req: Request): boolean {
  return req.method === 'POST' && UPLOAD_PATH.test(req.path) && typeof req.is('multipart/form-data') === 'string';
}

/** Wraps the JSON-only guard: multipart uploads of time studies pass, everything else meets the guard. */
export function exceptTimeStudyUploads(guard: RequestHandler): RequestHandler {
  return (req, res, next) => (isTimeStudyUpload(req) ? next() : guard(req, res, next));
}
