// Query keys of the runs feature, general to specific, so `runKeys.lists()` refreshes every run
// list (a scenario's and its project's, every page) after a run is saved, renamed or deleted.
import type { ListRunsQuery } from '../../../shared/api/runs';

export type RunListScope = { scenarioId: string } | { projectId: string };

export const runKeys = {
  all: ['runs'] as const,
  lists: () => [...runKeys.all, 'list'] as const,
  list: (scope: RunListScope, query: Partial<ListRunsQuery> = {}) => [...runKeys.lists(), scope, query] as const,
  details: () => [...runKeys.all, 'detail'] as const,
  detail: (id: string) => [...runKeys.details(), id] as const,
};
