// Several sweeps on one pair of axes, each with its 95 % band: the same question asked of two to four
// layouts (throughput against carriers for a stacked and a side-by-side loop). Series differ by colour
// and dash; settings a series could not run are crossed on the axis in its colour.
import { extent, max, min, scaleLinear } from 'd3';
import { useState, type MouseEvent } from 'react';
import { SweepAxes } from './SweepAxes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { SweepPoint } from './CurveWithBand';
import type { LegendItem } from './Legend';
import { ascendingProblem, LineWithBand, nearestIndex } from './LineWithBand';
import { formatNumber } from './format';
import { ink, seriesStyle } from './palette';
import { StopMarks, type StopMark } from './StopMarks';
import { localPoint, useChartShell } from './useChartShell';
import { checkNumbers, firstProblem, type Problem } from './validate';

export interface CurveSeries {
  label: string;
  points: readonly SweepPoint[];
  stops?: readonly StopMark[];
}

export interface CurvesWithBandsProps {
  series: readonly CurveSeries[];
  xQuantity: string;
  xUnit: string;
  yQuantity: string;
  yUnit: string;
  reference?: { value: number; label: string };
  title?: string;
  plotHeight?: number;
  width?: number;
  exportName?: string;
}

const MARGIN: Margin = { top: 26, right: 24, bottom: 56, left: 70 };

function seriesProblem(series: readonly CurveSeries[]): Problem {
  return firstProblem(
    ...series.flatMap((s, i) => [
      ...(['x', 'mean', 'lower', 'upper'] as const).map(
        (key) => () =>
          checkNumbers(
            s.points.map((p) => p[key]),
            `series[${i}].points[].${key}`,
          ),
      ),
      () =>
        ascendingProblem(
          s.points.map((p) => p.x),
          `series[${i}].points[].x`,
        ),
    ]),
  );
}

export function CurvesWithBands(props: CurvesWithBandsProps) {
  const { series, xQuantity, xUnit, yQuantity, yUnit, reference, plotHeight = 280 } = props;
  const title = props.title ?? `${yQuantity} against ${xQuantity.toLowerCase()}`;
  const shell = useChartShell(props.width);
  const [hover, setHover] = useState<number | null>(null);
  const problem = seriesProblem(series);
  if (problem) return <ChartMessage title={title} tone="problem" message={`This chart cannot be drawn: ${problem}.`} />;
  const all = series.flatMap((s) => s.points);
  if (all.length === 0)
    return (
      <ChartMessage title={title} tone="empty" message="None of the studies has a finished point on this axis yet." />
    );

  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const xs = [...new Set([...all.map((p) => p.x), ...series.flatMap((s) => s.stops?.map((m) => m.x) ?? [])])].sort(
    (a, b) => a - b,
  );
  const [x0, x1] = extent(xs) as [number, number];
  const x = scaleLinear()
    .domain(x0 === x1 ? [x0 - 1, x1 + 1] : [x0, x1])
    .range([0, plotWidth]);
  const lows = [...all.map((p) => p.lower), ...(reference ? [reference.value] : [])];
  const highs = [...all.map((p) => p.upper), ...(reference ? [reference.value] : [])];
  const y = scaleLinear()
    .domain([Math.min(0, min(lows) ?? 0), (max(highs) ?? 1) * 1.08 || 1])
    .nice()
    .range([plotHeight, 0]);
  const unitText = xUnit === 'count' ? '' : ` ${xUnit}`;

  const legendItems: LegendItem[] = [
    ...series.map((s, i) => ({
      label: s.label,
      swatch: { kind: 'line' as const, colour: seriesStyle(i).colour, dash: seriesStyle(i).dash },
    })),
    { label: 'shaded: 95 % confidence interval', swatch: { kind: 'box', fill: ink.soft, opacity: 0.18 } },
    ...(reference
      ? [{ label: reference.label, swatch: { kind: 'line' as const, colour: ink.soft, dash: '4 3', strokeWidth: 1.5 } }]
      : []),
  ];

  const onMove = (event: MouseEvent<SVGRectElement>) => {
    const index = nearestIndex(xs, x.invert(localPoint(event).x));
    setHover(index);
    shell.showTooltip(event, {
      title: `${xQuantity}: ${formatNumber(xs[index])}${unitText}`,
      rows: series.map((s) => {
        const p = s.points.find((q) => q.x === xs[index]);
        const stop = s.stops?.find((m) => m.x === xs[index]);
        return [
          s.label,
          p
            ? `${formatNumber(p.mean)} ${yUnit} (${formatNumber(p.lower)}–${formatNumber(p.upper)})`
            : (stop?.reason ?? 'not run'),
        ];
      }),
    });
  };

  const rows = xs.flatMap((value) =>
    series.map((s) => {
      const p = s.points.find((q) => q.x === value);
      const stop = s.stops?.find((m) => m.x === value);
      return { x: value, series: s.label, p, note: p ? '' : (stop?.reason ?? 'not run') };
    }),
  );

  return (
    <ChartFrame
      shell={shell}
      title={title}
      summary={`${yQuantity} of ${series.map((s) => s.label).join(', ')} for ${xQuantity.toLowerCase()} from ${formatNumber(x0)} to ${formatNumber(x1)}.`}
      legend={{ kind: 'swatches', items: legendItems }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={{
        caption: `${yQuantity} (${yUnit}) of each series for each setting of ${xQuantity.toLowerCase()}`,
        columns: [
          `${xQuantity}${xUnit === 'count' ? '' : ` (${xUnit})`}`,
          'Series',
          `Mean (${yUnit})`,
          `Lower (${yUnit})`,
          `Upper (${yUnit})`,
          'Note',
        ],
        rows: rows.map((r) => [
          formatNumber(r.x),
          r.series,
          r.p ? formatNumber(r.p.mean) : '',
          r.p ? formatNumber(r.p.lower) : '',
          r.p ? formatNumber(r.p.upper) : '',
          r.note,
        ]),
      }}
      csv={() => ({
        caption: yQuantity,
        columns: ['x', 'series', 'mean', 'lower', 'upper', 'note'],
        rows: rows.map((r) => [r.x, r.series, r.p?.mean ?? '', r.p?.lower ?? '', r.p?.upper ?? '', r.note]),
      })}
      exportName={props.exportName ?? 'sweep-curves'}
    >
      <SweepAxes
        x={x}
        y={y}
        plotWidth={plotWidth}
        plotHeight={plotHeight}
        xQuantity={xQuantity}
        xUnit={xUnit}
        yQuantity={yQuantity}
        yUnit={yUnit}
        reference={reference}
      />
      {series.map((s, i) => {
        const { colour, dash } = seriesStyle(i);
        return (
          <g key={s.label} data-series-index={i}>
            <LineWithBand
              xs={s.points.map((p) => p.x)}
              values={s.points.map((p) => p.mean)}
              lower={s.points.map((p) => p.lower)}
              upper={s.points.map((p) => p.upper)}
              x={x}
              y={y}
              colour={colour}
              dash={dash}
              name={s.label}
            />
            <g pointerEvents="none">
              {s.points.map((p) => (
                <circle
                  key={p.x}
                  cx={x(p.x)}
                  cy={y(p.mean)}
                  r={hover !== null && xs[hover] === p.x && shell.tooltip ? 5 : 3}
                  fill={colour}
                  data-chart-part="point"
                />
              ))}
            </g>
            {s.stops && <StopMarks marks={s.stops} x={x} plotHeight={plotHeight} colour={colour} />}
          </g>
        );
      })}
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
