// Puts the server's field errors beside the fields that caused them. Paths the
// form has no field for are returned so the caller can show them in a banner.
import type { FieldPath, FieldValues, UseFormSetError } from 'react-hook-form';
import type { FieldIssue } from '../../shared/api/errors';
import { isApiRequestError } from './api-client';

export function applyServerFieldErrors<T extends FieldValues>(
  error: unknown,
  fieldNames: readonly FieldPath<T>[],
  setError: UseFormSetError<T>,
): FieldIssue[] {
  if (!isApiRequestError(error)) return [];
  const unplaced: FieldIssue[] = [];
  let focused = false;
  for (const issue of error.fields) {
    const field = fieldNames.find((name) => issue.path === name);
    if (!field) {
      unplaced.push(issue);
      continue;
    }
    setError(field, { type: 'server', message: issue.message }, { shouldFocus: !focused });
    focused = true;
  }
  return unplaced;
}

/**
 * The shared schemas word their messages as the end of a sentence about the
 * field ("must be at least 10 characters"), so the label is put in front,
 * without a trailing note such as "(optional)"; messages that already start
 * with a capital are whole sentences.
 */
export function sentenceFor(label: string, message: string): string {
  const first = message.charAt(0);
  const isFragment = first !== '' && first === first.toLowerCase() && first !== first.toUpperCase();
  return isFragment ? `${label.replace(/\s*\([^)]*\)$/, '')} ${message}` : message;
}
