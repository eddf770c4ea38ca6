// The one door to the HTTP API: every request goes through `api`, every
// answer is checked against the shared zod schema before anyone uses it, and
// every failure becomes an ApiRequestError carrying the server's field paths.
import type { z } from 'zod';
import { apiErrorSchema, formatPath, type ApiErrorCode, type FieldIssue } from '../../shared/api/errors';

/** Codes the client adds for failures that never reached a well-formed server answer. */
export type ClientErrorCode = 'network' | 'invalid_response' | 'unexpected_status';

export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: ApiErrorCode | ClientErrorCode;
  readonly fields: FieldIssue[];

  constructor(init: { status: number; code: ApiErrorCode | ClientErrorCode; message: string; fields?: FieldIssue[] }) {
    super(init.message);
    this.name = 'ApiRequestError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? [];
  }
}

export function isApiRequestError(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
type Query = Record<string, string | undefined>;

interface RequestOptions {
  body?: unknown;
  /** A multipart body (file uploads); the browser writes its Content-Type with the boundary. */
  form?: FormData;
  query?: Query;
  signal?: AbortSignal;
}

function withQuery(path: string, query: Query | undefined): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined) params.set(key, value);
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

function errorFromResponse(response: Response, body: unknown): ApiRequestError {
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) return new ApiRequestError({ status: response.status, ...parsed.data.error });
  // A proxy or crashed server may answer with HTML or nothing; say what we saw, not a parse error.
  return new ApiRequestError({
    status: response.status,
    code: 'unexpected_status',
    message: `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''}. Try again in a moment.`,
  });
}

async function request<S extends z.ZodType>(
  method: Method,
  path: string,
  schema: S,
  options: RequestOptions = {},
): Promise<z.infer<S>> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.form ?? (options.body === undefined ? undefined : JSON.stringify(options.body)),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiRequestError({
      status: 0,
      code: 'network',
      message: 'Lanewright could not reach its server. Check your connection and try again.',
    });
  }
  const body = await readJson(response);
  if (!response.ok) throw errorFromResponse(response, body);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    throw new ApiRequestError({
      status: response.status,
      code: 'invalid_response',
      message: `The server's answer to ${method} ${path} did not have the expected shape${first ? ` (${formatPath(first.path) || 'response'}: ${first.message})` : ''}.`,
    });
  }
  return parsed.data;
}

export const api = {
  get: <S extends z.ZodType>(path: string, schema: S, options?: Omit<RequestOptions, 'body' | 'form'>) =>
    request('GET', path, schema, options),
  post: <S extends z.ZodType>(path: string, body: unknown, schema: S) => request('POST', path, schema, { body }),
  postForm: <S extends z.ZodType>(path: string, form: FormData, schema: S) => request('POST', path, schema, { form }),
  patch: <S extends z.ZodType>(path: string, body: unknown, schema: S) => request('PATCH', path, schema, { body }),
  put: <S extends z.ZodType>(path: string, body: unknown, schema: S) => request('PUT', path, schema, { body }),
  delete: <S extends z.ZodType>(path: string, schema: S) => request('DELETE', path, schema),
};
