// Independent carriers, or the same process on a constant-speed belt as a baseline to compare with.
import { useFormContext, useWatch } from 'react-hook-form';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { conveyorOfKind } from '../../utils/defaults';
import { NumberField } from '../fields';
import { SectionHeading } from '../row-actions';

export function ConveyorSection() {
  const { setValue, getValues } = useFormContext<ScenarioForm>();
  const { readOnly } = useEditor();
  const kind = useWatch<ScenarioForm, 'conveyor.kind'>({ name: 'conveyor.kind' }) ?? 'carriers';
  const choose = (next: 'carriers' | 'belt') => {
    const length = Number(getValues('carriers.lengthMm'));
    setValue('conveyor', conveyorOfKind(next, Number.isFinite(length) ? length : 0), {
      shouldDirty: true,
      shouldValidate: true,
    });
  };
  return (
    <div className="flex flex-col gap-5">
      <SectionHeading
        title="Conveyor"
        description="Run the layout with independent carriers, or as a belt baseline to show what the carriers gain."
      />
      <div role="radiogroup" aria-label="Conveyor mode" className="flex flex-col gap-2">
        {(
          [
            [
              'carriers',
              'Independent carriers',
              'Each carrier moves on its own motion profile and stops at any position.',
            ],
            [
              'belt',
              'Belt baseline',
              'Pallets ride at constant belt speed, queue at a fixed pitch and need a stop-and-locate time at each station.',
            ],
          ] as const
        ).map(([value, label, hint]) => (
          <label key={value} className="flex items-start gap-2 text-sm">
            <input
              type="radio"
              name="conveyor-kind"
              value={value}
              checked={kind === value}
              disabled={readOnly}
              onChange={() => choose(value)}
              className="mt-1 accent-accent"
            />
            <span>
              <span className="font-semibold text-ink">{label}</span>
              <span className="block text-ink-soft">{hint}</span>
            </span>
          </label>
        ))}
      </div>
      {kind === 'belt' && (
        <div className="grid grid-cols-3 gap-3">
          <NumberField name="conveyor.speedMmPerS" label="Belt speed (mm/s)" />
          <NumberField name="conveyor.stopAndLocateSeconds" label="Stop and locate (s)" />
          <NumberField name="conveyor.pitchMm" label="Pallet pitch (mm)" />
        </div>
      )}
    </div>
  );
}
