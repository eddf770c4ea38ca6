// Choosing two to four of a project's studies to compare. Studies of one kind share an axis (carrier
// count, or one swept field) and are drawn on one chart; others are compared in the table only.
import { useState } from 'react';
import type { StudyKind, StudyListItem } from '../../../../shared/api/studies';
import { Button } from '../../../components/ui/button';
import { STUDY_COMPARE_LIMITS } from '../utils/study-comparison';

interface StudyPickerProps {
  studies: readonly StudyListItem[];
  selectedIds: readonly string[];
  kindLabels: Record<StudyKind, string>;
  onCompare: (ids: string[]) => void;
}

export function StudyPicker({ studies, selectedIds, kindLabels, onCompare }: StudyPickerProps) {
  const [chosen, setChosen] = useState<string[]>([...selectedIds]);
  const [issue, setIssue] = useState<string | null>(null);
  if (studies.length < STUDY_COMPARE_LIMITS.min)
    return <p className="text-sm text-ink-soft">The project has fewer than two studies; make another to compare.</p>;
  const kinds = new Set(studies.filter((s) => chosen.includes(s.id)).map((s) => s.kind));
  return (
    <form
      className="flex flex-col gap-2"
      aria-label="Compare studies"
      onSubmit={(event) => {
        event.preventDefault();
        const n = chosen.length;
        const problem =
          n < STUDY_COMPARE_LIMITS.min || n > STUDY_COMPARE_LIMITS.max
            ? `Choose ${STUDY_COMPARE_LIMITS.min} to ${STUDY_COMPARE_LIMITS.max} studies; ${n} chosen.`
            : null;
        setIssue(problem);
        if (!problem) onCompare(chosen);
      }}
    >
      <fieldset className="max-h-64 overflow-y-auto rounded-md border border-paper-sunk p-2">
        <legend className="sr-only">Studies</legend>
        {studies.map((study) => (
          <label key={study.id} className="flex items-baseline gap-2 py-0.5 text-sm">
            <input
              type="checkbox"
              checked={chosen.includes(study.id)}
              onChange={() =>
                setChosen((c) => (c.includes(study.id) ? c.filter((x) => x !== study.id) : [...c, study.id]))
              }
            />
            <span>
              <strong>{study.name}</strong> · {kindLabels[study.kind]} of {study.scenarioName}{' '}
              <span className="text-ink-soft">
                ({study.pointCount} points, {study.settings.replications} replications, seed{' '}
                {String(study.settings.seed)})
              </span>
            </span>
          </label>
        ))}
      </fieldset>
      {kinds.size > 1 && (
        <p className="text-sm text-caution">
          The chosen studies ask different questions; points are matched where they change the same fields.
        </p>
      )}
      {issue && <p className="text-sm font-medium text-danger">{issue}</p>}
      <div>
        <Button type="submit" variant="secondary">
          Compare chosen studies
        </Button>
      </div>
    </form>
  );
}
