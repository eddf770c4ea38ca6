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

const MARGIN: Margin = { top: 10, right: 20, bottom: 56, left: 64 };
const PLOT_HEIGHT = 240;
const BAR_FILL = '#9ecae1';
const BAR_STROKE = '#4a7fa8';
const TITLE = 'Lead time distribution';

/** Trailing empty bins only stretch the axis. */
function lastFilledBin(counts: readonly number[]): number {
  for (let i = counts.length - 1; i >= 0; i--) if (counts[i] > 0) return i;
  return -1;
}

export function LeadTimeHistogram({ leadTime, exportName }: { leadTime: RunResult['leadTimeSeconds']; exportName: string }) {
  const shell = useChartShell();
  const { binWidthSeconds: width, counts } = leadTime.histogram;
  const last = lastFilledBin(counts);
  if (last < 0 || !(width > 0)) return <ChartMessage title={TITLE} tone="empty" message="No part finished after warm-up, so there is no lead time to show." />;

  const shown = counts.slice(0, last + 1);
  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const x = scaleLinear().domain([0, shown.length * width]).range([0, plotWidth]);
  const y = scaleLinear().domain([0, (max(shown) ?? 1) * 1.05]).nice().range([PLOT_HEIGHT, 0]);
  const rows = shown.map((count, i) => [i * width, (i + 1) * width, count] as const);
  const total = shown.reduce((a, b) => a + b, 0);

  return (
    <ChartFrame
      shell={shell}
      title={TITLE}
      subtitle={`Mean ${formatSeconds(leadTime.mean)} s, median ${formatSeconds(leadTime.p50)} s, 95th percentile ${formatSeconds(leadTime.p95)} s; bins of ${formatNumber(width)} s`}
      summary={`Lead time of ${formatNumber(total)} parts across all replications, mean ${formatSeconds(leadTime.mean)} s.`}
      legend={{ kind: 'swatches', items: [{ label: 'parts finished in each bin, all replications', swatch: { kind: 'box', fill: BAR_FILL, stroke: BAR_STROKE } }] }}
      margin={MARGIN}
      plotHeight={PLOT_HEIGHT}
      table={{ caption: 'Parts per lead-time bin', columns: ['From (s)', 'To (s)', 'Parts'], rows: rows.map(([a, b, c]) => [formatNumber(a), formatNumber(b), c]) }}
      csv={() => ({ caption: 'Lead time', columns: ['bin_from_s', 'bin_to_s', 'parts'], rows: counts.map((count, i) => [i * width, (i + 1) * width, count]) })}
      exportName={exportName}
    >
      <AxisLeft ticks={linearTicks(y, PLOT_HEIGHT / 45, (v) => v.toLocaleString('en-GB'))} height={PLOT_HEIGHT} label="Parts (count)" gridWidth={plotWidth} labelOffset={48} />
      <AxisBottom ticks={linearTicks(x, plotWidth / 80)} width={plotWidth} plotHeight={PLOT_HEIGHT} label="Lead time (s)" />
      <g data-chart-part="marks">
        {rows.map(([from, to, count]) => (
          <rect
            key={from}
            x={x(from)}
            y={y(count)}
            width={Math.max(0, x(to) - x(from))}
            height={PLOT_HEIGHT - y(count)}
            fill={BAR_FILL}
            stroke={BAR_STROKE}
            strokeWidth={0.75}
            data-count={count}
            onMouseMove={(event) => shell.showTooltip(event, { title: `${formatNumber(from)}–${formatNumber(to)} s`, rows: [['Parts', formatNumber(count)]] })}
            onMouseLeave={shell.hideTooltip}
          />
        ))}
      </g>
    </ChartFrame>
  );
}
