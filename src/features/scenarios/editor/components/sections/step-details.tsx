// One process step: its kind and dispatch rule, inspection shares, and the stations serving it.
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import {
  DEFAULT_DISPATCH,
  DISPATCH_RULES,
  STEP_KINDS,
  type Step,
  type StepKind,
} from '../../../../../../shared/scenario/process';
import { distributionSchema } from '../../../../../../shared/scenario/distribution';
import { distributionMean } from '../../../../../../workers/engine/stats/distribution-moments';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { useIssueCount } from '../../hooks/use-has-issues';
import { freeId, newStation, stepOfKind } from '../../utils/defaults';
import { ListIssue, NumberField, SelectField, TextField } from '../fields';
import { PickRow, SectionHeading, SmallButton } from '../row-actions';
import { StationDetails } from './station-details';

const DISPATCH_LABELS: Record<(typeof DISPATCH_RULES)[number], string> = {
  pooled: 'Pooled: decided where the routes part',
  firstFree: 'First free, fixed at the previous step',
  shortestQueue: 'Shortest queue, fixed at the previous step',
  roundRobin: 'In turn, fixed at the previous step',
};

type DraftStation = NonNullable<NonNullable<ScenarioForm['steps']>[number]['stations']>[number];

function StationRow({
  stepIndex,
  index,
  station,
  selected,
  onPick,
}: {
  stepIndex: number;
  index: number;
  station: Partial<DraftStation> | undefined;
  selected: boolean;
  onPick: () => void;
}) {
  const issues = useIssueCount(`steps.${stepIndex}.stations.${index}`);
  const parsed = distributionSchema.safeParse(station?.cycleTimeSeconds);
  return (
    <PickRow
      selected={selected}
      onPick={onPick}
      invalid={issues > 0}
      label={`Station ${station?.id ?? index + 1}${issues > 0 ? `, ${issues} problem${issues === 1 ? '' : 's'}` : ''}`}
    >
      <span className="w-14 truncate font-mono text-xs">{station?.id}</span>
      <span className="flex-1 truncate">{station?.name}</span>
      <span className="w-16 truncate text-xs text-ink-soft">{station?.laneId}</span>
      <span className="w-16 text-right text-xs tabular-nums">
        {typeof station?.positionMm === 'number' ? `${station.positionMm} mm` : '—'}
      </span>
      <span className="w-14 text-right text-xs tabular-nums">
        {parsed.success ? `${distributionMean(parsed.data).toFixed(1)} s` : '—'}
      </span>
    </PickRow>
  );
}

export function StepDetails({ stepIndex }: { stepIndex: number }) {
  const base = `steps.${stepIndex}` as const;
  const { control, getValues, setValue } = useFormContext<ScenarioForm>();
  const { readOnly, selection, select } = useEditor();
  const stations = useFieldArray({ control, name: `${base}.stations` });
  const kind = useWatch<ScenarioForm, `steps.${number}.kind`>({ name: `${base}.kind` });
  const values = useWatch<ScenarioForm, `steps.${number}.stations`>({ name: `${base}.stations` }) ?? [];
  const steps = useWatch<ScenarioForm, 'steps'>({ name: 'steps' }) ?? [];
  const selected =
    selection?.kind === 'station' &&
    selection.stepIndex === stepIndex &&
    selection.stationIndex < stations.fields.length
      ? selection.stationIndex
      : null;

  const changeKind = (next: StepKind) => {
    const current = getValues(base);
    if (current)
      setValue(
        base,
        stepOfKind(next, {
          ...current,
          stations: (current.stations ?? []) as Step['stations'],
          dispatch: current.dispatch ?? DEFAULT_DISPATCH,
        }),
        { shouldDirty: true, shouldValidate: true },
      );
  };
  const addStation = (copyOf?: number) => {
    const all = (getValues('steps') ?? []).flatMap((s) => s.stations ?? []);
    const id = freeId(
      String(getValues(`${base}.id`) || 'ST').toUpperCase(),
      all.map((s) => s.id),
    );
    const source = copyOf === undefined ? undefined : getValues(`${base}.stations.${copyOf}`);
    const laneId = getValues('lanes')?.[0]?.id ?? '';
    const item = (
      source ? { ...structuredClone(source), id, name: `${source.name} copy` } : newStation(id, laneId, 1000)
    ) as DraftStation;
    stations.append(item);
    select({ kind: 'station', stepIndex, stationIndex: stations.fields.length });
  };
  const removeStation = (index: number) => {
    stations.remove(index);
    select(null);
  };

  return (
    <div className="flex flex-col gap-4" data-step-details={stepIndex}>
      <div className="grid grid-cols-2 gap-3">
        <TextField name={`${base}.id`} label="Step id" />
        <TextField name={`${base}.name`} label="Step name" />
        <label className="flex flex-col gap-1 text-xs font-semibold text-ink">
          Kind
          <select
            value={kind}
            disabled={readOnly}
            onChange={(e) => changeKind(e.target.value as StepKind)}
            className="rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm font-normal disabled:bg-paper-sunk"
          >
            {STEP_KINDS.map((k) => (
              <option key={k} value={k}>
                {k}
              </option>
            ))}
          </select>
          <ListIssue name={`${base}.kind`} />
        </label>
        <SelectField
          name={`${base}.dispatch`}
          label="Dispatch among its stations"
          options={DISPATCH_RULES.map((r) => ({ value: r, label: DISPATCH_LABELS[r] }))}
        />
      </div>
      {kind === 'inspect' && (
        <div className="grid grid-cols-3 gap-3">
          <NumberField name={`${base}.rejectShare`} label="Reject share (0–1)" />
          <NumberField name={`${base}.reworkShare`} label="Rework share (0–1)" />
          <SelectField
            name={`${base}.reworkStepId`}
            label="Rework goes back to"
            emptyMeansNone
            options={[
              { value: '', label: 'no rework' },
              ...steps
                .slice(1, stepIndex + 1)
                .map((s) => ({ value: s?.id ?? '', label: `${s?.name ?? ''} (${s?.id ?? ''})` })),
            ]}
          />
        </div>
      )}
      <SectionHeading
        title={`Stations (${stations.fields.length})`}
        description="Parallel stations share the step's work; the dispatch rule picks among them."
      >
        <SmallButton onClick={() => addStation()}>Add station</SmallButton>
        {selected !== null && <SmallButton onClick={() => addStation(selected)}>Duplicate</SmallButton>}
        {selected !== null && <SmallButton onClick={() => removeStation(selected)}>Remove station</SmallButton>}
      </SectionHeading>
      <ListIssue name={`${base}.stations`} />
      <div
        className="max-h-60 overflow-y-auto rounded-md border border-paper-sunk"
        role="list"
        aria-label="Stations of this step"
      >
        {stations.fields.map((field, i) => (
          <div role="listitem" key={field.id}>
            <StationRow
              stepIndex={stepIndex}
              index={i}
              station={values[i]}
              selected={selected === i}
              onPick={() => select({ kind: 'station', stepIndex, stationIndex: i })}
            />
          </div>
        ))}
        {stations.fields.length === 0 && <p className="p-2 text-sm text-ink-soft">No stations serve this step yet.</p>}
      </div>
      {selected !== null && (
        <StationDetails key={stations.fields[selected]?.id} stepIndex={stepIndex} stationIndex={selected} />
      )}
    </div>
  );
}
