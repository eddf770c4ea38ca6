// Who may rename or delete a run: an organisation owner, or the engineer who made it. The server
// holds the same rule; the client only hides what would be refused.
import type { RunListItem } from '../../../../shared/api/runs';
import { canEdit, type Role } from '../../../../shared/api/roles';

export function mayChangeRun(role: Role | undefined, userId: string, run: Pick<RunListItem, 'createdBy'>): boolean {
  if (!role) return false;
  return role === 'owner' || (canEdit(role) && run.createdBy?.id === userId);
}
