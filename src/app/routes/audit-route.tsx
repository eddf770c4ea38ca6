// /organisations/:organisationId/audit : the audit page for owners, with the members as its people filter.
import { useParams } from 'react-router-dom';
import { EmptyState } from '../../components/ui/empty-state';
import { NotFoundMessage } from '../../components/not-found-message';
import { AuditPage } from '../../features/audit/components/audit-page';
import { useSession } from '../../lib/session/session-context';
import { useMembers } from '../../features/members/api/members';

function OwnersAudit({ organisationId, organisationName }: { organisationId: string; organisationName: string }) {
  const members = useMembers(organisationId);
  const people = (members.data ?? []).map((member) => ({ id: member.userId, name: member.name, email: member.email }));
  return <AuditPage organisationId={organisationId} organisationName={organisationName} people={people} />;
}

export function AuditRoute() {
  const { organisationId = '' } = useParams();
  const membership = useSession().membershipFor(organisationId);
  if (!membership) return <NotFoundMessage what="organisation" />;
  if (membership.role !== 'owner') {
    return (
      <EmptyState title="Owners only">
        The audit trail of {membership.organisationName} is open to its owners. Ask one of them if you need something
        from it.
      </EmptyState>
    );
  }
  return <OwnersAudit organisationId={organisationId} organisationName={membership.organisationName} />;
}
