// One random time (cycle time, time between failures, time to repair): a kind picker, the kind's
// parameters and a small picture of its shape with its mean and coefficient of variation.
import { useId } from 'react';
import { useFormContext, useWatch, type FieldPath } from 'react-hook-form';
import { distributionSchema, type DistributionKind } from '../../../../../shared/scenario/distribution';
import { distributionMean, distributionVariance } from '../../../../../workers/engine/stats/distribution-moments';
import { DistributionPreview } from '../../../../components/charts';
import { useEditor, type ScenarioForm } from '../editor-context';
import { distributionOfKind } from '../utils/defaults';
import { previewShape } from '../utils/distribution-shape';
import { NumberField } from './fields';
import { NumberListField } from './number-list-field';

const KINDS: { value: DistributionKind; label: string }[] = [
  { value: 'fixed', label: 'Fixed' },
  { value: 'uniform', label: 'Uniform' },
  { value: 'triangular', label: 'Triangular' },
  { value: 'normal', label: 'Normal (truncated)' },
  { value: 'lognormal', label: 'Lognormal' },
  { value: 'exponential', label: 'Exponential' },
  { value: 'erlang', label: 'Erlang' },
  { value: 'gamma', label: 'Gamma' },
  { value: 'empirical', label: 'Empirical (time study)' },
];

const PARAMETERS: Record<DistributionKind, { key: string; label: string; step?: string }[]> = {
  fixed: [{ key: 'value', label: 'Value (s)' }],
  uniform: [
    { key: 'min', label: 'Min (s)' },
    { key: 'max', label: 'Max (s)' },
  ],
  triangular: [
    { key: 'min', label: 'Min (s)' },
    { key: 'mode', label: 'Mode (s)' },
    { key: 'max', label: 'Max (s)' },
  ],
  normal: [
    { key: 'mean', label: 'Mean (s)' },
    { key: 'sd', label: 'Std. dev. (s)' },
    { key: 'min', label: 'Cut below (s)' },
  ],
  lognormal: [
    { key: 'mean', label: 'Mean (s)' },
    { key: 'cv', label: 'CV' },
  ],
  exponential: [{ key: 'mean', label: 'Mean (s)' }],
  erlang: [
    { key: 'mean', label: 'Mean (s)' },
    { key: 'k', label: 'Phases k', step: '1' },
  ],
  gamma: [
    { key: 'mean', label: 'Mean (s)' },
    { key: 'cv', label: 'CV' },
  ],
  empirical: [],
};

const isKind = (value: unknown): value is DistributionKind => KINDS.some((k) => k.value === value);
const fmt = (v: number) => v.toLocaleString('en-GB', { maximumFractionDigits: v < 10 ? 2 : 1 });

function Summary({ value, label }: { value: unknown; label: string }) {
  const parsed = distributionSchema.safeParse(value);
  if (!parsed.success) return <p className="text-xs text-ink-soft">Shape shown once the values are valid.</p>;
  const mean = distributionMean(parsed.data);
  const cv = mean > 0 ? Math.sqrt(distributionVariance(parsed.data)) / mean : 0;
  return (
    <div className="flex items-center gap-3">
      <DistributionPreview label={label} {...previewShape(parsed.data)} width={140} height={36} />
      <p className="text-xs text-ink-soft tabular-nums" data-distribution-summary>
        mean <strong className="text-ink">{fmt(mean)} s</strong> · CV <strong className="text-ink">{fmt(cv)}</strong>
      </p>
    </div>
  );
}

/** A range outside which a mean is probably a typing slip, for a caution that does not refuse the value. */
export interface PlausibleRange {
  minSeconds: number;
  maxSeconds: number;
}

function plausibilityCaution(value: unknown, range: PlausibleRange | undefined, label: string): string | null {
  if (!range) return null;
  const parsed = distributionSchema.safeParse(value);
  if (!parsed.success) return null;
  const mean = distributionMean(parsed.data);
  if (mean >= range.minSeconds && mean <= range.maxSeconds) return null;
  return `A mean ${label.toLowerCase()} of ${mean.toLocaleString('en-GB', { maximumSignificantDigits: 4 })} s is unusual (most lie between ${range.minSeconds} s and ${range.maxSeconds.toLocaleString('en-GB')} s); check the value and that it is in seconds. It is kept as typed.`;
}

export function DistributionEditor({
  name,
  label,
  plausible,
}: {
  name: string;
  label: string;
  plausible?: PlausibleRange;
}) {
  const id = useId();
  const { control, setValue } = useFormContext<ScenarioForm>();
  const { readOnly, clearExternal } = useEditor();
  const path = name as FieldPath<ScenarioForm>;
  const value = useWatch({ control, name: path }) as { kind?: unknown } | undefined;
  const kind = isKind(value?.kind) ? value.kind : 'fixed';
  const onKind = (next: DistributionKind) => {
    const parsed = distributionSchema.safeParse(value);
    clearExternal(name);
    setValue(path, distributionOfKind(next, parsed.success ? distributionMean(parsed.data) : Number.NaN) as never, {
      shouldDirty: true,
      shouldValidate: true,
    });
  };
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-paper-sunk p-3" data-distribution={name}>
      <legend className="px-1 text-xs font-semibold text-ink">{label}</legend>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={id} className="text-xs font-semibold text-ink">
            Kind
          </label>
          <select
            id={id}
            value={kind}
            disabled={readOnly}
            onChange={(e) => onKind(e.target.value as DistributionKind)}
            className="rounded border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm disabled:bg-paper-sunk"
          >
            {KINDS.map((k) => (
              <option key={k.value} value={k.value}>
                {k.label}
              </option>
            ))}
          </select>
        </div>
        <Summary value={value} label={label} />
      </div>
      {plausibilityCaution(value, plausible, label) && (
        <p className="rounded bg-caution-soft px-2 py-1 text-xs text-caution" data-plausibility-caution>
          {plausibilityCaution(value, plausible, label)}
        </p>
      )}
      <div key={kind} className="grid grid-cols-3 gap-3">
        {PARAMETERS[kind].map((p) => (
          <NumberField key={p.key} name={`${name}.${p.key}`} label={p.label} step={p.step} />
        ))}
        {kind === 'empirical' && (
          <div className="col-span-3">
            <NumberListField
              name={`${name}.samples`}
              label="Measured times (s)"
              hint="Paste the time study's cycle times, separated by commas, spaces or new lines."
              rows={3}
            />
          </div>
        )}
      </div>
    </fieldset>
  );
}
