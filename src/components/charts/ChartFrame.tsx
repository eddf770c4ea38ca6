// The common body of every chart: title and legend inside the SVG (so exports explain themselves),
// an aria summary, a visually hidden table for screen readers, the export menu and the tooltip.
import { useRef, type ReactNode } from 'react';
import { ChartExportMenu } from './ChartExportMenu';
import { Legend, legendHeight, type LegendSpec } from './Legend';
import { estimateTextWidth } from './format';
import { FONT_FAMILY, ink } from './palette';
import type { ChartShell } from './useChartShell';
import { ChartTooltip } from './ChartTooltip';
import type { ChartTable } from './chart-table';

export interface Margin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

const PAD = 12;
const TITLE_BLOCK = 30;
const SUBTITLE_BLOCK = 18;
/** Room kept free at the top right for the export buttons. */
const MENU_ROOM = 150;

export const plotWidthOf = (width: number, margin: Margin) => Math.max(40, width - margin.left - margin.right);

interface ChartFrameProps {
  shell: ChartShell;
  title: string;
  subtitle?: string;
  /** One or two sentences read out in place of the picture. */
  summary: string;
  legend?: LegendSpec;
  margin: Margin;
  plotHeight: number;
  /** What screen readers get instead of the marks; kept small enough to listen to. */
  table: ChartTable;
  /** The full data behind the picture, offered as CSV; defaults to the table. Built on demand. */
  csv?: () => ChartTable;
  exportName: string;
  defs?: ReactNode;
  /** Drawn in plot coordinates: (0,0) is the plot's top left corner. */
  children: ReactNode;
}

/** Breaks text into lines that fit `maxWidth` at `fontSize`, so a title is never cut on a phone. */
function wrapWords(text: string, fontSize: number, maxWidth: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    const next = line ? `${line} ${word}` : word;
    if (line && estimateTextWidth(next, fontSize) > maxWidth) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  return [...lines, line];
}

export function ChartFrame(props: ChartFrameProps) {
  const { shell, title, subtitle, summary, legend, margin, plotHeight, table, exportName, defs, children } = props;
  const svgRef = useRef<SVGSVGElement | null>(null);
  const width = shell.width;
  const titleLines = wrapWords(title, 16, width - 2 * PAD);
  const subtitleLines = subtitle ? wrapWords(subtitle, 12, width - 2 * PAD) : [];
  const extraTitle = (titleLines.length - 1) * 20;
  const headerHeight = PAD + TITLE_BLOCK + extraTitle + subtitleLines.length * SUBTITLE_BLOCK;
  const legendWidth = width - 2 * PAD;
  const legendSpace = legend ? legendHeight(legend, legendWidth) + 8 : 0;
  const plotTop = headerHeight + legendSpace + margin.top;
  const height = plotTop + plotHeight + margin.bottom;
  // On narrow screens a long title would run under the buttons; they move above the picture then.
  const menuBesideTitle = PAD + estimateTextWidth(title, 16) + MENU_ROOM <= width;

  return (
    <figure className="relative m-0 w-full" ref={shell.containerRef} data-chart={exportName}>
      <div
        className={menuBesideTitle ? 'absolute right-1 top-1' : 'flex justify-end'}
        style={{ maxWidth: menuBesideTitle ? MENU_ROOM : undefined }}
      >
        <ChartExportMenu svgRef={svgRef} fileBase={exportName} title={title} csv={props.csv ?? (() => table)} />
      </div>
      <svg
        ref={svgRef}
        role="img"
        aria-label={`${title}. ${summary}`}
        width={width}
        height={height}
        viewBox={`0 0 ${width} ${height}`}
        xmlns="http://www.w3.org/2000/svg"
        fontFamily={FONT_FAMILY}
        className="block max-w-full"
      >
        {defs && <defs>{defs}</defs>}
        <text x={PAD} y={PAD + 16} fontSize={16} fontWeight={600} fill={ink.DEFAULT} data-chart-part="title">
          {titleLines.map((line, i) => (
            <tspan key={i} x={PAD} dy={i === 0 ? 0 : 20}>
              {line}
            </tspan>
          ))}
        </text>
        {subtitleLines.map((line, i) => (
          <text
            key={i}
            x={PAD}
            y={PAD + TITLE_BLOCK + extraTitle + 8 + i * SUBTITLE_BLOCK}
            fontSize={12}
            fill={ink.soft}
          >
            {line}
          </text>
        ))}
        {legend && <Legend spec={legend} x={PAD} y={headerHeight} maxWidth={legendWidth} />}
        <g transform={`translate(${margin.left},${plotTop})`}>{children}</g>
      </svg>
      <ScreenReaderTable table={table} />
      {shell.tooltip && <ChartTooltip tooltip={shell.tooltip} containerWidth={width} />}
    </figure>
  );
}

/**
 * The chart's data for screen readers. The box is hidden, not the table: a table ignores the 1 px
 * size of "sr-only" and, though invisible, would widen the page on a phone and add blank scroll below
 * the footer.
 */
function ScreenReaderTable({ table }: { table: ChartTable }) {
  return (
    <div className="sr-only" data-chart-table>
      <table>
        <caption>{table.caption}</caption>
        <thead>
          <tr>
            {table.columns.map((column) => (
              <th key={column} scope="col">
                {column}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row, r) => (
            <tr key={r}>
              {row.map((cell, c) => (
                <td key={c}>{cell}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Shown instead of a chart when there is nothing to draw or the data cannot be drawn. */
export function ChartMessage({ title, message, tone }: { title: string; message: string; tone: 'empty' | 'problem' }) {
  return (
    <figure className="m-0 w-full rounded border border-ink-faint/40 bg-paper-raised p-4" data-chart-state={tone}>
      <figcaption className="text-base font-semibold text-ink">{title}</figcaption>
      <p
        role={tone === 'problem' ? 'alert' : 'status'}
        className={tone === 'problem' ? 'mt-2 text-sm text-danger' : 'mt-2 text-sm text-ink-soft'}
      >
        {message}
      </p>
    </figure>
  );
}
