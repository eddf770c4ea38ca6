// One bar for the whole study: jobs done of all jobs, where they run, the time left, and Cancel or Resume.
import { Button } from '../../../components/ui/button';
import { formatDuration } from '../../../lib/format';

interface StudyProgressProps {
  done: number;
  total: number;
  running: boolean;
  remainingMs: number | null;
  /** Where the jobs run, for the progress line: "on 4 cores", "on the server’s workers". */
  place: string;
  onCancel?: () => void;
  onResume?: () => void;
}

export function StudyProgress({ done, total, running, remainingMs, place, onCancel, onResume }: StudyProgressProps) {
  const percent = total > 0 ? Math.round((done / total) * 100) : 0;
  return (
    <div
      className="flex flex-col gap-3 rounded-md border border-accent/30 bg-accent-soft/40 p-4"
      data-testid="study-progress"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-semibold text-ink" aria-live="polite">
          {done} of {total} jobs done{running ? ` · running ${place}` : ''}
        </p>
        {running && onCancel && (
          <Button variant="secondary" onClick={onCancel}>
            Cancel study
          </Button>
        )}
        {!running && onResume && <Button onClick={onResume}>Resume study</Button>}
      </div>
      <div
        role="progressbar"
        aria-label="Study progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${done} of ${total} jobs`}
        className="h-3 w-full overflow-hidden rounded-full bg-paper-sunk"
      >
        <div
          className="h-full rounded-full bg-accent transition-[width] duration-200"
          style={{ width: `${percent}%` }}
        />
      </div>
      {running && (
        <p className="text-sm text-ink-soft">
          Time left: {remainingMs === null ? 'estimating…' : `about ${formatDuration(remainingMs / 1000)}`}
        </p>
      )}
    </div>
  );
}
