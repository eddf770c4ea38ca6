// The station's time studies, newest first: pick one to see its analysis; engineers may delete one.
import type { TimeStudyListItem } from '../../../../shared/api/time-studies';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { formatSeconds } from '../utils/fit-presentation';
import { DeleteTimeStudyButton } from './delete-time-study-button';

interface TimeStudyListProps {
  studies: readonly TimeStudyListItem[];
  selectedId: string | null;
  onSelect: (id: string) => void;
  canEdit: boolean;
}

export function TimeStudyList({ studies, selectedId, onSelect, canEdit }: TimeStudyListProps) {
  return (
    <ul className="flex flex-col gap-2" aria-label="Time studies of this station">
      {studies.map((study) => {
        const selected = study.id === selectedId;
        return (
          <li
            key={study.id}
            className={`flex flex-wrap items-center gap-3 rounded-md border px-3 py-2 ${selected ? 'border-accent bg-accent-soft' : 'border-paper-sunk'}`}
          >
            <button
              type="button"
              className="flex-1 text-left"
              aria-pressed={selected}
              onClick={() => onSelect(study.id)}
            >
              <span className="block font-semibold text-ink">{study.name}</span>
              <span className="block text-sm text-ink-soft">
                {study.count.toLocaleString('en-GB')} samples, mean {formatSeconds(study.mean)}, sd{' '}
                {formatSeconds(study.sd)} · {study.fileName}, column “{study.column}” · {formatPerson(study.createdBy)},{' '}
                {formatDateTime(study.createdAt)}
              </span>
            </button>
            {canEdit && <DeleteTimeStudyButton study={study} />}
          </li>
        );
      })}
    </ul>
  );
}
