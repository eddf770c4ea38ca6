// How parts and carriers flow: lead time, WIP over time, where carrier time goes, loop time.
import type { RunResult } from '../../../../shared/results/run-result';
import { TimeSeriesChart } from '../../../components/charts';
import { StackedShareBars, type ShareCategory } from '../../../components/charts/StackedShareBars';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatPercent, formatSeconds } from '../../../lib/format-run';
import { wipSeries } from '../utils/chart-data';
import { LeadTimeHistogram } from './lead-time-histogram';

const CARRIER_CATEGORIES: readonly (ShareCategory & { key: 'working' | 'moving' | 'waiting' | 'inTransfer' })[] = [
  { key: 'working', label: 'working (in a station)', colour: '#009e73' },
  { key: 'moving', label: 'moving', colour: '#56b4e9' },
  { key: 'waiting', label: 'waiting (queued or blocked)', colour: '#e69f00' },
  { key: 'inTransfer', label: 'in a transfer or elevator', colour: '#cc79a7' },
];

export function FlowResults({ result, fileBase }: { result: RunResult; fileBase: string }) {
  const wip = wipSeries(result);
  const { carriers } = result;
  return (
    <Card aria-labelledby="flow-title" className="flex flex-col gap-6">
      <CardTitle id="flow-title">Parts and carriers</CardTitle>
      <LeadTimeHistogram leadTime={result.leadTimeSeconds} exportName={`${fileBase}-lead-time`} />
      <TimeSeriesChart
        timesMinutes={wip.timesMinutes}
        series={[{ name: `WIP, mean of ${result.settings.replications} replications`, values: wip.values }]}
        quantity="Work in progress"
        unit="parts"
        title="Work in progress over time"
        exportName={`${fileBase}-wip`}
      />
      <StackedShareBars
        title="How carriers spend their time"
        subtitle={`${carriers.count} carriers, after warm-up`}
        summary={`Working ${formatPercent(carriers.working)}, moving ${formatPercent(carriers.moving)}, waiting ${formatPercent(carriers.waiting)}, in a transfer ${formatPercent(carriers.inTransfer)}.`}
        categories={CARRIER_CATEGORIES}
        items={[{ id: 'all', label: 'All carriers', shares: CARRIER_CATEGORIES.map((c) => carriers[c.key]) }]}
        axisLabel="Share of carrier time after warm-up (%)"
        tableCaption="Share of time carriers spend working, moving, waiting and in transfers"
        exportName={`${fileBase}-carrier-time`}
      />
      <p className="text-ink" data-testid="loop-time">
        <strong>Loop time</strong> (one load to the next on the same carrier): mean{' '}
        {formatSeconds(carriers.loopTimeSeconds.mean)} s, median {formatSeconds(carriers.loopTimeSeconds.p50)} s, 95th
        percentile {formatSeconds(carriers.loopTimeSeconds.p95)} s.
      </p>
    </Card>
  );
}
