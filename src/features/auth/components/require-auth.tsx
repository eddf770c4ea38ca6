// Guards the signed-in pages: visitors go to sign-in with the address they
// wanted, so they come back to it afterwards.
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { LoadError } from '../../../components/load-error';
import { PageSpinner } from '../../../components/ui/spinner';
import { useMe } from '../api/get-me';
import { signInPath } from '../utils/return-to';

export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageSpinner label="Checking your session…" />;
  if (me.isError) return <LoadError what="your session" error={me.error} onRetry={() => void me.refetch()} />;
  if (!me.data) return <Navigate to={signInPath(`${location.pathname}${location.search}`)} replace />;
  return <Outlet />;
}
