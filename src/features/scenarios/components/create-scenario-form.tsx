// A new scenario, started from a bundled example or as a copy of another
// scenario in the project. Name and description follow the server's rules.
import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { createScenarioSchema, type ScenarioSummary } from '../../../../shared/api/scenarios';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useCreateScenario } from '../api/create-scenario';
import { scenarioQueryOptions } from '../api/get-scenario';
import { exampleScenarios } from '../../../lib/examples/examples';
import { TEMPLATE_NOTES } from '../../../lib/examples/template-notes';

const EXAMPLE = 'example:';
const COPY = 'copy:';

const createScenarioFormSchema = createScenarioSchema
  .pick({ name: true, description: true })
  .extend({ source: z.string().min(1, { message: 'is required: pick an example or a scenario to copy' }) });

const FIELDS = ['name', 'description', 'source'] as const;

interface CreateScenarioFormProps {
  projectId: string;
  existing: ScenarioSummary[];
  onCreated: (scenario: ScenarioSummary) => void;
  onCancel: () => void;
}

/** A line on what the chosen starting point is, so the examples can be told apart before creating. */
function SourceNote({ source, existing }: { source: string; existing: ScenarioSummary[] }) {
  const example = exampleScenarios.find((e) => `${EXAMPLE}${e.id}` === source);
  const copied = existing.find((s) => `${COPY}${s.id}` === source);
  const note = example ? TEMPLATE_NOTES[example.id] : undefined;
  const text = example
    ? note
      ? `${note.title}: ${note.summary}`
      : example.document.description
    : copied
      ? `A copy of revision ${copied.latestRevision.number} of “${copied.name}”; the original is not changed.`
      : '';
  if (!text) return null;
  return (
    <p className="-mt-1 mb-2 text-sm text-ink-soft" data-source-note>
      {text}
    </p>
  );
}

export function CreateScenarioForm({ projectId, existing, onCreated, onCancel }: CreateScenarioFormProps) {
  const first = exampleScenarios[0];
  const form = useForm({
    resolver: zodResolver(createScenarioFormSchema),
    defaultValues: {
      name: first?.document.name ?? '',
      description: first?.document.description ?? '',
      source: first ? `${EXAMPLE}${first.id}` : '',
    },
  });
  const { errors } = form.formState;
  const createScenario = useCreateScenario(projectId);
  const queryClient = useQueryClient();

  const documentFor = async (source: string) => {
    if (source.startsWith(COPY))
      return (await queryClient.fetchQuery(scenarioQueryOptions(source.slice(COPY.length)))).document;
    const example = exampleScenarios.find((e) => `${EXAMPLE}${e.id}` === source);
    if (!example) throw new Error('The chosen starting point is no longer available; pick another.');
    return example.document;
  };

  /** Offers the example's own name while the user has not typed one of their own. */
  const onSourceChange = (source: string) => {
    const example = exampleScenarios.find((e) => `${EXAMPLE}${e.id}` === source);
    const copied = existing.find((s) => `${COPY}${s.id}` === source);
    const suggestion = example?.document.name ?? (copied ? `Copy of ${copied.name}` : undefined);
    if (suggestion && !form.getFieldState('name').isDirty) form.setValue('name', suggestion);
  };

  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async ({ source, name, description }) => {
    const document = await documentFor(source);
    onCreated(
      await createScenario.mutateAsync({
        name,
        description,
        document: { ...document, name, description: description ?? document.description },
      }),
    );
  });

  const sourceField = form.register('source', { onChange: (event) => onSourceChange(String(event.target.value)) });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="New scenario">
      <FormErrorBanner title="The scenario was not created" failure={failure} />
      <SelectField
        label="Start from"
        hint="Every scenario begins as a complete layout you can then change."
        error={errors.source?.message}
        {...sourceField}
      >
        <option value="">Choose a starting layout…</option>
        {exampleScenarios.length > 0 && (
          <optgroup label="Example layouts">
            {exampleScenarios.map((example) => (
              <option key={example.id} value={`${EXAMPLE}${example.id}`}>
                {example.document.name}
              </option>
            ))}
          </optgroup>
        )}
        {existing.length > 0 && (
          <optgroup label="Copy a scenario of this project">
            {existing.map((scenario) => (
              <option key={scenario.id} value={`${COPY}${scenario.id}`}>
                {scenario.name} (revision {scenario.latestRevision.number})
              </option>
            ))}
          </optgroup>
        )}
      </SelectField>
      <SourceNote source={form.watch('source')} existing={existing} />
      <TextField label="Scenario name" error={errors.name?.message} {...form.register('name')} />
      <TextAreaField
        label="Description (optional)"
        error={errors.description?.message}
        {...form.register('description')}
      />
      <div className="mt-2 flex flex-wrap gap-3">
        <Button
          type="submit"
          pending={createScenario.isPending || form.formState.isSubmitting}
          pendingLabel="Creating…"
        >
          Create scenario
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={createScenario.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
