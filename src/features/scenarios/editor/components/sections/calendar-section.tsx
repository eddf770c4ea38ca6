// Shifts, breaks and working days: they turn hourly throughput into annual output.
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { ScenarioForm } from '../../editor-context';
import { ListIssue, NumberField, SelectField } from '../fields';

const BREAK_MODE_OPTIONS = [
  { value: 'manualStations', label: 'Only manual stations set to pause stop; the rest of the line runs on' },
  { value: 'wholeLine', label: 'Breaks stop the whole line: carriers halt, no station works' },
] as const;
import { RemoveCell, SectionHeading, SmallButton } from '../row-actions';

function WorkingHours() {
  const calendar = useWatch<ScenarioForm, 'calendar'>({ name: 'calendar' });
  const nums = [calendar?.shiftsPerDay, calendar?.hoursPerShift, calendar?.daysPerWeek, calendar?.weeksPerYear];
  if (!nums.every((n) => typeof n === 'number' && Number.isFinite(n))) return null;
  const [shifts, hours, days, weeks] = nums as number[];
  const breakMinutes = (calendar?.breaks ?? []).reduce(
    (sum, b) => sum + (typeof b?.minutes === 'number' && Number.isFinite(b.minutes) ? b.minutes : 0),
    0,
  );
  const working = shifts * days * weeks * Math.max(0, hours - breakMinutes / 60);
  return (
    <p className="text-sm text-ink-soft" data-annual-hours>
      {(shifts * hours * days * weeks).toLocaleString('en-GB', { maximumFractionDigits: 0 })} staffed hours a year, of
      which about <strong className="text-ink">{working.toLocaleString('en-GB', { maximumFractionDigits: 0 })}</strong>{' '}
      outside breaks.
    </p>
  );
}

export function CalendarSection() {
  const { control } = useFormContext<ScenarioForm>();
  const breaks = useFieldArray({ control, name: 'calendar.breaks' });
  return (
    <div className="flex flex-col gap-5">
      <SectionHeading
        title="Calendar"
        description="Every shift of a day has the same length and breaks. Choose below whether breaks stop only the manual stations set to pause, or the whole line."
      />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <NumberField name="calendar.shiftsPerDay" label="Shifts per day" step="1" />
        <NumberField name="calendar.hoursPerShift" label="Hours per shift" />
        <NumberField name="calendar.daysPerWeek" label="Days per week" step="1" />
        <NumberField name="calendar.weeksPerYear" label="Weeks per year" step="1" />
      </div>
      <WorkingHours />
      <SectionHeading title="Breaks" description="Minutes after the start of each shift.">
        <SmallButton onClick={() => breaks.append({ startMinute: 0, minutes: 15 })}>Add break</SmallButton>
      </SectionHeading>
      <SelectField name="calendar.breakMode" label="During breaks" options={BREAK_MODE_OPTIONS} />
      <ListIssue name="calendar.breaks" />
      {breaks.fields.length === 0 && (
        <p className="text-sm text-ink-soft">No breaks: the line works the whole shift.</p>
      )}
      <ol className="flex flex-col gap-2">
        {breaks.fields.map((field, i) => (
          <li key={field.id} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2">
            <NumberField name={`calendar.breaks.${i}.startMinute`} label={`Break ${i + 1} starts at minute`} />
            <NumberField name={`calendar.breaks.${i}.minutes`} label="Length (minutes)" />
            <RemoveCell onClick={() => breaks.remove(i)} label={`Remove break ${i + 1}`} />
          </li>
        ))}
      </ol>
    </div>
  );
}
