// The strip above the runs table while a run is being repeated, and what came of it.
import { LoadError } from '../../../components/load-error';
import { SimulationProblem } from '../simulation/components/simulation-problem';
import { SimulationProgress } from '../simulation/components/simulation-progress';
import type { useRerun } from '../hooks/use-rerun';
import { SaveStatus } from './save-status';

export function RerunStatus({ rerun }: { rerun: ReturnType<typeof useRerun> }) {
  const { source, simulation, save, loadError, retrySave } = rerun;
  if (!source) return null;
  return (
    <section aria-label="Rerun" className="flex flex-col gap-2 rounded-md border border-paper-sunk bg-paper p-3">
      <p className="text-sm text-ink">
        Rerunning <strong>{source.name}</strong>: revision {source.revisionNumber}, seed {String(source.settings.seed)},{' '}
        {source.settings.replications} × {source.settings.hours} h.
      </p>
      {loadError !== null && <LoadError what="the revision to rerun" error={loadError} />}
      {simulation.status === 'running' && (
        <SimulationProgress progress={simulation.progress} onCancel={simulation.cancel} />
      )}
      <SimulationProblem outcome={simulation.outcome} />
      <SaveStatus save={save} onRetry={retrySave} />
    </section>
  );
}
