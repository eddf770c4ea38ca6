// /forgot-password: asks for a reset link. The answer reads the same for every address.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { requestPasswordResetSchema } from '../../../../shared/api/account';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useRequestPasswordReset } from '../api/password-reset';
import { AuthPanel } from '../components/auth-panel';
import { MailSentNotice } from '../components/mail-sent-notice';

const FIELDS = ['email'] as const;

export function ForgotPasswordRoute() {
  const form = useForm({ resolver: zodResolver(requestPasswordResetSchema), defaultValues: { email: '' } });
  const request = useRequestPasswordReset();
  const [sent, setSent] = useState<string | null>(null);
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    setSent((await request.mutateAsync(values)).message);
  });
  return (
    <AuthPanel
      title="Forgot your password?"
      intro="Enter the e-mail you sign in with and we send a link to choose a new password."
      footer={
        <Link className="font-semibold text-accent-strong underline underline-offset-4" to="/sign-in">
          Back to sign-in
        </Link>
      }
    >
      {sent ? (
        <MailSentNotice message={sent} />
      ) : (
        <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Ask for a password link">
          <FormErrorBanner title="No link was sent" failure={failure} />
          <TextField
            label="E-mail"
            type="email"
            autoComplete="email"
            error={form.formState.errors.email?.message}
            {...form.register('email')}
          />
          <Button
            type="submit"
            pending={request.isPending}
            pendingLabel="Sending…"
            className="mt-2 self-stretch sm:self-start"
          >
            Send me a link
          </Button>
        </form>
      )}
    </AuthPanel>
  );
}
