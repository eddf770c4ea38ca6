// The headline counts of a layout as a row of figures.
import { formatLengthMm } from '../../../lib/format';
import type { DocumentFacts } from '../utils/document-facts';

export function DocumentFactsList({ facts }: { facts: DocumentFacts }) {
  const items: [string, string][] = [
    ['Decks', String(facts.decks)],
    ['Lanes', String(facts.lanes)],
    ['Track length', formatLengthMm(facts.trackLengthMm)],
    ['Transfers', String(facts.transfers)],
    ['Process steps', String(facts.steps)],
    ['Stations', String(facts.stations)],
    ['Carriers', String(facts.carriers)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-7">
      {items.map(([label, value]) => (
        <div key={label} className="flex flex-col gap-1 rounded-md border border-paper-sunk bg-paper-raised px-3 py-2">
          <dt className="text-xs font-medium tracking-wide text-ink-soft uppercase">{label}</dt>
          <dd className="text-xl font-semibold text-ink tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
