// The sectioned editor: a list of sections with their problem counts beside the open section.
import type { ReactNode } from 'react';
import { useIssueCount } from '../hooks/use-has-issues';
import type { SectionId } from '../utils/paths';
import { CalendarSection } from './sections/calendar-section';
import { CarriersSection } from './sections/carriers-section';
import { ConveyorSection } from './sections/conveyor-section';
import { GeneralSection } from './sections/general-section';
import { LanesSection } from './sections/lanes-section';
import { ProcessSection } from './sections/process-section';
import { TrackSection } from './sections/track-section';
import { TransfersSection } from './sections/transfers-section';

export const SECTIONS: { id: SectionId; label: string; roots: string[]; render: () => ReactNode }[] = [
  {
    id: 'general',
    label: 'General',
    roots: ['name', 'description', 'targetTaktSeconds'],
    render: () => <GeneralSection />,
  },
  { id: 'track', label: 'Track and decks', roots: ['track', 'decks'], render: () => <TrackSection /> },
  { id: 'lanes', label: 'Lanes', roots: ['lanes'], render: () => <LanesSection /> },
  { id: 'transfers', label: 'Transfers and links', roots: ['transfers', 'links'], render: () => <TransfersSection /> },
  { id: 'carriers', label: 'Carriers', roots: ['carriers'], render: () => <CarriersSection /> },
  { id: 'process', label: 'Process and stations', roots: ['steps'], render: () => <ProcessSection /> },
  { id: 'calendar', label: 'Calendar', roots: ['calendar'], render: () => <CalendarSection /> },
  { id: 'conveyor', label: 'Conveyor mode', roots: ['conveyor'], render: () => <ConveyorSection /> },
];

function Count({ roots }: { roots: string[] }) {
  // Hooks in a fixed order: every section has a fixed list of roots.
  const counts = roots.map((root) => useIssueCount(root));
  const total = counts.reduce((a, b) => a + b, 0);
  if (total === 0) return null;
  return (
    <span
      className="ml-auto rounded-full bg-danger-soft px-2 text-xs font-semibold text-danger"
      aria-label={`${total} problem${total === 1 ? '' : 's'}`}
    >
      {total}
    </span>
  );
}

export function ScenarioEditor({ section, onSection }: { section: SectionId; onSection: (id: SectionId) => void }) {
  const open = SECTIONS.find((s) => s.id === section) ?? SECTIONS[0];
  return (
    <div className="grid grid-cols-1 gap-4 sm:grid-cols-[10.5rem_1fr]">
      <nav aria-label="Scenario sections">
        {/* A row of section buttons above the section on a phone; a side menu from small tablets up. */}
        <ul className="flex flex-wrap gap-1 sm:flex-col sm:flex-nowrap sm:gap-0.5">
          {SECTIONS.map((s) => (
            <li key={s.id}>
              <button
                type="button"
                onClick={() => onSection(s.id)}
                aria-current={s.id === open.id ? 'true' : undefined}
                className={`flex items-center gap-2 rounded px-2 py-1.5 sm:w-full text-left text-sm ${s.id === open.id ? 'bg-ink font-semibold text-white' : 'text-ink border border-paper-sunk hover:bg-paper-sunk sm:border-transparent'}`}
              >
                {s.label}
                <Count roots={s.roots} />
              </button>
            </li>
          ))}
        </ul>
      </nav>
      <div className="min-w-0" role="region" aria-label={open.label}>
        {open.render()}
      </div>
    </div>
  );
}
