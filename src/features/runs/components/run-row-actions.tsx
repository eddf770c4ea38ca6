// Per-run actions: rerun (same revision, settings and seed) for people who may run, delete with a
// confirmation for the run's author and owners.
import { useState } from 'react';
import type { RunListItem } from '../../../../shared/api/runs';
import { Button } from '../../../components/ui/button';
import { useDeleteRun } from '../api/delete-run';

interface RunRowActionsProps {
  run: RunListItem;
  mayRerun: boolean;
  mayDelete: boolean;
  rerunBusy?: boolean;
  onRerun?: (run: RunListItem) => void;
  onDeleted?: () => void;
}

const SMALL = 'min-h-8 px-3 py-1';

export function RunRowActions({ run, mayRerun, mayDelete, rerunBusy, onRerun, onDeleted }: RunRowActionsProps) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteRun();

  if (confirming) {
    return (
      <div role="group" aria-label={`Confirm deleting ${run.name}`} className="flex flex-col gap-1">
        <p className="text-sm">Delete this run and its results? This cannot be undone.</p>
        <div className="flex gap-2">
          <Button
            className={`${SMALL} bg-danger hover:bg-danger`}
            pending={remove.isPending}
            pendingLabel="Deleting…"
            onClick={() => remove.mutate(run.id, { onSuccess: onDeleted })}
          >
            Delete run
          </Button>
          <Button
            variant="secondary"
            className={SMALL}
            onClick={() => setConfirming(false)}
            disabled={remove.isPending}
          >
            Keep
          </Button>
        </div>
        {remove.isError && (
          <p role="alert" className="text-sm text-danger">
            {remove.error.message}
          </p>
        )}
      </div>
    );
  }
  if (!mayRerun && !mayDelete) return null;
  return (
    <div className="flex gap-2 whitespace-nowrap">
      {mayRerun && onRerun && (
        <Button
          variant="secondary"
          className={SMALL}
          disabled={rerunBusy}
          aria-label={`Rerun ${run.name}`}
          onClick={() => onRerun?.(run)}
        >
          Rerun
        </Button>
      )}
      {mayDelete && (
        <Button
          variant="secondary"
          className={SMALL}
          aria-label={`Delete ${run.name}`}
          onClick={() => setConfirming(true)}
        >
          Delete
        </Button>
      )}
    </div>
  );
}
