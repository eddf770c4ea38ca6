// Query keys of the sharing feature: the links of one subject, and a shared view by its token.
import type { ShareKind } from '../../../../shared/api/shares';

export const shareKeys = {
  all: ['shares'] as const,
  list: (kind: ShareKind, subjectId: string) => [...shareKeys.all, 'list', kind, subjectId] as const,
  view: (token: string) => [...shareKeys.all, 'view', token] as const,
};
