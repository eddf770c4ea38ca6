// Query keys of the compare feature: the stored comparison of one ordered set of runs.
export const compareKeys = {
  all: ['comparisons'] as const,
  stored: (runIds: readonly string[]) => [...compareKeys.all, 'stored', runIds.join(',')] as const,
};
