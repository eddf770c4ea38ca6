// Stored results reshaped for the chart components, without changing a value: only the layout of
// the arrays and the names beside them. The result calls time off shift "onBreak"; the charts call
// the same state "idle (off shift)".
import type { RunResult, StationState } from '../../../../shared/results/run-result';
import type { SpaceTimeLane, StationStateBarsStation, StationState as ChartState } from '../../../components/charts';

export const chartState = (state: StationState): ChartState => (state === 'onBreak' ? 'idle' : state);

const nameOf = (items: readonly { id: string; name: string }[], id: string) => items.find((item) => item.id === id)?.name ?? id;

export function spaceTimeLanes(result: RunResult): SpaceTimeLane[] {
  return result.heatmaps.lanes.map((heatmap) => {
    const lengthMm = result.lanes.find((lane) => lane.id === heatmap.laneId)?.lengthMm ?? heatmap.positionBins;
    return { laneName: nameOf(result.lanes, heatmap.laneId), lengthMm, positionBinMm: lengthMm / heatmap.positionBins, values: heatmap.occupancy };
  });
}

export function stationTimeline(result: RunResult) {
  const { heatmaps } = result;
  return {
    stations: heatmaps.stations.map((s) => ({ id: s.stationId, name: nameOf(result.stations, s.stationId) })),
    states: heatmaps.stationStates.map(chartState),
    shares: heatmaps.stations.flatMap((s) => s.shares),
    timeBinSeconds: heatmaps.binSeconds,
    startMinutes: heatmaps.startSeconds / 60,
  };
}

export function stationBars(result: RunResult): StationStateBarsStation[] {
  return result.stations.map((s) => ({
    id: s.id,
    name: s.name,
    shares: { processing: s.processing, starved: s.starved, blocked: s.blocked, down: s.down, idle: s.onBreak },
  }));
}

/** The WIP series holds the mean over each time bin; each value is drawn at its bin's middle. */
export function wipSeries(result: RunResult) {
  const { startSeconds, binSeconds, values } = result.wip.series;
  return { timesMinutes: values.map((_, i) => (startSeconds + (i + 0.5) * binSeconds) / 60), values };
}
