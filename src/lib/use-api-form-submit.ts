// Submitting a react-hook-form form to the API. Field errors from the server
// go beside their fields; anything else becomes the banner's failure. Typed
// values are never reset, so nothing is lost when a submit fails.
import { useState } from 'react';
import type { FieldPath, FieldValues, UseFormReturn } from 'react-hook-form';
import type { FieldIssue } from '../../shared/api/errors';
import { isApiRequestError } from './api-client';
import { applyServerFieldErrors } from './form-errors';

export interface SubmitFailure {
  message: string;
  /** Server issues whose path matches no field of the form. */
  issues: FieldIssue[];
}

function failureFrom<T extends FieldValues>(
  error: unknown,
  fieldNames: readonly FieldPath<T>[],
  form: UseFormReturn<T, unknown, unknown>,
): SubmitFailure | null {
  const issues = applyServerFieldErrors(error, fieldNames, form.setError);
  const placedAll = isApiRequestError(error) && error.fields.length > 0 && issues.length === 0;
  if (placedAll) return null;
  return { message: error instanceof Error ? error.message : 'Something unexpected went wrong. Try again.', issues };
}

export function useApiFormSubmit<T extends FieldValues, TOut>(
  form: UseFormReturn<T, unknown, TOut>,
  fieldNames: readonly FieldPath<T>[],
  action: (values: TOut) => Promise<void>,
) {
  const [failure, setFailure] = useState<SubmitFailure | null>(null);
  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      await action(values);
    } catch (error) {
      setFailure(failureFrom(error, fieldNames, form as UseFormReturn<T, unknown, unknown>));
    }
  });
  return { onSubmit, failure };
}
