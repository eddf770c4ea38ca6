// A new project in the active organisation.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { Project } from '../../../../shared/api/projects';
import { createProjectSchema } from '../../../../shared/api/projects';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useCreateProject } from '../api/create-project';

const FIELDS = ['name', 'description'] as const;

interface CreateProjectFormProps {
  organisationId: string;
  onCreated: (project: Project) => void;
  onCancel: () => void;
}

export function CreateProjectForm({ organisationId, onCreated, onCancel }: CreateProjectFormProps) {
  const form = useForm({
    resolver: zodResolver(createProjectSchema),
    defaultValues: { name: '', description: '', organisationId },
  });
  const { errors } = form.formState;
  const createProject = useCreateProject();
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) =>
    onCreated(await createProject.mutateAsync(values)),
  );

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="New project">
      <FormErrorBanner title="The project was not created" failure={failure} />
      <TextField
        label="Project name"
        hint="For example the line or the customer job it belongs to."
        error={errors.name?.message}
        {...form.register('name')}
      />
      <TextAreaField
        label="Description (optional)"
        error={errors.description?.message}
        {...form.register('description')}
      />
      <div className="mt-2 flex flex-wrap gap-3">
        <Button type="submit" pending={createProject.isPending} pendingLabel="Creating…">
          Create project
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={createProject.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
