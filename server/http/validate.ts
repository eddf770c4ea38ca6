// Parses a request's route parameters, query and body with the shared zod schemas before the handler runs,
// and hands the handler typed values. A failure answers 400 with every problem and its field path.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { toFieldIssues } from '../../shared/api/errors';
import { badRequest } from './http-error';

type Schemas = { params?: z.ZodType; query?: z.ZodType; body?: z.ZodType };
type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

/** A request with a million wrong items gets the first few problems, not a million-line answer. */
export const MAX_REPORTED_ISSUES = 20;

const where = { params: 'in the address', query: 'in the query string', body: 'in the request body' } as const;

function valueAt(value: unknown, path: readonly PropertyKey[]): unknown {
  let current = value;
  for (const key of path) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return current;
}

export function parseInput<S extends z.ZodType>(schema: S, value: unknown, part: keyof typeof where): z.output<S> {
  if (part === 'body' && value === undefined) {
    throw badRequest('This request needs a JSON body sent with Content-Type: application/json.', [
      { path: '', message: 'is required' },
    ]);
  }
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const issues = result.error.issues.slice(0, MAX_REPORTED_ISSUES);
  const fields = toFieldIssues({ issues }).map((field, i) => {
    const issue = issues[i];
    // Schemas give one message per type check ("must be text"); a field that is absent is better told so.
    const absent =
      ['invalid_type', 'invalid_value', 'invalid_union'].includes(issue.code) &&
      valueAt(value, issue.path) === undefined;
    return absent ? { ...field, message: 'is required' } : field;
  });
  const more = result.error.issues.length - issues.length;
  const summary =
    fields.map((f) => (f.path ? `${f.path} ${f.message}` : f.message)).join('; ') +
    (more > 0 ? `; and ${more} more problem(s) not listed` : '');
  throw badRequest(`Invalid input ${where[part]}: ${summary}`, fields);
}

export function validate<S extends Schemas>(
  schemas: S,
  handler: (input: Parsed<S>, req: Request, res: Response, next: NextFunction) => unknown,
): RequestHandler {
  return async (req, res, next) => {
    const input: Record<string, unknown> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (schema) input[part] = parseInput(schema, req[part], part);
    }
    await handler(input as Parsed<S>, req, res, next);
  };
}
