// Header links to the team pages of the organisation being worked in (members for everyone, the audit
// trail for owners), the account page, and the development mailbox while mail goes to the local fake.
import { NavLink } from 'react-router-dom';
import type { Session } from '../../lib/session/session-context';
import { MailboxLink } from '../../features/mailbox/components/mailbox-link';

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `rounded px-1 text-paper underline-offset-4 hover:underline ${isActive ? 'underline' : ''}`;

export function TeamNav({ session }: { session: Session | null }) {
  const membership = session?.activeMembership;
  return (
    <nav aria-label="Team and account" className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      {membership && (
        <NavLink className={linkClass} to={`/organisations/${membership.organisationId}/members`}>
          Members
        </NavLink>
      )}
      {membership?.role === 'owner' && (
        <NavLink className={linkClass} to={`/organisations/${membership.organisationId}/audit`}>
          Audit
        </NavLink>
      )}
      {session && (
        <NavLink className={linkClass} to="/account">
          Account
        </NavLink>
      )}
      <MailboxLink />
    </nav>
  );
}
