// A ranking of changes by what they gain: one horizontal bar per item with its 95 % interval as a
// whisker, a zero line, significant gains filled and the rest outlined, and a second value (such as
// the station's bottleneck share) written beside each bar.
import { scaleBand, scaleLinear } from 'd3';
import { AxisBottom, linearTicks } from './Axes';
import { ChartFrame, ChartMessage, plotWidthOf, type Margin } from './ChartFrame';
import { estimateTextWidth, formatNumber } from './format';
import { ink, seriesStyle } from './palette';
import { useChartShell } from './useChartShell';

export interface GainBar {
  label: string;
  mean: number;
  lower: number;
  upper: number;
  significant: boolean;
  /** Written at the right edge, e.g. "bottleneck 92 %". */
  note: string;
}

export interface GainBarsProps {
  bars: readonly GainBar[];
  title: string;
  quantity: string;
  unit: string;
  width?: number;
  exportName?: string;
}

const ROW = 28;
const COLOUR = seriesStyle(0).colour;

export function GainBars({ bars, title, quantity, unit, ...props }: GainBarsProps) {
  const shell = useChartShell(props.width);
  if (bars.length === 0)
    return (
      <ChartMessage
        title={title}
        tone="empty"
        message="No station has finished yet; the ranking appears as points complete."
      />
    );
  const labelWidth = Math.min(200, Math.max(...bars.map((b) => estimateTextWidth(b.label, 12))) + 12);
  const noteWidth = Math.max(...bars.map((b) => estimateTextWidth(b.note, 11))) + 12;
  const margin: Margin = { top: 10, right: noteWidth, bottom: 52, left: labelWidth };
  const plotWidth = plotWidthOf(shell.width, margin);
  const plotHeight = bars.length * ROW;
  const lo = Math.min(0, ...bars.map((b) => b.lower));
  const hi = Math.max(0, ...bars.map((b) => b.upper));
  const x = scaleLinear()
    .domain([lo, hi === lo ? lo + 1 : hi])
    .nice()
    .range([0, plotWidth]);
  const y = scaleBand<string>()
    .domain(bars.map((_, i) => String(i)))
    .range([0, plotHeight])
    .padding(0.3);
  return (
    <ChartFrame
      shell={shell}
      title={title}
      summary={`${bars.length} items ranked by ${quantity.toLowerCase()}; ${bars.filter((b) => b.significant).length} with a gain whose 95 % interval lies above zero.`}
      legend={{
        kind: 'swatches',
        items: [
          { label: 'gain, interval above zero', swatch: { kind: 'box', fill: COLOUR } },
          { label: 'gain not distinguishable from zero', swatch: { kind: 'box', fill: 'white', stroke: COLOUR } },
          { label: '95 % interval', swatch: { kind: 'whisker', colour: ink.DEFAULT } },
        ],
      }}
      margin={margin}
      plotHeight={plotHeight}
      table={{
        caption: `${quantity} (${unit}) per item`,
        columns: ['Item', `Mean (${unit})`, `Lower (${unit})`, `Upper (${unit})`, 'Interval above zero', 'Note'],
        rows: bars.map((b) => [
          b.label,
          formatNumber(b.mean),
          formatNumber(b.lower),
          formatNumber(b.upper),
          b.significant ? 'yes' : 'no',
          b.note,
        ]),
      }}
      exportName={props.exportName ?? 'gain-ranking'}
    >
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 70)}
        width={plotWidth}
        plotHeight={plotHeight}
        label={`${quantity} (${unit})`}
        grid
      />
      <line x1={x(0)} x2={x(0)} y2={plotHeight} stroke={ink.DEFAULT} />
      {bars.map((b, i) => {
        const top = y(String(i)) ?? 0;
        const h = y.bandwidth();
        const mid = top + h / 2;
        return (
          <g key={`${b.label}-${i}`} data-chart-part="bar">
            <text x={-8} y={mid} dy="0.35em" textAnchor="end" fontSize={12} fill={ink.DEFAULT}>
              {b.label}
            </text>
            <rect
              x={Math.min(x(0), x(b.mean))}
              y={top}
              width={Math.abs(x(b.mean) - x(0))}
              height={h}
              fill={b.significant ? COLOUR : 'white'}
              stroke={COLOUR}
              strokeWidth={1.5}
            />
            <line x1={x(b.lower)} x2={x(b.upper)} y1={mid} y2={mid} stroke={ink.DEFAULT} strokeWidth={1.5} />
            <line x1={x(b.lower)} x2={x(b.lower)} y1={mid - 5} y2={mid + 5} stroke={ink.DEFAULT} strokeWidth={1.5} />
            <line x1={x(b.upper)} x2={x(b.upper)} y1={mid - 5} y2={mid + 5} stroke={ink.DEFAULT} strokeWidth={1.5} />
            <text x={plotWidth + 8} y={mid} dy="0.35em" fontSize={11} fill={ink.soft}>
              {b.note}
            </text>
          </g>
        );
      })}
    </ChartFrame>
  );
}
