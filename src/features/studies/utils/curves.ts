// Points of a study as chart input: finished points in ascending x, and the settings that have no
// result (gridlock, not valid, not run) as crosses on the axis.
import type { ConfidenceInterval } from '../../../../workers/engine/stats';
import { hasFailed, POINT_STATE_WORDS, type PointStatistics } from '../../../../workers/studies/point-statistics';
import type { StopMark, SweepPoint } from '../../../components/charts';

export function curveOf(
  stats: PointStatistics[],
  xOf: (s: PointStatistics) => number,
  pick: (s: PointStatistics) => ConfidenceInterval | null,
): SweepPoint[] {
  return stats
    .filter((s) => (s.state === 'done' || s.state === 'partial') && pick(s) && Number.isFinite(xOf(s)))
    .map((s) => ({ x: xOf(s), mean: pick(s)!.mean, lower: pick(s)!.ciLow, upper: pick(s)!.ciHigh }))
    .sort((a, b) => a.x - b.x);
}

export function stopsOf(stats: PointStatistics[], xOf: (s: PointStatistics) => number): StopMark[] {
  return stats
    .filter((s) => hasFailed(s.state) && Number.isFinite(xOf(s)))
    .map((s) => ({ x: xOf(s), reason: POINT_STATE_WORDS[s.state] }));
}
