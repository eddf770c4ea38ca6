// Transfers and elevators (each holds one carrier: how busy, how often stuck with a carrier the next
// lane cannot take, how long the queue in front) and lanes (how full they ran).
import type { LaneResult, RunResult, TransferResult } from '../../../../shared/results/run-result';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatMean2, formatPercent } from '../../../lib/format-run';
import { ResultTable, type ResultColumn } from './result-table';

const KIND_LABEL: Record<TransferResult['kind'], string> = { elevator: 'elevator', lateral: 'lateral transfer', curve: 'curve' };

const transferColumns: ResultColumn<TransferResult>[] = [
  { id: 'name', header: 'Transfer', value: (t) => t.name },
  { id: 'kind', header: 'Kind', value: (t) => KIND_LABEL[t.kind] },
  { id: 'utilisation', header: 'Utilisation', value: (t) => t.utilisation, format: formatPercent, numeric: true },
  { id: 'blocked', header: 'Blocked', value: (t) => t.blocked, format: formatPercent, numeric: true },
  { id: 'queue', header: 'Mean queue (carriers)', value: (t) => t.meanQueue, format: formatMean2, numeric: true },
  { id: 'moves', header: 'Moves per hour', value: (t) => t.movesPerHour, format: formatMean2, numeric: true },
];

const laneColumns: ResultColumn<LaneResult>[] = [
  { id: 'name', header: 'Lane', value: (l) => l.name },
  { id: 'length', header: 'Length (mm)', value: (l) => l.lengthMm, format: (v) => v.toLocaleString('en-GB'), numeric: true },
  { id: 'capacity', header: 'Holds (carriers)', value: (l) => l.capacity, numeric: true },
  { id: 'mean', header: 'Mean carriers on it', value: (l) => l.meanCarriers, format: formatMean2, numeric: true },
];

export function TrackResults({ result, fileBase }: { result: RunResult; fileBase: string }) {
  return (
    <Card aria-labelledby="track-title" className="flex flex-col gap-6">
      <CardTitle id="track-title">Transfers, elevators and lanes</CardTitle>
      {result.transfers.length > 0 ? (
        <ResultTable caption="Transfer and elevator results" rows={result.transfers} columns={transferColumns} rowKey={(t) => t.id} fileBase={`${fileBase}-transfers`} />
      ) : (
        <p className="text-sm text-ink-soft">This layout has no transfers or elevators.</p>
      )}
      <ResultTable caption="Lane occupancy" rows={result.lanes} columns={laneColumns} rowKey={(l) => l.id} fileBase={`${fileBase}-lanes`} />
    </Card>
  );
}
