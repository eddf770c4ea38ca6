// Text PostgreSQL cannot store: a NUL character (text columns refuse it, jsonb too) and a lone UTF-16
// surrogate (valid in a JavaScript string, not in UTF-8 or jsonb). Checked once for every parsed body and
// query before any route, so each field gets a 400 with its path instead of a failed query.
import type { IncomingMessage } from 'node:http';
import type { RequestHandler } from 'express';
import { formatPath, type FieldIssue } from '../../shared/api/errors';
import { badRequest } from './http-error';

const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const MAX_REPORTED = 5;

function problemOf(text: string): string | null {
  const match = UNSTORABLE.exec(text);
  if (!match) return null;
  return match[0] === '\u0000'
    ? 'contains a NUL character, which cannot be stored'
    : 'contains half of a UTF-16 surrogate pair, which is not valid Unicode';
}

/** Walks a parsed JSON value without recursion (a deeply nested body must not exhaust the stack). */
export function unstorableText(value: unknown): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const stack: { value: unknown; path: PropertyKey[] }[] = [{ value, path: [] }];
  while (stack.length > 0 && issues.length < MAX_REPORTED) {
    const { value: current, path } = stack.pop()!;
    if (typeof current === 'string') {
      const problem = problemOf(current);
      if (problem) issues.push({ path: formatPath(path), message: problem });
    } else if (Array.isArray(current)) {
      for (let i = current.length - 1; i >= 0; i -= 1) stack.push({ value: current[i], path: [...path, i] });
    } else if (current !== null && typeof current === 'object') {
      for (const [key, item] of Object.entries(current).reverse()) {
        const keyProblem = problemOf(key);
        if (keyProblem) issues.push({ path: formatPath(path), message: `has a key that ${keyProblem}` });
        stack.push({ value: item, path: [...path, key] });
      }
    }
  }
  return issues.slice(0, MAX_REPORTED);
}

type Suspect = IncomingMessage & { mayHoldUnstorableText?: boolean };

const ESCAPED_SUSPECT = /\\u(0000|d[89a-f])/i;

/**
 * For express.json's `verify`: in JSON text a NUL or a surrogate can only arrive as a \u escape (raw NUL is
 * not valid JSON, raw UTF-8 cannot encode a surrogate), so bodies without one skip the walk entirely.
 */
export function noteSuspectText(req: IncomingMessage, _res: unknown, raw: Buffer): void {
  (req as Suspect).mayHoldUnstorableText = ESCAPED_SUSPECT.test(raw.toString('latin1'));
}

export const refuseUnstorableText: RequestHandler = (req, _res, next) => {
  for (const [part, where] of [
    ['body', 'request body'],
    ['query', 'query string'],
  ] as const) {
    if (part === 'body' && !(req as Suspect).mayHoldUnstorableText) continue;
    const issues = unstorableText(req[part]);
    if (issues.length > 0)
      return next(
        badRequest(
          `Invalid input in the ${where}: ${issues.map((i) => `${i.path || '(the value)'} ${i.message}`).join('; ')}`,
          issues,
        ),
      );
  }
  next();
};
