// The runs table's filters, sort and page as the server's list query: the table shows one page of a
// list the server sorts and filters, so no run outside the page is needed in the browser.
import type { SortingState } from '@tanstack/react-table';
import { runSortSchema, type ListRunsQuery } from '../../../../shared/api/runs';

export interface RunFilterValues {
  author: string;
  revision: string;
  carriers: string;
  /** yyyy-mm-dd in the user's time zone, one of `sinceChoices`. */
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

const SINCE_SPANS = [
  { days: 0, label: 'Today' },
  { days: 6, label: 'Last 7 days' },
  { days: 29, label: 'Last 30 days' },
  { days: 89, label: 'Last 90 days' },
  { days: 364, label: 'Last 365 days' },
] as const;

const isoDay = (date: Date) =>
  `${date.getFullYear()}-${String(date.getMonth() + 1).padStart(2, '0')}-${String(date.getDate()).padStart(2, '0')}`;

/**
 * The "run on or after" menu: spans ending today in the user's time zone, each naming its first day the
 * way the app writes dates, so no browser date field shows mm/dd/yyyy beside "2 Dec 2026".
 */
export function sinceChoices(today: Date, formatDay: (date: Date) => string): { value: string; label: string }[] {
  return SINCE_SPANS.map(({ days, label }) => {
    const first = new Date(today.getFullYear(), today.getMonth(), today.getDate() - days);
    return { value: isoDay(first), label: `${label} (from ${formatDay(first)})` };
  });
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
