// Carrier count, size and motion; empty carriers may move faster than loaded ones.
import { useFormContext, useWatch } from 'react-hook-form';
import { useEditor, type ScenarioForm } from '../../editor-context';
import { NumberField } from '../fields';
import { SectionHeading } from '../row-actions';

function MotionFields({ prefix, title }: { prefix: 'carriers.loaded' | 'carriers.empty'; title: string }) {
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-paper-sunk p-3">
      <legend className="px-1 text-xs font-semibold text-ink">{title}</legend>
      <div className="grid grid-cols-3 gap-3">
        <NumberField name={`${prefix}.vMaxMmPerS`} label="Top speed (mm/s)" />
        <NumberField name={`${prefix}.aMaxMmPerS2`} label="Acceleration (mm/s²)" />
        <NumberField name={`${prefix}.jMaxMmPerS3`} label="Jerk (mm/s³)" hint="Empty for a trapezoidal move." />
      </div>
    </fieldset>
  );
}

export function CarriersSection() {
  const { setValue, getValues } = useFormContext<ScenarioForm>();
  const { readOnly } = useEditor();
  const empty = useWatch<ScenarioForm, 'carriers.empty'>({ name: 'carriers.empty' });
  const sameAsLoaded = empty === undefined;
  const toggle = (same: boolean) =>
    setValue('carriers.empty', same ? undefined : { ...getValues('carriers.loaded') }, {
      shouldDirty: true,
      shouldValidate: true,
    });
  return (
    <div className="flex flex-col gap-5">
      <SectionHeading
        title="Carriers"
        description="Carriers never pass each other on a lane and keep at least the minimum gap, so a lane holds a bounded number."
      />
      <div className="grid grid-cols-3 gap-3">
        <NumberField name="carriers.count" label="Carrier count" step="1" />
        <NumberField name="carriers.lengthMm" label="Carrier length (mm)" />
        <NumberField name="carriers.minGapMm" label="Minimum gap (mm)" />
      </div>
      <MotionFields prefix="carriers.loaded" title="Motion with a part on board" />
      <label className="flex items-center gap-2 text-sm text-ink">
        <input
          type="checkbox"
          className="size-4 accent-accent"
          checked={sameAsLoaded}
          disabled={readOnly}
          onChange={(e) => toggle(e.target.checked)}
        />
        Empty carriers move like loaded ones
      </label>
      {!sameAsLoaded && <MotionFields prefix="carriers.empty" title="Motion when empty" />}
    </div>
  );
}
