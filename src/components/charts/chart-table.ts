// The tabular form of a chart's data: read by screen readers and offered as CSV.
export type ChartCell = string | number;

export interface ChartTable {
  caption: string;
  columns: readonly string[];
  rows: ReadonlyArray<readonly ChartCell[]>;
}
