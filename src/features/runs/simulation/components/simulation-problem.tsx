// Why a run did not produce a result, in words: each validation issue with its field path (the
// editor can place the same issues beside its fields), or why the engine stopped.
import { ErrorBanner } from '../../../../components/ui/error-banner';
import type { SimulationOutcome } from '../hooks/use-simulation';

const GRIDLOCK_SHOWN = 8;

export function SimulationProblem({ outcome }: { outcome: SimulationOutcome | null }) {
  if (!outcome) return null;
  switch (outcome.status) {
    case 'invalid':
      return (
        <ErrorBanner title="The scenario cannot be run as it stands">
          <ul className="list-disc pl-5" aria-label="Problems found in the scenario">
            {outcome.issues.map((issue) => (
              <li key={`${issue.path}:${issue.message}`}>
                {issue.path && <code className="font-mono text-xs">{issue.path}</code>}
                {issue.path && ': '}
                {issue.message}
              </li>
            ))}
          </ul>
        </ErrorBanner>
      );
    case 'stopped':
      return (
        <ErrorBanner title="The simulation stopped before the end">
          <p>{outcome.message}</p>
          {outcome.gridlock.length > 0 && (
            <ul className="mt-1 list-disc pl-5" aria-label="Carriers waiting on each other">
              {outcome.gridlock.slice(0, GRIDLOCK_SHOWN).map((entry) => (
                <li key={entry.carrier}>
                  Carrier {entry.carrier} at {entry.at}, waiting for {entry.waitingFor}
                </li>
              ))}
              {outcome.gridlock.length > GRIDLOCK_SHOWN && <li>and {outcome.gridlock.length - GRIDLOCK_SHOWN} more</li>}
            </ul>
          )}
        </ErrorBanner>
      );
    case 'failed':
      return (
        <ErrorBanner title="The simulation failed">
          <p>
            {outcome.message}. Nothing was saved; try again, and if it happens again, report the scenario and settings.
          </p>
        </ErrorBanner>
      );
    case 'cancelled':
      return (
        <p role="status" className="text-sm text-ink-soft">
          The run was cancelled; nothing was saved.
        </p>
      );
    default:
      return null;
  }
}
