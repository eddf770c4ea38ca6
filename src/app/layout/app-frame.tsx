// The frame around every page: skip link, header, main content, safety note.
// Signed-in visitors see who they are and where they work in the header.
import { Outlet } from 'react-router-dom';
import { UserMenu } from '../../features/auth/components/user-menu';
import { useOptionalSession } from '../../lib/session/session-context';
import { SafetyNote } from './safety-note';
import { TeamNav } from './team-nav';
import { Wordmark } from './wordmark';

export function AppFrame() {
  const session = useOptionalSession();
  return (
    <div className="flex min-h-screen flex-col print:min-h-0">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-paper-raised px-4 py-2 font-semibold text-ink focus:not-sr-only focus:fixed focus:top-3 focus:left-3 focus:outline-3 focus:outline-accent"
      >
        Skip to main content
      </a>
      <header className="bg-ink text-paper print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
          <Wordmark />
          <TeamNav session={session} />
          {session && <UserMenu session={session} />}
        </div>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 focus:outline-none sm:px-6 sm:py-10 print:max-w-none print:p-0"
      >
        <Outlet />
      </main>
      <SafetyNote />
    </div>
  );
}
