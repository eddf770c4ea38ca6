// Deleting a time study in two presses on the same spot: the first arms the button (it turns red and says
// what will happen), the second deletes; "Keep" disarms it.
import { useState } from 'react';
import type { TimeStudyListItem } from '../../../../shared/api/time-studies';
import { Button } from '../../../components/ui/button';
import { useDeleteTimeStudy } from '../api/delete-time-study';

const SMALL = 'min-h-8 px-3 py-1';

export function DeleteTimeStudyButton({ study }: { study: TimeStudyListItem }) {
  const [armed, setArmed] = useState(false);
  const remove = useDeleteTimeStudy();
  const samples = study.count.toLocaleString('en-GB');
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button
        variant={armed ? 'primary' : 'secondary'}
        className={armed ? `${SMALL} bg-danger hover:bg-danger` : SMALL}
        pending={remove.isPending}
        pendingLabel="Deleting…"
        aria-label={
          armed
            ? `Confirm: delete the ${samples} samples of ${study.name} for everyone`
            : `Delete time study ${study.name}`
        }
        onClick={() => (armed ? remove.mutate(study.id) : setArmed(true))}
      >
        {armed ? 'Delete for everyone' : 'Delete'}
      </Button>
      {armed && !remove.isPending && (
        <Button variant="quiet" className={SMALL} onClick={() => setArmed(false)}>
          Keep
        </Button>
      )}
      {remove.isError && (
        <p role="alert" className="w-full text-sm text-danger">
          {remove.error.message}
        </p>
      )}
    </div>
  );
}
