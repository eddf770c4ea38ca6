// Creating an account: the person, their organisation and a password.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH, signUpSchema } from '../../../../shared/api/auth';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useSignUp } from '../api/sign-up';

const FIELDS = ['name', 'organisationName', 'email', 'password'] as const;

export function SignUpForm({ onAsked }: { onAsked: (message: string) => void }) {
  const form = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', organisationName: '', email: '', password: '' },
  });
  const { errors } = form.formState;
  const signUp = useSignUp();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    const answer = await signUp.mutateAsync(values);
    onAsked(answer.message);
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Create an account">
      <FormErrorBanner title="The account was not created" failure={failure} />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <TextField
        label="Organisation"
        hint="The company or team whose lines you plan. You become its owner and can invite colleagues."
        autoComplete="organization"
        error={errors.organisationName?.message}
        {...form.register('organisationName')}
      />
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
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button
        type="submit"
        pending={signUp.isPending}
        pendingLabel="Creating your account…"
        className="mt-2 self-stretch sm:self-start"
      >
        Create account
      </Button>
    </form>
  );
}
