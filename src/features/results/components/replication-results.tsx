// Each replication's own figures, the spread the confidence intervals are computed from.
import type { ReplicationResult } from '../../../../shared/results/run-result';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatMean1, formatMean2, formatPerHour, formatSeconds, formatTakt } from '../../../lib/format-run';
import { ResultTable, type ResultColumn } from './result-table';

const columns: ResultColumn<ReplicationResult>[] = [
  { id: 'replication', header: 'Replication', value: (r) => r.replication + 1, numeric: true },
  {
    id: 'throughput',
    header: 'Throughput (/h)',
    value: (r) => r.throughputPerHour,
    format: formatPerHour,
    numeric: true,
  },
  { id: 'takt', header: 'Takt (s)', value: (r) => r.taktSeconds, format: formatTakt, numeric: true },
  { id: 'output', header: 'Good parts', value: (r) => r.output, format: formatMean1, numeric: true },
  { id: 'scrapped', header: 'Scrapped', value: (r) => r.scrapped, format: formatMean1, numeric: true },
  {
    id: 'lead',
    header: 'Mean lead time (s)',
    value: (r) => r.leadTimeMeanSeconds,
    format: formatSeconds,
    numeric: true,
  },
  { id: 'wip', header: 'Mean WIP', value: (r) => r.wipMean, format: formatMean2, numeric: true },
  { id: 'events', header: 'Events', value: (r) => r.events, numeric: true },
];

export function ReplicationResults({
  replications,
  fileBase,
}: {
  replications: readonly ReplicationResult[];
  fileBase: string;
}) {
  return (
    <Card aria-labelledby="replications-title" className="flex flex-col gap-4">
      <CardTitle id="replications-title">Replications</CardTitle>
      <ResultTable
        caption="Results of each replication"
        rows={replications}
        columns={columns}
        rowKey={(r) => String(r.replication)}
        fileBase={`${fileBase}-replications`}
      />
    </Card>
  );
}
