// Points of a study as chart input: finished points only, in ascending x.
import type { ConfidenceInterval } from '../../../../workers/engine/stats';
import type { PointStatistics } from '../../../../workers/studies/point-statistics';
import type { SweepPoint } from '../../../components/charts';

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
