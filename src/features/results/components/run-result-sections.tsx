// Every result section of one stored run, in reading order: the same on the run page and on a shared
// read-only view of it.
import type { RunResult } from '../../../../shared/results/run-result';
import { FlowResults } from './flow-results';
import { HeatmapResults } from './heatmap-results';
import { ReplicationResults } from './replication-results';
import { ResultHeadline } from './result-headline';
import { SafetyCaution } from './safety-caution';
import { StationResults } from './station-results';
import { TrackResults } from './track-results';

export function RunResultSections({
  result,
  stepNames,
  fileBase,
}: {
  result: RunResult;
  stepNames?: Map<string, string>;
  fileBase: string;
}) {
  return (
    <>
      <SafetyCaution />
      <ResultHeadline result={result} />
      <HeatmapResults result={result} fileBase={fileBase} />
      <StationResults result={result} stepNames={stepNames} fileBase={fileBase} />
      <TrackResults result={result} fileBase={fileBase} />
      <FlowResults result={result} fileBase={fileBase} />
      <ReplicationResults replications={result.replications} fileBase={fileBase} />
    </>
  );
}
