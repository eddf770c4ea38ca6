// Where a new study runs: in this browser tab (its cores, while the page stays open) or on the server's
// workers (any number of machines, the tab may close). Until the user picks, the study's size decides,
// and the hint says by which rule.
import { SERVER_SUGGESTED_ABOVE_HOURS, type StudyRunPlace } from '../../../../shared/api/studies';

interface RunPlaceFieldProps {
  value: StudyRunPlace;
  chosen: boolean;
  hours: number | null;
  onChange: (place: StudyRunPlace) => void;
}

const OPTIONS: { place: StudyRunPlace; label: string; detail: string }[] = [
  { place: 'browser', label: 'This browser', detail: 'uses this computer’s cores; keep the page open' },
  { place: 'server', label: 'The server', detail: 'shared by the server’s workers; you may close the page' },
];

const fmt = (n: number) => Math.round(n).toLocaleString('en-GB');

export function RunPlaceField({ value, chosen, hours, onChange }: RunPlaceFieldProps) {
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-paper-sunk p-3">
      <legend className="px-1 text-sm font-semibold">Where it runs</legend>
      <div className="flex flex-wrap gap-x-6 gap-y-2">
        {OPTIONS.map((o) => (
          <label key={o.place} className="flex items-start gap-2 text-sm">
            <input
              type="radio"
              name="run-place"
              className="mt-1"
              checked={value === o.place}
              onChange={() => onChange(o.place)}
            />
            <span>
              <span className="font-semibold">{o.label}</span> <span className="text-ink-soft">({o.detail})</span>
            </span>
          </label>
        ))}
      </div>
      <p className="text-sm text-ink-soft" data-testid="run-place-hint">
        {hours === null ? 'This study’s size is not known yet.' : `This study simulates ${fmt(hours)} hours. `}
        Studies above {fmt(SERVER_SUGGESTED_ABOVE_HOURS)} simulated hours (points × replications × (hours + warm-up),
        about ten minutes of a two-core laptop) run on the server unless you choose otherwise
        {chosen ? '; you chose.' : '.'} The server also sends you an e-mail when a long study finishes.
      </p>
    </fieldset>
  );
}
