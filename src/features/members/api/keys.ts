// Query keys of the members feature, general to specific: one organisation's members and invitations.
export const memberKeys = {
  all: ['members'] as const,
  organisation: (organisationId: string) => [...memberKeys.all, organisationId] as const,
  list: (organisationId: string) => [...memberKeys.organisation(organisationId), 'list'] as const,
  invitations: (organisationId: string) => [...memberKeys.organisation(organisationId), 'invitations'] as const,
};
