// Carrier sizing: the recommendation in words, throughput against carriers with its band and the
// target, and WIP and lead time below on the same carrier axis.
import type { StudyDetail } from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import {
  recommendCarriers,
  sizingPointsOf,
  stationNamesOf,
  targetPerHourOf,
} from '../../../../workers/studies/carrier-sizing';
import type { PointStatistics } from '../../../../workers/studies/point-statistics';
import { CurveWithBand, type SweepPoint } from '../../../components/charts';
import { Recommendation } from './recommendation';
import { curveOf, stopsOf } from '../utils/curves';

export function CarrierSizingResults({
  study,
  stats,
  scenario,
}: {
  study: StudyDetail;
  stats: PointStatistics[];
  scenario: Scenario;
}) {
  const sized = sizingPointsOf(study, stats);
  const target = targetPerHourOf(scenario);
  const advice = recommendCarriers(sized, target, stationNamesOf(scenario));
  const xOf = (s: PointStatistics) => sized[s.index].carriers;
  const throughput: SweepPoint[] = curveOf(stats, xOf, (s) => s.throughput);
  const stops = stopsOf(stats, xOf);
  const recommended =
    advice.kind === 'recommend' && throughput.some((p) => p.x === advice.carriers) ? advice.carriers : undefined;
  return (
    <div className="flex flex-col gap-4">
      <Recommendation
        tone={advice.kind === 'unreachable' ? 'caution' : 'accent'}
        title={
          advice.kind === 'recommend'
            ? `Recommended: ${advice.carriers} carriers`
            : advice.kind === 'unreachable'
              ? 'No carrier count reaches the target'
              : 'No recommendation yet'
        }
      >
        {advice.text}
      </Recommendation>
      <CurveWithBand
        points={throughput}
        xQuantity="Carriers"
        xUnit="count"
        yQuantity="Throughput"
        yUnit="parts/h"
        recommendedX={recommended}
        recommendedLabel={recommended !== undefined ? `${recommended} carriers` : undefined}
        reference={
          target
            ? { value: target, label: `target ${target.toFixed(1)} parts/h (takt ${scenario.targetTaktSeconds} s)` }
            : undefined
        }
        stops={stops}
        title="Throughput against carriers"
        exportName="carrier-sizing-throughput"
      />
      <div className="grid gap-4 lg:grid-cols-2">
        <CurveWithBand
          points={curveOf(stats, xOf, (s) => s.wip)}
          xQuantity="Carriers"
          xUnit="count"
          yQuantity="WIP"
          yUnit="parts"
          plotHeight={180}
          title="Work in process against carriers"
          exportName="carrier-sizing-wip"
        />
        <CurveWithBand
          points={curveOf(stats, xOf, (s) => s.leadSeconds)}
          xQuantity="Carriers"
          xUnit="count"
          yQuantity="Lead time"
          yUnit="s"
          plotHeight={180}
          title="Lead time against carriers"
          exportName="carrier-sizing-lead-time"
        />
      </div>
    </div>
  );
}
