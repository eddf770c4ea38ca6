// The last middleware: every failure leaves as `{ error: { code, message, fields } }`, and nothing about
// the server's internals (stack traces, SQL) reaches the client.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { toFieldIssues, type ApiError } from '../../shared/api/errors';
import { isDatabaseUnavailable, isRefusedValue, isUniqueViolation } from '../db/query-errors';
import { HttpError } from './http-error';
import { formatBytes, JSON_BODY_LIMIT_BYTES } from './limits';
import { MAX_REPORTED_ISSUES } from './validate';

interface BodyParserError {
  type?: string;
  status?: number;
  limit?: number;
}

function bodyParserError(err: unknown): HttpError | null {
  const type = (err as BodyParserError | null)?.type;
  const limit = (err as BodyParserError | null)?.limit ?? JSON_BODY_LIMIT_BYTES;
  switch (type) {
    case 'entity.parse.failed':
      return new HttpError(
        400,
        'bad_request',
        'The request body is not valid JSON; check quotes, commas and brackets.',
      );
    case 'entity.too.large':
      return new HttpError(
        413,
        'payload_too_large',
        `The request body is larger than this route's limit of ${formatBytes(limit)}.`,
      );
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new HttpError(415, 'unsupported_media_type', 'Send the body as UTF-8 JSON.');
    case 'request.aborted':
    case 'request.size.invalid':
    case 'stream.encoding.set':
      return new HttpError(400, 'bad_request', 'The request body could not be read completely.');
    default:
      break;
  }
  // zlib's errors: Z_DATA_ERROR and kin for gzip and deflate, ERR__ERROR_FORMAT_… for brotli; a body
  // labelled with an encoding it is not in.
  const zlibCode = (err as { code?: unknown } | null)?.code;
  if (typeof zlibCode === 'string' && (zlibCode.startsWith('Z_') || zlibCode.startsWith('ERR__ERROR_'))) {
    return new HttpError(
      400,
      'bad_request',
      'The request body is labelled with a Content-Encoding (such as gzip) but is not data in that encoding; send it uncompressed or compress it as labelled.',
      [{ path: 'Content-Encoding', message: 'does not match the body' }],
    );
  }
  return null;
}

/** The router failed to decode a percent-encoded part of the address (Express raises a URIError). */
function badAddress(err: unknown, path: string): HttpError | null {
  if (!(err instanceof URIError)) return null;
  const segment = path.split('/').find((part) => {
    try {
      decodeURIComponent(part);
      return false;
    } catch {
      return true;
    }
  });
  return new HttpError(
    400,
    'bad_request',
    `The address has malformed percent-encoding${segment ? ` in "${segment.slice(0, 60)}"` : ''}; ids are plain UUIDs.`,
    [{ path: 'address', message: 'has malformed percent-encoding' }],
  );
}

let lastOutageLog = 0;
/** One line per outage (at most every 10 s), not a stack trace per request, while the database is away. */
function logOutage(err: unknown): void {
  const now = Date.now();
  if (now - lastOutageLog < 10_000) return;
  lastOutageLog = now;
  console.error(
    `Database unavailable: ${(err instanceof Error ? err.message : String(err)).split('\n')[0].slice(0, 200)}; answering 503 until it is back.`,
  );
}

function toHttpError(err: unknown, path: string): HttpError {
  if (err instanceof HttpError) return err;
  const address = badAddress(err, path);
  if (address) return address;
  if (err instanceof ZodError)
    return new HttpError(
      400,
      'bad_request',
      'Invalid input.',
      toFieldIssues({ issues: err.issues.slice(0, MAX_REPORTED_ISSUES) }),
    );
  const parsed = bodyParserError(err);
  if (parsed) return parsed;
  // Two requests created the same unique thing at once; the loser hears what a later request would.
  if (isUniqueViolation(err)) return new HttpError(409, 'conflict', 'This already exists; reload and try again.');
  if (isRefusedValue(err))
    return new HttpError(
      400,
      'bad_request',
      'A value in the request is outside what can be stored (a number too large, or text that cannot be encoded).',
    );
  if (isDatabaseUnavailable(err)) {
    logOutage(err);
    return new HttpError(
      503,
      'unavailable',
      'The database is not reachable right now; nothing was changed. Try again in a moment.',
      [],
      { 'Retry-After': '5' },
    );
  }
  // The stack only: a failed query's error object carries its parameters, which may hold personal data.
  console.error('Unexpected server error:', err instanceof Error ? err.stack : String(err));
  return new HttpError(500, 'internal', 'Something went wrong on the server; the error has been logged.');
}

export function sendError(res: Parameters<RequestHandler>[1], error: HttpError): void {
  const body: ApiError = { error: { code: error.code, message: error.message, fields: error.fields } };
  res.set(error.headers);
  res.status(error.status).json(body);
}

export const errorHandler: ErrorRequestHandler = (err, req, res, next) => {
  if (res.headersSent) return next(err);
  sendError(res, toHttpError(err, req.originalUrl.split('?')[0]));
};

export const unknownApiRoute: RequestHandler = (req, res) => {
  sendError(res, new HttpError(404, 'not_found', `There is no API route ${req.method} ${req.path}.`));
};
