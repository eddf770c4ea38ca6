// The axes of a sweep chart (a setting across, a measure up, whole-number ticks for counts) and an
// optional reference level such as the target rate, shared by the one-curve and the several-curve charts.
import type { ScaleLinear } from 'd3';
import { AxisBottom, AxisLeft, linearTicks } from './Axes';
import { formatNumber } from './format';
import { ink } from './palette';

export interface SweepAxesProps {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  plotWidth: number;
  plotHeight: number;
  xQuantity: string;
  xUnit: string;
  yQuantity: string;
  yUnit: string;
  reference?: { value: number; label: string };
}

export function SweepAxes({
  x,
  y,
  plotWidth,
  plotHeight,
  xQuantity,
  xUnit,
  yQuantity,
  yUnit,
  reference,
}: SweepAxesProps) {
  const [x0, x1] = x.domain();
  return (
    <>
      <AxisLeft
        ticks={linearTicks(y, plotHeight / 45)}
        height={plotHeight}
        label={`${yQuantity} (${yUnit})`}
        gridWidth={plotWidth}
        labelOffset={54}
      />
      <AxisBottom
        ticks={linearTicks(
          x,
          Math.min(plotWidth / 70, xUnit === 'count' ? x1 - x0 : Infinity),
          xUnit === 'count' ? (v) => (Number.isInteger(v) ? formatNumber(v) : '') : formatNumber,
        )}
        width={plotWidth}
        plotHeight={plotHeight}
        label={`${xQuantity} (${xUnit})`}
      />
      {reference && (
        <g transform={`translate(0,${y(reference.value)})`} pointerEvents="none" data-chart-part="reference">
          <line x2={plotWidth} stroke={ink.soft} strokeWidth={1.5} strokeDasharray="4 3" />
          <text x={4} y={-5} fontSize={11} fill={ink.soft}>
            {reference.label}
          </text>
        </g>
      )}
    </>
  );
}
