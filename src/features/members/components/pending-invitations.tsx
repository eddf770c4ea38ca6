// Invitations not yet accepted: who, which role, when sent, and whether the link still works.
import type { Invitation } from '../../../../shared/api/invitations';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { useResendInvitation, useRevokeInvitation } from '../api/invitations';

export function PendingInvitations({
  organisationId,
  invitations,
}: {
  organisationId: string;
  invitations: Invitation[];
}) {
  const resend = useResendInvitation(organisationId);
  const revoke = useRevokeInvitation(organisationId);
  const failure = resend.error ?? revoke.error;
  if (invitations.length === 0) return <p className="text-ink-soft">No invitation is waiting for an answer.</p>;
  return (
    <div className="flex flex-col gap-3">
      {failure && (
        <ErrorBanner title="The invitation was not changed">
          <p>{failure.message}</p>
        </ErrorBanner>
      )}
      <Table caption="Pending invitations">
        <thead>
          <tr>
            <Th>E-mail</Th>
            <Th>Role</Th>
            <Th>Sent</Th>
            <Th>Link</Th>
            <Th className="text-right">Actions</Th>
          </tr>
        </thead>
        <tbody>
          {invitations.map((invitation) => (
            <tr key={invitation.id}>
              <Td>
                {invitation.email}
                <br />
                <span className="text-ink-soft">by {formatPerson(invitation.invitedBy)}</span>
              </Td>
              <Td>{invitation.role}</Td>
              <Td className="whitespace-nowrap">{formatDateTime(invitation.sentAt)}</Td>
              <Td>
                {invitation.state === 'expired' ? (
                  <Badge tone="caution">expired</Badge>
                ) : (
                  `valid until ${formatDateTime(invitation.expiresAt)}`
                )}
              </Td>
              <Td className="text-right whitespace-nowrap">
                <Button
                  variant="quiet"
                  pending={resend.isPending && resend.variables === invitation.id}
                  onClick={() => resend.mutate(invitation.id)}
                >
                  Resend
                </Button>
                <Button
                  variant="quiet"
                  pending={revoke.isPending && revoke.variables === invitation.id}
                  onClick={() => revoke.mutate(invitation.id)}
                >
                  Revoke
                </Button>
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
