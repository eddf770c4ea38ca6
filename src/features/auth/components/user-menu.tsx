// The signed-in part of the header: organisation, person, role and sign-out.
import { useNavigate } from 'react-router-dom';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { useSignOut } from '../api/sign-out';
import type { Session } from '../../../lib/session/session-context';
import { SIGNED_OUT_STATE } from '../utils/return-to';
import { OrganisationPicker } from './organisation-picker';

export function UserMenu({ session }: { session: Session }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  const role = session.activeMembership?.role;

  const onSignOut = () =>
    signOut.mutate(undefined, {
      onSuccess: () => navigate('/sign-in', { replace: true, state: SIGNED_OUT_STATE }),
    });

  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      <OrganisationPicker session={session} />
      <span className="flex items-center gap-2">
        <span className="font-medium text-paper" title={session.user.email}>
          {session.user.name}
        </span>
        {role && (
          <span aria-label={`Role: ${role}`}>
            <Badge tone={role === 'viewer' ? 'neutral' : 'accent'}>{role}</Badge>
          </span>
        )}
      </span>
      <Button
        variant="secondary"
        className="min-h-9 px-3 py-1"
        onClick={onSignOut}
        pending={signOut.isPending}
        pendingLabel="Signing out…"
      >
        Sign out
      </Button>
      {signOut.isError && (
        <p role="alert" className="w-full text-sm text-danger-soft">
          Sign-out failed: {signOut.error.message}
        </p>
      )}
    </div>
  );
}
