// The sign-in form, checked with the same schema the server uses.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { signInSchema } from '../../../../shared/api/auth';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useSignIn } from '../api/sign-in';

const FIELDS = ['email', 'password'] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const form = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const { errors } = form.formState;
  const signIn = useSignIn();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    await signIn.mutateAsync(values);
    onSignedIn();
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Sign in">
      <FormErrorBanner title="Sign-in failed" failure={failure} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button
        type="submit"
        pending={signIn.isPending}
        pendingLabel="Signing in…"
        className="mt-2 self-stretch sm:self-start"
      >
        Sign in
      </Button>
    </form>
  );
}
