// /invitations/accept#<token>: answering an invitation, signed in or not. Afterwards the new
// organisation becomes the one the project list shows.
import { useQueryClient } from '@tanstack/react-query';
import { useLocation, useNavigate } from 'react-router-dom';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { removeUserData } from '../../features/auth/api/forget-session';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { useOptionalSession } from '../../lib/session/session-context';
import { signInPath } from '../../features/auth/utils/return-to';
import { AcceptInvitation } from '../../features/members/components/accept-invitation';
import { useLinkToken } from '../../lib/use-link-token';

export function AcceptInvitationRoute() {
  const token = useLinkToken();
  const me = useMe();
  const session = useOptionalSession();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const location = useLocation();
  return (
    <AuthPanel
      title="You are invited"
      intro="Join an organisation on Lanewright to plan its lines together."
      footer="Nobody is added to an organisation until they accept."
    >
      {me.isPending ? null : (
        <AcceptInvitation
          token={token}
          signedInAs={me.data?.user.email ?? null}
          signInPath={signInPath(`${location.pathname}${location.hash}`)}
          onJoined={async ({ organisationId }) => {
            removeUserData(queryClient);
            await queryClient.fetchQuery({ ...meQueryOptions(), staleTime: 0 });
            session?.chooseOrganisation(organisationId);
            navigate('/', { replace: true });
          }}
        />
      )}
    </AuthPanel>
  );
}
