// The scenarios of a project, each with its latest revision.
import { Link } from 'react-router-dom';
import type { ScenarioSummary } from '../../../../shared/api/scenarios';
import { BeltBaselineTag } from '../../../components/ui/belt-baseline-tag';
import { formatCount, formatDateTime, formatPerson } from '../../../lib/format';

export function ScenarioList({ scenarios }: { scenarios: ScenarioSummary[] }) {
  return (
    <ul
      className="flex flex-col divide-y divide-paper-sunk rounded-lg border border-paper-sunk bg-paper-raised"
      aria-label="Scenarios"
    >
      {scenarios.map((scenario) => (
        <li key={scenario.id}>
          <Link
            to={`/scenarios/${scenario.id}`}
            className="flex flex-col gap-1 p-4 hover:bg-paper focus-visible:outline-3 focus-visible:-outline-offset-3 focus-visible:outline-accent sm:flex-row sm:items-baseline sm:justify-between sm:gap-6 sm:px-5"
          >
            <span className="flex min-w-0 flex-col gap-1">
              <span className="flex flex-wrap items-center gap-2">
                <span className="font-semibold text-accent-strong">{scenario.name}</span>
                {scenario.latestRevision.conveyorMode === 'belt' && <BeltBaselineTag short />}
              </span>
              {scenario.description && (
                <span className="line-clamp-2 text-sm text-ink-soft">{scenario.description}</span>
              )}
            </span>
            <span className="shrink-0 text-sm text-ink-soft">
              Revision {scenario.latestRevision.number} · {formatPerson(scenario.latestRevision.createdBy)},{' '}
              {formatDateTime(scenario.latestRevision.createdAt)} · {formatCount(scenario.runCount, 'run')}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
