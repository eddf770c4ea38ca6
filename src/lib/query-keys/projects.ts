// Query keys of the projects feature, general to specific, so
// `projectKeys.all` or `projectKeys.lists()` invalidates a whole family.
export const projectKeys = {
  all: ['projects'] as const,
  lists: () => [...projectKeys.all, 'list'] as const,
  list: (organisationId: string | undefined) => [...projectKeys.lists(), { organisationId }] as const,
  details: () => [...projectKeys.all, 'detail'] as const,
  detail: (id: string) => [...projectKeys.details(), id] as const,
};
