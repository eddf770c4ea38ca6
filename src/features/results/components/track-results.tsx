// Transfers and elevators (each holds one carrier: its time carrying, returning empty, blocked with a
// carrier the next lane cannot take, and idle; how long the queue in front) and lanes (how full they
// ran). Says when a transfer, not a station, held the line.
import {
  transferShares,
  type LaneResult,
  type RunResult,
  type TransferResult,
} from '../../../../shared/results/run-result';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatMean2, formatPercent } from '../../../lib/format-run';
import { ResultTable, type ResultColumn } from './result-table';

const KIND_LABEL: Record<TransferResult['kind'], string> = {
  elevator: 'elevator',
  lateral: 'lateral transfer',
  curve: 'curve',
};

const transferColumns: ResultColumn<TransferResult>[] = [
  { id: 'name', header: 'Transfer', value: (t) => t.name },
  { id: 'kind', header: 'Kind', value: (t) => KIND_LABEL[t.kind] },
  {
    id: 'busy',
    header: 'Busy (carrying + returning)',
    value: (t) => transferShares(t).busy,
    format: formatPercent,
    numeric: true,
  },
  {
    id: 'carrying',
    header: 'Carrying',
    value: (t) => transferShares(t).carrying ?? 'not recorded',
    format: formatPercent,
    numeric: true,
  },
  {
    id: 'returning',
    header: 'Returning empty',
    value: (t) => transferShares(t).returning ?? 'not recorded',
    format: formatPercent,
    numeric: true,
  },
  {
    id: 'blocked',
    header: 'Blocked (holding a carrier)',
    value: (t) => t.blocked,
    format: formatPercent,
    numeric: true,
  },
  { id: 'idle', header: 'Idle', value: (t) => transferShares(t).idle, format: formatPercent, numeric: true },
  { id: 'queue', header: 'Mean queue (carriers)', value: (t) => t.meanQueue, format: formatMean2, numeric: true },
  { id: 'moves', header: 'Moves per hour', value: (t) => t.movesPerHour, format: formatMean2, numeric: true },
];

const laneColumns: ResultColumn<LaneResult>[] = [
  { id: 'name', header: 'Lane', value: (l) => l.name },
  {
    id: 'length',
    header: 'Length (mm)',
    value: (l) => l.lengthMm,
    format: (v) => v.toLocaleString('en-GB'),
    numeric: true,
  },
  { id: 'capacity', header: 'Holds (carriers)', value: (l) => l.capacity, numeric: true },
  { id: 'mean', header: 'Mean carriers on it', value: (l) => l.meanCarriers, format: formatMean2, numeric: true },
];

/** Says when a transfer, not a station, held the line: busy most of the time and rarely blocked. */
function transferBottleneckSentence(result: RunResult): string | null {
  const t = result.transfers.find((x) => x.id === result.bottleneckTransferId);
  if (!t) return null;
  const s = transferShares(t);
  return (
    `${t.name} holds the line, not a station: busy ${formatPercent(s.busy)} of the time and blocked only ${formatPercent(s.blocked)}; ` +
    `it was the bottleneck ${formatPercent(t.bottleneckShare ?? 0)} of the time, more than any station. A faster cycle there raises output first.`
  );
}

export function TrackResults({ result, fileBase }: { result: RunResult; fileBase: string }) {
  const sentence = transferBottleneckSentence(result);
  return (
    <Card aria-labelledby="track-title" className="flex flex-col gap-6">
      <CardTitle id="track-title">Transfers, elevators and lanes</CardTitle>
      {sentence ? (
        <p className="max-w-prose text-ink" data-testid="transfer-bottleneck-sentence">
          {sentence}
        </p>
      ) : null}
      {result.transfers.length > 0 ? (
        <ResultTable
          caption="Transfer and elevator results"
          rows={result.transfers}
          columns={transferColumns}
          rowKey={(t) => t.id}
          fileBase={`${fileBase}-transfers`}
        />
      ) : (
        <p className="text-sm text-ink-soft">This layout has no transfers or elevators.</p>
      )}
      <ResultTable
        caption="Lane occupancy"
        rows={result.lanes}
        columns={laneColumns}
        rowKey={(l) => l.id}
        fileBase={`${fileBase}-lanes`}
      />
    </Card>
  );
}
