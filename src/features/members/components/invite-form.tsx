// Inviting someone by e-mail with a role. The answer is the same whether or not they have an account.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { inviteMemberSchema } from '../../../../shared/api/invitations';
import { roleSchema } from '../../../../shared/api/roles';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useInvite } from '../api/invitations';
import { ROLE_NOTES } from './role-notes';

const FIELDS = ['email', 'role'] as const;

export function InviteForm({ organisationId }: { organisationId: string }) {
  const form = useForm({
    resolver: zodResolver(inviteMemberSchema),
    defaultValues: { email: '', role: 'engineer' as const },
  });
  const invite = useInvite(organisationId);
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    await invite.mutateAsync(values);
    form.reset({ email: '', role: values.role });
  });
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Invite a member">
      <FormErrorBanner title="No invitation was sent" failure={failure} />
      {invite.isSuccess && (
        <p role="status" className="font-medium text-ink">
          Invitation mailed to {invite.data.email}. They join once they accept.
        </p>
      )}
      <div className="grid gap-x-4 sm:grid-cols-[2fr_1fr]">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          error={errors.email?.message}
          {...form.register('email')}
        />
        <SelectField label="Role" error={errors.role?.message} {...form.register('role')}>
          {roleSchema.options.map((role) => (
            <option key={role} value={role}>
              {role}
            </option>
          ))}
        </SelectField>
      </div>
      <p className="text-sm text-ink-soft">{ROLE_NOTES}</p>
      <Button type="submit" pending={invite.isPending} pendingLabel="Sending…" className="mt-2 self-start">
        Send invitation
      </Button>
    </form>
  );
}
