// Lanewright's wordmark: two lanes, one above the other, with carriers on them.
import { Link } from 'react-router-dom';

export function Wordmark() {
  return (
    <Link
      to="/"
      className="flex items-center gap-2.5 rounded-sm text-paper focus-visible:outline-3 focus-visible:outline-offset-4 focus-visible:outline-accent-soft"
    >
      <svg aria-hidden="true" viewBox="0 0 32 24" className="h-6 w-8">
        <rect x="1" y="5" width="30" height="2" rx="1" fill="currentColor" opacity="0.55" />
        <rect x="1" y="17" width="30" height="2" rx="1" fill="currentColor" opacity="0.55" />
        <rect x="5" y="2" width="7" height="5" rx="1.5" fill="#5eead4" />
        <rect x="15" y="2" width="7" height="5" rx="1.5" fill="#5eead4" />
        <rect x="20" y="14" width="7" height="5" rx="1.5" fill="currentColor" />
      </svg>
      <span className="text-lg font-semibold tracking-tight">Lanewright</span>
    </Link>
  );
}
