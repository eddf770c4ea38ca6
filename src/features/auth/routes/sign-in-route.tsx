// /sign-in: returns the user to the page they were sent away from.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { forgetSession } from '../api/forget-session';
import { useMe } from '../api/get-me';
import { AuthPanel } from '../components/auth-panel';
import { SignInForm } from '../components/sign-in-form';
import { isSignedOutState, safeReturnTo, withSameReturn } from '../utils/return-to';

export function SignInRoute() {
  const location = useLocation();
  const navigate = useNavigate();
  const me = useMe();
  const queryClient = useQueryClient();
  const returnTo = safeReturnTo(location.search);
  const justSignedOut = isSignedOutState(location.state);

  useEffect(() => {
    if (justSignedOut) forgetSession(queryClient);
  }, [justSignedOut, queryClient]);

  if (me.data && !justSignedOut) return <Navigate to={returnTo} replace />;

  return (
    <AuthPanel
      title="Sign in to Lanewright"
      intro="Plan and compare carrier-track assembly lines with your team."
      footer={
        <>
          New here?{' '}
          <Link
            className="font-semibold text-accent-strong underline underline-offset-4"
            to={withSameReturn('/sign-up', location.search)}
          >
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm onSignedIn={() => navigate(returnTo, { replace: true })} />
      <p className="mt-4 text-sm">
        <Link className="font-semibold text-accent-strong underline underline-offset-4" to="/forgot-password">
          Forgot password?
        </Link>
      </p>
    </AuthPanel>
  );
}
