// Guards the signed-in pages: visitors go to sign-in with the address they
// wanted, so they come back to it afterwards.
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { PageSpinner } from '../../../components/ui/spinner';
import { useMe } from '../api/get-me';
import { useOptionalSession } from '../../../lib/session/session-context';
import { signInPath } from '../utils/return-to';

export function RequireAuth() {
  const me = useMe();
  const session = useOptionalSession();
  const location = useLocation();
  if (me.isPending) return <PageSpinner label="Checking your session…" />;
  if (me.isError) return <LoadError what="your session" error={me.error} onRetry={() => void me.refetch()} />;
  if (!me.data) return <Navigate to={signInPath(`${location.pathname}${location.search}`)} replace />;
  // The query cache tells each observer of the answer in its own turn, so this guard can hear of the
  // user a moment before SessionProvider does; pages call useSession, so they wait for the provider.
  if (!session) return <PageSpinner label="Checking your session…" />;
  return <Outlet />;
}
