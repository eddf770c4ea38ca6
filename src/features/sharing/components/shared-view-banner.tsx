// The band at the top of every shared page: what this is, from whom, until when, and that it is read only.
import { formatDateTime } from '../../../lib/format';

export function SharedViewBanner({ organisationName, expiresAt }: { organisationName: string; expiresAt: string }) {
  return (
    <div
      role="note"
      aria-label="Shared view"
      className="flex flex-col gap-1 rounded-md border-l-4 border-accent bg-accent-soft px-4 py-3 text-ink"
    >
      <p className="font-semibold">Shared view, read only</p>
      <p className="text-sm">
        {organisationName} shared this with you through a link that works until {formatDateTime(expiresAt)}. You see
        only what was shared, and nothing here can be changed.
      </p>
    </div>
  );
}
