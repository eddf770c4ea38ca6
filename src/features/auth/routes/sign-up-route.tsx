// /sign-up: a new account with its own organisation.
import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { useMe } from '../api/get-me';
import { AuthPanel } from '../components/auth-panel';
import { SignUpForm } from '../components/sign-up-form';
import { safeReturnTo, withSameReturn } from '../utils/return-to';

export function SignUpRoute() {
  const location = useLocation();
  const navigate = useNavigate();
  const me = useMe();
  const returnTo = safeReturnTo(location.search);
  if (me.data) return <Navigate to={returnTo} replace />;

  return (
    <AuthPanel
      title="Create your Lanewright account"
      intro="You get an organisation of your own; invite engineers and viewers to it later."
      footer={
        <>
          Already have an account?{' '}
          <Link className="font-semibold text-accent-strong underline underline-offset-4" to={withSameReturn('/sign-in', location.search)}>
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm onSignedUp={() => navigate(returnTo, { replace: true })} />
    </AuthPanel>
  );
}
