// Query keys of the costs feature.
export const costKeys = {
  all: ['costs'] as const,
  priceList: (organisationId: string) => [...costKeys.all, 'price-list', organisationId] as const,
};
