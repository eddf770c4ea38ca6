// Query keys of the studies feature, general to specific, so `studyKeys.lists()` refreshes every
// study list after a study is made, changed or deleted.
export const studyKeys = {
  all: ['studies'] as const,
  lists: () => [...studyKeys.all, 'list'] as const,
  list: (projectId: string) => [...studyKeys.lists(), projectId] as const,
  details: () => [...studyKeys.all, 'detail'] as const,
  detail: (id: string) => [...studyKeys.details(), id] as const,
  progress: (id: string) => [...studyKeys.detail(id), 'progress'] as const,
};
