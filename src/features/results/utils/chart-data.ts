// Stored results reshaped for the chart components, without changing a value: only the layout of
// the arrays and the names beside them. The charts use the result's own station states.
import type { RunResult } from '../../../../shared/results/run-result';
import type { SpaceTimeLane, StationStateBarsStation } from '../../../components/charts';

const nameOf = (items: readonly { id: string; name: string }[], id: string) =>
  items.find((item) => item.id === id)?.name ?? id;

export function spaceTimeLanes(result: RunResult): SpaceTimeLane[] {
  return result.heatmaps.lanes.map((heatmap) => {
    const lengthMm = result.lanes.find((lane) => lane.id === heatmap.laneId)?.lengthMm ?? heatmap.positionBins;
    return {
      laneName: nameOf(result.lanes, heatmap.laneId),
      lengthMm,
      positionBinMm: lengthMm / heatmap.positionBins,
      values: heatmap.occupancy,
    };
  });
}

/**
 * The engine stores timeline shares rounded to four decimals, so a bin's five shares can add up to
 * 1.0001 or so; the timeline refuses any sum above 1 beyond floating-point noise. Only such bins are
 * scaled back to 1, a change far below the tenth of a percent the chart shows.
 */
export function withinWholeBins(shares: readonly number[], groupSize: number): number[] {
  const out = [...shares];
  for (let start = 0; start < out.length; start += groupSize) {
    let sum = 0;
    for (let i = start; i < start + groupSize; i++) sum += out[i];
    if (sum > 1) for (let i = start; i < start + groupSize; i++) out[i] /= sum;
  }
  return out;
}

export function stationTimeline(result: RunResult) {
  const { heatmaps } = result;
  return {
    stations: heatmaps.stations.map((s) => ({ id: s.stationId, name: nameOf(result.stations, s.stationId) })),
    states: heatmaps.stationStates,
    shares: withinWholeBins(
      heatmaps.stations.flatMap((s) => s.shares),
      heatmaps.stationStates.length,
    ),
    timeBinSeconds: heatmaps.binSeconds,
    startMinutes: heatmaps.startSeconds / 60,
  };
}

export function stationBars(result: RunResult): StationStateBarsStation[] {
  return result.stations.map((s) => ({
    id: s.id,
    name: s.name,
    shares: { processing: s.processing, starved: s.starved, blocked: s.blocked, down: s.down, onBreak: s.onBreak },
  }));
}

/** The WIP series holds the mean over each time bin; each value is drawn at its bin's middle. */
export function wipSeries(result: RunResult) {
  const { startSeconds, binSeconds, values } = result.wip.series;
  return { timesMinutes: values.map((_, i) => (startSeconds + (i + 0.5) * binSeconds) / 60), values };
}
