// Shows the organisation being worked in, and lets members of several switch.
import { useId } from 'react';
import type { Session } from '../../../lib/session/session-context';

export function OrganisationPicker({ session }: { session: Session }) {
  const id = useId();
  const { memberships, activeMembership } = session;
  if (!activeMembership) return <span className="text-paper-sunk">No organisation</span>;
  if (memberships.length === 1) {
    return (
      <span className="text-paper-sunk">
        <span className="sr-only">Organisation: </span>
        {activeMembership.organisationName}
      </span>
    );
  }
  return (
    <span className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Organisation
      </label>
      <select
        id={id}
        value={activeMembership.organisationId}
        onChange={(event) => session.chooseOrganisation(event.target.value)}
        className="rounded-md border border-ink-soft bg-ink px-2 py-1 text-paper focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-accent-soft"
      >
        {memberships.map((m) => (
          <option key={m.organisationId} value={m.organisationId}>
            {m.organisationName}
          </option>
        ))}
      </select>
    </span>
  );
}
