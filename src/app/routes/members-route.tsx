// /organisations/:organisationId/members : the members page, fed with who is looking and their role.
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { NotFoundMessage } from '../../components/not-found-message';
import { authKeys } from '../../lib/query-keys/auth';
import { useSession } from '../../lib/session/session-context';
import { MembersPage } from '../../features/members/components/members-page';

export function MembersRoute() {
  const { organisationId = '' } = useParams();
  const { user, membershipFor } = useSession();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const membership = membershipFor(organisationId);
  if (!membership) return <NotFoundMessage what="organisation" />;
  return (
    <MembersPage
      organisationId={organisationId}
      organisationName={membership.organisationName}
      myUserId={user.id}
      myRole={membership.role}
      onLeft={() => {
        void queryClient.invalidateQueries({ queryKey: authKeys.me() });
        navigate('/', { replace: true });
      }}
    />
  );
}
