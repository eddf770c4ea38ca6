// Previous/next paging under a server-paged list, with "41–60 of 342" between the buttons.
import { Button } from './button';

interface PagerProps {
  /** Names the navigation landmark ("Run pages"). */
  label: string;
  offset: number;
  limit: number;
  total: number;
  onOffsetChange: (offset: number) => void;
  previousLabel?: string;
  nextLabel?: string;
}

export function Pager({
  label,
  offset,
  limit,
  total,
  onOffsetChange,
  previousLabel = 'Previous',
  nextLabel = 'Next',
}: PagerProps) {
  if (total <= limit && offset === 0) return null;
  const last = Math.min(offset + limit, total);
  return (
    <nav aria-label={label} className="flex items-center gap-3 text-sm text-ink-soft">
      <Button variant="secondary" disabled={offset <= 0} onClick={() => onOffsetChange(Math.max(0, offset - limit))}>
        {previousLabel}
      </Button>
      <span aria-live="polite">{total === 0 ? 'none' : `${offset + 1}–${last} of ${total}`}</span>
      <Button variant="secondary" disabled={last >= total} onClick={() => onOffsetChange(offset + limit)}>
        {nextLabel}
      </Button>
    </nav>
  );
}
