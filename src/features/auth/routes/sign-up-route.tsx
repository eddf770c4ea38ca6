// /sign-up: asks for a new account with its own organisation. The e-mailed link finishes it
// (/sign-up/finish), so this page never tells whether the address already has an account.
import { useState } from 'react';
import { Link, Navigate, useLocation } from 'react-router-dom';
import { useMe } from '../api/get-me';
import { AuthPanel } from '../components/auth-panel';
import { MailSentNotice } from '../components/mail-sent-notice';
import { SignUpForm } from '../components/sign-up-form';
import { safeReturnTo, withSameReturn } from '../utils/return-to';

export function SignUpRoute() {
  const location = useLocation();
  const me = useMe();
  const [sent, setSent] = useState<string | null>(null);
  const returnTo = safeReturnTo(location.search);
  if (me.data) return <Navigate to={returnTo} replace />;

  return (
    <AuthPanel
      title="Create your Lanewright account"
      intro="You get an organisation of your own and can invite engineers and viewers to it. We mail you a link to finish."
      footer={
        <>
          Already have an account?{' '}
          <Link
            className="font-semibold text-accent-strong underline underline-offset-4"
            to={withSameReturn('/sign-in', location.search)}
          >
            Sign in
          </Link>
        </>
      }
    >
      {sent ? <MailSentNotice message={sent} /> : <SignUpForm onAsked={setSent} />}
    </AuthPanel>
  );
}
