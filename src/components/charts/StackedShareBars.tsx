// Horizontal 100 % bars split into shares, one per item: the common body of the station-state bars
// and the carrier time-share bars. Segments wide enough carry their percentage as text.
import { lab, scaleBand, scaleLinear } from 'd3';
import type { MouseEvent } from 'react';
import { AxisBottom, linearTicks, TICK_FONT } from './Axes';
import { ChartFrame, plotWidthOf, type Margin } from './ChartFrame';
import { estimateTextWidth, formatShare } from './format';
import { ink } from './palette';
import { useChartShell } from './useChartShell';

export interface ShareCategory {
  key: string;
  label: string;
  colour: string;
  /** Column name stem in the CSV export, when the key is not already one. */
  csvName?: string;
}

export interface ShareItem {
  id: string;
  label: string;
  /** One share per category, in category order. */
  shares: readonly number[];
  /** Text written after the bar, e.g. a bottleneck marker. */
  note?: string;
  /** Used instead of `note` when the chart is too narrow for it. */
  shortNote?: string;
  emphasis?: boolean;
}

interface StackedShareBarsProps {
  title: string;
  subtitle?: string;
  summary: string;
  categories: readonly ShareCategory[];
  items: readonly ShareItem[];
  axisLabel: string;
  tableCaption: string;
  exportName: string;
  barHeight?: number;
  width?: number;
}

const textOn = (fill: string) => (lab(fill).l < 55 ? '#ffffff' : ink.DEFAULT);

export function StackedShareBars(props: StackedShareBarsProps) {
  const { categories, barHeight = 28 } = props;
  const shell = useChartShell(props.width);
  const labelWidth = Math.min(
    180,
    Math.max(...props.items.map((item) => estimateTextWidth(item.label, TICK_FONT))) + 14,
  );
  const notesWidth = (list: readonly ShareItem[]) =>
    Math.max(0, ...list.map((item) => (item.note ? estimateTextWidth(item.note, TICK_FONT) + 12 : 0)));
  // Bars keep at least half the room; past that a long note gives way to its short form.
  const items =
    notesWidth(props.items) > (shell.width - labelWidth) / 2
      ? props.items.map((item) => ({ ...item, note: item.shortNote ?? item.note }))
      : props.items;
  const noteWidth = notesWidth(items);
  const margin: Margin = { top: 4, right: Math.max(16, noteWidth), bottom: 50, left: labelWidth };
  const plotWidth = plotWidthOf(shell.width, margin);
  const x = scaleLinear().domain([0, 1]).range([0, plotWidth]);
  const y = scaleBand<string>()
    .domain(items.map((item) => item.id))
    .range([0, items.length * barHeight])
    .paddingInner(0.25);
  const plotHeight = items.length * barHeight;

  const show = (event: MouseEvent<SVGRectElement>, item: ShareItem) =>
    shell.showTooltip(event, {
      title: item.note ? `${item.label} (${item.note.replace(/^◀\s*/, '')})` : item.label,
      rows: categories.map((category, c) => [category.label, formatShare(item.shares[c])] as const),
    });

  return (
    <ChartFrame
      shell={shell}
      title={props.title}
      subtitle={props.subtitle}
      summary={props.summary}
      legend={{
        kind: 'swatches',
        items: categories.map((category) => ({
          label: category.label,
          swatch: { kind: 'box', fill: category.colour },
        })),
      }}
      margin={margin}
      plotHeight={plotHeight}
      table={{
        caption: props.tableCaption,
        columns: ['', ...categories.map((category) => category.label), 'Note'],
        rows: items.map((item) => [item.label, ...item.shares.map(formatShare), item.note?.replace(/^◀\s*/, '') ?? '']),
      }}
      csv={() => ({
        caption: props.tableCaption,
        columns: ['id', 'name', ...categories.map((category) => `${category.csvName ?? category.key}_share`), 'note'],
        rows: items.map((item) => [item.id, item.label, ...item.shares, item.note?.replace(/^◀\s*/, '') ?? '']),
      })}
      exportName={props.exportName}
    >
      <AxisBottom
        ticks={linearTicks(x, plotWidth / 90, (v) => formatShare(v).replace('.0%', '%'))}
        width={plotWidth}
        plotHeight={plotHeight}
        label={props.axisLabel}
        grid
      />
      {items.map((item) => {
        const top = y(item.id) ?? 0;
        let start = 0;
        return (
          <g key={item.id} data-item={item.id}>
            <text
              x={-8}
              y={top + y.bandwidth() / 2}
              dy="0.35em"
              textAnchor="end"
              fontSize={TICK_FONT}
              fontWeight={item.emphasis ? 700 : 400}
              fill={ink.DEFAULT}
            >
              {item.label}
            </text>
            {categories.map((category, c) => {
              const share = item.shares[c];
              const left = x(start);
              start += share;
              const width = x(start) - left;
              if (width <= 0) return null;
              const text = formatShare(share);
              return (
                <g key={category.key}>
                  <rect
                    x={left}
                    y={top}
                    width={width}
                    height={y.bandwidth()}
                    fill={category.colour}
                    data-category={category.key}
                    onMouseMove={(event) => show(event, item)}
                    onMouseLeave={shell.hideTooltip}
                  />
                  {width > estimateTextWidth(text, 11) + 6 && (
                    <text
                      x={left + width / 2}
                      y={top + y.bandwidth() / 2}
                      dy="0.35em"
                      textAnchor="middle"
                      fontSize={11}
                      fill={textOn(category.colour)}
                      pointerEvents="none"
                    >
                      {text}
                    </text>
                  )}
                </g>
              );
            })}
            {item.emphasis && (
              <rect
                x={-1}
                y={top - 1}
                width={x(start) + 2}
                height={y.bandwidth() + 2}
                fill="none"
                stroke={ink.DEFAULT}
                strokeWidth={2}
                pointerEvents="none"
              />
            )}
            {item.note && (
              <text
                x={x(start) + 6}
                y={top + y.bandwidth() / 2}
                dy="0.35em"
                fontSize={TICK_FONT}
                fontWeight={600}
                fill={ink.DEFAULT}
                data-chart-part="note"
              >
                {item.note}
              </text>
            )}
          </g>
        );
      })}
    </ChartFrame>
  );
}
