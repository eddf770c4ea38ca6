// Three small buttons in a chart's corner: save the picture as PNG or SVG, or its data as CSV.
import { useState, type RefObject } from 'react';
import { downloadCsv, type CsvColumn } from '../../lib/export/csv';
import { downloadPng } from '../../lib/export/png';
import { downloadSvg } from '../../lib/export/svg';
import type { ChartCell, ChartTable } from './chart-table';

interface ChartExportMenuProps {
  svgRef: RefObject<SVGSVGElement | null>;
  /** File name without extension, e.g. "station-states-run-12". */
  fileBase: string;
  /** Chart title, used in the buttons' accessible names. */
  title: string;
  /** The chart's data, built only when asked for, since a long run's full table can be large. */
  csv?: () => ChartTable;
}

const BUTTON =
  'rounded border border-ink-faint/50 bg-paper-raised px-1.5 py-0.5 text-[11px] font-medium text-ink-soft hover:border-accent hover:text-accent focus-visible:outline-2 focus-visible:outline-accent';

export function tableColumns(table: ChartTable): CsvColumn<readonly ChartCell[]>[] {
  return table.columns.map((header, index) => ({ header, get: (row: readonly ChartCell[]) => row[index] }));
}

export function ChartExportMenu({ svgRef, fileBase, title, csv }: ChartExportMenuProps) {
  const [problem, setProblem] = useState<string | null>(null);

  const run = async (action: () => Promise<void> | void) => {
    setProblem(null);
    try {
      await action();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    }
  };
  const withSvg = (save: (svg: SVGSVGElement) => Promise<void>) => () =>
    run(() => {
      if (!svgRef.current) throw new Error('The chart is not on screen yet, so there is no picture to save.');
      return save(svgRef.current);
    });

  return (
    <div className="flex flex-col items-end gap-1" data-chart-part="export-menu">
      <div className="flex gap-1">
        <button
          type="button"
          className={BUTTON}
          aria-label={`Save ${title} as PNG`}
          onClick={withSvg((svg) => downloadPng(svg, fileBase))}
        >
          PNG
        </button>
        <button
          type="button"
          className={BUTTON}
          aria-label={`Save ${title} as SVG`}
          onClick={withSvg((svg) => downloadSvg(svg, fileBase))}
        >
          SVG
        </button>
        {csv && (
          <button
            type="button"
            className={BUTTON}
            aria-label={`Save the data of ${title} as CSV`}
            onClick={() =>
              run(() => {
                const table = csv();
                downloadCsv(fileBase, table.rows, tableColumns(table));
              })
            }
          >
            CSV
          </button>
        )}
      </div>
      {problem && (
        <p role="alert" className="m-0 rounded bg-danger-soft px-2 py-1 text-xs text-danger">
          Export failed: {problem}
        </p>
      )}
    </div>
  );
}
