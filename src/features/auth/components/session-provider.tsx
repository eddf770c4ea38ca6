// Supplies the Session once the signed-in user is known. The chosen
// organisation is remembered in this browser so a member of several
// organisations comes back to the one they last used.
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { useMe } from '../api/get-me';
import { SessionContext, type Session } from '../../../lib/session/session-context';

const STORAGE_KEY = 'lanewright.organisationId';

function readStored(): string | null {
  try {
    return window.localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

export function SessionProvider({ children }: { children: ReactNode }) {
  const { data: me } = useMe();
  const [chosenId, setChosenId] = useState<string | null>(readStored);

  const chooseOrganisation = useCallback((organisationId: string) => {
    setChosenId(organisationId);
    try {
      window.localStorage.setItem(STORAGE_KEY, organisationId);
    } catch {
      // Private windows may refuse storage; the choice then lasts for this visit only.
    }
  }, []);

  const session = useMemo<Session | null>(() => {
    if (!me) return null;
    const membershipFor = (organisationId: string) => me.memberships.find((m) => m.organisationId === organisationId);
    return {
      user: me.user,
      memberships: me.memberships,
      activeMembership: (chosenId ? membershipFor(chosenId) : undefined) ?? me.memberships[0],
      chooseOrganisation,
      membershipFor,
    };
  }, [me, chosenId, chooseOrganisation]);

  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}
