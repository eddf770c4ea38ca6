// One station: where it stands, how it works, its cycle time (with the time studies measured for it) and, optionally, its failures.
import { useFormContext, useWatch } from 'react-hook-form';
import { STATION_OPERATIONS } from '../../../../../../shared/scenario/process';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { DistributionEditor } from '../distribution-editor';
import { CheckField, NumberField, SelectField, TextField } from '../fields';

/**
 * Station cycle times on carrier lines run from a fraction of a second (a pick or a press stroke) to
 * several minutes (a manual fitting or a leak test): common trade practice, not a standard.
 */
const CYCLE_TIME_RANGE = { minSeconds: 0.2, maxSeconds: 3600 };

const DEFAULT_FAILURES = {
  timeBetweenFailuresSeconds: { kind: 'exponential', mean: 3600 },
  timeToRepairSeconds: { kind: 'lognormal', mean: 120, cv: 0.5 },
} as const;

export function StationDetails({ stepIndex, stationIndex }: { stepIndex: number; stationIndex: number }) {
  const base = `steps.${stepIndex}.stations.${stationIndex}` as const;
  const { setValue } = useFormContext<ScenarioForm>();
  const { readOnly, scenarioId, stationStudies } = useEditor();
  const stationId = useWatch<ScenarioForm, `steps.${number}.stations.${number}.id`>({ name: `${base}.id` });
  const stationName = useWatch<ScenarioForm, `steps.${number}.stations.${number}.name`>({ name: `${base}.name` });
  const lanes = useWatch<ScenarioForm, 'lanes'>({ name: 'lanes' }) ?? [];
  const failures = useWatch<ScenarioForm, `steps.${number}.stations.${number}.failures`>({ name: `${base}.failures` });
  const toggleFailures = (on: boolean) =>
    setValue(`${base}.failures`, on ? structuredClone(DEFAULT_FAILURES) : undefined, {
      shouldDirty: true,
      shouldValidate: true,
    });
  return (
    <div
      className="flex flex-col gap-3 rounded-md border border-accent/40 bg-paper p-3"
      data-station-details={`${stepIndex}.${stationIndex}`}
    >
      <div className="grid grid-cols-2 gap-3">
        <TextField name={`${base}.id`} label="Station id" />
        <TextField name={`${base}.name`} label="Station name" />
        <SelectField
          name={`${base}.laneId`}
          label="Lane"
          options={lanes.map((lane) => ({
            value: lane?.id ?? '',
            label: `${lane?.id ?? ''}${lane?.name ? ` — ${lane.name}` : ''}`,
          }))}
        />
        <NumberField
          name={`${base}.positionMm`}
          label="Position (mm)"
          hint="Where the carrier's front stops, from the lane's start."
        />
        <SelectField
          name={`${base}.operation`}
          label="Operation"
          options={STATION_OPERATIONS.map((o) => ({ value: o, label: o }))}
        />
        <div className="pt-5">
          <CheckField name={`${base}.pausesForBreaks`} label="Pauses for breaks" />
        </div>
      </div>
      <DistributionEditor name={`${base}.cycleTimeSeconds`} label="Cycle time" plausible={CYCLE_TIME_RANGE} />
      {scenarioId &&
        stationStudies?.({
          scenarioId,
          stationId: stationId ?? '',
          stationName: stationName || stationId || 'this station',
          canEdit: !readOnly,
          onUse: (d) => setValue(`${base}.cycleTimeSeconds`, d, { shouldDirty: true, shouldValidate: true }),
        })}
      <label className="flex items-center gap-2 text-sm text-ink">
        <input
          type="checkbox"
          className="size-4 accent-accent"
          checked={failures !== undefined}
          disabled={readOnly}
          onChange={(e) => toggleFailures(e.target.checked)}
        />
        This station fails now and then
      </label>
      {failures !== undefined && (
        <>
          <DistributionEditor
            name={`${base}.failures.timeBetweenFailuresSeconds`}
            label="Operating time between failures (MTBF)"
          />
          <DistributionEditor name={`${base}.failures.timeToRepairSeconds`} label="Time to repair (MTTR)" />
        </>
      )}
    </div>
  );
}
