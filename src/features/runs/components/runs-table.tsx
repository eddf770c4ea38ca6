// Stored runs of a scenario or a project: sortable by every figure, filterable by author,
// revision, carriers, date, throughput and takt; open, rename, delete and rerun in place.
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { RunListItem } from '../../../../shared/api/runs';
import { Table, Td, Th } from '../../../components/ui/table';
import { useRerun } from '../hooks/use-rerun';
import { useRunPermissions } from '../hooks/use-run-permissions';
import { columnFiltersOf, NO_FILTERS, type RunFilterValues } from '../utils/run-filters';
import { RerunStatus } from './rerun-status';
import { RunNameCell } from './run-name-cell';
import { RunRowActions } from './run-row-actions';
import { RunsFilters } from './runs-filters';
import { runsColumns } from './runs-table-columns';

export interface RunsTableProps {
  runs: readonly RunListItem[];
  organisationId: string | undefined;
  /** A project's table names each run's scenario; a scenario's does not need to. */
  showScenario?: boolean;
  caption: string;
}

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

export function RunsTable({ runs, organisationId, showScenario = false, caption }: RunsTableProps) {
  const permissions = useRunPermissions(organisationId);
  const rerun = useRerun();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: true }]);
  const [filters, setFilters] = useState<RunFilterValues>(NO_FILTERS);
  const columnFilters = useMemo(() => columnFiltersOf(filters), [filters]);
  const { mayRun, mayChange } = permissions;
  const columns = useMemo(
    () =>
      runsColumns({
        showScenario,
        showActions: mayRun || runs.some(mayChange),
        name: (run) => <RunNameCell run={run} mayRename={mayChange(run)} />,
        actions: (run) => (
          <RunRowActions
            run={run}
            mayRerun={mayRun}
            mayDelete={mayChange(run)}
            rerunBusy={rerun.busy}
            onRerun={(r) => void rerun.rerun(r)}
          />
        ),
      }),
    [showScenario, mayChange, mayRun, rerun, runs],
  );
  const table = useReactTable({
    data: runs as RunListItem[],
    columns,
    state: { sorting, columnFilters },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId: (run) => run.id,
  });
  const rows = table.getRowModel().rows;

  return (
    <div className="flex flex-col gap-4">
      <RunsFilters runs={runs} values={filters} onChange={setFilters} />
      <RerunStatus rerun={rerun} />
      <Table caption={caption}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <Th key={header.id} aria-sort={sorted ? ARIA_SORT[sorted] : undefined} className="whitespace-nowrap">
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 hover:text-ink"
                        onClick={header.column.getToggleSortingHandler()}
                      >
                        {label}
                        <span aria-hidden="true" className="text-xs">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </Th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} data-run-id={row.id}>
              {row.getVisibleCells().map((cell) => (
                <Td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</Td>
              ))}
            </tr>
          ))}
        </tbody>
      </Table>
      {rows.length === 0 && (
        <p className="text-sm text-ink-soft">{runs.length === 0 ? 'No runs yet.' : 'No run matches these filters.'}</p>
      )}
    </div>
  );
}
