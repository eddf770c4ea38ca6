// A sortable table of one kind of result (stations, transfers, lanes) with its CSV download. The
// screen shows rounded figures; the CSV carries the stored values unrounded.
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Table, Td, Th } from '../../../components/ui/table';
import { CsvButton } from './csv-button';

export interface ResultColumn<T> {
  id: string;
  header: string;
  value: (row: T) => number | string;
  format?: (value: number) => string;
  /** Numbers line up on the right. */
  numeric?: boolean;
}

interface ResultTableProps<T> {
  caption: string;
  rows: readonly T[];
  columns: readonly ResultColumn<T>[];
  rowKey: (row: T) => string;
  fileBase: string;
  /** Marks a row (the bottleneck) in text, not only by colour. */
  emphasise?: (row: T) => string | null;
}

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

export function ResultTable<T>({ caption, rows, columns, rowKey, fileBase, emphasise }: ResultTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columnDefs = useMemo<ColumnDef<T>[]>(
    () =>
      columns.map((column) => ({
        id: column.id,
        header: column.header,
        accessorFn: column.value,
        sortDescFirst: Boolean(column.numeric),
        cell: (context) => {
          const value = context.getValue() as number | string;
          return typeof value === 'number' && column.format ? column.format(value) : String(value);
        },
      })),
    [columns],
  );
  const table = useReactTable({
    data: rows as T[],
    columns: columnDefs,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: rowKey,
  });

  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-end justify-between gap-3">
        <h3 className="font-semibold text-ink">{caption}</h3>
        <CsvButton
          what={caption}
          fileBase={fileBase}
          rows={rows}
          columns={columns.map((c) => ({ header: c.header, get: c.value }))}
        />
      </div>
      <Table caption={caption}>
        <thead>
          <tr>
            {table.getFlatHeaders().map((header) => {
              const sorted = header.column.getIsSorted();
              const numeric = columns.find((c) => c.id === header.id)?.numeric;
              return (
                <Th
                  key={header.id}
                  aria-sort={sorted ? ARIA_SORT[sorted] : undefined}
                  className={numeric ? 'text-right' : ''}
                >
                  <button
                    type="button"
                    className="inline-flex items-center gap-1 hover:text-ink"
                    onClick={header.column.getToggleSortingHandler()}
                  >
                    {flexRender(header.column.columnDef.header, header.getContext())}
                    <span aria-hidden="true" className="text-xs">
                      {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                    </span>
                  </button>
                </Th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const note = emphasise?.(row.original) ?? null;
            return (
              <tr key={row.id} className={note ? 'bg-caution-soft/50' : undefined}>
                {row.getVisibleCells().map((cell, i) => (
                  <Td key={cell.id} className={columns[i]?.numeric ? 'text-right tabular-nums whitespace-nowrap' : ''}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    {i === 0 && note && <span className="ml-2 text-xs font-semibold text-caution">{note}</span>}
                  </Td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </Table>
    </div>
  );
}
