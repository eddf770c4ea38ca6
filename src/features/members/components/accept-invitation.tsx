// Answering an invitation from its e-mailed link. Signed in as the invitee: one click. New to Lanewright:
// a name and a password make the account. An account but signed out: sign in first, then come back.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { passwordSchema, PASSWORD_MIN_LENGTH } from '../../../../shared/api/auth';
import { nameSchema } from '../../../../shared/api/common';
import type { AcceptedInvitation, InvitationPreview } from '../../../../shared/api/invitations';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button, ButtonLink } from '../../../components/ui/button';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { TextField } from '../../../components/ui/field';
import { PageSpinner } from '../../../components/ui/spinner';
import { formatDateTime } from '../../../lib/format';
import { IncompleteLink } from '../../../components/incomplete-link';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useAcceptInvitation, useInvitationPreview } from '../api/invitations';

const newAccountSchema = z.object({ name: nameSchema, password: passwordSchema });
const FIELDS = ['name', 'password'] as const;

interface AcceptInvitationProps {
  token: string | null;
  /** The e-mail of whoever is signed in on this browser, if anyone. */
  signedInAs: string | null;
  /** Where "sign in first" leads, coming back to this page afterwards. */
  signInPath: string;
  onJoined: (accepted: AcceptedInvitation) => void;
}

function NewAccountForm({ token, onJoined }: { token: string; onJoined: AcceptInvitationProps['onJoined'] }) {
  const form = useForm({ resolver: zodResolver(newAccountSchema), defaultValues: { name: '', password: '' } });
  const accept = useAcceptInvitation();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) =>
    onJoined(await accept.mutateAsync({ token, ...values })),
  );
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Create your account and join">
      <FormErrorBanner title="You have not joined yet" failure={failure} />
      <TextField
        label="Your name"
        autoComplete="name"
        error={form.formState.errors.name?.message}
        {...form.register('name')}
      />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" pending={accept.isPending} pendingLabel="Joining…" className="mt-2 self-start">
        Create account and join
      </Button>
    </form>
  );
}

function Invitation({ preview }: { preview: InvitationPreview }) {
  return (
    <p className="text-ink">
      {preview.invitedByName ?? 'An owner'} invites <strong>{preview.email}</strong> to{' '}
      <strong>{preview.organisationName}</strong> as {preview.role === 'engineer' ? 'an' : 'a'}{' '}
      <strong>{preview.role}</strong>. The link works until {formatDateTime(preview.expiresAt)}.
    </p>
  );
}

export function AcceptInvitation({ token, signedInAs, signInPath, onJoined }: AcceptInvitationProps) {
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation();
  if (!token) {
    return <IncompleteLink />;
  }
  if (preview.isPending) return <PageSpinner label="Reading the invitation…" />;
  if (preview.isError) {
    return (
      <ErrorBanner title="This invitation cannot be used">
        <p>{preview.error.message} Ask the owner who invited you to resend it.</p>
      </ErrorBanner>
    );
  }
  const invitation = preview.data;
  const signedInAsInvitee = signedInAs === invitation.email;
  return (
    <div className="flex flex-col gap-4">
      <Invitation preview={invitation} />
      {signedInAs && !signedInAsInvitee && (
        <ErrorBanner title="You are signed in as someone else">
          <p>
            This browser is signed in as {signedInAs}. Sign out, then open the link from the mail again to accept as{' '}
            {invitation.email}.
          </p>
        </ErrorBanner>
      )}
      {signedInAsInvitee && (
        <div className="flex flex-col items-start gap-2">
          {accept.isError && (
            <ErrorBanner title="You have not joined yet">
              <p>{accept.error.message}</p>
            </ErrorBanner>
          )}
          <Button
            pending={accept.isPending}
            pendingLabel="Joining…"
            onClick={() => accept.mutate({ token }, { onSuccess: onJoined })}
          >
            Join {invitation.organisationName}
          </Button>
        </div>
      )}
      {!signedInAs && invitation.accountExists && (
        <div className="flex flex-col items-start gap-2">
          <p className="text-ink-soft">
            {invitation.email} already has a Lanewright account. Sign in with it and you come back here to accept.
          </p>
          <ButtonLink variant="primary" to={signInPath}>
            Sign in to accept
          </ButtonLink>
        </div>
      )}
      {!signedInAs && !invitation.accountExists && <NewAccountForm token={token} onJoined={onJoined} />}
    </div>
  );
}
