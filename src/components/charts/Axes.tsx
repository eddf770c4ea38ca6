// Axes drawn by React from tick lists, so continuous and categorical axes share one look.
import type { ScaleBand, ScaleLinear } from 'd3';
import { formatNumber } from './format';
import { ink } from './palette';

export interface Tick {
  position: number;
  label: string;
}

export const TICK_FONT = 12;
export const AXIS_LABEL_FONT = 13;

export function linearTicks(
  scale: ScaleLinear<number, number>,
  count: number,
  format: (value: number) => string = formatNumber,
): Tick[] {
  return scale.ticks(Math.max(2, Math.round(count))).map((value) => ({ position: scale(value), label: format(value) }));
}

export function bandTicks(scale: ScaleBand<string>, labelFor: (key: string) => string): Tick[] {
  return scale.domain().map((key) => ({ position: (scale(key) ?? 0) + scale.bandwidth() / 2, label: labelFor(key) }));
}

interface AxisBottomProps {
  ticks: readonly Tick[];
  width: number;
  /** Plot height: the axis sits at its foot; gridlines, when asked for, run up from it. */
  plotHeight: number;
  label: string;
  grid?: boolean;
  /** Tilt tick labels when categories are too many for their names to sit side by side. */
  tilt?: boolean;
  labelOffset?: number;
}

export function AxisBottom({ ticks, width, plotHeight, label, grid, tilt, labelOffset = 38 }: AxisBottomProps) {
  return (
    <g transform={`translate(0,${plotHeight})`} data-chart-part="x-axis">
      <line x2={width} stroke={ink.soft} />
      {ticks.map((tick) => (
        <g key={`${tick.position}-${tick.label}`} transform={`translate(${tick.position},0)`}>
          {grid && <line y2={-plotHeight} stroke={ink.faint} strokeOpacity={0.35} />}
          <line y2={5} stroke={ink.soft} />
          {tilt ? (
            <text
              transform="translate(0,9) rotate(-35)"
              textAnchor="end"
              dy="0.35em"
              fontSize={TICK_FONT}
              fill={ink.soft}
            >
              {tick.label}
            </text>
          ) : (
            <text y={9} dy="0.71em" textAnchor="middle" fontSize={TICK_FONT} fill={ink.soft}>
              {tick.label}
            </text>
          )}
        </g>
      ))}
      <text
        x={width / 2}
        y={labelOffset}
        dy="0.71em"
        textAnchor="middle"
        fontSize={AXIS_LABEL_FONT}
        fill={ink.DEFAULT}
        data-axis-label="x"
      >
        {label}
      </text>
    </g>
  );
}

interface AxisLeftProps {
  ticks: readonly Tick[];
  height: number;
  label: string;
  /** Plot width, for gridlines across the plot. */
  gridWidth?: number;
  labelOffset: number;
}

export function AxisLeft({ ticks, height, label, gridWidth, labelOffset }: AxisLeftProps) {
  return (
    <g data-chart-part="y-axis">
      <line y2={height} stroke={ink.soft} />
      {ticks.map((tick) => (
        <g key={`${tick.position}-${tick.label}`} transform={`translate(0,${tick.position})`}>
          {gridWidth !== undefined && <line x2={gridWidth} stroke={ink.faint} strokeOpacity={0.35} />}
          <line x2={-5} stroke={ink.soft} />
          <text x={-8} dy="0.35em" textAnchor="end" fontSize={TICK_FONT} fill={ink.soft}>
            {tick.label}
          </text>
        </g>
      ))}
      <text
        transform={`translate(${-labelOffset},${height / 2}) rotate(-90)`}
        textAnchor="middle"
        fontSize={AXIS_LABEL_FONT}
        fill={ink.DEFAULT}
        data-axis-label="y"
      >
        {label}
      </text>
    </g>
  );
}
