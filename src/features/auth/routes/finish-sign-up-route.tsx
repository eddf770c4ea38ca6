// /sign-up/finish#<token>: the e-mailed link that makes the account. It waits for a click, so a mail
// program that opens links to preview them cannot spend the link.
import { Link, useNavigate } from 'react-router-dom';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Button } from '../../../components/ui/button';
import { IncompleteLink } from '../../../components/incomplete-link';
import { useLinkToken } from '../../../lib/use-link-token';
import { useFinishSignUp } from '../api/finish-sign-up';
import { AuthPanel } from '../components/auth-panel';

export function FinishSignUpRoute() {
  const token = useLinkToken();
  const finish = useFinishSignUp();
  const navigate = useNavigate();
  return (
    <AuthPanel
      title="Finish creating your account"
      intro="One click and your account and organisation are ready."
      footer={
        <Link className="font-semibold text-accent-strong underline underline-offset-4" to="/sign-up">
          Ask for a new link
        </Link>
      }
    >
      {!token ? (
        <IncompleteLink />
      ) : (
        <div className="flex flex-col gap-3">
          {finish.isError && (
            <ErrorBanner title="The account was not created">
              <p>{finish.error.message}</p>
            </ErrorBanner>
          )}
          <Button
            pending={finish.isPending}
            pendingLabel="Creating…"
            onClick={() => finish.mutate(token, { onSuccess: () => navigate('/', { replace: true }) })}
          >
            Create my account
          </Button>
        </div>
      )}
    </AuthPanel>
  );
}
