// The one error type route code throws; the error handler turns it into the shared JSON error shape.
import type { ApiErrorCode, FieldIssue } from '../../shared/api/errors';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly fields: FieldIssue[] = [],
    /** Response headers that belong to this answer, such as Retry-After. */
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, fields: FieldIssue[] = []) =>
  new HttpError(400, 'bad_request', message, fields);
export const unauthenticated = (message = 'Sign in to continue.') => new HttpError(401, 'unauthenticated', message);
export const forbidden = (message: string) => new HttpError(403, 'forbidden', message);
export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, fields: FieldIssue[] = []) => new HttpError(409, 'conflict', message, fields);
