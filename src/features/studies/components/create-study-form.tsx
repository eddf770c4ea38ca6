// Making a study: pick the scenario and the kind of question, set the run length and replications,
// then what the kind needs (the carrier range, the swept fields, the share to shorten by).
import { useMemo, useState, type FormEvent } from 'react';
import { STUDY_KINDS, type StudyDetail, type StudyKind } from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { sweepableFields } from '../../../../shared/studies/sweepable-fields';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { isApiRequestError } from '../../../lib/api-client';
import { useCreateStudy } from '../api/create-study';
import {
  defaultForm,
  emptyAxis,
  formHours,
  runPlaceOf,
  studyInput,
  type AxisForm,
  type StudyForm,
} from '../utils/study-form';
import { RunPlaceField } from './run-place-field';
import { KIND_HINTS, KIND_LABELS } from '../utils/labels';

export type ScenarioChoice = { id: string; name: string; revisionId: string; revisionNumber: number };

interface CreateStudyFormProps {
  projectId: string;
  scenarios: ScenarioChoice[];
  scenarioId: string;
  onScenarioChange: (id: string) => void;
  /** The chosen scenario's latest revision, once loaded. */
  scenario: Scenario | undefined;
  onCancel: () => void;
  onCreated: (study: StudyDetail) => void;
}

function AxisFields({
  axis,
  index,
  scenario,
  onChange,
}: {
  axis: AxisForm;
  index: number;
  scenario: Scenario;
  onChange: (a: AxisForm) => void;
}) {
  const fields = useMemo(() => sweepableFields(scenario), [scenario]);
  const groups = [...new Set(fields.map((f) => f.group))];
  const chosen = fields.find((f) => f.path === axis.path);
  const set = (patch: Partial<AxisForm>) => onChange({ ...axis, ...patch });
  return (
    <fieldset className="grid gap-3 rounded-md border border-paper-sunk p-3 sm:grid-cols-2">
      <legend className="px-1 text-sm font-semibold">
        {index === 0 ? 'Field to vary' : 'Second field (optional)'}
      </legend>
      <SelectField
        label="Field"
        value={axis.path}
        onChange={(e) => {
          const f = fields.find((x) => x.path === e.target.value);
          set({
            path: e.target.value,
            from: f ? String(Number((f.value * 0.8).toPrecision(4))) : '',
            to: f ? String(Number((f.value * 1.2).toPrecision(4))) : '',
          });
        }}
      >
        <option value="">{index === 0 ? 'Choose a field…' : 'None'}</option>
        {groups.map((g) => (
          <optgroup key={g} label={g}>
            {fields
              .filter((f) => f.group === g)
              .map((f) => (
                <option key={f.path} value={f.path}>
                  {f.label} (now {Number(f.value.toPrecision(6))}
                  {f.unit ? ` ${f.unit}` : ''})
                </option>
              ))}
          </optgroup>
        ))}
      </SelectField>
      {chosen && (
        <>
          <SelectField
            label="Values"
            value={axis.mode}
            onChange={(e) => set({ mode: e.target.value as AxisForm['mode'] })}
          >
            <option value="range">Evenly spaced range</option>
            <option value="list">A list of values</option>
          </SelectField>
          {axis.mode === 'range' ? (
            <div className="grid grid-cols-3 gap-2 sm:col-span-2">
              <TextField
                label="From"
                inputMode="decimal"
                value={axis.from}
                onChange={(e) => set({ from: e.target.value })}
              />
              <TextField label="To" inputMode="decimal" value={axis.to} onChange={(e) => set({ to: e.target.value })} />
              <TextField
                label="Values"
                inputMode="numeric"
                value={axis.count}
                onChange={(e) => set({ count: e.target.value })}
              />
            </div>
          ) : (
            <div className="sm:col-span-2">
              <TextField
                label="Values, separated by commas"
                value={axis.list}
                onChange={(e) => set({ list: e.target.value })}
              />
            </div>
          )}
        </>
      )}
    </fieldset>
  );
}

export function CreateStudyForm({
  projectId,
  scenarios,
  scenarioId,
  onScenarioChange,
  scenario,
  onCancel,
  onCreated,
}: CreateStudyFormProps) {
  const [form, setForm] = useState<StudyForm>(() => defaultForm('carrierSizing', scenario));
  const [loadedFor, setLoadedFor] = useState<Scenario | undefined>(scenario);
  const create = useCreateStudy(projectId);
  const choice = scenarios.find((s) => s.id === scenarioId);
  // A newly loaded scenario brings its own carrier range.
  if (scenario !== loadedFor) {
    setLoadedFor(scenario);
    setForm((f) => ({ ...defaultForm(f.kind, scenario), name: f.name, hours: f.hours, replications: f.replications }));
  }
  const set = (patch: Partial<StudyForm>) => setForm((f) => ({ ...f, ...patch }));
  const hours = scenario ? formHours(form, scenario) : null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!scenario || !choice) return;
    create.mutate(studyInput(form, scenario, choice.revisionId), { onSuccess: onCreated });
  };

  const error = create.error;
  return (
    <form className="flex flex-col gap-4" onSubmit={submit} noValidate aria-label="New study">
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="Scenario" value={scenarioId} onChange={(e) => onScenarioChange(e.target.value)}>
          {scenarios.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name} (revision {s.revisionNumber})
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Question"
          value={form.kind}
          hint={KIND_HINTS[form.kind]}
          onChange={(e) => set({ ...defaultForm(e.target.value as StudyKind, scenario), name: form.name })}
        >
          {STUDY_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
      </div>
      <TextField
        label="Name"
        placeholder={`${KIND_LABELS[form.kind]} of ${choice?.name ?? 'the scenario'}`}
        value={form.name}
        onChange={(e) => set({ name: e.target.value })}
      />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <TextField
          label="Hours per replication"
          inputMode="decimal"
          value={form.hours}
          onChange={(e) => set({ hours: e.target.value })}
        />
        <TextField
          label="Warm-up (min)"
          inputMode="decimal"
          value={form.warmupMinutes}
          onChange={(e) => set({ warmupMinutes: e.target.value })}
        />
        <TextField
          label="Replications"
          inputMode="numeric"
          value={form.replications}
          onChange={(e) => set({ replications: e.target.value })}
        />
        <TextField label="Seed" value={form.seed} onChange={(e) => set({ seed: e.target.value })} />
      </div>
      {!scenario && <p className="text-sm text-ink-soft">Loading the scenario…</p>}
      {scenario && form.kind === 'carrierSizing' && (
        <div className="grid grid-cols-3 gap-3">
          <TextField
            label="Fewest carriers"
            hint="One per station"
            inputMode="numeric"
            value={form.carriersFrom}
            onChange={(e) => set({ carriersFrom: e.target.value })}
          />
          <TextField
            label="Most carriers"
            hint="Below gridlock: one fewer than the smallest loop holds"
            inputMode="numeric"
            value={form.carriersTo}
            onChange={(e) => set({ carriersTo: e.target.value })}
          />
          <TextField
            label="Counts to try"
            hint="About this many"
            inputMode="numeric"
            value={form.carrierPoints}
            onChange={(e) => set({ carrierPoints: e.target.value })}
          />
        </div>
      )}
      {scenario && form.kind === 'sweep' && (
        <div className="flex flex-col gap-3">
          {form.axes.map((axis, i) => (
            <AxisFields
              key={i}
              axis={axis}
              index={i}
              scenario={scenario}
              onChange={(a) => set({ axes: form.axes.map((x, j) => (j === i ? a : x)) })}
            />
          ))}
          {form.axes.length === 1 && form.axes[0].path && (
            <Button variant="quiet" className="self-start" onClick={() => set({ axes: [...form.axes, emptyAxis()] })}>
              Add a second field (heatmap)
            </Button>
          )}
        </div>
      )}
      {scenario && form.kind === 'whatIf' && (
        <TextField
          label="Shorten each station’s mean cycle time by (%)"
          inputMode="decimal"
          value={form.reductionPercent}
          onChange={(e) => set({ reductionPercent: e.target.value })}
        />
      )}
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={form.commonRandomNumbers}
          onChange={(e) => set({ commonRandomNumbers: e.target.checked })}
        />
        Same random numbers at every point (differences between points are then paired and sharper)
      </label>
      <RunPlaceField
        value={runPlaceOf(form, hours)}
        chosen={form.runOn !== 'auto'}
        hours={hours}
        onChange={(runOn) => set({ runOn })}
      />
      {error && (
        <ErrorBanner title="The study was not made">
          {isApiRequestError(error) && error.fields.length > 0 ? (
            <ul className="list-disc pl-5">
              {error.fields.map((f) => (
                <li key={`${f.path}${f.message}`}>
                  <code>{f.path}</code> {f.message}
                </li>
              ))}
            </ul>
          ) : (
            error.message
          )}
        </ErrorBanner>
      )}
      <div className="flex gap-3">
        <Button type="submit" pending={create.isPending} pendingLabel="Making the study…" disabled={!scenario}>
          Make and run the study
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
