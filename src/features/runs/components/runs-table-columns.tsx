// The columns of the runs table. Headline figures come from the run summary the server keeps
// beside each result, written with the same decimals as the result page. Sorting happens on the
// server, by the column of the same id (`runSortSchema`).
import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { RunListItem } from '../../../../shared/api/runs';
import { BeltBaselineTag } from '../../../components/ui/belt-baseline-tag';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { formatInterval, formatPerHour, formatTakt } from '../../../lib/format-run';

const column = createColumnHelper<RunListItem>();

interface ColumnOptions {
  showScenario: boolean;
  /** Left out when the user may do nothing to any run, so viewers see no empty column. */
  showActions: boolean;
  name: (run: RunListItem) => ReactNode;
  actions: (run: RunListItem) => ReactNode;
}

export function runsColumns({ showScenario, showActions, name, actions }: ColumnOptions) {
  return [
    column.accessor('name', {
      id: 'name',
      header: 'Run',
      cell: (c) => name(c.row.original),
    }),
    ...(showScenario ? [column.accessor('scenarioName', { id: 'scenario', header: 'Scenario' })] : []),
    column.accessor('revisionNumber', {
      id: 'revision',
      header: 'Revision',
      cell: (c) => `#${c.getValue()}`,
    }),
    column.accessor('conveyorMode', {
      id: 'conveyor',
      header: 'Conveyor',
      enableColumnFilter: false,
      cell: (c) => (c.getValue() === 'belt' ? <BeltBaselineTag short /> : 'Carriers'),
    }),
    column.accessor((run) => formatPerson(run.createdBy), {
      id: 'author',
      header: 'Author',
    }),
    column.accessor('createdAt', {
      id: 'createdAt',
      header: 'Run at',
      cell: (c) => <time dateTime={c.getValue()}>{formatDateTime(c.getValue())}</time>,
    }),
    column.accessor((run) => run.summary.throughputPerHour.mean, {
      id: 'throughput',
      header: 'Throughput (/h)',
      cell: (c) => (
        <Figure
          value={formatPerHour(c.getValue())}
          interval={formatInterval(c.row.original.summary.throughputPerHour, formatPerHour)}
        />
      ),
    }),
    column.accessor((run) => run.summary.taktSeconds.mean, {
      id: 'takt',
      header: 'Takt (s)',
      cell: (c) => (
        <Figure
          value={formatTakt(c.getValue())}
          interval={formatInterval(c.row.original.summary.taktSeconds, formatTakt)}
        />
      ),
    }),
    column.accessor((run) => run.summary.carriers, { id: 'carriers', header: 'Carriers' }),
    ...(showActions
      ? [column.display({ id: 'actions', header: 'Actions', cell: (c) => actions(c.row.original) })]
      : []),
  ];
}

function Figure({ value, interval }: { value: string; interval: string }) {
  return (
    <span className="flex flex-col tabular-nums">
      <span className="font-semibold">{value}</span>
      <span className="text-xs text-ink-soft">95 % CI {interval}</span>
    </span>
  );
}
