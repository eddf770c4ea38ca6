// What the run was: which revision, seed, engine and settings, who ran it and when; enough to
// repeat it to the same numbers.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { RunDetail } from '../../../../shared/api/runs';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatDateTime, formatPerson } from '../../../lib/format';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-sm font-semibold text-ink-soft">{term}</dt>
      <dd className="text-ink">{children}</dd>
    </div>
  );
}

/** Which calendar choice the run used for breaks; results stored before it was recorded say so. */
function breakText(results: RunDetail['results']): string {
  if (results.breakMinutesPerShift === 0) return 'none in the calendar';
  const minutes = results.breakMinutesPerShift === undefined ? '' : `${results.breakMinutesPerShift} min per shift; `;
  return results.breakMode === 'wholeLine'
    ? `${minutes}stop the whole line (carriers halt, no station works)`
    : `${minutes}only manual stations that pause for breaks stop`;
}

/** `readOnlyView`: for a shared page, whose reader has no scenario to open and needs no names of the team. */
export function RunMetadata({ run, readOnlyView = false }: { run: RunDetail; readOnlyView?: boolean }) {
  const { settings } = run;
  return (
    <Card aria-labelledby="metadata-title" className="flex flex-col gap-4">
      <CardTitle id="metadata-title">About this run</CardTitle>
      <dl className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <Item term="Scenario revision">
          {readOnlyView ? (
            `${run.scenarioName}, revision ${run.revisionNumber}`
          ) : (
            <Link className="text-accent-strong underline underline-offset-4" to={`/scenarios/${run.scenarioId}`}>
              {run.scenarioName}, revision {run.revisionNumber}
            </Link>
          )}
        </Item>
        <Item term="Seed">
          <code className="font-mono">{run.seed}</code>
        </Item>
        <Item term="Engine version">{run.engineVersion}</Item>
        <Item term={readOnlyView ? 'Run on' : 'Run by'}>
          {readOnlyView ? '' : `${formatPerson(run.createdBy)}, `}
          <time dateTime={run.createdAt}>{formatDateTime(run.createdAt)}</time>
        </Item>
        <Item term="Simulated">
          {settings.replications} replication{settings.replications === 1 ? '' : 's'} × {settings.hours} h after{' '}
          {settings.warmupMinutes} min warm-up
        </Item>
        <Item term="Carriers">
          {settings.carriers === undefined
            ? `${run.results.carriers.count} (as in the scenario)`
            : `${settings.carriers} (override)`}
        </Item>
        <Item term="Conveyor">
          {run.results.conveyor === 'belt' ? 'belt or chain conveyor (baseline)' : 'independent carriers'}
        </Item>
        <Item term="Breaks">{breakText(run.results)}</Item>
        <Item term="Events simulated">{run.results.events.toLocaleString('en-GB')}</Item>
      </dl>
      <p className="text-sm text-ink-soft">
        Running revision {run.revisionNumber} again with seed {run.seed} and these settings on engine{' '}
        {run.engineVersion} gives the same figures, in this browser or with{' '}
        <code className="font-mono text-xs">npm run simulate</code>.
      </p>
    </Card>
  );
}
