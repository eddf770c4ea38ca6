// /reset-password#<token>: choose a new password with the e-mailed link. Afterwards every session of the
// account has ended, this one too, so the person signs in afresh.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { z } from 'zod';
import { passwordSchema, PASSWORD_MIN_LENGTH } from '../../../../shared/api/auth';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button, ButtonLink } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { IncompleteLink } from '../../../components/incomplete-link';
import { useLinkToken } from '../../../lib/use-link-token';
import { useResetPassword } from '../api/password-reset';
import { AuthPanel } from '../components/auth-panel';

const formSchema = z.object({ password: passwordSchema });
const FIELDS = ['password'] as const;

export function ResetPasswordRoute() {
  const token = useLinkToken();
  const form = useForm({ resolver: zodResolver(formSchema), defaultValues: { password: '' } });
  const reset = useResetPassword();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async ({ password }) => {
    await reset.mutateAsync({ token: token ?? '', password });
  });
  return (
    <AuthPanel
      title="Choose a new password"
      intro="Your new password replaces the old one, and every browser signed in to your account is signed out."
      footer={
        <Link className="font-semibold text-accent-strong underline underline-offset-4" to="/forgot-password">
          Ask for a new link
        </Link>
      }
    >
      {!token ? (
        <IncompleteLink />
      ) : reset.isSuccess ? (
        <div role="status" className="flex flex-col gap-3">
          <p className="font-semibold text-ink">Your password is changed. Sign in with the new one.</p>
          <ButtonLink variant="primary" to="/sign-in" className="self-start">
            Sign in
          </ButtonLink>
        </div>
      ) : (
        <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Choose a new password">
          <FormErrorBanner title="The password was not changed" failure={failure} />
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            error={form.formState.errors.password?.message}
            {...form.register('password')}
          />
          <Button
            type="submit"
            pending={reset.isPending}
            pendingLabel="Saving…"
            className="mt-2 self-stretch sm:self-start"
          >
            Save the new password
          </Button>
        </form>
      )}
    </AuthPanel>
  );
}
