// The last middleware: every failure leaves as `{ error: { code, message, fields } }`, and nothing about
// the server's internals (stack traces, SQL) reaches the client.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { toFieldIssues, type ApiError } from '../../shared/api/errors';
import { isUniqueViolation } from '../db/query-errors';
import { HttpError } from './http-error';
import { JSON_BODY_LIMIT_BYTES } from './limits';

interface BodyParserError {
  type?: string;
  status?: number;
}

function bodyParserError(err: unknown): HttpError | null {
  const type = (err as BodyParserError | null)?.type;
  switch (type) {
    case 'entity.parse.failed':
      return new HttpError(400, 'bad_request', 'The request body is not valid JSON; check quotes, commas and brackets.');
    case 'entity.too.large':
      return new HttpError(413, 'payload_too_large', `The request body is larger than the limit of ${Math.round(JSON_BODY_LIMIT_BYTES / 1048576)} MB.`);
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new HttpError(415, 'unsupported_media_type', 'Send the body as UTF-8 JSON.');
    case 'request.aborted':
    case 'request.size.invalid':
    case 'stream.encoding.set':
      return new HttpError(400, 'bad_request', 'The request body could not be read completely.');
    default:
      return null;
  }
}

function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof ZodError) return new HttpError(400, 'bad_request', 'Invalid input.', toFieldIssues(err));
  const parsed = bodyParserError(err);
  if (parsed) return parsed;
  // Two requests created the same unique thing at once; the loser hears what a later request would.
  if (isUniqueViolation(err)) return new HttpError(409, 'conflict', 'This already exists; reload and try again.');
  // The stack only: a failed query's error object carries its parameters, which may hold personal data.
  console.error('Unexpected server error:', err instanceof Error ? err.stack : String(err));
  return new HttpError(500, 'internal', 'Something went wrong on the server; the error has been logged.');
}

export function sendError(res: Parameters<RequestHandler>[1], error: HttpError): void {
  const body: ApiError = { error: { code: error.code, message: error.message, fields: error.fields } };
  res.set(error.headers);
  res.status(error.status).json(body);
}

export const errorHandler: ErrorRequestHandler = (err, _req, res, next) => {
  if (res.headersSent) return next(err);
  sendError(res, toHttpError(err));
};

export const unknownApiRoute: RequestHandler = (req, res) => {
  sendError(res, new HttpError(404, 'not_found', `There is no API route ${req.method} ${req.path}.`));
};
