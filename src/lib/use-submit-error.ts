// The failure of a form's last submit: field errors go beside their fields,
// everything else is kept for the form's banner. Typed values are never reset.
import { useCallback, useState } from 'react';
import type { FieldPath, FieldValues, UseFormSetError } from 'react-hook-form';
import type { FieldIssue } from '../../shared/api/errors';
import { isApiRequestError } from './api-client';
import { applyServerFieldErrors } from './form-errors';

export interface SubmitFailure {
  message: string;
  /** Server issues whose path matches no field of the form. */
  issues: FieldIssue[];
}

export function useSubmitError<T extends FieldValues>(fieldNames: readonly FieldPath<T>[], setError: UseFormSetError<T>) {
  const [failure, setFailure] = useState<SubmitFailure | null>(null);

  const capture = useCallback(
    (error: unknown) => {
      const issues = applyServerFieldErrors(error, fieldNames, setError);
      const placedAll = isApiRequestError(error) && error.fields.length > 0 && issues.length === 0;
      if (placedAll) {
        setFailure(null);
        return;
      }
      const message = error instanceof Error ? error.message : 'Something unexpected went wrong. Try again.';
      setFailure({ message, issues });
    },
    [fieldNames, setError],
  );

  const clear = useCallback(() => setFailure(null), []);
  return { failure, capture, clear };
}
