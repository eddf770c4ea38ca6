// How long and how often to simulate, checked against the same schema the engine and the server
// use. Issues the engine finds in the settings (too many carriers for the track) land beside the field.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { runSettingsSchema, type RunSettings, type RunSettingsInput } from '../../../../shared/scenario/run-settings';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import {
  DEFAULT_SETTINGS,
  newSeed,
  numberOrUndefined,
  seedFromText,
  SETTINGS_LABELS,
  settingsMessage,
  type SettingsField,
} from '../utils/settings-form';

interface RunSettingsFormProps {
  /** The scenario's own carrier count, offered as the default. */
  scenarioCarriers: number;
  initial?: RunSettingsInput;
  running: boolean;
  /** Issues the engine raised against the settings, placed beside their fields. */
  engineIssues?: readonly { field: SettingsField; message: string }[];
  onRun: (settings: RunSettings) => void;
}

export function RunSettingsForm({
  scenarioCarriers,
  initial = DEFAULT_SETTINGS,
  running,
  engineIssues,
  onRun,
}: RunSettingsFormProps) {
  const form = useForm<RunSettingsInput, unknown, RunSettings>({
    resolver: zodResolver(runSettingsSchema),
    defaultValues: initial,
    mode: 'onTouched',
  });
  const { errors } = form.formState;

  useEffect(() => {
    engineIssues?.forEach((issue, i) =>
      form.setError(issue.field, { type: 'engine', message: issue.message }, { shouldFocus: i === 0 }),
    );
  }, [engineIssues, form]);

  const errorOf = (field: SettingsField) => {
    const message = errors[field]?.message;
    return message ? settingsMessage(field, message) : undefined;
  };
  const numeric = { setValueAs: numberOrUndefined };

  return (
    <form noValidate aria-label="Run settings" onSubmit={form.handleSubmit(onRun)} className="flex flex-col gap-2">
      <fieldset disabled={running} className="grid grid-cols-1 gap-x-4 sm:grid-cols-2 lg:grid-cols-5">
        <legend className="sr-only">Run settings</legend>
        <TextField
          label={SETTINGS_LABELS.hours}
          hint="After warm-up, per replication"
          type="number"
          inputMode="decimal"
          step="any"
          min={0}
          error={errorOf('hours')}
          {...form.register('hours', numeric)}
        />
        <TextField
          label={SETTINGS_LABELS.warmupMinutes}
          hint="Simulated, not counted"
          type="number"
          inputMode="decimal"
          step="any"
          min={0}
          error={errorOf('warmupMinutes')}
          {...form.register('warmupMinutes', numeric)}
        />
        <TextField
          label={SETTINGS_LABELS.replications}
          hint="Independent repeats"
          type="number"
          inputMode="numeric"
          step={1}
          min={1}
          error={errorOf('replications')}
          {...form.register('replications', numeric)}
        />
        <div className="flex flex-col">
          <TextField
            label={SETTINGS_LABELS.seed}
            hint="Same seed, same result"
            inputMode="numeric"
            autoComplete="off"
            error={errorOf('seed')}
            {...form.register('seed', { setValueAs: seedFromText })}
          />
          <Button
            variant="quiet"
            className="-mt-4 self-start px-0"
            onClick={() => form.setValue('seed', newSeed(), { shouldValidate: true, shouldDirty: true })}
          >
            New seed
          </Button>
        </div>
        <TextField
          label={SETTINGS_LABELS.carriers}
          hint={`Empty: the scenario's ${scenarioCarriers}`}
          type="number"
          inputMode="numeric"
          step={1}
          min={1}
          placeholder={String(scenarioCarriers)}
          error={errorOf('carriers')}
          {...form.register('carriers', numeric)}
        />
      </fieldset>
      <div>
        <Button type="submit" pending={running} pendingLabel="Running…">
          Run simulation
        </Button>
      </div>
    </form>
  );
}
