// Whether the signed-in user may edit in an organisation, without throwing while the session is still
// being handed down: a page loaded directly can render once before the session context catches up
// with the sign-in query, and `ready` lets it wait for that instead of failing.
import { canEdit } from '../../../../shared/api/roles';
import { useOptionalSession } from '../../../lib/session/session-context';

export function useEditPermission(organisationId: string | undefined): { ready: boolean; mayEdit: boolean } {
  const session = useOptionalSession();
  if (!session) return { ready: false, mayEdit: false };
  const membership = organisationId ? session.membershipFor(organisationId) : undefined;
  return { ready: true, mayEdit: membership ? canEdit(membership.role) : false };
}
