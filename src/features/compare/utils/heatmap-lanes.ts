// The lanes of several runs as one set of small multiples, each panel named "run: lane", so every
// panel shares one time axis and one colour scale. Runs whose time bins differ cannot share an axis;
// they are split into groups of equal bin length (each still on the same 0–100 % colour scale).
import type { RunResult } from '../../../../shared/results/run-result';
import type { SpaceTimeLane } from '../../../components/charts';

export interface HeatmapGroup {
  binSeconds: number;
  startSeconds: number;
  timeBins: number;
  lanes: SpaceTimeLane[];
}

export function heatmapGroups(runs: readonly { label: string; result: RunResult }[]): HeatmapGroup[] {
  const groups: HeatmapGroup[] = [];
  for (const { label, result } of runs) {
    const { binSeconds, startSeconds, timeBins } = result.heatmaps;
    let group = groups.find(
      (g) => g.binSeconds === binSeconds && g.startSeconds === startSeconds && g.timeBins === timeBins,
    );
    if (!group) {
      group = { binSeconds, startSeconds, timeBins, lanes: [] };
      groups.push(group);
    }
    for (const heatmap of result.heatmaps.lanes) {
      const lane = result.lanes.find((l) => l.id === heatmap.laneId);
      const lengthMm = lane?.lengthMm ?? heatmap.positionBins;
      group.lanes.push({
        laneName: `${label}: ${lane?.name ?? heatmap.laneId}`,
        lengthMm,
        positionBinMm: lengthMm / heatmap.positionBins,
        values: heatmap.occupancy,
      });
    }
  }
  return groups.filter((g) => g.lanes.length > 0);
}
