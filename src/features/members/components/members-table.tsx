// The members of an organisation with role and last sign-in. Owners change roles and remove members;
// the server keeps the last owner in place and says so when asked otherwise.
import type { Member } from '../../../../shared/api/members';
import { roleSchema, type Role } from '../../../../shared/api/roles';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime } from '../../../lib/format';
import { useChangeRole, useRemoveMember } from '../api/members';

interface MembersTableProps {
  organisationId: string;
  members: Member[];
  myUserId: string;
  mayManage: boolean;
}

export function MembersTable({ organisationId, members, myUserId, mayManage }: MembersTableProps) {
  const changeRole = useChangeRole(organisationId);
  const remove = useRemoveMember(organisationId);
  const failure = changeRole.error ?? remove.error;
  return (
    <div className="flex flex-col gap-3">
      {failure && (
        <ErrorBanner title="The change was not made">
          <p>{failure.message}</p>
        </ErrorBanner>
      )}
      <Table caption="Members">
        <thead>
          <tr>
            <Th>Member</Th>
            <Th>Role</Th>
            <Th>Last sign-in</Th>
            {mayManage && <Th className="text-right">Actions</Th>}
          </tr>
        </thead>
        <tbody>
          {members.map((member) => (
            <tr key={member.userId}>
              <Td>
                <span className="font-medium text-ink">{member.name}</span>
                {member.userId === myUserId && <span className="text-ink-soft"> (you)</span>}
                <br />
                <span className="text-ink-soft">{member.email}</span>
              </Td>
              <Td>
                {mayManage ? (
                  <select
                    aria-label={`Role of ${member.name}`}
                    value={member.role}
                    disabled={changeRole.isPending}
                    onChange={(event) => changeRole.mutate({ userId: member.userId, role: event.target.value as Role })}
                    className="rounded-md border border-ink-faint bg-paper-raised px-2 py-1"
                  >
                    {roleSchema.options.map((role) => (
                      <option key={role} value={role}>
                        {role}
                      </option>
                    ))}
                  </select>
                ) : (
                  <Badge tone={member.role === 'viewer' ? 'neutral' : 'accent'}>{member.role}</Badge>
                )}
              </Td>
              <Td className="whitespace-nowrap">
                {member.lastSignInAt ? formatDateTime(member.lastSignInAt) : 'never'}
              </Td>
              {mayManage && (
                <Td className="text-right">
                  {member.userId !== myUserId && (
                    <Button
                      variant="quiet"
                      pending={remove.isPending && remove.variables === member.userId}
                      onClick={() => {
                        if (window.confirm(`Remove ${member.name} from this organisation? They lose access at once.`))
                          remove.mutate(member.userId);
                      }}
                    >
                      Remove
                    </Button>
                  )}
                </Td>
              )}
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
