// The signed-in user's rights over runs of one organisation.
import type { RunListItem } from '../../../../shared/api/runs';
import { canEdit } from '../../../../shared/api/roles';
import { useSession } from '../../../lib/session/session-context';
import { mayChangeRun } from '../utils/run-permissions';

export function useRunPermissions(organisationId: string | undefined) {
  const { user, membershipFor } = useSession();
  const role = organisationId ? membershipFor(organisationId)?.role : undefined;
  return {
    mayRun: role ? canEdit(role) : false,
    mayChange: (run: Pick<RunListItem, 'createdBy'>) => mayChangeRun(role, user.id, run),
  };
}
