// The progress of a running experiment: a bar, the replication and simulated time, time left, Cancel.
import { Button } from '../../../../components/ui/button';
import { formatDuration, type RunProgress } from '../utils/progress';

interface SimulationProgressProps {
  progress: RunProgress | null;
  onCancel: () => void;
}

export function SimulationProgress({ progress, onCancel }: SimulationProgressProps) {
  const percent = progress ? Math.round(progress.fraction * 100) : 0;
  return (
    <div
      className="flex flex-col gap-3 rounded-md border border-accent/30 bg-accent-soft/40 p-4"
      data-testid="simulation-progress"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-semibold text-ink" aria-live="polite">
          {progress ? `Replication ${progress.replication} of ${progress.replications}` : 'Starting the simulation…'}
        </p>
        <Button variant="secondary" onClick={onCancel}>
          Cancel run
        </Button>
      </div>
      <div
        role="progressbar"
        aria-label="Simulation progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={
          progress ? `${percent} %, replication ${progress.replication} of ${progress.replications}` : 'starting'
        }
        className="h-3 w-full overflow-hidden rounded-full bg-paper-sunk"
      >
        <div
          className="h-full rounded-full bg-accent transition-[width] duration-200"
          style={{ width: `${percent}%` }}
        />
      </div>
      {progress && (
        <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm text-ink-soft sm:grid-cols-3">
          <div>
            <dt className="inline">Simulated: </dt>
            <dd className="inline font-medium text-ink">
              {formatDuration(progress.replicationSeconds)} of {formatDuration(progress.replicationLengthSeconds)}
            </dd>
          </div>
          <div>
            <dt className="inline">Done: </dt>
            <dd className="inline font-medium text-ink">{percent} %</dd>
          </div>
          <div>
            <dt className="inline">Time left: </dt>
            <dd className="inline font-medium text-ink">
              {progress.remainingMs === null ? 'estimating…' : `about ${formatDuration(progress.remainingMs / 1000)}`}
            </dd>
          </div>
        </dl>
      )}
    </div>
  );
}
