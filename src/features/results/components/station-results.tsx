// Per station: where its time went, how often it was the bottleneck (alone, or shifting with a
// neighbour), its cycle and output. Bars for the eye, a sortable table for the figures.
import { useMemo } from 'react';
import type { RunResult, StationResult } from '../../../../shared/results/run-result';
import { StationStateBars } from '../../../components/charts';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatMean2, formatPercent, formatTakt } from '../../../lib/format-run';
import { stationBars } from '../utils/chart-data';
import { ResultTable, type ResultColumn } from './result-table';

/** A station with the names of its step and lane, which the result knows only by id. */
type StationRow = StationResult & { stepName: string; laneName: string };

const stationName: ResultColumn<StationRow> = { id: 'name', header: 'Station', value: (s) => s.name };

/** Where each station's time went and how often it held the line back. */
const stateColumns: ResultColumn<StationRow>[] = [
  stationName,
  { id: 'processing', header: 'Processing', value: (s) => s.processing, format: formatPercent, numeric: true },
  { id: 'starved', header: 'Starved', value: (s) => s.starved, format: formatPercent, numeric: true },
  { id: 'blocked', header: 'Blocked', value: (s) => s.blocked, format: formatPercent, numeric: true },
  { id: 'down', header: 'Down', value: (s) => s.down, format: formatPercent, numeric: true },
  { id: 'onBreak', header: 'On break', value: (s) => s.onBreak, format: formatPercent, numeric: true },
  { id: 'bottleneck', header: 'Bottleneck', value: (s) => s.bottleneckShare, format: formatPercent, numeric: true },
  { id: 'sole', header: 'Sole bottleneck', value: (s) => s.soleBottleneckShare, format: formatPercent, numeric: true },
  {
    id: 'shifting',
    header: 'Shifting bottleneck',
    value: (s) => s.shiftingBottleneckShare,
    format: formatPercent,
    numeric: true,
  },
];

/** What each station did: its work content, output, failures and the carriers waiting for it. */
const workColumns: ResultColumn<StationRow>[] = [
  stationName,
  { id: 'step', header: 'Step', value: (s) => s.stepName },
  { id: 'lane', header: 'Lane', value: (s) => s.laneName },
  { id: 'cycle', header: 'Mean cycle (s)', value: (s) => s.meanCycleSeconds, format: formatTakt, numeric: true },
  {
    id: 'operations',
    header: 'Operations per hour',
    value: (s) => s.operationsPerHour,
    format: formatMean2,
    numeric: true,
  },
  { id: 'failures', header: 'Failures per hour', value: (s) => s.failuresPerHour, format: formatMean2, numeric: true },
  { id: 'queue', header: 'Mean queue (carriers)', value: (s) => s.meanQueue, format: formatMean2, numeric: true },
];

function bottleneckSentence(result: RunResult): string {
  const station = result.stations.find((s) => s.id === result.bottleneckStationId);
  if (!station) return 'No station stood out as the bottleneck in this run.';
  const others = result.stations
    .filter((s) => s.id !== station.id && s.bottleneckShare > 0)
    .sort((a, b) => b.bottleneckShare - a.bottleneckShare);
  const runnerUp = others[0]
    ? ` Next most often: ${others[0].name} (${formatPercent(others[0].bottleneckShare)}).`
    : '';
  const transfer = result.transfers.find((t) => t.id === result.bottleneckTransferId);
  if (transfer)
    return `${transfer.name}, a transfer, held the line more often than any station (see Transfers). Among the stations, ${station.name} came first.${runnerUp}`;
  return (
    `${station.name} is the bottleneck: the sole bottleneck ${formatPercent(station.soleBottleneckShare)} of the time, and shifting with another station a further ` +
    `${formatPercent(station.shiftingBottleneckShare)}.${runnerUp}`
  );
}

interface StationResultsProps {
  result: RunResult;
  /** Step names by id, from the run's revision; ids stand in until it has loaded. */
  stepNames: ReadonlyMap<string, string> | undefined;
  fileBase: string;
}

export function StationResults({ result, stepNames, fileBase }: StationResultsProps) {
  // Rows are rebuilt when the names arrive, since the table caches cell values per row.
  const rows = useMemo<StationRow[]>(
    () =>
      result.stations.map((s) => ({
        ...s,
        stepName: stepNames?.get(s.stepId) ?? s.stepId,
        laneName: result.lanes.find((lane) => lane.id === s.laneId)?.name ?? s.laneId,
      })),
    [result, stepNames],
  );
  const bottleneck = result.stations.find((s) => s.id === result.bottleneckStationId);
  const emphasise = (s: StationRow) => (s.id === result.bottleneckStationId ? 'bottleneck' : null);
  return (
    <Card aria-labelledby="stations-title" className="flex flex-col gap-4">
      <CardTitle id="stations-title">Stations</CardTitle>
      <p className="max-w-prose text-ink" data-testid="bottleneck-sentence">
        {bottleneckSentence(result)}
      </p>
      <StationStateBars
        stations={stationBars(result)}
        bottleneckId={result.bottleneckStationId}
        bottleneckShare={bottleneck?.bottleneckShare}
        exportName={`${fileBase}-station-states-chart`}
      />
      <ResultTable
        caption="Station time shares and bottleneck"
        rows={rows}
        columns={stateColumns}
        rowKey={(s) => s.id}
        fileBase={`${fileBase}-station-shares-table`}
        emphasise={emphasise}
      />
      {result.conveyor === 'belt' && (
        <p className="text-sm text-ink-soft" data-testid="belt-cycle-note">
          On the belt baseline each station&apos;s mean cycle includes the time to stop and locate the pallet.
        </p>
      )}
      <ResultTable
        caption="Station cycle, output and queue"
        rows={rows}
        columns={workColumns}
        rowKey={(s) => s.id}
        fileBase={`${fileBase}-station-work`}
        emphasise={emphasise}
      />
    </Card>
  );
}
