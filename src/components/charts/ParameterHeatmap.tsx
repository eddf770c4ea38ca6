// A two-field sweep: mean throughput on a grid of the two swept values, one cell per point, with the
// target level drawn as a contour (d3-contour's marching squares over the grid) and cells without a
// value (invalid or stopped points, or not yet run) hatched grey.
import { contours, geoPath, interpolateViridis, scaleBand, scaleSequential } from 'd3';
import { AxisBottom, AxisLeft, bandTicks } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import { formatNumber } from './format';
import { ink } from './palette';
import { useChartShell } from './useChartShell';

export interface ParameterHeatmapProps {
  xs: readonly number[];
  ys: readonly number[];
  /** values[i][j] for xs[i], ys[j]; null where the point has no result. */
  values: readonly (readonly (number | null)[])[];
  xLabel: string;
  yLabel: string;
  quantity: string;
  unit: string;
  target?: number;
  title: string;
  width?: number;
}

const MARGIN: Margin = { top: 10, right: 20, bottom: 60, left: 80 };

export function ParameterHeatmap({
  xs,
  ys,
  values,
  xLabel,
  yLabel,
  quantity,
  unit,
  target,
  title,
  ...props
}: ParameterHeatmapProps) {
  const shell = useChartShell(props.width);
  const known = values.flat().filter((v): v is number => v !== null);
  if (known.length === 0)
    return <ChartMessage title={title} tone="empty" message="No point has finished yet; cells fill in as they do." />;
  const plotWidth = plotWidthOf(shell.width, MARGIN);
  const plotHeight = Math.min(360, Math.max(160, ys.length * 36));
  const x = scaleBand<string>().domain(xs.map(String)).range([0, plotWidth]);
  const y = scaleBand<string>().domain(ys.map(String)).range([plotHeight, 0]);
  const lo = Math.min(...known);
  const hi = Math.max(...known);
  const colour = scaleSequential(interpolateViridis).domain([lo, hi === lo ? lo + 1 : hi]);
  // The contour runs through cell centres: grid index (i, j) maps to the centre of cell (xs[i], ys[j]).
  const grid = ys.flatMap((_, j) => xs.map((_, i) => values[i][j] ?? Number.NaN));
  const line =
    target !== undefined && target > lo && target < hi && xs.length > 1 && ys.length > 1
      ? contours().size([xs.length, ys.length]).thresholds([target])(grid.map((v) => (Number.isNaN(v) ? lo : v)))[0]
      : null;
  // Grid coordinate g runs from 0 at the first cell's centre - 0.5; map it onto the band scales.
  const toPlot = ([gx, gy]: number[]) => [x.bandwidth() * gx, plotHeight - y.bandwidth() * gy];
  const path = line
    ? geoPath()({
        type: 'MultiPolygon',
        coordinates: line.coordinates.map((polygon) => polygon.map((ring) => ring.map(toPlot))),
      })
    : null;
  return (
    <ChartFrame
      shell={shell}
      title={title}
      summary={`${quantity} for ${xs.length} × ${ys.length} combinations, from ${formatNumber(lo)} to ${formatNumber(hi)} ${unit}.${target !== undefined ? ` Target ${formatNumber(target)} ${unit}.` : ''}`}
      legend={{
        kind: 'ramp',
        label: `${quantity} (${unit})`,
        interpolate: (t) => colour(lo + t * (hi - lo)),
        domain: [lo, hi],
        tickFormat: formatNumber,
        extras: line
          ? [
              {
                label: `target ${formatNumber(target!)} ${unit}`,
                swatch: { kind: 'line', colour: 'white', strokeWidth: 3 },
              },
            ]
          : [],
      }}
      margin={MARGIN}
      plotHeight={plotHeight}
      table={{
        caption: `${quantity} (${unit})`,
        columns: [xLabel, yLabel, `${quantity} (${unit})`],
        rows: xs.flatMap((vx, i) =>
          ys.map((vy, j) => [
            formatNumber(vx),
            formatNumber(vy),
            values[i][j] === null ? 'no result' : formatNumber(values[i][j]!),
          ]),
        ),
      }}
      exportName="sweep-heatmap"
      defs={
        <pattern id="no-result" width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width={6} height={6} fill="#eee" />
          <line y2={6} stroke="#999" strokeWidth={2} />
        </pattern>
      }
    >
      {xs.map((vx, i) =>
        ys.map((vy, j) => {
          const v = values[i][j];
          return (
            <rect
              key={`${i}-${j}`}
              x={x(String(vx))}
              y={y(String(vy))}
              width={x.bandwidth()}
              height={y.bandwidth()}
              fill={v === null ? 'url(#no-result)' : colour(v)}
              stroke="white"
              data-chart-part="cell"
            />
          );
        }),
      )}
      {path && <path d={path} fill="none" stroke="white" strokeWidth={3} data-chart-part="target-contour" />}
      {path && <path d={path} fill="none" stroke={ink.DEFAULT} strokeWidth={1.2} strokeDasharray="5 3" />}
      <AxisLeft
        ticks={bandTicks(y, (k) => formatNumber(Number(k)))}
        height={plotHeight}
        label={yLabel}
        labelOffset={64}
      />
      <AxisBottom
        ticks={bandTicks(x, (k) => formatNumber(Number(k)))}
        width={plotWidth}
        plotHeight={plotHeight}
        label={xLabel}
      />
    </ChartFrame>
  );
}
