// Deleting a time study, asked twice: the first press shows what will go and a second button to confirm.
import { useState } from 'react';
import type { TimeStudyListItem } from '../../../../shared/api/time-studies';
import { Button } from '../../../components/ui/button';
import { useDeleteTimeStudy } from '../api/delete-time-study';

const SMALL = 'min-h-8 px-3 py-1';

export function DeleteTimeStudyButton({ study }: { study: TimeStudyListItem }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteTimeStudy();
  if (!confirming) {
    return (
      <Button variant="secondary" className={SMALL} aria-label={`Delete time study ${study.name}`} onClick={() => setConfirming(true)}>
        Delete
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`Confirm deleting ${study.name}`} className="flex flex-col gap-1">
      <p className="text-sm">Delete these {study.count.toLocaleString('en-GB')} samples for everyone? Cycle times already set from them stay as they are.</p>
      <div className="flex gap-2">
        <Button className={`${SMALL} bg-danger hover:bg-danger`} pending={remove.isPending} pendingLabel="Deleting…" onClick={() => remove.mutate(study.id)}>
          Delete time study
        </Button>
        <Button variant="secondary" className={SMALL} onClick={() => setConfirming(false)} disabled={remove.isPending}>
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
