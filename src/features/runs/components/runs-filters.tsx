// The filter bar above the runs table. The menus offer the values the whole list holds (the server
// reports them beside each page), not only the page on screen.
import { FORMER_MEMBER, type RunFilterChoices } from '../../../../shared/api/runs';
import { Button } from '../../../components/ui/button';
import { formatDay, formatPerson } from '../../../lib/format';
import { anyFilter, NO_FILTERS, sinceChoices, type RunFilterValues } from '../utils/run-filters';

interface RunsFiltersProps {
  choices: RunFilterChoices;
  values: RunFilterValues;
  onChange: (values: RunFilterValues) => void;
}

const CONTROL =
  'rounded-md border border-ink-faint bg-paper-raised px-2 py-1.5 text-sm text-ink focus-visible:outline-2 focus-visible:outline-accent';
const LABEL = 'flex flex-col gap-1 text-xs font-semibold text-ink-soft';

interface NumberChoiceProps {
  label: string;
  values: readonly number[];
  value: string;
  onChange: (event: { target: { value: string } }) => void;
}

/** One of the values the listed runs actually have, or any. */
function NumberChoice({ label, values, value, onChange }: NumberChoiceProps) {
  return (
    <label className={LABEL}>
      {label}
      <select className={CONTROL} value={value} onChange={onChange}>
        <option value="">Any</option>
        {values.map((n) => (
          <option key={n} value={String(n)}>
            {n}
          </option>
        ))}
      </select>
    </label>
  );
}

export function RunsFilters({ choices, values, onChange }: RunsFiltersProps) {
  const set = (key: keyof RunFilterValues) => (event: { target: { value: string } }) =>
    onChange({ ...values, [key]: event.target.value });
  const active = anyFilter(values);
  return (
    <div role="group" aria-label="Filter runs" className="flex flex-wrap items-end gap-3">
      <label className={LABEL}>
        Author
        <select className={CONTROL} value={values.author} onChange={set('author')}>
          <option value="">Anyone</option>
          {choices.authors.map((a) => (
            <option key={a.id ?? FORMER_MEMBER} value={a.id ?? FORMER_MEMBER}>
              {a.id ? a.name : formatPerson(null)}
            </option>
          ))}
        </select>
      </label>
      <NumberChoice label="Revision" values={choices.revisions} value={values.revision} onChange={set('revision')} />
      <NumberChoice label="Carriers" values={choices.carriers} value={values.carriers} onChange={set('carriers')} />
      <label className={LABEL}>
        Run on or after
        <select className={CONTROL} value={values.since} onChange={set('since')}>
          <option value="">Any day</option>
          {sinceChoices(new Date(), formatDay).map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </select>
      </label>
      <label className={LABEL}>
        Throughput at least (/h)
        <input
          type="number"
          min={0}
          step="any"
          className={`${CONTROL} w-28`}
          value={values.minThroughput}
          onChange={set('minThroughput')}
        />
      </label>
      <label className={LABEL}>
        Takt at most (s)
        <input
          type="number"
          min={0}
          step="any"
          className={`${CONTROL} w-28`}
          value={values.maxTakt}
          onChange={set('maxTakt')}
        />
      </label>
      {active && (
        <Button variant="quiet" onClick={() => onChange(NO_FILTERS)}>
          Clear filters
        </Button>
      )}
    </div>
  );
}
