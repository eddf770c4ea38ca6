// One page of the stored runs of a scenario or a project: sortable by every figure, filterable by
// author, revision, carriers, date, throughput and takt, all on the server (the table is controlled: it
// shows the page it is given and reports sort, filter and page changes); open, rename, delete and rerun
// in place.
import { flexRender, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { RunListItem, RunsPage } from '../../../../shared/api/runs';
import { Pager } from '../../../components/ui/pager';
import { Table, Td, Th } from '../../../components/ui/table';
import { useRerun } from '../hooks/use-rerun';
import { useRunPermissions } from '../hooks/use-run-permissions';
import { anyFilter, type RunFilterValues } from '../utils/run-filters';
import { RerunStatus } from './rerun-status';
import { RunNameCell } from './run-name-cell';
import { RunRowActions } from './run-row-actions';
import { RunsFilters } from './runs-filters';
import { runsColumns } from './runs-table-columns';

export interface RunsTableProps {
  page: RunsPage;
  organisationId: string | undefined;
  /** A project's table names each run's scenario; a scenario's does not need to. */
  showScenario?: boolean;
  caption: string;
  sorting: SortingState;
  onSortingChange: (sorting: SortingState) => void;
  filters: RunFilterValues;
  onFiltersChange: (filters: RunFilterValues) => void;
  onOffsetChange: (offset: number) => void;
  /** True while the next page, sort or filter loads (the current page stays on screen). */
  loading?: boolean;
}

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

export function RunsTable({
  page,
  organisationId,
  showScenario = false,
  caption,
  sorting,
  onSortingChange,
  filters,
  onFiltersChange,
  onOffsetChange,
  loading = false,
}: RunsTableProps) {
  const permissions = useRunPermissions(organisationId);
  const rerun = useRerun();
  const runs = page.items;
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
    state: { sorting },
    onSortingChange: (update) => onSortingChange(typeof update === 'function' ? update(sorting) : update),
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (run) => run.id,
  });
  const rows = table.getRowModel().rows;

  return (
    <div className="flex flex-col gap-4" aria-busy={loading}>
      <RunsFilters choices={page.choices} values={filters} onChange={onFiltersChange} />
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
        <p className="text-sm text-ink-soft">{anyFilter(filters) ? 'No run matches these filters.' : 'No runs yet.'}</p>
      )}
      <Pager
        label="Run pages"
        offset={page.offset}
        limit={page.limit}
        total={page.total}
        onOffsetChange={onOffsetChange}
      />
    </div>
  );
}
