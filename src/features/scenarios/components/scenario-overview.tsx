// The read-only overview of a scenario document: headline figures, carriers,
// track and process. The scenario editor will replace this view for editors.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { TitledCard } from '../../../components/ui/card';
import { formatLengthMm } from '../../../lib/format';
import { documentFacts } from '../utils/document-facts';
import { DocumentFactsList } from './document-facts-list';
import { ProcessOverview } from './process-overview';
import { TrackOverview } from './track-overview';

const seconds = (value: number) => `${value.toLocaleString('en-GB', { maximumFractionDigits: 2 })} s`;

function LineSummary({ document }: { document: Scenario }) {
  const { carriers, conveyor, calendar, targetTaktSeconds } = document;
  return (
    <ul className="flex flex-col gap-1 text-sm text-ink-soft">
      <li>
        {carriers.count} carriers, each {formatLengthMm(carriers.lengthMm)} long with at least{' '}
        {formatLengthMm(carriers.minGapMm)} between them; top speed loaded {formatLengthMm(carriers.loaded.vMaxMmPerS)}
        /s{carriers.empty ? `, empty ${formatLengthMm(carriers.empty.vMaxMmPerS)}/s` : ''}.
      </li>
      {conveyor.kind === 'belt' && (
        <li>
          Baseline on a belt conveyor at {formatLengthMm(conveyor.speedMmPerS)}/s,{' '}
          {seconds(conveyor.stopAndLocateSeconds)} to stop and locate at each station.
        </li>
      )}
      <li>
        {calendar.shiftsPerDay} × {calendar.hoursPerShift} h shifts, {calendar.daysPerWeek} days a week,{' '}
        {calendar.weeksPerYear} weeks a year
        {calendar.breaks.length > 0
          ? `, ${calendar.breaks.length} break${calendar.breaks.length === 1 ? '' : 's'} per shift`
          : ''}
        .{targetTaktSeconds !== undefined && ` Target takt ${seconds(targetTaktSeconds)}.`}
      </li>
    </ul>
  );
}

export function ScenarioOverview({ document }: { document: Scenario }) {
  return (
    <div className="flex flex-col gap-6">
      <DocumentFactsList facts={documentFacts(document)} />
      <LineSummary document={document} />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <TitledCard title="Track">
          <TrackOverview document={document} />
        </TitledCard>
        <TitledCard title="Process">
          <ProcessOverview document={document} />
        </TitledCard>
      </div>
    </div>
  );
}
