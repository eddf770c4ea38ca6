// The filters of the runs table: each is one column's test, so TanStack Table applies them and
// the sort together.
import type { FilterFn } from '@tanstack/react-table';
import type { RunListItem } from '../../../../shared/api/runs';
import { localDayOf } from '../../../lib/format';

export interface RunFilterValues {
  author: string;
  revision: string;
  carriers: string;
  since: string;
  minThroughput: string;
  maxTakt: string;
}

export const NO_FILTERS: RunFilterValues = {
  author: '',
  revision: '',
  carriers: '',
  since: '',
  minThroughput: '',
  maxTakt: '',
};

export const FILTER_COLUMN: Record<keyof RunFilterValues, string> = {
  author: 'author',
  revision: 'revision',
  carriers: 'carriers',
  since: 'createdAt',
  minThroughput: 'throughput',
  maxTakt: 'takt',
};

const number = (text: unknown) => (typeof text === 'string' && text.trim() !== '' ? Number(text) : NaN);

export const equalsText: FilterFn<RunListItem> = (row, columnId, wanted) =>
  String(row.getValue(columnId)) === String(wanted);
export const atLeast: FilterFn<RunListItem> = (row, columnId, wanted) =>
  !Number.isFinite(number(wanted)) || Number(row.getValue(columnId)) >= number(wanted);
export const atMost: FilterFn<RunListItem> = (row, columnId, wanted) =>
  !Number.isFinite(number(wanted)) || Number(row.getValue(columnId)) <= number(wanted);
/** `wanted` is a yyyy-mm-dd day in the user's time zone; runs from the start of that day on pass. */
export const sinceDay: FilterFn<RunListItem> = (row, columnId, wanted) => {
  const from = typeof wanted === 'string' && wanted ? new Date(`${wanted}T00:00:00`).getTime() : NaN;
  return Number.isNaN(from) || new Date(String(row.getValue(columnId))).getTime() >= from;
};

export function columnFiltersOf(values: RunFilterValues) {
  return (Object.keys(values) as (keyof RunFilterValues)[])
    .filter((key) => values[key].trim() !== '')
    .map((key) => ({ id: FILTER_COLUMN[key], value: values[key] }));
}

export function filterChoices(runs: readonly RunListItem[]) {
  const authors = new Map<string, string>();
  for (const run of runs) authors.set(run.createdBy?.id ?? '', run.createdBy?.name ?? 'a former member');
  const distinct = (values: number[]) => [...new Set(values)].sort((a, b) => a - b);
  return {
    authors: [...authors].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name)),
    revisions: distinct(runs.map((r) => r.revisionNumber)),
    carriers: distinct(runs.map((r) => r.summary.carriers)),
    /** Days with at least one run, newest first. */
    days: [...new Set(runs.map((r) => localDayOf(r.createdAt)))].sort().reverse(),
  };
}

export const authorIs: FilterFn<RunListItem> = (row, _columnId, wanted) =>
  (row.original.createdBy?.id ?? '') === wanted;
