// The single error shape every API response uses, so clients render field
// messages the same way whatever went wrong.
import { z } from 'zod';

export const fieldIssueSchema = z.object({
  path: z.string(),
  message: z.string(),
});

export const apiErrorCodeSchema = z.enum([
  'bad_request',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'rate_limited',
  'unavailable',
  'internal',
]);

export const apiErrorSchema = z.object({
  error: z.object({
    code: apiErrorCodeSchema,
    message: z.string(),
    fields: z.array(fieldIssueSchema),
  }),
});

export type FieldIssue = z.infer<typeof fieldIssueSchema>;
export type ApiErrorCode = z.infer<typeof apiErrorCodeSchema>;
export type ApiError = z.infer<typeof apiErrorSchema>;

/** Turns zod issues into the `fields` list: dotted paths with numeric indices in brackets. */
export function toFieldIssues(error: Pick<z.ZodError, 'issues'>): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: formatPath(issue.path),
    message: issue.message,
  }));
}

export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((acc, key) => {
    if (typeof key === 'number') return `${acc}[${key}]`;
    const name = String(key);
    return acc ? `${acc}.${name}` : name;
  }, '');
}
