// The stored lead-time histogram drawn bin for bin as the engine counted it. The chart library's
// histogram bins raw samples itself; a stored run keeps only fixed-width counts, so re-binning them
// would show bins and a mean the run never produced.
import { max, scaleLinear } from 'd3';
import { AxisBottom, AxisLeft, linearTicks } from '../../../components/charts/Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from '../../../components/charts/ChartFrame';
import { formatNumber } from '../../../components/charts/format';
import { useChartShell } from '../../../components/charts/useChartShell';
import type { RunResult } from '../../../../shared/results/run-result';
import { formatSeconds } from '../../../lib/format-run';
import { CLIP_QUANTILE, clipHistogram } from '../utils/clip-histogram';

const MARGIN: Margin = { top: 10, right: 20, bottom: 56, left: 64 };
const PLOT_HEIGHT = 240;
const BAR_FILL = '#9ecae1';
const BAR_STROKE = '#4a7fa8';
const OVERFLOW_FILL = '#c6dbef';
const TITLE = 'Lead time distribution';

interface Bar {
  from: number;
  to: number;
  count: number;
  label: string;
  overflow?: boolean;
}

export function LeadTimeHistogram({
  leadTime,
  exportName,
}: {
  leadTime: RunResult['leadTimeSeconds'];
  exportName: string;
}) {
  const shell = useChartShell();
  const { binWidthSeconds: width, counts } = leadTime.histogram;
  const clipped = clipHistogram(counts, width);
  if (clipped.total === 0 || !(width > 0))
    return (
      <ChartMessage
        title={TITLE}
        tone="empty"
        message="No part finished after warm-up, so there is no lead time to show."
      />
    );

  const { overflow, total } = clipped;
  const rows: Bar[] = clipped.counts.map((count, i) => ({
    from: i * width,
    to: (i + 1) * width,
    count,
    label: `${formatNumber(i * width)}–${formatNumber((i + 1) * width)} s`,
  }));
  if (overflow)
    rows.push({
      from: overflow.fromSeconds,
      to: overflow.fromSeconds + width,
      count: overflow.count,
      label: `≥ ${formatNumber(overflow.fromSeconds)} s`,
      overflow: true,
    });
  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const x = scaleLinear()
    .domain([0, rows[rows.length - 1].to])
    .range([0, plotWidth]);
  const y = scaleLinear()
    .domain([0, (max(rows, (r) => r.count) ?? 1) * 1.05])
    .nice()
    .range([PLOT_HEIGHT, 0]);
  const clipNote = overflow
    ? `; the axis stops at the ${formatNumber(CLIP_QUANTILE * 100)}th percentile and the last bar gathers the ${formatNumber(overflow.count)} parts at ${formatNumber(overflow.fromSeconds)} s or more`
    : '';

  return (
    <ChartFrame
      shell={shell}
      title={TITLE}
      subtitle={`Mean ${formatSeconds(leadTime.mean)} s, median ${formatSeconds(leadTime.p50)} s, 95th percentile ${formatSeconds(leadTime.p95)} s; bins of ${formatNumber(width)} s${clipNote}`}
      summary={`Lead time of ${formatNumber(total)} parts across all replications, mean ${formatSeconds(leadTime.mean)} s.`}
      legend={{
        kind: 'swatches',
        items: [
          {
            label: 'parts finished in each bin, all replications',
            swatch: { kind: 'box', fill: BAR_FILL, stroke: BAR_STROKE },
          },
        ],
      }}
      margin={MARGIN}
      plotHeight={PLOT_HEIGHT}
      table={{
        caption: 'Parts per lead-time bin',
        columns: ['From (s)', 'To (s)', 'Parts'],
        rows: rows.map((r) => [formatNumber(r.from), r.overflow ? 'and beyond' : formatNumber(r.to), r.count]),
      }}
      csv={() => ({
        caption: 'Lead time',
        columns: ['bin_from_s', 'bin_to_s', 'parts'],
        rows: counts.map((count, i) => [i * width, (i + 1) * width, count]),
      })}
      exportName={exportName}
    >
      <AxisLeft
        ticks={linearTicks(y, PLOT_HEIGHT / 45, (v) => v.toLocaleString('en-GB'))}
        height={PLOT_HEIGHT}
        label="Parts (count)"
        gridWidth={plotWidth}
        labelOffset={48}
      />
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 80)}
        width={plotWidth}
        plotHeight={PLOT_HEIGHT}
        label="Lead time (s)"
      />
      <g data-chart-part="marks">
        {rows.map(({ from, to, count, label, overflow: beyond }) => (
          <rect
            key={from}
            x={x(from)}
            y={y(count)}
            width={Math.max(0, x(to) - x(from))}
            height={PLOT_HEIGHT - y(count)}
            fill={beyond ? OVERFLOW_FILL : BAR_FILL}
            data-overflow={beyond ? 'true' : undefined}
            stroke={BAR_STROKE}
            strokeWidth={0.75}
            data-count={count}
            onMouseMove={(event) => shell.showTooltip(event, { title: label, rows: [['Parts', formatNumber(count)]] })}
            onMouseLeave={shell.hideTooltip}
          />
        ))}
        {overflow && (
          <text
            x={x(overflow.fromSeconds + width / 2)}
            y={y(overflow.count) - 4}
            textAnchor="middle"
            fontSize={11}
            fill="currentColor"
            data-overflow-label
          >
            ≥ {formatNumber(overflow.fromSeconds)} s
          </text>
        )}
      </g>
    </ChartFrame>
  );
}
