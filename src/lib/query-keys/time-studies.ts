// Query keys of the time-studies feature, general to specific, so `timeStudyKeys.lists()` refreshes
// every station's list after an upload or a delete.
export interface TimeStudyListScope {
  scenarioId: string;
  stationId: string;
}

export const timeStudyKeys = {
  all: ['timeStudies'] as const,
  lists: () => [...timeStudyKeys.all, 'list'] as const,
  list: (scope: TimeStudyListScope) => [...timeStudyKeys.lists(), scope] as const,
  details: () => [...timeStudyKeys.all, 'detail'] as const,
  detail: (id: string) => [...timeStudyKeys.details(), id] as const,
};
