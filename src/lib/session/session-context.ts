// The signed-in user and the organisation they are working in.
import { createContext, useContext } from 'react';
import type { Me, Membership } from '../../../shared/api/auth';

export interface Session {
  user: Me['user'];
  memberships: Membership[];
  /** The organisation whose projects the list shows; undefined when the user belongs to none. */
  activeMembership: Membership | undefined;
  chooseOrganisation: (organisationId: string) => void;
  membershipFor: (organisationId: string) => Membership | undefined;
}

export const SessionContext = createContext<Session | null>(null);

/** The session, or null for a visitor; for parts shown both signed in and out, like the header. */
export const useOptionalSession = (): Session | null => useContext(SessionContext);

export function useSession(): Session {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession is only available on pages behind sign-in (inside RequireAuth).');
  return session;
}
