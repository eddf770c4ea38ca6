// A sweep: throughput against one swept field with its band, or a heatmap over two with the target
// contour.
import type { StudyDetail } from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { sweepableFields } from '../../../../shared/studies/sweepable-fields';
import type { PointStatistics } from '../../../../workers/studies/point-statistics';
import { CurveWithBand } from '../../../components/charts';
import { ParameterHeatmap } from '../../../components/charts/ParameterHeatmap';
import { curveOf, stopsOf } from '../utils/curves';

export function SweepResults({
  study,
  stats,
  scenario,
}: {
  study: StudyDetail;
  stats: PointStatistics[];
  scenario: Scenario;
}) {
  const target = scenario.targetTaktSeconds ? 3600 / scenario.targetTaktSeconds : undefined;
  const [xAxis, yAxis] = study.axes;
  if (!xAxis) return null;
  const valueOf = (s: PointStatistics, path: string) =>
    study.points[s.index].changes.find((c) => c.path === path)?.value ?? Number.NaN;
  if (!yAxis) {
    return (
      <CurveWithBand
        points={curveOf(
          stats,
          (s) => valueOf(s, xAxis.path),
          (s) => s.throughput,
        )}
        xQuantity={xAxis.label}
        xUnit={sweepableFields(scenario).find((f) => f.path === xAxis.path)?.unit || 'value'}
        yQuantity="Throughput"
        yUnit="parts/h"
        reference={target ? { value: target, label: `target ${target.toFixed(1)} parts/h` } : undefined}
        stops={stopsOf(stats, (s) => valueOf(s, xAxis.path))}
        title={`Throughput against ${xAxis.label}`}
        exportName="sweep-throughput"
      />
    );
  }
  const xs = [...new Set(stats.map((s) => valueOf(s, xAxis.path)))].sort((a, b) => a - b);
  const ys = [...new Set(stats.map((s) => valueOf(s, yAxis.path)))].sort((a, b) => a - b);
  const values = xs.map((vx) =>
    ys.map(
      (vy) =>
        stats.find((s) => valueOf(s, xAxis.path) === vx && valueOf(s, yAxis.path) === vy)?.throughput?.mean ?? null,
    ),
  );
  return (
    <ParameterHeatmap
      xs={xs}
      ys={ys}
      values={values}
      xLabel={xAxis.label}
      yLabel={yAxis.label}
      quantity="Throughput"
      unit="parts/h"
      target={target}
      title="Throughput over both swept fields"
    />
  );
}
