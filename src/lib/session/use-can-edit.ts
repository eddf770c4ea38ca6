// Whether the signed-in user may create and change things in an organisation.
// Only hides controls: the server enforces the same rule.
import { canEdit } from '../../../shared/api/roles';
import { useSession } from './session-context';

export function useCanEdit(organisationId: string | undefined): boolean {
  const { membershipFor } = useSession();
  const membership = organisationId ? membershipFor(organisationId) : undefined;
  return membership ? canEdit(membership.role) : false;
}
