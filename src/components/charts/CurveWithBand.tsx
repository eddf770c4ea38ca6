// A sweep result: a measure (throughput) against a setting (carrier count) with its confidence band,
// the recommended setting marked and labelled, and an optional reference level such as the plateau.
import { extent, max, min, scaleLinear } from 'd3';
import { useState, type MouseEvent } from 'react';
import { SweepAxes } from './SweepAxes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { LegendItem } from './Legend';
import { ascendingProblem, LineWithBand, nearestIndex } from './LineWithBand';
import { estimateTextWidth, formatNumber } from './format';
import { ink, seriesStyle } from './palette';
import { localPoint, useChartShell } from './useChartShell';
import { StopMarks, STOP_COLOUR, type StopMark } from './StopMarks';
import { checkNumbers, firstProblem, type Problem } from './validate';

export interface SweepPoint {
  x: number;
  mean: number;
  lower: number;
  upper: number;
}

export interface CurveWithBandProps {
  points: readonly SweepPoint[];
  /** e.g. "Carriers on the track" with unit "count". */
  xQuantity: string;
  xUnit: string;
  yQuantity: string;
  yUnit: string;
  bandLabel?: string;
  recommendedX?: number;
  /** Text beside the recommended point; defaults to "recommended: <x>". */
  recommendedLabel?: string;
  /** A level to read the curve against, e.g. "plateau − 1 % tolerance". */
  reference?: { value: number; label: string };
  /** Settings with no result (gridlock, not valid, not run): crossed on the axis, never drawn as zero. */
  stops?: readonly StopMark[];
  title?: string;
  plotHeight?: number;
  width?: number;
  exportName?: string;
}

const MARGIN: Margin = { top: 26, right: 24, bottom: 56, left: 70 };
const COLOUR = seriesStyle(0).colour;
const MARK = '#d55e00';

function curveProblem(props: CurveWithBandProps): Problem {
  const { points } = props;
  const xs = points.map((p) => p.x);
  return firstProblem(
    ...(['x', 'mean', 'lower', 'upper'] as const).map(
      (key) => () =>
        checkNumbers(
          points.map((p) => p[key]),
          `points[].${key}`,
        ),
    ),
    () => ascendingProblem(xs, 'points[].x'),
    () => {
      const i = points.findIndex((p) => p.lower > p.mean || p.upper < p.mean);
      return i < 0
        ? null
        : `points[${i}] has its mean ${points[i].mean} outside its band ${points[i].lower}–${points[i].upper}`;
    },
    () =>
      props.recommendedX !== undefined && !xs.includes(props.recommendedX)
        ? `recommendedX ${props.recommendedX} is not one of the swept points`
        : null,
  );
}

export function CurveWithBand(props: CurveWithBandProps) {
  const {
    points,
    xQuantity,
    xUnit,
    yQuantity,
    yUnit,
    recommendedX,
    reference,
    title = `${yQuantity} against ${xQuantity.toLowerCase()}`,
    plotHeight = 260,
  } = props;
  const shell = useChartShell(props.width);
  const [hover, setHover] = useState<number | null>(null);
  const problem = curveProblem(props);
  if (problem) return <ChartMessage title={title} tone="problem" message={`This chart cannot be drawn: ${problem}.`} />;
  if (points.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="The sweep has no finished points yet; they appear here as each setting's replications complete."
      />
    );

  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const xs = points.map((p) => p.x);
  const stops = props.stops ?? [];
  const [x0, x1] = extent([...xs, ...stops.map((m) => m.x)]) as [number, number];
  const x = scaleLinear()
    .domain(x0 === x1 ? [x0 - 1, x1 + 1] : [x0, x1])
    .range([0, plotWidth]);
  const lows = [...points.map((p) => p.lower), ...(reference ? [reference.value] : [])];
  const highs = [...points.map((p) => p.upper), ...(reference ? [reference.value] : [])];
  const y = scaleLinear()
    .domain([Math.min(0, min(lows) ?? 0), (max(highs) ?? 1) * 1.08 || 1])
    .nice()
    .range([plotHeight, 0]);
  const recommended = points.find((p) => p.x === recommendedX);
  const recommendedText = recommended ? (props.recommendedLabel ?? `recommended: ${formatNumber(recommended.x)}`) : '';

  const legendItems: LegendItem[] = [
    { label: `mean ${yQuantity.toLowerCase()}`, swatch: { kind: 'line', colour: COLOUR } },
    { label: props.bandLabel ?? '95 % confidence interval', swatch: { kind: 'box', fill: COLOUR, opacity: 0.18 } },
    ...(recommended ? [{ label: 'recommended setting', swatch: { kind: 'diamond' as const, colour: MARK } }] : []),
    ...(reference
      ? [{ label: reference.label, swatch: { kind: 'line' as const, colour: ink.soft, dash: '4 3', strokeWidth: 1.5 } }]
      : []),
    ...(stops.length > 0
      ? [
          {
            label: `✕ no result: ${[...new Set(stops.map((m) => m.reason))].join(', ')}`,
            swatch: { kind: 'line' as const, colour: STOP_COLOUR },
          },
        ]
      : []),
  ];

  const onMove = (event: MouseEvent<SVGRectElement>) => {
    const index = nearestIndex(xs, x.invert(localPoint(event).x));
    const p = points[index];
    setHover(index);
    shell.showTooltip(event, {
      title: `${xQuantity}: ${formatNumber(p.x)}${xUnit === 'count' ? '' : ` ${xUnit}`}${p.x === recommendedX ? ' (recommended)' : ''}`,
      rows: [
        [`Mean ${yQuantity.toLowerCase()}`, `${formatNumber(p.mean)} ${yUnit}`],
        ['Interval', `${formatNumber(p.lower)}–${formatNumber(p.upper)} ${yUnit}`],
      ],
    });
  };

  const labelWidth = estimateTextWidth(recommendedText, 12);
  const labelX = recommended ? Math.min(plotWidth - labelWidth / 2, Math.max(labelWidth / 2, x(recommended.x))) : 0;

  return (
    <ChartFrame
      shell={shell}
      title={title}
      summary={`${yQuantity} for ${points.length} settings of ${xQuantity.toLowerCase()} from ${formatNumber(x0)} to ${formatNumber(x1)}.${recommended ? ` Recommended: ${formatNumber(recommended.x)}, giving ${formatNumber(recommended.mean)} ${yUnit}.` : ''}`}
      legend={{ kind: 'swatches', items: legendItems }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={{
        caption: `${yQuantity} (${yUnit}) for each setting of ${xQuantity.toLowerCase()}`,
        columns: [
          `${xQuantity}${xUnit === 'count' ? '' : ` (${xUnit})`}`,
          `Mean (${yUnit})`,
          `Lower (${yUnit})`,
          `Upper (${yUnit})`,
          'Recommended',
        ],
        rows: points.map((p) => [
          formatNumber(p.x),
          formatNumber(p.mean),
          formatNumber(p.lower),
          formatNumber(p.upper),
          p.x === recommendedX ? 'yes' : '',
        ]),
      }}
      csv={() => ({
        caption: yQuantity,
        columns: ['x', 'mean', 'lower', 'upper', 'recommended'],
        rows: points.map((p) => [p.x, p.mean, p.lower, p.upper, p.x === recommendedX ? 'yes' : '']),
      })}
      exportName={props.exportName ?? 'sweep-curve'}
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
      <LineWithBand
        xs={xs}
        values={points.map((p) => p.mean)}
        lower={points.map((p) => p.lower)}
        upper={points.map((p) => p.upper)}
        x={x}
        y={y}
        colour={COLOUR}
        name={yQuantity}
      />
      <g pointerEvents="none">
        {points.map((p, i) => (
          <circle
            key={p.x}
            cx={x(p.x)}
            cy={y(p.mean)}
            r={hover === i && shell.tooltip ? 5 : 3}
            fill={COLOUR}
            data-chart-part="point"
          />
        ))}
      </g>
      <StopMarks marks={stops} x={x} plotHeight={plotHeight} />
      {recommended && (
        <g pointerEvents="none" data-chart-part="recommended">
          <line
            x1={x(recommended.x)}
            x2={x(recommended.x)}
            y1={y(recommended.mean)}
            y2={plotHeight}
            stroke={MARK}
            strokeDasharray="3 3"
          />
          <path
            d={`M${x(recommended.x)},${y(recommended.mean) - 9} l9,9 l-9,9 l-9,-9 Z`}
            fill="white"
            fillOpacity={0.6}
            stroke={MARK}
            strokeWidth={2.5}
          />
          <text
            x={labelX}
            y={y(recommended.upper) - 12}
            textAnchor="middle"
            fontSize={12}
            fontWeight={600}
            fill={ink.DEFAULT}
            paintOrder="stroke"
            stroke="white"
            strokeWidth={3}
          >
            {recommendedText}
          </text>
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
