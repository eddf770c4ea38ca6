// What-if ranking: for each station, the throughput gained when its cycle time is shorter by a share,
// against the unchanged line. Points are paired replication by replication (common random numbers),
// and a gain counts as significant when its 95 % interval lies above zero.
import type { ConfidenceInterval } from '../engine/stats';
import { pairedDifference, type PointStatistics } from './point-statistics';

export type WhatIfRow = {
  stationIndex: number;
  label: string;
  gain: ConfidenceInterval | null;
  significant: boolean;
  bottleneckShare: number;
  /** Why a station has no gain (its point was invalid or stopped). */
  message: string | null;
};

/** Point 0 is the unchanged line; point k (k >= 1) shortens station k - 1. Sorted by gain, largest first. */
export function rankWhatIf(points: PointStatistics[]): WhatIfRow[] {
  const [base, ...changed] = points;
  if (!base) return [];
  const rows = changed.map((p, s): WhatIfRow => {
    const gain = pairedDifference(base, p, (f) => f.throughputPerHour);
    return {
      stationIndex: s,
      label: p.label,
      gain,
      significant: gain !== null && gain.ciLow > 0,
      bottleneckShare: base.bottleneckShares[s] ?? 0,
      message: p.message,
    };
  });
  return rows.sort((a, b) => (b.gain?.mean ?? -Infinity) - (a.gain?.mean ?? -Infinity));
}
