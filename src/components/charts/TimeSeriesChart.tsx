// A quantity over simulated time (WIP, queue length), with an optional confidence band per series.
import { max, min, scaleLinear } from 'd3';
import { useState, type MouseEvent } from 'react';
import { AxisBottom, AxisLeft, linearTicks } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { LegendItem } from './Legend';
import { ascendingProblem, LineWithBand, nearestIndex } from './LineWithBand';
import { formatNumber, formatOne } from './format';
import { ink, seriesStyle } from './palette';
import { localPoint, useChartShell } from './useChartShell';
import { checkNumbers, firstProblem, type Problem } from './validate';

export interface TimeSeries {
  name: string;
  values: readonly number[];
  lower?: readonly number[];
  upper?: readonly number[];
}

export interface TimeSeriesChartProps {
  /** Simulated time of each point, in minutes, rising. */
  timesMinutes: readonly number[];
  series: readonly TimeSeries[];
  /** What is plotted, e.g. "Work in progress". */
  quantity: string;
  /** Unit of the values, e.g. "parts". */
  unit: string;
  /** Meaning of the band, e.g. "95 % confidence interval over 10 replications". */
  bandLabel?: string;
  warmupMinutes?: number;
  title?: string;
  plotHeight?: number;
  width?: number;
  exportName?: string;
}

const MARGIN: Margin = { top: 10, right: 20, bottom: 56, left: 64 };
const SPOKEN_ROWS = 100;

function seriesProblem(times: readonly number[], series: readonly TimeSeries[]): Problem {
  return firstProblem(
    () => checkNumbers(times, 'timesMinutes'),
    () => ascendingProblem(times, 'timesMinutes'),
    ...series.flatMap((s, i) =>
      (['values', 'lower', 'upper'] as const).map((key) => () => {
        const list = s[key];
        if (!list) return null;
        if (list.length !== times.length)
          return `series[${i}].${key} has ${list.length} points but timesMinutes has ${times.length}`;
        return checkNumbers(list, `series[${i}].${key}`);
      }),
    ),
    ...series.map(
      (s, i) => () =>
        Boolean(s.lower) !== Boolean(s.upper) ? `series[${i}] needs both lower and upper for a band, or neither` : null,
    ),
  );
}

export function TimeSeriesChart(props: TimeSeriesChartProps) {
  const {
    timesMinutes: times,
    series,
    quantity,
    unit,
    warmupMinutes,
    title = `${quantity} over time`,
    plotHeight = 240,
  } = props;
  const shell = useChartShell(props.width);
  const [hover, setHover] = useState<number | null>(null);
  const problem = seriesProblem(times, series);
  if (problem) return <ChartMessage title={title} tone="problem" message={`This chart cannot be drawn: ${problem}.`} />;
  if (times.length === 0 || series.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message={`No ${quantity.toLowerCase()} was recorded: the run has not produced any time points yet.`}
      />
    );

  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const all = series.flatMap((s) => [...s.values, ...(s.lower ?? []), ...(s.upper ?? [])]);
  const x = scaleLinear()
    .domain([times[0], times[times.length - 1] === times[0] ? times[0] + 1 : times[times.length - 1]])
    .range([0, plotWidth]);
  const y = scaleLinear()
    .domain([Math.min(0, min(all) ?? 0), (max(all) ?? 1) * 1.05 || 1])
    .nice()
    .range([plotHeight, 0]);
  const hasBand = series.some((s) => s.lower);
  // A table read aloud stays useful up to about a hundred rows.
  const every = Math.ceil(times.length / SPOKEN_ROWS);

  const legendItems: LegendItem[] = series.map((s, i) => ({
    label: s.name,
    swatch: { kind: 'line', colour: seriesStyle(i).colour, dash: seriesStyle(i).dash },
  }));
  if (hasBand)
    legendItems.push({
      label: props.bandLabel ?? 'confidence interval',
      swatch: { kind: 'box', fill: seriesStyle(0).colour, opacity: 0.18 },
    });

  const onMove = (event: MouseEvent<SVGRectElement>) => {
    const index = nearestIndex(times, x.invert(localPoint(event).x));
    setHover(index);
    shell.showTooltip(event, {
      title: `${formatOne(times[index])} min`,
      rows: series.map(
        (s) =>
          [
            s.name,
            `${formatNumber(s.values[index])} ${unit}${s.lower && s.upper ? ` (${formatNumber(s.lower[index])}–${formatNumber(s.upper[index])})` : ''}`,
          ] as const,
      ),
    });
  };

  return (
    <ChartFrame
      shell={shell}
      title={title}
      summary={`${quantity} from ${formatOne(times[0])} to ${formatOne(times[times.length - 1])} min. ${series.map((s) => `${s.name}: mean ${formatNumber(s.values.reduce((a, b) => a + b, 0) / s.values.length)} ${unit}, highest ${formatNumber(max(s.values) ?? 0)} ${unit}`).join('; ')}.`}
      legend={{ kind: 'swatches', items: legendItems }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={{
        caption: `${quantity} (${unit}) over simulated time${every > 1 ? `, every ${every}th point (the CSV export has all)` : ''}`,
        columns: ['Time (min)', ...series.map((s) => `${s.name} (${unit})`)],
        rows: times.flatMap((t, i) =>
          i % every === 0 ? [[formatOne(t), ...series.map((s) => formatNumber(s.values[i]))]] : [],
        ),
      }}
      csv={() => ({
        caption: quantity,
        columns: [
          'time_min',
          ...series.flatMap((s) => [s.name, ...(s.lower ? [`${s.name}_lower`, `${s.name}_upper`] : [])]),
        ],
        rows: times.map((t, i) => [
          t,
          ...series.flatMap((s) => [s.values[i], ...(s.lower && s.upper ? [s.lower[i], s.upper[i]] : [])]),
        ]),
      })}
      exportName={props.exportName ?? `${quantity.toLowerCase().replace(/\s+/g, '-')}-over-time`}
    >
      <AxisLeft
        ticks={linearTicks(y, plotHeight / 45)}
        height={plotHeight}
        label={`${quantity} (${unit})`}
        gridWidth={plotWidth}
        labelOffset={48}
      />
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 80)}
        width={plotWidth}
        plotHeight={plotHeight}
        label="Simulated time (min)"
      />
      {warmupMinutes !== undefined && warmupMinutes > times[0] && (
        <g pointerEvents="none" data-chart-part="warmup">
          <rect
            width={x(Math.min(warmupMinutes, x.domain()[1]))}
            height={plotHeight}
            fill={ink.faint}
            fillOpacity={0.15}
          />
          <text x={4} y={12} fontSize={11} fill={ink.soft}>
            warm-up
          </text>
        </g>
      )}
      {series.map((s, i) => (
        <LineWithBand
          key={s.name}
          xs={times}
          values={s.values}
          lower={s.lower}
          upper={s.upper}
          x={x}
          y={y}
          colour={seriesStyle(i).colour}
          dash={seriesStyle(i).dash}
          name={s.name}
        />
      ))}
      {hover !== null && shell.tooltip && (
        <g pointerEvents="none">
          <line x1={x(times[hover])} x2={x(times[hover])} y2={plotHeight} stroke={ink.soft} strokeDasharray="3 3" />
          {series.map((s, i) => (
            <circle
              key={s.name}
              cx={x(times[hover])}
              cy={y(s.values[hover])}
              r={4}
              fill="white"
              stroke={seriesStyle(i).colour}
              strokeWidth={2}
            />
          ))}
        </g>
      )}
      <rect
        width={plotWidth}
        height={plotHeight}
        fill="transparent"
        data-chart-part="hit-area"
        onMouseMove={onMove}
        onMouseLeave={shell.hideTooltip}
      />
    </ChartFrame>
  );
}
