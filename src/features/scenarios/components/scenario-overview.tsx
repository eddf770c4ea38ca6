// The read-only overview of a scenario document: headline figures, carriers,
// track and process. The scenario editor will replace this view for editors.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { TitledCard } from '../../../components/ui/card';
import { formatLengthMm } from '../../../lib/format';
import { documentFacts } from '../utils/document-facts';
import { DocumentFactsList } from './document-facts-list';
import { ProcessOverview } from './process-overview';
import { TrackOverview } from './track-overview';

function CarrierSummary({ carriers }: { carriers: Scenario['carriers'] }) {
  return (
    <p className="text-sm text-ink-soft">
      {carriers.count} carriers, each {formatLengthMm(carriers.lengthMm)} long with at least {formatLengthMm(carriers.minGapMm)} between them;
      top speed loaded {formatLengthMm(carriers.loaded.vMaxMmPerS)}/s
      {carriers.empty ? `, empty ${formatLengthMm(carriers.empty.vMaxMmPerS)}/s` : ''}.
    </p>
  );
}

export function ScenarioOverview({ document }: { document: Scenario }) {
  return (
    <div className="flex flex-col gap-6">
      <DocumentFactsList facts={documentFacts(document)} />
      <CarrierSummary carriers={document.carriers} />
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
