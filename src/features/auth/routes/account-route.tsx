// /account: the signed-in person's own password and the other browsers signed in as them.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { changePasswordSchema } from '../../../../shared/api/account';
import { PASSWORD_MIN_LENGTH } from '../../../../shared/api/auth';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TitledCard } from '../../../components/ui/card';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { TextField } from '../../../components/ui/field';
import { PageHeader } from '../../../components/ui/page-header';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useChangePassword, useSignOutOtherSessions } from '../api/account';
import { useSession } from '../../../lib/session/session-context';

const FIELDS = ['currentPassword', 'newPassword'] as const;
const ended = (n: number) =>
  n === 0 ? 'No other browser was signed in.' : `${n} other session${n === 1 ? '' : 's'} signed out.`;

function ChangePasswordForm() {
  const form = useForm({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const change = useChangePassword();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    await change.mutateAsync(values);
    form.reset();
  });
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-2" aria-label="Change password">
      <FormErrorBanner title="The password was not changed" failure={failure} />
      {change.isSuccess && (
        <p role="status" className="font-medium text-ink">
          Password changed. {ended(change.data.ended)}
        </p>
      )}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...form.register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. Other browsers signed in as you are signed out.`}
        error={errors.newPassword?.message}
        {...form.register('newPassword')}
      />
      <Button type="submit" pending={change.isPending} pendingLabel="Saving…" className="mt-2 self-start">
        Change password
      </Button>
    </form>
  );
}

function OtherSessions() {
  const signOut = useSignOutOtherSessions();
  return (
    <div className="flex flex-col items-start gap-3">
      <p className="max-w-prose text-ink-soft">
        Signed in on a shared or lost computer? End every session except this one.
      </p>
      <Button
        variant="secondary"
        pending={signOut.isPending}
        pendingLabel="Signing out…"
        onClick={() => signOut.mutate()}
      >
        Sign out other sessions
      </Button>
      {signOut.isSuccess && <p role="status">{ended(signOut.data.ended)}</p>}
      {signOut.isError && (
        <ErrorBanner title="Nothing was signed out">
          <p>{signOut.error.message}</p>
        </ErrorBanner>
      )}
    </div>
  );
}

export function AccountRoute() {
  const { user } = useSession();
  return (
    <div className="flex flex-col gap-8">
      <PageHeader title="Your account" description={`${user.name}, signed in as ${user.email}.`} />
      <TitledCard title="Password">
        <ChangePasswordForm />
      </TitledCard>
      <TitledCard title="Sessions">
        <OtherSessions />
      </TitledCard>
    </div>
  );
}
