// Speed-up ranking: throughput gained per station when its cycle time is shorter by the chosen share,
// against the line as it is, paired replication by replication; beside each, its bottleneck share.
import type { StudyDetail } from '../../../../shared/api/studies';
import type { PointStatistics } from '../../../../workers/studies/point-statistics';
import { rankWhatIf } from '../../../../workers/studies/what-if';
import { GainBars } from '../../../components/charts/GainBars';
import { Recommendation } from './recommendation';

export function WhatIfResults({ study, stats }: { study: StudyDetail; stats: PointStatistics[] }) {
  const rows = rankWhatIf(stats);
  const share = Math.round((study.reduction ?? 0) * 100);
  const significant = rows.filter((r) => r.significant);
  const bars = rows
    .filter((r) => r.gain)
    .map((r) => ({
      label: r.label,
      mean: r.gain!.mean,
      lower: r.gain!.ciLow,
      upper: r.gain!.ciHigh,
      significant: r.significant,
      note: `bottleneck ${Math.round(r.bottleneckShare * 100)} %`,
    }));
  const text =
    significant.length === 0
      ? `Shortening no single station by ${share} % gains throughput beyond the noise of ${study.settings.replications} replications.`
      : `Shortening ${significant.map((r) => r.label).join(', ')} by ${share} % gains throughput: ${significant.map((r) => `${r.label} +${r.gain!.mean.toFixed(1)} parts/h (95 % interval ${r.gain!.ciLow.toFixed(1)} to ${r.gain!.ciHigh.toFixed(1)})`).join('; ')}. Other stations' gains cannot be told from zero.`;
  return (
    <div className="flex flex-col gap-4">
      {bars.length > 0 && (
        <Recommendation
          tone="accent"
          title={significant.length > 0 ? `Worth speeding up: ${significant[0].label}` : 'No station stands out'}
        >
          {text}
        </Recommendation>
      )}
      <GainBars
        bars={bars}
        title={`Throughput gained by a ${share} % shorter cycle time`}
        quantity="Throughput gained"
        unit="parts/h"
        exportName="speed-up-ranking"
      />
    </div>
  );
}
