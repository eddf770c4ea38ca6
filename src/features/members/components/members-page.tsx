// The members page of one organisation: everyone sees who is in it and may leave; owners also invite,
// change roles, remove, and answer for pending invitations.
import { useState } from 'react';
import type { Role } from '../../../../shared/api/roles';
import { LoadError } from '../../../components/load-error';
import { Button } from '../../../components/ui/button';
import { TitledCard } from '../../../components/ui/card';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { useInvitations } from '../api/invitations';
import { useLeaveOrganisation, useMembers } from '../api/members';
import { InviteForm } from './invite-form';
import { MembersTable } from './members-table';
import { PendingInvitations } from './pending-invitations';

interface MembersPageProps {
  organisationId: string;
  organisationName: string;
  myUserId: string;
  myRole: Role;
  onLeft: () => void;
}

export function MembersPage({ organisationId, organisationName, myUserId, myRole, onLeft }: MembersPageProps) {
  const mayManage = myRole === 'owner';
  const members = useMembers(organisationId);
  const invitations = useInvitations(organisationId, mayManage);
  const leave = useLeaveOrganisation(organisationId);
  const [confirmingLeave, setConfirmingLeave] = useState(false);

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`Members of ${organisationName}`}
        description={
          mayManage
            ? 'Invite colleagues, set what each may do, and see who signed in when.'
            : 'Who works in this organisation.'
        }
      />
      {mayManage && (
        <TitledCard title="Invite someone">
          <InviteForm organisationId={organisationId} />
        </TitledCard>
      )}
      <TitledCard title="Members">
        {members.isPending && <PageSpinner label="Loading members…" />}
        {members.isError && (
          <LoadError what="the members" error={members.error} onRetry={() => void members.refetch()} />
        )}
        {members.data && (
          <MembersTable
            organisationId={organisationId}
            members={members.data}
            myUserId={myUserId}
            mayManage={mayManage}
          />
        )}
      </TitledCard>
      {mayManage && (
        <TitledCard title="Pending invitations">
          {invitations.isPending && <PageSpinner label="Loading invitations…" />}
          {invitations.isError && (
            <LoadError what="the invitations" error={invitations.error} onRetry={() => void invitations.refetch()} />
          )}
          {invitations.data && <PendingInvitations organisationId={organisationId} invitations={invitations.data} />}
        </TitledCard>
      )}
      <TitledCard title="Leave this organisation">
        <div className="flex flex-col items-start gap-3">
          <p className="max-w-prose text-ink-soft">
            You lose access to its projects at once; an owner can invite you again. The last owner cannot leave.
          </p>
          {leave.isError && (
            <ErrorBanner title="You are still a member">
              <p>{leave.error.message}</p>
            </ErrorBanner>
          )}
          {confirmingLeave ? (
            <div className="flex gap-2">
              <Button
                pending={leave.isPending}
                pendingLabel="Leaving…"
                onClick={() => leave.mutate(undefined, { onSuccess: onLeft })}
              >
                Yes, leave {organisationName}
              </Button>
              <Button variant="secondary" onClick={() => setConfirmingLeave(false)}>
                Stay
              </Button>
            </div>
          ) : (
            <Button variant="secondary" onClick={() => setConfirmingLeave(true)}>
              Leave…
            </Button>
          )}
        </div>
      </TitledCard>
    </div>
  );
}
