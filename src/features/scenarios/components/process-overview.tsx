// Read-only view of the process: steps in order, each with its stations and mean cycle time.
import { distributionMean } from '../../../../workers/engine/stats/distribution-moments';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { formatLengthMm } from '../../../lib/format';

const stepKindLabel = { load: 'Load', process: 'Process', inspect: 'Inspect', unload: 'Unload' } as const;

function formatSeconds(seconds: number): string {
  return `${seconds.toLocaleString('en-GB', { maximumFractionDigits: 1 })} s`;
}

export function ProcessOverview({ document }: { document: Scenario }) {
  const laneName = (id: string) => document.lanes.find((lane) => lane.id === id)?.name ?? id;
  return (
    <ol className="flex flex-col gap-3">
      {document.steps.map((step, index) => (
        <li key={step.id} className="rounded-md border border-paper-sunk p-3 sm:p-4">
          <p className="flex flex-wrap items-baseline gap-x-2">
            <span className="font-mono text-sm text-ink-soft">{index + 1}.</span>
            <span className="font-semibold">{step.name}</span>
            <span className="text-sm text-ink-soft">
              {stepKindLabel[step.kind]} ·{' '}
              {step.stations.length === 1 ? '1 station' : `${step.stations.length} stations`}
            </span>
          </p>
          <ul className="mt-2 flex flex-col gap-1 pl-6 text-sm">
            {step.stations.map((station) => (
              <li key={station.id} className="flex flex-wrap gap-x-2">
                <span className="font-medium">{station.name}</span>
                <span className="text-ink-soft">
                  on {laneName(station.laneId)} at {formatLengthMm(station.positionMm)} · mean cycle{' '}
                  {formatSeconds(distributionMean(station.cycleTimeSeconds))} · {station.operation}
                  {station.failures ? ' · with failures' : ''}
                </span>
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}
