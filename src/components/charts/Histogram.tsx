// Distribution of measured or simulated times (lead time, time-study samples) as a histogram of
// counts, optionally with fitted densities drawn over it at the same scale.
import { line, max, min, scaleLinear } from 'd3';
import { useMemo, type MouseEvent } from 'react';
import { AxisBottom, AxisLeft, linearTicks } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import type { LegendItem } from './Legend';
import { histogramBins, sampleCurve, type Bin } from './density';
import { formatNumber, formatShare } from './format';
import { seriesStyle } from './palette';
import { useChartShell } from './useChartShell';
import { checkNumbers, firstProblem } from './validate';

export interface FittedDensity {
  /** e.g. "lognormal fit (μ 2.1, σ 0.3)". */
  label: string;
  /** Probability density in 1/unit, the same unit as the samples. */
  pdf: (x: number) => number;
}

export interface HistogramProps {
  values: readonly number[];
  /** What was measured, e.g. "Lead time". */
  quantity: string;
  /** Unit of the values, e.g. "min" or "s". */
  unit: string;
  fits?: readonly FittedDensity[];
  binCount?: number;
  /** Bins already counted elsewhere (e.g. by the server); drawn as given, so a caption quoting them agrees. */
  bins?: readonly Bin[];
  title?: string;
  plotHeight?: number;
  width?: number;
  exportName?: string;
}

const MARGIN: Margin = { top: 10, right: 20, bottom: 56, left: 64 };
const BAR_FILL = '#9ecae1';
const BAR_STROKE = '#4a7fa8';

export function Histogram(props: HistogramProps) {
  const { values, quantity, unit, fits = [], title = `${quantity} distribution`, plotHeight = 240 } = props;
  const shell = useChartShell(props.width);
  const problem = firstProblem(
    () => checkNumbers(values, 'values'),
    () =>
      props.binCount !== undefined && !(Number.isInteger(props.binCount) && props.binCount >= 1)
        ? `binCount must be a whole number of at least 1, got ${props.binCount}`
        : null,
  );
  const given = props.bins;
  const bins = useMemo(
    () => (problem ? [] : given && given.length > 0 ? given : histogramBins(values, props.binCount)),
    [values, props.binCount, given, problem],
  );
  if (problem)
    return <ChartMessage title={title} tone="problem" message={`This histogram cannot be drawn: ${problem}.`} />;
  if (values.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message={`No ${quantity.toLowerCase()} samples to show yet: nothing was measured or no part finished after warm-up.`}
      />
    );

  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const lo = bins[0].x0;
  const hi = bins[bins.length - 1].x1;
  const binWidth = bins[0].x1 - bins[0].x0;
  const n = values.length;
  const curves = fits.map((fit) => sampleCurve((x) => fit.pdf(x) * n * binWidth, lo, hi));
  const yMax = max([...bins.map((b) => b.count), ...curves.flatMap((curve) => curve.map(([, c]) => c))]) ?? 1;
  const x = scaleLinear().domain([lo, hi]).range([0, plotWidth]);
  const y = scaleLinear()
    .domain([0, yMax * 1.05])
    .nice()
    .range([plotHeight, 0]);
  const path = line<[number, number]>()
    .x(([v]) => x(v))
    .y(([, c]) => y(c));
  const mean = values.reduce((a, b) => a + b, 0) / n;

  const legendItems: LegendItem[] = [
    { label: `samples (n = ${formatNumber(n)})`, swatch: { kind: 'box', fill: BAR_FILL, stroke: BAR_STROKE } },
    ...fits.map((fit, i) => ({
      label: fit.label,
      swatch: { kind: 'line' as const, colour: seriesStyle(i + 1).colour, dash: seriesStyle(i + 1).dash },
    })),
  ];

  const show = (event: MouseEvent<SVGRectElement>, b: (typeof bins)[number]) =>
    shell.showTooltip(event, {
      title: `${formatNumber(b.x0)}–${formatNumber(b.x1)} ${unit}`,
      rows: [
        ['Samples', formatNumber(b.count)],
        ['Share of samples', formatShare(b.count / n)],
        ...fits.map(
          (fit) => [`${fit.label} expects`, formatNumber(fit.pdf((b.x0 + b.x1) / 2) * n * binWidth)] as const,
        ),
      ],
    });

  return (
    <ChartFrame
      shell={shell}
      title={title}
      subtitle={`${formatNumber(n)} samples, mean ${formatNumber(mean)} ${unit}, bins of ${formatNumber(binWidth)} ${unit}`}
      summary={`Histogram of ${n} ${quantity.toLowerCase()} samples from ${formatNumber(min(values) ?? 0)} to ${formatNumber(max(values) ?? 0)} ${unit}, mean ${formatNumber(mean)} ${unit}.`}
      legend={{ kind: 'swatches', items: legendItems }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={{
        caption: `${quantity} samples per bin`,
        columns: [`From (${unit})`, `To (${unit})`, 'Samples'],
        rows: bins.map((b) => [formatNumber(b.x0), formatNumber(b.x1), b.count]),
      }}
      csv={() => ({
        caption: quantity,
        columns: [`bin_from_${unit}`, `bin_to_${unit}`, 'samples'],
        rows: bins.map((b) => [b.x0, b.x1, b.count]),
      })}
      exportName={props.exportName ?? `${quantity.toLowerCase().replace(/\s+/g, '-')}-histogram`}
    >
      <AxisLeft
        ticks={linearTicks(y, plotHeight / 45)}
        height={plotHeight}
        label="Samples (count)"
        gridWidth={plotWidth}
        labelOffset={48}
      />
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 80)}
        width={plotWidth}
        plotHeight={plotHeight}
        label={`${quantity} (${unit})`}
      />
      <g data-chart-part="marks">
        {bins.map((b) => (
          <rect
            key={b.x0}
            x={x(b.x0)}
            y={y(b.count)}
            width={Math.max(0, x(b.x1) - x(b.x0))}
            height={plotHeight - y(b.count)}
            fill={BAR_FILL}
            stroke={BAR_STROKE}
            strokeWidth={0.75}
            data-count={b.count}
            onMouseMove={(event) => show(event, b)}
            onMouseLeave={shell.hideTooltip}
          />
        ))}
      </g>
      {curves.map((curve, i) => (
        <path
          key={fits[i].label}
          d={path(curve) ?? ''}
          fill="none"
          stroke={seriesStyle(i + 1).colour}
          strokeWidth={2.5}
          strokeDasharray={seriesStyle(i + 1).dash || undefined}
          pointerEvents="none"
          data-chart-part="fit"
        />
      ))}
    </ChartFrame>
  );
}
