// Per station: where its time went, how often it was the bottleneck (alone, or shifting with a
// neighbour), its cycle and output. Bars for the eye, a sortable table for the figures.
import type { RunResult, StationResult } from '../../../../shared/results/run-result';
import { StationStateBars } from '../../../components/charts';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatMean2, formatPercent, formatTakt } from '../../runs/utils/format-run';
import { stationBars } from '../utils/chart-data';
import { ResultTable, type ResultColumn } from './result-table';

export function stationColumns(laneName: (id: string) => string, stepName: (id: string) => string): ResultColumn<StationResult>[] {
  return [
    { id: 'name', header: 'Station', value: (s) => s.name },
    { id: 'step', header: 'Step', value: (s) => stepName(s.stepId) },
    { id: 'lane', header: 'Lane', value: (s) => laneName(s.laneId) },
    { id: 'processing', header: 'Processing', value: (s) => s.processing, format: formatPercent, numeric: true },
    { id: 'starved', header: 'Starved', value: (s) => s.starved, format: formatPercent, numeric: true },
    { id: 'blocked', header: 'Blocked', value: (s) => s.blocked, format: formatPercent, numeric: true },
    { id: 'down', header: 'Down', value: (s) => s.down, format: formatPercent, numeric: true },
    { id: 'onBreak', header: 'On break', value: (s) => s.onBreak, format: formatPercent, numeric: true },
    { id: 'bottleneck', header: 'Bottleneck', value: (s) => s.bottleneckShare, format: formatPercent, numeric: true },
    { id: 'sole', header: 'Sole bottleneck', value: (s) => s.soleBottleneckShare, format: formatPercent, numeric: true },
    { id: 'shifting', header: 'Shifting bottleneck', value: (s) => s.shiftingBottleneckShare, format: formatPercent, numeric: true },
    { id: 'cycle', header: 'Mean cycle (s)', value: (s) => s.meanCycleSeconds, format: formatTakt, numeric: true },
    { id: 'operations', header: 'Operations per hour', value: (s) => s.operationsPerHour, format: formatMean2, numeric: true },
    { id: 'failures', header: 'Failures per hour', value: (s) => s.failuresPerHour, format: formatMean2, numeric: true },
    { id: 'queue', header: 'Mean queue (carriers)', value: (s) => s.meanQueue, format: formatMean2, numeric: true },
  ];
}

function bottleneckSentence(result: RunResult): string {
  const station = result.stations.find((s) => s.id === result.bottleneckStationId);
  if (!station) return 'No station stood out as the bottleneck in this run.';
  const others = result.stations.filter((s) => s.id !== station.id && s.bottleneckShare > 0).sort((a, b) => b.bottleneckShare - a.bottleneckShare);
  const runnerUp = others[0] ? ` Next most often: ${others[0].name} (${formatPercent(others[0].bottleneckShare)}).` : '';
  return (
    `${station.name} is the bottleneck: the sole bottleneck ${formatPercent(station.soleBottleneckShare)} of the time, and shifting with another station a further ` +
    `${formatPercent(station.shiftingBottleneckShare)}.${runnerUp}`
  );
}

interface StationResultsProps {
  result: RunResult;
  stepName: (id: string) => string;
  fileBase: string;
}

export function StationResults({ result, stepName, fileBase }: StationResultsProps) {
  const laneName = (id: string) => result.lanes.find((lane) => lane.id === id)?.name ?? id;
  const bottleneck = result.stations.find((s) => s.id === result.bottleneckStationId);
  return (
    <Card aria-labelledby="stations-title" className="flex flex-col gap-4">
      <CardTitle id="stations-title">Stations</CardTitle>
      <p className="max-w-prose text-ink" data-testid="bottleneck-sentence">
        {bottleneckSentence(result)}
      </p>
      <StationStateBars stations={stationBars(result)} bottleneckId={result.bottleneckStationId} bottleneckShare={bottleneck?.bottleneckShare} exportName={`${fileBase}-station-states`} />
      <ResultTable
        caption="Station results"
        rows={result.stations}
        columns={stationColumns(laneName, stepName)}
        rowKey={(s) => s.id}
        fileBase={`${fileBase}-stations`}
        emphasise={(s) => (s.id === result.bottleneckStationId ? 'bottleneck' : null)}
      />
    </Card>
  );
}
