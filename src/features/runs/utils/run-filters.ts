// The runs table's filters, sort and page as the server's list query: the table shows one page of a
// list the server sorts and filters, so no run outside the page is needed in the browser.
import type { SortingState } from '@tanstack/react-table';
import { runSortSchema, type ListRunsQuery } from '../../../../shared/api/runs';

export interface RunFilterValues {
  author: string;
  revision: string;
  carriers: string;
  /** yyyy-mm-dd in the user's time zone, from a date field. */
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

export const RUNS_PER_PAGE = 25;
export const NEWEST_FIRST: SortingState = [{ id: 'createdAt', desc: true }];

/** A typed number, or nothing while the field is empty or not (yet) a number. */
function numberOf(text: string): number | undefined {
  const value = text.trim() === '' ? NaN : Number(text);
  return Number.isFinite(value) && value >= 0 ? value : undefined;
}

/** The start of a local day as an instant, so "on or after" means the user's day, not UTC's. */
function startOfLocalDay(day: string): string | undefined {
  const time = /^\d{4}-\d{2}-\d{2}$/.test(day) ? new Date(`${day}T00:00:00`).getTime() : NaN;
  return Number.isNaN(time) ? undefined : new Date(time).toISOString();
}

export function runsRequestOf(
  filters: RunFilterValues,
  sorting: SortingState,
  offset: number,
  limit = RUNS_PER_PAGE,
): Partial<ListRunsQuery> {
  const sortBy = runSortSchema.safeParse(sorting[0]?.id);
  const request: Partial<ListRunsQuery> = {
    sort: sortBy.success ? sortBy.data : 'createdAt',
    order: sortBy.success && !sorting[0].desc ? 'asc' : 'desc',
    limit,
    offset,
    createdBy: filters.author || undefined,
    revision: numberOf(filters.revision),
    carriers: numberOf(filters.carriers),
    since: startOfLocalDay(filters.since),
    minThroughput: numberOf(filters.minThroughput),
    maxTakt: numberOf(filters.maxTakt),
  };
  return Object.fromEntries(Object.entries(request).filter((entry) => entry[1] !== undefined));
}

export const anyFilter = (filters: RunFilterValues) => Object.values(filters).some((value) => value.trim() !== '');
