// Query keys of the scenarios feature, general to specific, so
// `scenarioKeys.all` invalidates every scenario query at once.
export const scenarioKeys = {
  all: ['scenarios'] as const,
  lists: () => [...scenarioKeys.all, 'list'] as const,
  list: (projectId: string) => [...scenarioKeys.lists(), projectId] as const,
  details: () => [...scenarioKeys.all, 'detail'] as const,
  detail: (id: string) => [...scenarioKeys.details(), id] as const,
  revisions: (id: string) => [...scenarioKeys.all, 'revisions', id] as const,
  /** One revision with its document; revisions never change. */
  revision: (id: string, number: number) => [...scenarioKeys.all, 'revision', id, number] as const,
};
